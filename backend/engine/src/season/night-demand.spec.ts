import { loadReferenceData } from '../testing/reference-data';
import { sunTimes } from '../solar';
import { demoClimate, demoSeasonInput } from './demo-season';
import { nightHeatingDemand, type NightDemandInput } from './night-demand';
import { SunCache } from './sun-hours';
import { dryAirDensityByHand } from '../testing/air-by-hand';
import { expectRelativelyClose } from '../testing/relative-tolerance';

const ref = loadReferenceData();
const sunCache = new SunCache();

function nightInput(overrides: Partial<NightDemandInput> = {}): NightDemandInput {
  const { season: _season, calendar: _calendar, ...rest } = demoSeasonInput();
  return { ...rest, date: '2026-01-20', ...overrides };
}

function constantClimate(outdoorC: number) {
  return {
    ...demoClimate(),
    monthly: demoClimate().monthly.map((month) => ({ ...month, meanDailyMinC: outdoorC, meanDailyMaxC: outdoorC })),
  };
}

describe('night heating demand', () => {
  /**
   * The night sky by hand for the demo site in January at a constant −5 °C (reference-data/sky-radiation.json):
   *   clearness 0.50 (climate-defaults.json, January) → N/8 = (0.50/0.75)^(1/3.4) = 0.887582 → 8.87582 tenths
   *   Clark & Allen: 1 + 0.0224 × 8.87582 − 0.0035 × 8.87582² + 0.00028 × 8.87582³ = 1.118875
   *   dew point = the day's minimum, −5 °C: ε_clear = 0.711 − 0.028 + 0.001825 = 0.684825; ε = 0.766233
   *   deficit D = σ T⁴ (1 − ε) = 5.670374e−8 × 268.15⁴ × 0.233767 = 293.1723 × 0.233767 = 68.5339 W/m²
   */
  const skyDeficitByHand = 68.5339;
  // crop 0.30 × 0.95 × 270 m² = 76.95 m²; coverings (1172.999 + 571.68 W/K) × 0.4 / 33.4 + 213.588 W/K × 0.9 / 33.4
  // = 26.6497 m² (U·A from heating/heat-loss.spec.ts; h_o 33.4 W/(m²·K)); S = 103.5997 m²
  const couplingByHand = 103.5997;

  it('is (UA × (T_night − T_out) + sky loss) × night length at a constant outdoor temperature', () => {
    const night = nightHeatingDemand(nightInput({ climate: constantClimate(-5) }), ref, sunCache);
    const sunset = sunTimes(new Date(Date.UTC(2026, 0, 20, 17)), 42, -72.5).sunset!;
    const sunrise = sunTimes(new Date(Date.UTC(2026, 0, 21, 17)), 42, -72.5).sunrise!;
    const nightHours = (sunrise.getTime() - sunset.getTime()) / 3_600_000;
    expect(night.nightHours).toBeCloseTo(nightHours, 6);
    // UA by hand (heating/heat-loss.spec.ts): conduction + perimeter 2065.907 W/K for the example house,
    // infiltration with dry air at the 15 °C night setpoint and the demo site's 60 m (testing/air-by-hand.ts):
    // ρ = 1.21636 kg/m³; 1.21636 × 1006 × 918 × 0.75 / 3600 = 234.024 W/K; UA = 2299.931 W/K
    const uaByHand = 2065.907 + (dryAirDensityByHand(15, 60) * 1006 * 918 * 0.75) / 3600;
    expect(uaByHand).toBeCloseTo(2299.93, 1);
    expectRelativelyClose(night.uaWPerK, uaByHand, 1e-5);
    // 103.5997 m² × 68.5339 W/m² = 7100.10 W to the sky every night hour
    const skyW = couplingByHand * skyDeficitByHand;
    expect(skyW).toBeCloseTo(7100.1, 1);
    for (const hour of night.hourly) expectRelativelyClose(hour.skyW, skyW, 1e-5);
    expectRelativelyClose(night.skyKWh, (skyW * nightHours) / 1000, 1e-5);
    expectRelativelyClose(night.energyKWh, ((uaByHand * 20 + skyW) * nightHours) / 1000, 1e-5);
    expectRelativelyClose(night.peakW, uaByHand * 20 + skyW, 1e-5);
    expect(night.sunset).toMatch(/^2026-01-20T16:/);
    expect(night.sunrise).toMatch(/^2026-01-21T07:/);
    expect(night.fuelQuantityUs).toBeGreaterThan(0);
  });

  it('needs less with the curtain drawn: less UA, and the drawn curtain stops the crop radiating to the sky', () => {
    const open = nightHeatingDemand(nightInput({ climate: constantClimate(-5) }), ref, sunCache);
    const house = { ...demoSeasonInput().house, curtainId: 'pe-film-curtain' };
    const drawn = nightHeatingDemand(nightInput({ climate: constantClimate(-5), house }), ref, sunCache);
    expect(drawn.uaWPerK).toBeLessThan(open.uaWPerK);
    // drawn: no crop path (curtain opaque to long-wave radiation); coverings' path with the curtain's
    // 0.33 off roof and sidewalls (curtains.json pe-film-curtain):
    // (1172.999 + 571.68) × 0.67 × 0.4 / 33.4 + 213.588 × 0.9 / 33.4 = 13.9992 + 5.7554 = 19.7546 m²
    const drawnSkyW = 19.7546 * skyDeficitByHand;
    const openSkyW = couplingByHand * skyDeficitByHand;
    expectRelativelyClose(drawn.skyKWh / open.skyKWh, drawnSkyW / openSkyW, 1e-5);
    expectRelativelyClose(
      drawn.energyKWh / open.energyKWh,
      (drawn.uaWPerK * 20 + drawnSkyW) / (open.uaWPerK * 20 + openSkyW),
      1e-5,
    );
  });

  it('follows the daily curve: colder before sunrise than after sunset, and a lower setpoint needs less', () => {
    const night = nightHeatingDemand(nightInput(), ref, sunCache);
    expect(night.hourly[0].outdoorC).toBeGreaterThan(night.minOutdoorC);
    const cooler = nightHeatingDemand(nightInput({ nightSetpointC: 10 }), ref, sunCache);
    expect(cooler.energyKWh).toBeLessThan(night.energyKWh);
    expect(cooler.nightSetpointC).toBe(10);
  });
});

describe('night heating demand with the installed heaters as a limit', () => {
  it('flags each hour the heaters cannot hold and counts fuel on the heat delivered', () => {
    const { house } = nightInput();
    const ample = nightHeatingDemand(nightInput({ climate: constantClimate(-5) }), ref, sunCache);
    const outputW = ample.peakW / 2;
    const small = nightHeatingDemand(
      nightInput({
        climate: constantClimate(-5),
        house: { ...house, heaters: [{ count: 1, ratedInputW: outputW / 0.8, efficiency: 0.8, fuelId: 'propane' }] },
      }),
      ref,
      sunCache,
    );
    expect(ample.hoursBelowSetpoint).toBe(0);
    expect(ample.capacityCaution).toBeNull();
    expect(small.installedOutputW).toBeCloseTo(outputW, 6);
    expect(small.hoursBelowSetpoint).toBe(small.hourly.length);
    for (const hour of small.hourly) {
      expect(hour.belowSetpoint).toBe(true);
      expect(hour.deliveredW).toBeCloseTo(outputW, 6);
    }
    expect(small.energyKWh).toBeCloseTo(ample.energyKWh / 2, 6);
    expect(small.unmetHeatKWh).toBeCloseTo(ample.energyKWh / 2, 6);
    expect(small.fuelInputKWh).toBeCloseTo(small.energyKWh / 0.8, 6);
    expect(small.capacityCaution).toMatch(/of the night/);
  });
});
