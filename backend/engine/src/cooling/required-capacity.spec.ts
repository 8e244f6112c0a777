import { loadReferenceData } from '../testing/reference-data';
import {
  elevationFactor,
  lightFactor,
  requiredCapacity,
  temperatureRiseFactor,
  velocityFactor,
  type CapacityInput,
} from './required-capacity';

const ref = loadReferenceData();
const FT = 0.3048;
const LUX_PER_FC = 10.76391;

function input(overrides: Partial<CapacityInput> = {}): CapacityInput {
  return {
    floorAreaM2: 9 * 30,
    elevationM: 0,
    peakInteriorLightLux: 5000 * LUX_PER_FC,
    allowedTemperatureRiseK: (7 * 5) / 9,
    padToFanDistanceM: 40,
    fans: { count: 2, capacityEachM3PerS: 5 },
    inletAreaM2: 6,
    ...overrides,
  };
}

describe('summer exhaust capacity by the floor-area method', () => {
  it('base rate is 8 cfm per ft² of floor (Kessler, Auburn Univ. "Greenhouse Ventilation and Cooling", verified) = 0.04064 m³/(s·m²)', () => {
    const cfmPerFt2InSi = (8 * FT ** 3) / 60 / FT ** 2;
    const result = requiredCapacity(input(), ref);
    expect(result.baseRateM3PerSM2).toBeCloseTo(cfmPerFt2InSi, 10);
    expect(result.baseRateM3PerSM2).toBeCloseTo(0.04064, 10);
  });

  it('at sea level, 5,000 fc, a 7 °F rise and a long house every factor is 1 and the flow is the base rate × floor', () => {
    const result = requiredCapacity(input(), ref);
    expect(result.factors.elevation).toBe(1);
    expect(result.factors.light).toBeCloseTo(1, 4);
    expect(result.factors.temperatureRise).toBeCloseTo(1, 4);
    expect(result.factors.velocity).toBe(1);
    expect(result.requiredFlowM3PerS).toBeCloseTo(0.04064 * 270, 2);
  });

  it.each([
    [20, 2.24],
    [30, 1.83],
    [50, 1.41],
    [75, 1.15],
    [100, 1.0],
  ])('velocity factor at %i ft pad-to-fan is %f (√(100/d), derived)', (feet, expected) => {
    expect(velocityFactor(feet * FT, ref)).toBeCloseTo(expected, 2);
  });

  it('velocity factor stays 1 beyond 100 ft', () => {
    expect(velocityFactor(60, ref)).toBe(1);
  });

  it('light factor scales with interior light: 4,000 fc ≈ 0.8, 6,000 fc ≈ 1.2 (EP406/NGMA recalled from memory, tested as a range)', () => {
    const at4000 = lightFactor(4000 * LUX_PER_FC, ref);
    const at6000 = lightFactor(6000 * LUX_PER_FC, ref);
    expect(at4000).toBeGreaterThan(0.75);
    expect(at4000).toBeLessThan(0.85);
    expect(at6000).toBeGreaterThan(1.15);
    expect(at6000).toBeLessThan(1.25);
  });

  it('temperature-rise factor: 10 °F ≈ 0.70, 5 °F ≈ 1.40 (EP406/NGMA recalled from memory, tested as a range)', () => {
    const at10F = temperatureRiseFactor((10 * 5) / 9, ref);
    const at5F = temperatureRiseFactor((5 * 5) / 9, ref);
    expect(at10F).toBeGreaterThan(0.65);
    expect(at10F).toBeLessThan(0.75);
    expect(at5F).toBeGreaterThan(1.3);
    expect(at5F).toBeLessThan(1.5);
  });

  it('elevation factor ≈ 1.2 at 5,000 ft (EP406/NGMA table recalled from memory, tested as a range) and never falls with height', () => {
    const at5000ft = elevationFactor(5000 * FT, ref);
    expect(at5000ft.factor).toBeGreaterThan(1.15);
    expect(at5000ft.factor).toBeLessThan(1.25);
    expect(at5000ft.beyondTable).toBe(false);
    let previous = 0;
    for (let elevationM = -100; elevationM <= 4500; elevationM += 50) {
      const { factor } = elevationFactor(elevationM, ref);
      expect(factor).toBeGreaterThanOrEqual(previous);
      previous = factor;
    }
    expect(elevationFactor(3000, ref).beyondTable).toBe(true);
  });

  it('uses the larger of the house factor and the velocity factor', () => {
    const short = requiredCapacity(input({ padToFanDistanceM: 20 * FT }), ref);
    expect(short.factors.applied).toBeCloseTo(short.factors.velocity, 10);
    const bright = requiredCapacity(
      input({ peakInteriorLightLux: 8000 * LUX_PER_FC, padToFanDistanceM: 75 * FT }),
      ref,
    );
    expect(bright.factors.house).toBeCloseTo(1.6, 3);
    expect(bright.factors.applied).toBeCloseTo(bright.factors.house, 10);
  });

  it('counts fans of the house size needed (rounded up) and how many more', () => {
    // 0.04064 × 270 = 10.97 m³/s; 5 m³/s fans → 3 needed, 2 installed → 1 more
    const result = requiredCapacity(input(), ref);
    expect(result.verdict).toBe('short');
    expect(result.fansNeeded).toBe(3);
    expect(result.additionalFansNeeded).toBe(1);
    const enough = requiredCapacity(input({ fans: { count: 4, capacityEachM3PerS: 5 } }), ref);
    expect(enough.verdict).toBe('adequate');
    expect(enough.additionalFansNeeded).toBe(0);
  });

  it('reports no-fans when none are installed, still sizing from the fan size when one is given', () => {
    const none = requiredCapacity(input({ fans: { count: 0, capacityEachM3PerS: 0 } }), ref);
    expect(none.verdict).toBe('no-fans');
    expect(none.fansNeeded).toBeNull();
    const sized = requiredCapacity(input({ fans: { count: 0, capacityEachM3PerS: 4 } }), ref);
    expect(sized.fansNeeded).toBe(3);
    expect(sized.additionalFansNeeded).toBe(3);
  });

  it('inlet area = design flow / 2.032 m/s (400 fpm, memory) for the larger of installed and required flow', () => {
    const result = requiredCapacity(input({ fans: { count: 4, capacityEachM3PerS: 5 }, inletAreaM2: 9 }), ref);
    expect(result.inletAreaNeededM2).toBeCloseTo(20 / 2.032, 6);
    expect(result.inletVerdict).toBe('short');
    const roomy = requiredCapacity(input({ fans: { count: 4, capacityEachM3PerS: 5 }, inletAreaM2: 10 }), ref);
    expect(roomy.inletVerdict).toBe('adequate');
  });
});
