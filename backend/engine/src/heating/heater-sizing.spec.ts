import fc from 'fast-check';
import { EngineInputError } from '../errors';
import type { HeaterGroup } from '../house.types';
import { referenceRow } from '../reference-data.types';
import { loadReferenceData } from '../testing/reference-data';
import { proseToPlainSi } from '../vocabulary';
import { sizeHeaters } from './heater-sizing';

const ref = loadReferenceData();
const margin = referenceRow(ref, 'heater-sizing', 'safety-margin')!.fraction as number;
const propane = (count: number, ratedInputW: number, efficiency = 0.8): HeaterGroup => ({
  count,
  ratedInputW,
  efficiency,
  fuelId: 'propane',
});

function expectEngineError(run: () => unknown, field: string): void {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    expect((error as EngineInputError).field).toBe(field);
    return;
  }
  throw new Error(`expected EngineInputError on ${field}`);
}

describe('sizeHeaters', () => {
  it('takes a sizing margin of 10–25 % from reference data (common practice, no source)', () => {
    expect(margin).toBeGreaterThanOrEqual(0.1);
    expect(margin).toBeLessThanOrEqual(0.25);
  });

  it('two 45 kW-input units at 80 % against a 50 kW loss with UA 2000 W/K at 15 °C inside (hand calculation)', () => {
    // installed input 90 kW, output 72 kW; required output 50 kW × (1 + margin)
    // holds 15 − 72000/2000 = −21 °C; with one unit out 15 − 36000/2000 = −3 °C
    const sizing = sizeHeaters(
      { designHeatLossW: 50_000, totalConductanceWPerK: 2000, insideC: 15, heaters: [propane(2, 45_000)] },
      ref,
    );
    const result = sizing.result;
    expect(result.requiredOutputW).toBeCloseTo(50_000 * (1 + margin), 6);
    expect(result.requiredInputW).toBeCloseTo((50_000 * (1 + margin)) / 0.8, 6);
    expect(result.installedInputW).toBe(90_000);
    expect(result.installedOutputW).toBeCloseTo(72_000, 6);
    expect(result.verdict).toBe('adequate');
    expect(result.shortfallW).toBe(0);
    expect(result.lowestHeldOutdoorC).toBeCloseTo(-21, 9);
    expect(result.unitCount).toBe(2);
    expect(result.largestUnitOutputW).toBeCloseTo(36_000, 6);
    expect(result.holdsWithLargestUnitOutC).toBeCloseTo(-3, 9);
    expect(result.fuelFired).toBe(true);
    expect(result.splitAdvice).toContain('{{temperature:-3}}');
    expect(proseToPlainSi(result.splitAdvice)).toContain('36.0 kW output');
    expect(proseToPlainSi(result.splitAdvice)).toContain('-3.0 °C');
    expect(sizing.efficiencyBasis).toBe('installed');
  });

  it('reports a shortfall when the installed output is below the requirement', () => {
    const result = sizeHeaters(
      { designHeatLossW: 80_000, totalConductanceWPerK: 2000, insideC: 15, heaters: [propane(2, 45_000)] },
      ref,
    ).result;
    expect(result.verdict).toBe('short');
    expect(result.shortfallW).toBeCloseTo(80_000 * (1 + margin) - 72_000, 6);
    expect(result.lowestHeldOutdoorC).toBeGreaterThan(15 - 80_000 / 2000);
  });

  it('with no heaters states the required input at the typical efficiency from heater-types.json', () => {
    const sizing = sizeHeaters({ designHeatLossW: 40_000, totalConductanceWPerK: 1500, insideC: 12, heaters: [] }, ref);
    expect(sizing.result.verdict).toBe('none-installed');
    expect(sizing.result.lowestHeldOutdoorC).toBeNull();
    expect(sizing.result.holdsWithLargestUnitOutC).toBeNull();
    expect(sizing.result.fuelFired).toBe(false);
    expect(sizing.efficiencyBasis).toBe('typical');
    expect(sizing.result.requiredInputW).toBeCloseTo(
      sizing.result.requiredOutputW / (sizing.typicalHeaterType!.typicalEfficiency as number),
      6,
    );
    expect(sizing.result.splitAdvice).toMatch(/at least 2 units/);
  });

  it('warns that a single unit leaves the crop unheated when it fails, and electric heat is not fuel-fired', () => {
    const result = sizeHeaters(
      {
        designHeatLossW: 10_000,
        totalConductanceWPerK: 500,
        insideC: 10,
        heaters: [{ count: 1, ratedInputW: 15_000, efficiency: 1, fuelId: 'electricity' }],
      },
      ref,
    ).result;
    expect(result.holdsWithLargestUnitOutC).toBeNull();
    expect(result.splitAdvice).toMatch(/single unit/i);
    expect(result.fuelFired).toBe(false);
  });

  it('with mixed units takes the largest one out (hand calculation: UA 2000 W/K, 15 °C inside)', () => {
    // 2 × 30 kW input at 80 % (24 kW out each) + 1 × 60 kW at 90 % (54 kW out): 102 kW output
    // all running: 15 − 102000/2000 = −36 °C; largest out (48 kW): −9 °C; largest alone (54 kW): −12 °C
    const sizing = sizeHeaters(
      {
        designHeatLossW: 40_000,
        totalConductanceWPerK: 2000,
        insideC: 15,
        heaters: [propane(2, 30_000), { count: 1, ratedInputW: 60_000, efficiency: 0.9, fuelId: 'natural-gas' }],
      },
      ref,
    );
    expect(sizing.result.unitCount).toBe(3);
    expect(sizing.result.installedOutputW).toBeCloseTo(102_000, 6);
    expect(sizing.result.lowestHeldOutdoorC).toBeCloseTo(-36, 9);
    expect(sizing.result.largestUnitOutputW).toBeCloseTo(54_000, 6);
    expect(sizing.result.holdsWithLargestUnitOutC).toBeCloseTo(-9, 9);
    expect(sizing.oneLargestUnitAloneHoldsC).toBeCloseTo(-12, 9);
    expect(proseToPlainSi(sizing.result.splitAdvice)).toContain('-9.0 °C');
    expect(proseToPlainSi(sizing.result.splitAdvice)).toContain('-12.0 °C');
    // required input at the installed input-weighted efficiency: 102 kW out / 120 kW in = 0.85
    expect(sizing.efficiencyForRequiredInput).toBeCloseTo(0.85, 12);
  });

  it.each([
    ['house.heaters.0.efficiency', [propane(1, 50_000, 1.5)]],
    [
      'house.heaters.1.fuelId',
      [propane(1, 50_000), { count: 1, ratedInputW: 50_000, efficiency: 0.8, fuelId: 'coal-tar' }],
    ],
    ['house.heaters.0.count', [propane(1.5, 50_000)]],
    ['house.heaters.0.ratedInputW', [propane(1, 10)]],
    // higher-heating-value basis: no fuel-fired heater gives more heat than its fuel holds
    ['house.heaters.0.efficiency', [propane(1, 50_000, 1.02)]],
    ['house.heaters.0.heaterType', [{ ...propane(1, 50_000), heaterType: 'electric' as const }]],
    [
      'house.heaters.0.heaterType',
      [{ count: 1, ratedInputW: 5_000, efficiency: 1, fuelId: 'electricity', heaterType: 'condensing' as const }],
    ],
    ['house.heaters.0.heaterType', [{ ...propane(1, 50_000), heaterType: 'rocket-stove' as never }]],
  ])('refuses a bad %s', (field, heaters) => {
    expectEngineError(
      () => sizeHeaters({ designHeatLossW: 1000, totalConductanceWPerK: 100, insideC: 10, heaters }, ref),
      field,
    );
  });

  it('an adequate verdict always holds the design outdoor temperature', () => {
    fc.assert(
      fc.property(
        fc.double({ min: 100, max: 50_000, noNaN: true }),
        fc.double({ min: 1, max: 60, noNaN: true }),
        fc.integer({ min: 0, max: 6 }),
        fc.double({ min: 500, max: 500_000, noNaN: true }),
        fc.double({ min: 0.3, max: 1, noNaN: true }),
        (ua, deltaTK, count, ratedInputW, efficiency) => {
          const insideC = 15;
          const designOutdoorC = insideC - deltaTK;
          const result = sizeHeaters(
            {
              designHeatLossW: ua * deltaTK,
              totalConductanceWPerK: ua,
              insideC,
              heaters: [propane(count, ratedInputW, efficiency)],
            },
            ref,
          ).result;
          for (const value of [result.requiredOutputW, result.requiredInputW, result.shortfallW]) {
            expect(Number.isFinite(value)).toBe(true);
          }
          if (result.verdict === 'adequate')
            expect(result.lowestHeldOutdoorC!).toBeLessThanOrEqual(designOutdoorC + 1e-9);
          if (result.verdict === 'short') expect(result.shortfallW).toBeGreaterThan(0);
          expect(result.verdict === 'none-installed').toBe(count === 0);
        },
      ),
    );
  });
});

describe('heater types', () => {
  it('an electric heater may give its whole input (efficiency 1.0); a fuel-fired one may not exceed 1.0', () => {
    const electric = sizeHeaters(
      {
        designHeatLossW: 1000,
        totalConductanceWPerK: 100,
        insideC: 10,
        heaters: [{ count: 1, ratedInputW: 5_000, efficiency: 1, fuelId: 'electricity', heaterType: 'electric' }],
      },
      ref,
    );
    expect(electric.result.installedOutputW).toBe(5_000);
    expect(electric.unventedInputW).toBe(0);
  });

  it('counts the input of unvented fuel-fired groups (their products stay in the house)', () => {
    const sizing = sizeHeaters(
      {
        designHeatLossW: 1000,
        totalConductanceWPerK: 100,
        insideC: 10,
        heaters: [
          { ...propane(2, 30_000), heaterType: 'unvented' },
          { ...propane(1, 40_000), heaterType: 'power-vented' },
          propane(1, 10_000),
        ],
      },
      ref,
    );
    expect(sizing.unventedInputW).toBe(60_000);
    expect(sizing.fuelFiredInputW).toBe(110_000);
  });
});
