import fc from 'fast-check';
import { loadReferenceData } from './testing/reference-data';
import { COOLING_BOUNDS } from './vocabulary';
import { EngineInputError } from './errors';
import { estimateCooling, type CoolingConditions, type CoolingInput } from './estimate-cooling';
import { computeHouseGeometry } from './geometry/house-geometry';
import { exampleDoublePolyGableHouse } from './heating/example-houses';
import type { HouseSpec } from './house.types';
import { proseToPlainSi } from './vocabulary';
import { dryAirDensityByHand } from './testing/air-by-hand';
import { expectRelativelyClose } from './testing/relative-tolerance';

/** A number with an SI unit written into prose instead of a {{kind:value}} token. */
const BARE_SI_QUANTITY = /\d\s*(kW|W\b|°C|K\b|m\b|m²|m³|cm²|kWh)/;

const ref = loadReferenceData();

const site = { latitudeDeg: 33.75, longitudeDeg: -84.39, elevationM: 300 };
const conditions: CoolingConditions = {
  designDate: '2026-07-21',
  summerDesignC: 34,
  dailyRangeK: 10,
  summerDesignWetBulbC: 23.5,
};

function run(
  overrides: { house?: Partial<HouseSpec>; site?: Partial<typeof site>; conditions?: Partial<CoolingConditions> } = {},
) {
  const input: CoolingInput = {
    house: exampleDoublePolyGableHouse(overrides.house),
    site: { ...site, ...overrides.site },
    conditions: { ...conditions, ...overrides.conditions },
  };
  return estimateCooling(input, ref);
}

function expectInputError(action: () => unknown, field: string): void {
  try {
    action();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    expect((error as EngineInputError).field).toBe(field);
    return;
  }
  throw new Error(`expected an EngineInputError for ${field}`);
}

describe('estimateCooling', () => {
  it('returns every section of the result', () => {
    const result = run({ conditions: { evaporativePad: { padTypeId: 'cellulose-150mm', areaM2: 8 } } });
    expect(Object.keys(result).sort()).toEqual(
      [
        'airExchange',
        'assumptions',
        'capacity',
        'cautions',
        'designDay',
        'interiorLight',
        'lamps',
        'pads',
        'shadeCloth',
        'staging',
        'winterVentilation',
      ].sort(),
    );
    expect(Object.keys(result.capacity.factors).sort()).toEqual(
      ['applied', 'elevation', 'house', 'light', 'temperatureRise', 'velocity'].sort(),
    );
    expect(result.designDay.hours).toHaveLength(24);
    expect(result.pads).not.toBeNull();
    for (const assumption of result.assumptions) {
      expect(assumption.source.length).toBeGreaterThan(8);
      expect(['verified', 'verified-secondary', 'derived', 'memory', 'common-practice']).toContain(
        assumption.confidence,
      );
    }
  });

  it('air exchange of the installed fans: 2 × 5 m³/s in the 9 × 30 m example house', () => {
    const house = exampleDoublePolyGableHouse();
    const geometry = computeHouseGeometry(house);
    const { airExchange } = run();
    expect(airExchange.installedFlowM3PerS).toBe(10);
    expect(airExchange.airChangesPerMinute).toBeCloseTo((10 * 60) / geometry.volumeM3, 10);
    expect(airExchange.airChangesPerHour).toBeCloseTo(airExchange.airChangesPerMinute * 60, 10);
    expect(airExchange.flowPerFloorAreaM3PerSM2).toBeCloseTo(10 / 270, 10);
  });

  it('names the default pad-to-fan distance (the house length) and marks entered values as overridden', () => {
    const defaults = run();
    const distance = defaults.assumptions.find((a) => a.key === 'padToFanDistanceM');
    expect(distance?.value).toBe(30);
    expect(distance?.overridden).toBe(false);
    const entered = run({ conditions: { padToFanDistanceM: 50, transpirationFraction: 0.3 } });
    expect(entered.assumptions.find((a) => a.key === 'padToFanDistanceM')?.overridden).toBe(true);
    expect(entered.assumptions.find((a) => a.key === 'transpirationFraction')).toMatchObject({
      value: 0.3,
      overridden: true,
    });
  });

  it('pads: area needed = design flow / face velocity; leaving air from the design dry and wet bulb', () => {
    // the base rate's own light is entered (5,000 fc = 53,819.55 lx), so F_light = 1
    const baseLight = { peakInteriorLightLux: 5000 * 10.76391 };
    const result = run({
      conditions: { ...baseLight, evaporativePad: { padTypeId: 'cellulose-100mm', areaM2: 20 } },
    });
    const pads = result.pads!;
    const designFlow = Math.max(result.capacity.requiredFlowM3PerS, result.capacity.installedFlowM3PerS);
    expect(pads.areaNeededM2).toBeCloseTo(designFlow / pads.faceVelocityMPerS, 10);
    // by hand: 270 m² × 8 cfm/ft² (0.04064 m³/s·m²) × elevation factor 1 + 0.04 × 984.3 ft / 1000 ft
    // = 10.9728 × 1.03937 = 11.405 m³/s (more than the 10 m³/s installed); ÷ 1.27 m/s (250 fpm) = 8.98 m²
    expect(pads.areaNeededM2).toBeCloseTo(8.98, 2);
    expect(pads.verdict).toBe('adequate');
    const small = run({
      conditions: { ...baseLight, evaporativePad: { padTypeId: 'cellulose-100mm', areaM2: 8.9 } },
    }).pads!;
    expect(small.verdict).toBe('short');
    expect(pads.leavingAirAtPeakC).toBeCloseTo(34 - pads.saturationEfficiency * (34 - 23.5), 1);
    expect(result.designDay.peakIndoorWithPadsC!).toBeLessThan(result.designDay.peakIndoorWithFansC);
  });

  it('refuses an unknown pad type naming the field', () => {
    expectInputError(
      () => run({ conditions: { evaporativePad: { padTypeId: 'straw', areaM2: 5 } } }),
      'conditions.evaporativePad.padTypeId',
    );
  });

  describe('thermostat staging', () => {
    it('warns when the cooling setpoint sits less than the deadband (2 K, memory/common practice) above heating', () => {
      const tight = run({ house: { setpoints: { dayHeatingC: 20, nightHeatingC: 16, coolingC: 21 } } });
      expect(tight.staging.deadbandK).toBe(1);
      expect(tight.staging.ok).toBe(false);
      expect(tight.staging.warnings).toHaveLength(1);
      expect(tight.cautions).toContain(tight.staging.warnings[0]);
      const fighting = run({ house: { setpoints: { dayHeatingC: 20, nightHeatingC: 16, coolingC: 19 } } });
      expect(fighting.staging.warnings[0]).toMatch(/at the same time/);
      const fine = run();
      expect(fine.staging.ok).toBe(true);
      expect(fine.staging.warnings).toEqual([]);
    });

    it('first stage ≈ 30 % of the fans at the setpoint, later stages 2 K apart, all fans used (common practice)', () => {
      const result = run({ house: { exhaustFans: { count: 10, capacityEachM3PerS: 1.5 } } });
      const stages = result.staging.stages;
      expect(stages[0]).toEqual({ stage: 1, onAtC: 24, fans: 3 });
      expect(stages.map((s) => s.onAtC)).toEqual([24, 26, 28]);
      expect(stages.reduce((sum, s) => sum + s.fans, 0)).toBe(10);
      expect(run({ house: { exhaustFans: { count: 1, capacityEachM3PerS: 5 } } }).staging.stages).toEqual([
        { stage: 1, onAtC: 24, fans: 1 },
      ]);
      expect(run({ house: { exhaustFans: { count: 0, capacityEachM3PerS: 0 } } }).staging.stages).toEqual([]);
    });
  });

  it('winter ventilation: 25 % of the summer rate (20–30 %, memory) and its heat ρ·c_p·V̇·ΔT', () => {
    const result = run({ conditions: { winterDesignC: -8 } });
    const winter = result.winterVentilation;
    expect(winter.fractionOfSummerRate).toBeGreaterThanOrEqual(0.2);
    expect(winter.fractionOfSummerRate).toBeLessThanOrEqual(0.3);
    // base rate × elevation only (light and temperature-rise factors are summer corrections)
    const floorM2 = computeHouseGeometry(exampleDoublePolyGableHouse()).floorAreaM2;
    expect(winter.flowM3PerS).toBeCloseTo(
      winter.fractionOfSummerRate * result.capacity.baseRateM3PerSM2 * result.capacity.factors.elevation * floorM2,
      10,
    );
    // house air at the 15 °C night setpoint, 300 m: p = 101325 × (1 − 2.25577e−5 × 300)^5.2559 = 97,772.6 Pa,
    // ρ = 97772.6 / (287.042 × 288.15) = 1.18210 kg/m³ (ideal gas, testing/air-by-hand.ts)
    const density = dryAirDensityByHand(15, 300);
    expect(density).toBeCloseTo(1.1821, 4);
    expectRelativelyClose(winter.heatCostW, density * 1006 * winter.flowM3PerS * (15 - -8), 1e-6);
    expect(winter.atOutdoorC).toBe(-8);
  });

  it('winter fan stage stays at 25 % of 8 cfm/ft² = 2 cfm/ft² at sea level, whatever the summer light and rise factors', () => {
    // Row ranges (memory, NGMA / ASABE EP406.4): winter stage 20–30 % of the summer rate, about
    // 1.5–2.5 cfm/ft². Hand arithmetic: 0.25 × 8 cfm/ft² = 2 cfm/ft² = 0.25 × 0.04064 m³/(s·m²).
    const bright = run({
      site: { elevationM: 0 },
      conditions: { peakInteriorLightLux: 80_000, allowedTemperatureRiseK: 2.5 },
    });
    expect(bright.capacity.factors.house).toBeGreaterThan(2); // the summer rate is more than doubled
    const floorM2 = computeHouseGeometry(exampleDoublePolyGableHouse()).floorAreaM2;
    const cfmPerFt2 = (bright.winterVentilation.flowM3PerS / floorM2 / 0.3048) * 60;
    expect(cfmPerFt2).toBeCloseTo(2, 9);
    expect(cfmPerFt2).toBeGreaterThanOrEqual(1.5);
    expect(cfmPerFt2).toBeLessThanOrEqual(2.5);
  });

  it('warns when running the winter fan stage all night would cost more than half the house loss (common practice, no source)', () => {
    const cold = run({ conditions: { winterDesignC: -29 } });
    const winter = cold.winterVentilation;
    expect(winter.houseHeatLossW).toBeGreaterThan(0);
    expect(winter.heatCostW).toBeGreaterThan(0.5 * winter.houseHeatLossW);
    expect(cold.cautions.some((c) => c.includes('heat-and-vent'))).toBe(true);
    const mild = run({ conditions: { winterDesignC: 14 } });
    expect(mild.winterVentilation.heatCostW).toBeGreaterThan(0);
    expect(mild.cautions.some((c) => c.includes('heat-and-vent'))).toBe(
      mild.winterVentilation.heatCostW > 0.5 * mild.winterVentilation.houseHeatLossW,
    );
  });

  it('writes quantities in cautions and staging warnings as tokens, never as SI numbers', () => {
    // too few fans, a small inlet, small pads, a long house, a high site and a tight deadband
    const crowded = run({
      house: {
        lengthM: 80,
        exhaustFans: { count: 1, capacityEachM3PerS: 2 },
        inletAreaM2: 0.5,
        setpoints: { dayHeatingC: 20, nightHeatingC: 16, coolingC: 21 },
      },
      site: { elevationM: 3000 },
      conditions: { evaporativePad: { padTypeId: 'cellulose-100mm', areaM2: 1 } },
    });
    expect(crowded.capacity.verdict).toBe('short');
    expect(crowded.capacity.inletVerdict).toBe('short');
    for (const text of crowded.cautions) expect(text).not.toMatch(BARE_SI_QUANTITY);
    const plain = crowded.cautions.map(proseToPlainSi).join('\n');
    expect(plain).toContain(
      // areas in plain SI carry the one decimal the app shows
      `Free inlet area 0.5 m² is below the ${crowded.capacity.inletAreaNeededM2.toFixed(1)} m² needed`,
    );
    expect(plain).toContain(
      `Installed fans move 2.00 m³/s against ${crowded.capacity.requiredFlowM3PerS.toFixed(2)} m³/s required`,
    );
    // the elevation table ends at 8,000 ft = 2,438.4 m (1 ft = 0.3048 m exactly)
    expect(plain).toContain('above the elevation table (2,438.40 m)');
    expect(plain).toContain('only 1.0 K above the heating setpoint; keep at least');
    expect(plain).not.toMatch(/\{\{/);
  });

  it('always carries the electrical, backdraft and planning cautions', () => {
    const { cautions } = run();
    expect(cautions.some((c) => /ground-fault/.test(c) && /electrician/.test(c))).toBe(true);
    expect(cautions.some((c) => /backdraft/.test(c))).toBe(true);
    expect(cautions.some((c) => /planning/.test(c))).toBe(true);
  });

  it('a house without fans: verdict no-fans and the setpoint lost on a hot afternoon', () => {
    const result = run({ house: { exhaustFans: { count: 0, capacityEachM3PerS: 0 } } });
    expect(result.capacity.verdict).toBe('no-fans');
    expect(result.designDay.hoursNotHeld).toContain(14);
    expect(result.designDay.hours.every((h) => h.fanFraction === 0)).toBe(true);
  });

  describe('bad input names the field', () => {
    it.each<[string, () => unknown]>([
      ['site.latitudeDeg', () => run({ site: { latitudeDeg: 80 } })],
      ['site.elevationM', () => run({ site: { elevationM: 9000 } })],
      ['conditions.designDate', () => run({ conditions: { designDate: '2026-02-30' } })],
      ['conditions.designDate', () => run({ conditions: { designDate: 'July 21' } })],
      ['conditions.summerDesignC', () => run({ conditions: { summerDesignC: 70 } })],
      ['conditions.dailyRangeK', () => run({ conditions: { dailyRangeK: -1 } })],
      ['conditions.summerDesignWetBulbC', () => run({ conditions: { summerDesignWetBulbC: 36 } })],
      ['conditions.allowedTemperatureRiseK', () => run({ conditions: { allowedTemperatureRiseK: 0 } })],
      ['conditions.peakInteriorLightLux', () => run({ conditions: { peakInteriorLightLux: Number.NaN } })],
      ['conditions.padToFanDistanceM', () => run({ conditions: { padToFanDistanceM: 0.5 } })],
      ['conditions.transpirationFraction', () => run({ conditions: { transpirationFraction: 1 } })],
      [
        'conditions.evaporativePad.areaM2',
        () => run({ conditions: { evaporativePad: { padTypeId: 'aspen-fibre', areaM2: 0 } } }),
      ],
      ['conditions.winterDesignC', () => run({ conditions: { winterDesignC: 40 } })],
      ['house.exhaustFans.count', () => run({ house: { exhaustFans: { count: 2.5, capacityEachM3PerS: 5 } } })],
      [
        'house.exhaustFans.capacityEachM3PerS',
        () => run({ house: { exhaustFans: { count: 2, capacityEachM3PerS: 0 } } }),
      ],
      ['house.inletAreaM2', () => run({ house: { inletAreaM2: -1 } })],
      [
        'house.setpoints.coolingC',
        () => run({ house: { setpoints: { dayHeatingC: 18, nightHeatingC: 15, coolingC: 60 } } }),
      ],
      [
        'house.coverings.roof',
        () =>
          run({ house: { coverings: { roof: 'foam-board-50mm', sidewalls: 'poly-single', endwalls: 'poly-single' } } }),
      ],
    ])('%s', (field, action) => expectInputError(action, field));
  });
});

describe('estimateCooling properties (fast-check)', () => {
  const b = COOLING_BOUNDS;
  const scenario = fc.record({
    fanCount: fc.integer({ min: 0, max: 12 }),
    fanCapacity: fc.double({ min: 0.5, max: 12, noNaN: true }),
    extraFans: fc.integer({ min: 1, max: 6 }),
    latitudeDeg: fc.double({ min: -66, max: 66, noNaN: true }),
    longitudeDeg: fc.double({ min: -180, max: 180, noNaN: true }),
    elevationM: fc.double({ min: -100, max: 4500, noNaN: true }),
    month: fc.integer({ min: 1, max: 12 }),
    summerDesignC: fc.double({ min: 15, max: 55, noNaN: true }),
    dailyRangeK: fc.double({ min: b.dailyRangeK.min, max: b.dailyRangeK.max, noNaN: true }),
    wetBulbShare: fc.double({ min: 0, max: 1, noNaN: true }),
    allowedTemperatureRiseK: fc.double({
      min: b.allowedTemperatureRiseK.min,
      max: b.allowedTemperatureRiseK.max,
      noNaN: true,
    }),
    peakInteriorLightLux: fc.double({ min: b.peakInteriorLightLux.min, max: b.peakInteriorLightLux.max, noNaN: true }),
    padToFanDistanceM: fc.double({ min: b.padToFanDistanceM.min, max: b.padToFanDistanceM.max, noNaN: true }),
    transpirationFraction: fc.double({
      min: b.transpirationFraction.min,
      max: b.transpirationFraction.max,
      noNaN: true,
    }),
    padTypeId: fc.constantFrom(null, 'cellulose-100mm', 'cellulose-150mm', 'aspen-fibre'),
    padAreaM2: fc.double({ min: b.padAreaM2.min, max: 200, noNaN: true }),
    winterDesignC: fc.double({ min: -50, max: 25, noNaN: true }),
  });

  type Scenario = typeof scenario extends fc.Arbitrary<infer T> ? T : never;

  function inputFor(s: Scenario, fanCount = s.fanCount): CoolingInput {
    const wetBulbC = Math.min(40, s.summerDesignC) * s.wetBulbShare;
    return {
      house: exampleDoublePolyGableHouse({ exhaustFans: { count: fanCount, capacityEachM3PerS: s.fanCapacity } }),
      site: { latitudeDeg: s.latitudeDeg, longitudeDeg: s.longitudeDeg, elevationM: s.elevationM },
      conditions: {
        designDate: `2026-${String(s.month).padStart(2, '0')}-15`,
        summerDesignC: s.summerDesignC,
        dailyRangeK: s.dailyRangeK,
        summerDesignWetBulbC: wetBulbC,
        allowedTemperatureRiseK: s.allowedTemperatureRiseK,
        peakInteriorLightLux: s.peakInteriorLightLux,
        padToFanDistanceM: s.padToFanDistanceM,
        transpirationFraction: s.transpirationFraction,
        evaporativePad: s.padTypeId === null ? null : { padTypeId: s.padTypeId, areaM2: s.padAreaM2 },
        winterDesignC: s.winterDesignC,
      },
    };
  }

  function allNumbersFinite(value: unknown): boolean {
    if (typeof value === 'number') return Number.isFinite(value);
    if (Array.isArray(value)) return value.every(allNumbersFinite);
    if (value && typeof value === 'object') return Object.values(value).every(allNumbersFinite);
    return true;
  }

  it('more fan capacity never raises the indoor peak (with fans, and with pads)', () => {
    fc.assert(
      fc.property(scenario, (s) => {
        const fewer = estimateCooling(inputFor(s), ref).designDay;
        const more = estimateCooling(inputFor(s, s.fanCount + s.extraFans), ref).designDay;
        expect(more.peakIndoorWithFansC).toBeLessThanOrEqual(fewer.peakIndoorWithFansC + 1e-9);
        // pads are in both runs or in neither (the same scenario), so compare them whenever given
        expect(more.peakIndoorWithPadsC === null).toBe(s.padTypeId === null);
        expect(fewer.peakIndoorWithPadsC === null).toBe(s.padTypeId === null);
        if (s.padTypeId !== null) {
          expect(more.peakIndoorWithPadsC!).toBeLessThanOrEqual(fewer.peakIndoorWithPadsC! + 1e-9);
        }
      }),
      { numRuns: 60 },
    );
  });

  it('a higher allowed temperature rise never raises the required capacity', () => {
    fc.assert(
      fc.property(scenario, fc.double({ min: 0, max: 10, noNaN: true }), (s, extraRiseK) => {
        const base = estimateCooling(inputFor(s), ref).capacity.requiredFlowM3PerS;
        const higherRise = Math.min(b.allowedTemperatureRiseK.max, s.allowedTemperatureRiseK + extraRiseK);
        const relaxed = estimateCooling(
          { ...inputFor(s), conditions: { ...inputFor(s).conditions, allowedTemperatureRiseK: higherRise } },
          ref,
        ).capacity.requiredFlowM3PerS;
        expect(relaxed).toBeLessThanOrEqual(base * (1 + 1e-12));
      }),
      { numRuns: 60 },
    );
  });

  it('gives no NaN or Infinity anywhere for inputs inside the bounds', () => {
    fc.assert(
      fc.property(scenario, (s) => {
        const result = estimateCooling(inputFor(s), ref);
        expect(allNumbersFinite(result)).toBe(true);
        for (const hour of result.designDay.hours) {
          expect(hour.fanFraction).toBeGreaterThanOrEqual(0);
          expect(hour.fanFraction).toBeLessThanOrEqual(1);
          expect(hour.solarGainW).toBeGreaterThanOrEqual(0);
        }
      }),
      { numRuns: 100 },
    );
  });

  it('out-of-bounds numbers throw EngineInputError naming the field', () => {
    const fields: Array<[keyof CoolingConditions, { min: number; max: number }]> = [
      ['dailyRangeK', b.dailyRangeK],
      ['allowedTemperatureRiseK', b.allowedTemperatureRiseK],
      ['peakInteriorLightLux', b.peakInteriorLightLux],
      ['padToFanDistanceM', b.padToFanDistanceM],
      ['transpirationFraction', b.transpirationFraction],
    ];
    fc.assert(
      fc.property(
        fc.constantFrom(...fields),
        fc.boolean(),
        fc.double({ min: 1e-6, max: 1e6, noNaN: true }),
        ([field, range], above, excess) => {
          const value = above ? range.max + excess : range.min - excess;
          expectInputError(
            () => run({ conditions: { [field]: value } as Partial<CoolingConditions> }),
            `conditions.${field}`,
          );
        },
      ),
      { numRuns: 60 },
    );
  });
});
