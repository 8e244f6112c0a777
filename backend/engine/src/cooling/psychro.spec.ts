import { humidityRatioFromWetBulb, padLeavingAirC, wetBulbFromHumidityRatioC } from './psychro';

const fToC = (f: number) => ((f - 32) * 5) / 9;
const cToF = (c: number) => (c * 9) / 5 + 32;

describe('wet-bulb helpers (psychrolib)', () => {
  it('40 °C dry bulb, 20 °C wet bulb at 101,325 Pa → humidity ratio 0.0065 kg/kg (ASHRAE 2017 Fundamentals ch. 1 Example 1, as checked in the psychrolib test suite)', () => {
    // the handbook prints 0.0065; the psychrolib suite accepts ±0.0001
    expect(Math.abs(humidityRatioFromWetBulb(40, 20, 101325) - 0.0065)).toBeLessThanOrEqual(0.0001);
  });

  it('recovers the 20 °C wet bulb of that example from its humidity ratio (within 0.1 K, the psychrolib suite tolerance)', () => {
    const humidityRatio = humidityRatioFromWetBulb(40, 20, 101325);
    expect(wetBulbFromHumidityRatioC(40, humidityRatio, 101325)).toBeCloseTo(20, 1);
  });

  it('30 °C / 25 °C wet bulb at 95,461 Pa → 0.0192281 kg/kg and back (psychrolib test suite value)', () => {
    const humidityRatio = humidityRatioFromWetBulb(30, 25, 95461);
    expect(humidityRatio).toBeGreaterThan(0.0192281 * (1 - 0.0003));
    expect(humidityRatio).toBeLessThan(0.0192281 * (1 + 0.0003));
    expect(wetBulbFromHumidityRatioC(30, humidityRatio, 95461)).toBeCloseTo(25, 2);
  });

  it('treats air holding more water than saturation allows as saturated (wet bulb = dry bulb)', () => {
    const humidityRatio = humidityRatioFromWetBulb(35, 28, 101325);
    expect(wetBulbFromHumidityRatioC(18, humidityRatio, 101325)).toBe(18);
  });

  it('wet bulb never exceeds dry bulb and falls as the air dries', () => {
    const humid = wetBulbFromHumidityRatioC(32, 0.018, 101325);
    const dry = wetBulbFromHumidityRatioC(32, 0.006, 101325);
    expect(humid).toBeLessThanOrEqual(32);
    expect(dry).toBeLessThan(humid);
  });
});

describe('padLeavingAirC', () => {
  it('95 °F dry bulb, 75 °F wet bulb, saturation efficiency 0.80 → 79 °F (standard definition, derived)', () => {
    expect(cToF(padLeavingAirC(fToC(95), fToC(75), 0.8))).toBeCloseTo(79, 6);
  });

  it('efficiency 0 leaves the air as it was and 1 brings it to the wet bulb', () => {
    expect(padLeavingAirC(35, 22, 0)).toBe(35);
    expect(padLeavingAirC(35, 22, 1)).toBe(22);
  });
});
