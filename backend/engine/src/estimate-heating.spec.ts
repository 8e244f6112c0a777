import fc from 'fast-check';
import { BOUNDS } from './vocabulary';
import { EngineInputError } from './errors';
import { estimateHeating, type HeatingConditions } from './estimate-heating';
import { exampleDoublePolyGableHouse } from './heating/example-houses';
import type { HouseShape } from './vocabulary';
import type { HouseSpec } from './house.types';
import { moistAirDensityByHand } from './testing/air-by-hand';
import { expectRelativelyClose } from './testing/relative-tolerance';
import { loadReferenceData } from './testing/reference-data';
import { proseToPlainSi } from './vocabulary';
import { referenceRow } from './reference-data.types';

/** A number with an SI unit written into prose instead of a {{kind:value}} token. */
const BARE_SI_QUANTITY = /\d\s*(kW|W\b|°C|K\b|m\b|m²|m³|cm²|kWh)/;

const ref = loadReferenceData();
const conditions: HeatingConditions = { designOutdoorC: -10, elevationM: 0, insideRelativeHumidityPct: 70 };

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

describe('estimateHeating', () => {
  const house = exampleDoublePolyGableHouse();
  const estimate = estimateHeating({ house, conditions }, ref);

  it('returns exactly the agreed shape', () => {
    expect(Object.keys(estimate).sort()).toEqual(
      ['assumptions', 'cautions', 'condensation', 'geometry', 'heatLoss', 'heater', 'lamps'].sort(),
    );
    expect(Object.keys(estimate.geometry).sort()).toEqual(
      [
        'coverAreaM2',
        'endwallAreaM2',
        'floorAreaM2',
        'kneewallAreaM2',
        'perimeterM',
        'roofAreaM2',
        'sidewallAreaM2',
        'volumeM3',
      ].sort(),
    );
    expect(Object.keys(estimate.heatLoss).sort()).toEqual(
      [
        'components',
        'coveringW',
        'curtainApplied',
        'deltaTK',
        'infiltrationW',
        'insideC',
        'kneewallW',
        'outsideC',
        'perimeterW',
        'skyW',
        'totalW',
        'wind',
      ].sort(),
    );
    expect(Object.keys(estimate.heatLoss.components[0]).sort()).toEqual(
      ['coefficient', 'conductanceWPerK', 'key', 'label', 'quantity', 'quantityUnit', 'share', 'watts'].sort(),
    );
    expect(Object.keys(estimate.heater).sort()).toEqual(
      [
        'safetyMargin',
        'requiredOutputW',
        'requiredInputW',
        'installedInputW',
        'installedOutputW',
        'verdict',
        'shortfallW',
        'lowestHeldOutdoorC',
        'unitCount',
        'largestUnitOutputW',
        'holdsWithLargestUnitOutC',
        'splitAdvice',
        'fuelFired',
      ].sort(),
    );
    expect(Object.keys(estimate.condensation).sort()).toEqual(
      ['anyCondenses', 'dewPointC', 'insideC', 'insideRelativeHumidityPct', 'surfaces'].sort(),
    );
    expect(Object.keys(estimate.condensation.surfaces[0]).sort()).toEqual(
      ['condensationBelowOutdoorC', 'condenses', 'coveringId', 'group', 'insideSurfaceC', 'uWPerM2K'].sort(),
    );
    for (const assumption of estimate.assumptions) {
      expect(Object.keys(assumption).sort()).toEqual(
        ['confidence', 'key', 'label', 'overridden', 'source', 'unit', 'value'].sort(),
      );
    }
  });

  it('defaults the inside temperature to the night setpoint and matches the hand calculation, air density included', () => {
    // hand calculation in heating/heat-loss.spec.ts: conduction + perimeter = 2065.907 W/K;
    // infiltration = ρ · 1006 · 918 · 0.75 / 3600 with ρ of moist air at 15 °C, 70 % RH, sea level by
    // the ideal-gas law (testing/air-by-hand.ts): p_w = 0.70 × 1702.0 = 1191.4 Pa,
    // ρ = (101325 − 1191.4)/(287.042 × 288.15) + 1191.4/(461.524 × 288.15) = 1.21060 + 0.00896 = 1.21960 kg/m³
    const density = moistAirDensityByHand(15, 70, 0);
    expect(density).toBeCloseTo(1.2196, 4);
    const expectedUa = 2065.907 + (density * 1006 * 918 * 0.75) / 3600;
    expect(estimate.heatLoss.insideC).toBe(15);
    expect(estimate.heatLoss.deltaTK).toBe(25);
    expectRelativelyClose(estimate.heatLoss.totalW, expectedUa * 25, 1e-5);
  });

  it('lists every reference value used with source and confidence', () => {
    const keys = estimate.assumptions.map((assumption) => assumption.key);
    for (const key of [
      'coverings.roof.uWPerM2K',
      'coverings.sidewalls.uWPerM2K',
      'coverings.endwalls.uWPerM2K',
      'airLeakage.airChangesPerHour',
      'perimeter.wPerMK',
      'air.specificHeatJPerKgK',
      'air.densityKgPerM3',
      'surface.insideRoof.hWPerM2K',
      'surface.insideWall.hWPerM2K',
      'heater.safetyMargin',
      'heater.efficiency',
      'safety.ethylene-crop-injury',
      'safety.combustion-air-inlet',
    ]) {
      expect(keys).toContain(key);
    }
    expect(new Set(keys).size).toBe(keys.length);
    for (const assumption of estimate.assumptions) {
      expect(assumption.source.length).toBeGreaterThan(8);
      expect(assumption.confidence.length).toBeGreaterThan(0);
    }
    expect(estimate.assumptions.every((assumption) => !assumption.overridden)).toBe(true);
  });

  it('marks house overrides as overridden', () => {
    const overridden = estimateHeating(
      {
        house: exampleDoublePolyGableHouse({
          coveringUOverridesWPerM2K: { endwalls: 2.5 },
          airChangesPerHourOverride: 0.5,
        }),
        conditions,
      },
      ref,
    );
    const byKey = new Map(overridden.assumptions.map((assumption) => [assumption.key, assumption]));
    expect(byKey.get('coverings.endwalls.uWPerM2K')).toMatchObject({ value: 2.5, overridden: true });
    expect(byKey.get('airLeakage.airChangesPerHour')).toMatchObject({ value: 0.5, overridden: true });
    expect(byKey.get('coverings.roof.uWPerM2K')!.overridden).toBe(false);
  });

  it('carries combustion-air, venting, carbon-monoxide and crop-injury cautions for fuel-fired heaters only', () => {
    const text = estimate.cautions.join('\n');
    expect(estimate.heater.fuelFired).toBe(true);
    expect(text).toMatch(/combustion/i);
    expect(text).toMatch(/chimney|flue/i);
    expect(text).toMatch(/carbon monoxide/i);
    expect(text).toMatch(/ethylene/i);
    expect(text).toMatch(/sulfur dioxide/i);
    expect(text).toMatch(/licensed installers/i);

    const electric = estimateHeating(
      {
        house: exampleDoublePolyGableHouse({
          heaters: [{ count: 3, ratedInputW: 30_000, efficiency: 1, fuelId: 'electricity' }],
        }),
        conditions,
      },
      ref,
    );
    expect(electric.heater.fuelFired).toBe(false);
    expect(electric.cautions.join('\n')).not.toMatch(/ethylene|carbon monoxide/i);
    expect(electric.cautions.join('\n')).toMatch(/planning/i);
  });

  it('writes quantities in cautions, advice and labels as tokens, never as SI numbers', () => {
    // one small propane heater, a curtain taken as open, humid night: short, single-unit,
    // curtain, condensation and fuel-fired cautions all appear
    const short = estimateHeating(
      {
        house: exampleDoublePolyGableHouse({
          curtainId: 'energy-screen-aluminised',
          heaters: [{ count: 1, ratedInputW: 20_000, efficiency: 0.8, fuelId: 'propane' }],
        }),
        conditions: { ...conditions, insideRelativeHumidityPct: 90 },
      },
      ref,
    );
    expect(short.heater.verdict).toBe('short');
    const prose = [
      ...short.cautions,
      short.heater.splitAdvice,
      ...short.assumptions.map((assumption) => assumption.label),
    ];
    for (const text of prose) expect(text).not.toMatch(BARE_SI_QUANTITY);

    const plain = short.cautions.map(proseToPlainSi).join('\n');
    const kW = (watts: number) => `${(watts / 1000).toFixed(1)} kW`;
    expect(plain).toContain(
      `Installed output ${kW(short.heater.installedOutputW)} is ${kW(short.heater.shortfallW)} short of the ${kW(short.heater.requiredOutputW)} required`,
    );
    const ridge = referenceRow(ref, 'safety', 'chimney-above-ridge')!.valueM as number;
    expect(short.cautions.join('\n')).toContain(`{{length:${ridge}}} above the ridge`);
    expect(plain).toContain(`at least ${ridge.toFixed(2)} m above the ridge`);
    expect(plain).toMatch(/\d cm²\/kW of heater input/);
    expect(plain).not.toMatch(/\{\{/);
  });

  it('sizes heaters without curtain credit unless asked, and says so', () => {
    const withCurtain = exampleDoublePolyGableHouse({ curtainId: 'energy-screen-aluminised' });
    const open = estimateHeating({ house: withCurtain, conditions }, ref);
    const closed = estimateHeating({ house: withCurtain, conditions: { ...conditions, curtainClosed: true } }, ref);
    expect(open.heatLoss.curtainApplied).toBe(false);
    expect(closed.heatLoss.curtainApplied).toBe(true);
    expect(closed.heatLoss.totalW).toBeLessThan(open.heatLoss.totalW);
    expect(open.heatLoss.totalW).toBeCloseTo(estimate.heatLoss.totalW, 6);
    expect(open.cautions.join('\n')).toMatch(/curtain is not credited/);
  });

  it('single poly condenses and loses more than inflated double poly on the same night', () => {
    const cover = (id: string): HouseSpec =>
      exampleDoublePolyGableHouse({ coverings: { roof: id, sidewalls: id, endwalls: id } });
    const night = { designOutdoorC: 0, elevationM: 200, insideRelativeHumidityPct: 75, insideC: 16 };
    const single = estimateHeating({ house: cover('poly-single'), conditions: night }, ref);
    const double = estimateHeating({ house: cover('poly-double-inflated'), conditions: night }, ref);
    expect(single.heatLoss.totalW).toBeGreaterThan(double.heatLoss.totalW);
    expect(single.condensation.anyCondenses).toBe(true);
    expect(
      double.condensation.surfaces.every(
        (surface) => surface.insideSurfaceC > single.condensation.surfaces[0].insideSurfaceC + 3,
      ),
    ).toBe(true);
  });

  it.each([
    ['conditions.designOutdoorC', { designOutdoorC: -80 }],
    ['conditions.elevationM', { elevationM: 9000 }],
    ['conditions.insideRelativeHumidityPct', { insideRelativeHumidityPct: 120 }],
    ['conditions.insideC', { insideC: Number.POSITIVE_INFINITY }],
  ])('refuses a bad %s', (field, override) => {
    expectEngineError(() => estimateHeating({ house, conditions: { ...conditions, ...override } }, ref), field);
  });

  it('refuses a night setpoint out of bounds when no inside temperature is given', () => {
    expectEngineError(
      () =>
        estimateHeating(
          {
            house: exampleDoublePolyGableHouse({ setpoints: { dayHeatingC: 18, nightHeatingC: 60, coolingC: 25 } }),
            conditions,
          },
          ref,
        ),
      'house.setpoints.nightHeatingC',
    );
  });

  it('never returns NaN or Infinity for any in-bounds input', () => {
    const coveringIds = ref['coverings'].rows.map((row) => row.id);
    const curtainIds = [null, ...ref['curtains'].rows.map((row) => row.id)];
    const leakageIds = ref['air-leakage'].rows.map((row) => row.id);
    const fuelIds = ref['fuels'].rows.map((row) => row.id);
    fc.assert(
      fc.property(
        fc.record({
          shape: fc.constantFrom<HouseShape>('gable', 'gothic-arch', 'quonset'),
          spans: fc.integer({ min: BOUNDS.spans.min, max: BOUNDS.spans.max }),
          widthM: fc.double({ min: BOUNDS.widthM.min, max: BOUNDS.widthM.max, noNaN: true }),
          lengthM: fc.double({ min: BOUNDS.lengthM.min, max: BOUNDS.lengthM.max, noNaN: true }),
          eaveHeightM: fc.double({ min: BOUNDS.eaveHeightM.min, max: BOUNDS.eaveHeightM.max, noNaN: true }),
          riseFraction: fc.double({ min: 0.02, max: 1, noNaN: true }),
          roof: fc.constantFrom(...coveringIds),
          walls: fc.constantFrom(...coveringIds),
          curtainId: fc.constantFrom(...curtainIds),
          leakage: fc.constantFrom(...leakageIds),
          perimeterInsulated: fc.boolean(),
          heaterCount: fc.integer({ min: BOUNDS.heaterCount.min, max: BOUNDS.heaterCount.max }),
          ratedInputW: fc.double({ min: BOUNDS.heaterInputW.min, max: BOUNDS.heaterInputW.max, noNaN: true }),
          // at most 1.0: fuel-fired heaters cannot exceed the higher heating value
          efficiency: fc.double({ min: BOUNDS.heaterEfficiency.min, max: 1, noNaN: true }),
          fuelId: fc.constantFrom(...fuelIds),
          insideC: fc.double({ min: BOUNDS.setpointC.min, max: BOUNDS.setpointC.max, noNaN: true }),
          designOutdoorC: fc.double({ min: BOUNDS.designOutdoorC.min, max: BOUNDS.designOutdoorC.max, noNaN: true }),
          elevationM: fc.double({ min: BOUNDS.elevationM.min, max: BOUNDS.elevationM.max, noNaN: true }),
          rh: fc.double({ min: BOUNDS.relativeHumidityPct.min, max: BOUNDS.relativeHumidityPct.max, noNaN: true }),
          curtainClosed: fc.boolean(),
        }),
        (draw) => {
          const maxRiseM = Math.min(
            BOUNDS.ridgeHeightM.max - draw.eaveHeightM,
            draw.shape === 'quonset'
              ? draw.widthM / 2
              : draw.shape === 'gothic-arch'
                ? (draw.widthM * Math.sqrt(3)) / 2
                : Infinity,
          );
          const ridgeHeightM = Math.max(draw.eaveHeightM + draw.riseFraction * maxRiseM, BOUNDS.ridgeHeightM.min);
          fc.pre(ridgeHeightM - draw.eaveHeightM <= maxRiseM && ridgeHeightM > draw.eaveHeightM);
          const result = estimateHeating(
            {
              house: exampleDoublePolyGableHouse({
                shape: draw.shape,
                spans: draw.spans,
                widthM: draw.widthM,
                lengthM: draw.lengthM,
                eaveHeightM: draw.eaveHeightM,
                ridgeHeightM,
                coverings: { roof: draw.roof, sidewalls: draw.walls, endwalls: draw.walls },
                curtainId: draw.curtainId,
                airLeakageClassId: draw.leakage,
                perimeterInsulated: draw.perimeterInsulated,
                heaters: [
                  {
                    count: draw.heaterCount,
                    ratedInputW: draw.ratedInputW,
                    efficiency: draw.efficiency,
                    fuelId: draw.fuelId,
                  },
                ],
              }),
              conditions: {
                designOutdoorC: draw.designOutdoorC,
                elevationM: draw.elevationM,
                insideRelativeHumidityPct: draw.rh,
                insideC: draw.insideC,
                curtainClosed: draw.curtainClosed,
              },
            },
            ref,
          );
          const numbers: number[] = [];
          const collect = (value: unknown): void => {
            if (typeof value === 'number') numbers.push(value);
            else if (Array.isArray(value)) value.forEach(collect);
            else if (value && typeof value === 'object') Object.values(value).forEach(collect);
          };
          collect(result);
          expect(numbers.every((value) => Number.isFinite(value))).toBe(true);
        },
      ),
      { numRuns: 200 },
    );
  });

  it('throws EngineInputError naming the field for any value beyond its bound', () => {
    type Target = {
      field: string;
      bound: { min: number; max: number };
      apply: (value: number) => { house: HouseSpec; conditions: HeatingConditions };
    };
    const withHouse = (patch: (value: number) => Partial<HouseSpec>) => (value: number) => ({
      house: exampleDoublePolyGableHouse(patch(value)),
      conditions,
    });
    const withConditions = (key: keyof HeatingConditions) => (value: number) => ({
      house: exampleDoublePolyGableHouse(),
      conditions: { ...conditions, [key]: value },
    });
    const targets: Target[] = [
      { field: 'house.widthM', bound: BOUNDS.widthM, apply: withHouse((widthM) => ({ widthM })) },
      { field: 'house.lengthM', bound: BOUNDS.lengthM, apply: withHouse((lengthM) => ({ lengthM })) },
      { field: 'house.spans', bound: BOUNDS.spans, apply: withHouse((spans) => ({ spans: Math.round(spans) })) },
      { field: 'house.eaveHeightM', bound: BOUNDS.eaveHeightM, apply: withHouse((eaveHeightM) => ({ eaveHeightM })) },
      {
        field: 'house.airChangesPerHourOverride',
        bound: BOUNDS.airChangesPerHour,
        apply: withHouse((ach) => ({ airChangesPerHourOverride: ach })),
      },
      {
        field: 'house.coveringUOverridesWPerM2K.roof',
        bound: BOUNDS.uValueWPerM2K,
        apply: withHouse((roof) => ({ coveringUOverridesWPerM2K: { roof } })),
      },
      {
        field: 'house.heaters.0.ratedInputW',
        bound: BOUNDS.heaterInputW,
        apply: withHouse((ratedInputW) => ({
          heaters: [{ count: 1, ratedInputW, efficiency: 0.8, fuelId: 'natural-gas' }],
        })),
      },
      { field: 'conditions.designOutdoorC', bound: BOUNDS.designOutdoorC, apply: withConditions('designOutdoorC') },
      { field: 'conditions.elevationM', bound: BOUNDS.elevationM, apply: withConditions('elevationM') },
      {
        field: 'conditions.insideRelativeHumidityPct',
        bound: BOUNDS.relativeHumidityPct,
        apply: withConditions('insideRelativeHumidityPct'),
      },
      { field: 'conditions.insideC', bound: BOUNDS.setpointC, apply: withConditions('insideC') },
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...targets),
        fc.boolean(),
        fc.double({ min: 1, max: 1e6, noNaN: true }),
        (target, below, beyond) => {
          const value = below ? target.bound.min - beyond : target.bound.max + beyond;
          expectEngineError(() => estimateHeating(target.apply(value), ref), target.field);
        },
      ),
    );
  });
});

describe('estimateHeating: unvented heaters', () => {
  it('gives the strong cautions and sizes the fresh-air inlet by the published rule', () => {
    // HortScience 8(1):23–24 (1973): free inlet ≈ 1 in² per 2,500 Btu/h of input
    // (safety.json combustion-air-inlet, 8.805e-7 m²/W). Two 30 kW unvented units: 60,000 W ×
    // 8.805e-7 = 0.05283 m² = 528.3 cm².
    const estimate = estimateHeating(
      {
        house: exampleDoublePolyGableHouse({
          heaters: [{ count: 2, ratedInputW: 30_000, efficiency: 1, fuelId: 'propane', heaterType: 'unvented' }],
        }),
        conditions: { designOutdoorC: -10, elevationM: 0, insideRelativeHumidityPct: 80 },
      },
      ref,
    );
    const text = proseToPlainSi(estimate.cautions.join(' '));
    expect(text).toMatch(/UNVENTED HEATERS/);
    expect(text).toMatch(/carbon monoxide/i);
    expect(text).toMatch(/carbon dioxide and water vapour/);
    expect(text).toMatch(/ethylene/);
    expect(text).toMatch(/nitrogen dioxide/);
    expect(text).toMatch(/local codes/);
    const inletToken = estimate.cautions.find((c) => c.includes('must run'))!.match(/\{\{smallArea:([^}]+)\}\}/)!;
    expect(Number(inletToken[1])).toBeCloseTo(60_000 * 8.805e-7, 9);
    expect(estimate.assumptions.map((a) => a.key)).toContain('safety.unvented-heater-products');
  });

  it('a vented heater does not get the unvented cautions', () => {
    const estimate = estimateHeating(
      {
        house: exampleDoublePolyGableHouse({
          heaters: [{ count: 2, ratedInputW: 30_000, efficiency: 0.8, fuelId: 'propane', heaterType: 'power-vented' }],
        }),
        conditions: { designOutdoorC: -10, elevationM: 0, insideRelativeHumidityPct: 80 },
      },
      ref,
    );
    expect(estimate.cautions.join(' ')).not.toMatch(/UNVENTED/);
  });
});

describe('estimateHeating on a clear night', () => {
  const clearNight: HeatingConditions = { designOutdoorC: -15, elevationM: 0, insideRelativeHumidityPct: 70 };

  it('adds the sky loss by hand: −15 °C air, −18 °C dew point, double poly roof and polycarbonate ends', () => {
    // Hand arithmetic (heating/sky-radiation.spec.ts works the sky through): ε_sky = 0.633852, T_sky = 230.34 K,
    // σ(T_air⁴ − T_sky⁴) = 5.670374e-8 × (4.44108e9 − 2.81499e9) = 92.205 W/m².
    // Through the roof film (τ 0.30) from the crop (ε 0.95): 0.30 × 0.95 × 92.205 = 26.28 W per m² of floor.
    // Each covering's outer surface sees the sky: the air seems colder by ε_o × 92.205 / h_o (h_o = 33.4 W/(m²·K)):
    // polyethylene ε_o 0.40 → 1.1043 K; polycarbonate ε_o 0.9 → 2.4846 K; times each covering's U·A.
    const house = exampleDoublePolyGableHouse();
    const floorAreaM2 = house.spans * house.widthM * house.lengthM;
    const overcast = estimateHeating({ house, conditions: clearNight }, ref);
    const clear = estimateHeating({ house, conditions: { ...clearNight, clearSky: true, outdoorDewPointC: -18 } }, ref);
    const ua = (key: string) =>
      overcast.heatLoss.components.find((component) => component.key === key)!.conductanceWPerK;
    const expectedSkyW = 26.28 * floorAreaM2 + (ua('roof') + ua('sidewalls')) * 1.1043 + ua('endwalls') * 2.4846;
    expect(overcast.heatLoss.skyW).toBe(0);
    expectRelativelyClose(clear.heatLoss.skyW, expectedSkyW, 1e-3);
    expectRelativelyClose(clear.heatLoss.totalW, overcast.heatLoss.totalW + expectedSkyW, 1e-3);
    const sky = clear.heatLoss.components.find((component) => component.key === 'sky')!;
    expect(sky.watts).toBe(clear.heatLoss.skyW);
    expect(clear.heatLoss.components.reduce((sum, component) => sum + component.share, 0)).toBeCloseTo(1, 10);
    expect(clear.cautions.some((caution) => /clear night/.test(caution))).toBe(true);
    // the same heaters hold less on a clear night
    expect(clear.heater.lowestHeldOutdoorC!).toBeGreaterThan(overcast.heater.lowestHeldOutdoorC!);
    // T_held = T_in − (output − sky loss) / UA: the sky loss costs (sky W ÷ UA) kelvin of outdoor reach
    const uaWPerK = overcast.heatLoss.totalW / overcast.heatLoss.deltaTK;
    expectRelativelyClose(
      clear.heater.lowestHeldOutdoorC! - overcast.heater.lowestHeldOutdoorC!,
      clear.heatLoss.skyW / uaWPerK,
      1e-9,
    );
    // the roof's inside surface is colder by (U / h_i) × 1.1043 K, so it drips sooner
    const roofOf = (estimate: typeof clear) =>
      estimate.condensation.surfaces.find((surface) => surface.group === 'roof')!;
    const filmRatio = roofOf(overcast).uWPerM2K / 9.31; // h_i, heat flowing up (reference-data/surface-coefficients.json)
    expect(roofOf(overcast).insideSurfaceC - roofOf(clear).insideSurfaceC).toBeCloseTo(filmRatio * 1.1043, 3);
  });

  it('single film loses more than twice what single glass does: glass passes almost nothing, though its surface cools', () => {
    const single = (covering: string) =>
      exampleDoublePolyGableHouse({ coverings: { roof: covering, sidewalls: covering, endwalls: covering } });
    const night = { ...clearNight, clearSky: true };
    const glassNight = estimateHeating({ house: single('glass-single'), conditions: night }, ref);
    const filmNight = estimateHeating({ house: single('poly-single'), conditions: night }, ref);
    expect(glassNight.heatLoss.skyW).toBeGreaterThan(0);
    expect(filmNight.heatLoss.skyW).toBeGreaterThan(2 * glassNight.heatLoss.skyW);
    // the caution is about what the film passes; glass passes almost nothing
    expect(glassNight.cautions.some((caution) => /clear night/.test(caution))).toBe(false);
    expect(filmNight.cautions.some((caution) => /clear night/.test(caution))).toBe(true);
  });

  it('an IR-absorbing inner film saves more on a clear night than under cloud (Bartok: 10–20 %)', () => {
    const plain = exampleDoublePolyGableHouse();
    const ir = exampleDoublePolyGableHouse({
      coverings: { roof: 'poly-double-ir-inner', sidewalls: 'poly-double-ir-inner', endwalls: 'poly-double-ir-inner' },
    });
    const saving = (clearSky: boolean) => {
      const a = estimateHeating({ house: plain, conditions: { ...clearNight, clearSky } }, ref).heatLoss.totalW;
      const b = estimateHeating({ house: ir, conditions: { ...clearNight, clearSky } }, ref).heatLoss.totalW;
      return 1 - b / a;
    };
    expect(saving(true)).toBeGreaterThan(saving(false));
    expect(saving(true)).toBeGreaterThan(0.1);
    expect(saving(true)).toBeLessThan(0.2);
  });

  it('refuses a dew point above the air temperature', () => {
    expectEngineError(
      () =>
        estimateHeating(
          { house: exampleDoublePolyGableHouse(), conditions: { ...clearNight, clearSky: true, outdoorDewPointC: -5 } },
          ref,
        ),
      'conditions.outdoorDewPointC',
    );
  });
});
