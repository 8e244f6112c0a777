import {
  dewPointC,
  dryAirDensityKgPerM3,
  insideAirDensityKgPerM3,
  moistAirDensityKgPerM3,
  standardAtmosphericPressurePa,
} from './psychrometrics';

const fahrenheitToC = (f: number) => ((f - 32) * 5) / 9;
const cToFahrenheit = (c: number) => (c * 9) / 5 + 32;

describe('psychrometrics', () => {
  it('dew point at 25 °C and 80 % RH is 21.3094 °C (psychrolib.js header example)', () => {
    expect(dewPointC(25, 80)).toBeCloseTo(21.3094, 3);
  });

  it('dew point of 70 °F / 70 % RH air is 60 °F as the UF/IFAS condensation bulletin prints it (Buffington et al.: "condenses on any surface at 60 °F or colder"), within its whole-degree rounding ±0.5 °F', () => {
    const dewF = cToFahrenheit(dewPointC(fahrenheitToC(70), 70));
    expect(Math.abs(dewF - 60)).toBeLessThanOrEqual(0.5);
  });

  it('dew point of 70 °F / 70 % RH by hand with the Magnus form (Alduchov & Eskridge 1996: a = 17.625, b = 243.04 °C) is 15.43 °C = 59.8 °F; the engine (psychrolib) agrees within 0.05 K', () => {
    // T = 21.1111 °C; γ = ln(0.70) + 17.625 × 21.1111 / (243.04 + 21.1111) = −0.356675 + 1.408600 = 1.051925
    // T_d = 243.04 × 1.051925 / (17.625 − 1.051925) = 255.6598 / 16.573075 = 15.4262 °C
    expect(Math.abs(dewPointC(fahrenheitToC(70), 70) - 15.4262)).toBeLessThan(0.05);
  });

  it('dew point at 20 °C / 50 % is about 9.26 °C (Alduchov & Eskridge 1996 Magnus form, derived)', () => {
    expect(dewPointC(20, 50)).toBeCloseTo(9.26, 1);
  });

  it('standard-atmosphere pressure: 101,325 Pa at 0 m, 95,461 Pa at 500 m, 89,875 Pa at 1,000 m (psychrolib test suite, ASHRAE 2017 Fundamentals ch. 1 table 1)', () => {
    expect(standardAtmosphericPressurePa(0)).toBeCloseTo(101325, -1);
    expect(standardAtmosphericPressurePa(500)).toBeCloseTo(95461, -1);
    expect(standardAtmosphericPressurePa(1000)).toBeCloseTo(89875, -1);
  });

  it('dry air at 25 °C and 101,325 Pa has specific volume 0.8443 m³/kg, density ≈ 1.184 kg/m³ (psychrolib test suite)', () => {
    expect(1 / dryAirDensityKgPerM3(25, 101325)).toBeCloseTo(0.8443, 3);
  });

  it('moist air is slightly lighter than dry air at the same temperature and pressure, and air is thinner up a mountain', () => {
    expect(moistAirDensityKgPerM3(20, 80, 101325)).toBeLessThan(dryAirDensityKgPerM3(20, 101325));
    const low = insideAirDensityKgPerM3(15, 70, 0).airDensityKgPerM3;
    const high = insideAirDensityKgPerM3(15, 70, 2000).airDensityKgPerM3;
    expect(high).toBeLessThan(low * 0.85);
    expect(low).toBeGreaterThan(1.2);
    expect(low).toBeLessThan(1.24);
  });
});
