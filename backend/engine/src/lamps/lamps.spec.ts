import fc from 'fast-check';
import { blockShareByHour } from '../cooling/design-day-lamps';
import { requiredCapacity, type CapacityInput } from '../cooling/required-capacity';
import { EngineInputError } from '../errors';
import { estimateCooling, type CoolingInput } from '../estimate-cooling';
import { estimateHeating } from '../estimate-heating';
import { estimateSeason } from '../estimate-season';
import type { HouseSpec, Lamps } from '../house.types';
import { demoSeasonInput } from '../season/demo-season';
import { SunCache } from '../season/sun-hours';
import { loadReferenceData } from '../testing/reference-data';
import { proseToPlainSi } from '../vocabulary';
import { lampTypeRows, validateLamps } from './lamps';

const ref = loadReferenceData();
const sunCache = new SunCache();

function lamps(overrides: Partial<Lamps> = {}): Lamps {
  return {
    lampTypeId: 'led-horticultural',
    powerDensityWPerM2: 50,
    hoursPerDayByMonth: [12, 12, 10, 8, 4, 0, 0, 0, 4, 8, 10, 12],
    heatToHouseFraction: 0.95,
    ...overrides,
  };
}

function fieldOf(run: () => unknown): string {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    return (error as EngineInputError).field;
  }
  throw new Error('expected an EngineInputError');
}

describe('lamps: validation and reference rows', () => {
  it('needs 12 monthly hours of 0–24, a density and a heat share within bounds, and a known lamp type', () => {
    expect(validateLamps(null)).toBeNull();
    expect(validateLamps(lamps(), 'house.lamps', ref)).not.toBeNull();
    expect(fieldOf(() => validateLamps(lamps({ hoursPerDayByMonth: [1, 2, 3] })))).toBe(
      'house.lamps.hoursPerDayByMonth',
    );
    expect(fieldOf(() => validateLamps(lamps({ hoursPerDayByMonth: [...Array(11).fill(1), 25] })))).toBe(
      'house.lamps.hoursPerDayByMonth[11]',
    );
    expect(fieldOf(() => validateLamps(lamps({ powerDensityWPerM2: 0 })))).toBe('house.lamps.powerDensityWPerM2');
    expect(fieldOf(() => validateLamps(lamps({ heatToHouseFraction: 1.2 })))).toBe('house.lamps.heatToHouseFraction');
    expect(fieldOf(() => validateLamps(lamps({ lampTypeId: 'heat-to-house-default' }), 'house.lamps', ref))).toBe(
      'house.lamps.lampTypeId',
    );
  });

  it('offers HPS and LED lamp types whose default heat share is near 1 (energy is conserved; a few per cent escapes)', () => {
    const ids = lampTypeRows(ref).map((row) => row.id);
    expect(ids).toEqual(expect.arrayContaining(['hps-double-ended', 'led-horticultural']));
    for (const row of lampTypeRows(ref)) {
      expect(row.heatToHouseFraction).toBeGreaterThanOrEqual(0.9);
      expect(row.heatToHouseFraction).toBeLessThanOrEqual(1);
    }
  });
});

describe('lamps on the summer design day', () => {
  it('a 10 h block ending at sunrise 06:00 lights 20:00–06:00: half of hour 20 and of hour 6, all hours between', () => {
    // hour h stands for [h − ½, h + ½); the block [20, 30] ≡ [−4, 6] by hand
    const shares = blockShareByHour(10, 6);
    expect(shares[20]).toBeCloseTo(0.5, 12);
    for (const hour of [21, 22, 23, 0, 1, 2, 3, 4, 5]) expect(shares[hour]).toBeCloseTo(1, 12);
    expect(shares[6]).toBeCloseTo(0.5, 12);
    expect(shares[12]).toBe(0);
    expect(shares.reduce((a, b) => a + b, 0)).toBeCloseTo(10, 12);
  });

  it('lamp heat in a dark hour needs V̇ = Q ÷ (ρ·c_p·ΔT); above the floor-area flow it sets the requirement', () => {
    const base: CapacityInput = {
      floorAreaM2: 1000,
      elevationM: 0,
      peakInteriorLightLux: 53_819.55, // 5,000 fc: light factor 1
      allowedTemperatureRiseK: 3.8889, // 7 °F: temperature-rise factor 1
      padToFanDistanceM: 40,
      fans: { count: 10, capacityEachM3PerS: 5 },
      inletAreaM2: 30,
    };
    const heatByHourW = Array(24).fill(0);
    heatByHourW[2] = 200_000; // 200 W/m² × 1000 m² at share 1, at 02:00 with no sun
    const withLamps = requiredCapacity(
      {
        ...base,
        lamps: { heatByHourW, sunShareByHour: Array(24).fill(0), airHeatCapacityJPerM3K: 1.2 * 1006 },
      },
      ref,
    );
    // by hand: floor-area method 0.04064 m³/(s·m²) × 1000 m² = 40.64 m³/s (every factor 1; Kessler, Auburn)
    expect(withLamps.floorAreaMethodFlowM3PerS).toBeCloseTo(40.64, 2);
    // lamps at 02:00: 200,000 W ÷ (1.2 kg/m³ × 1006 J/(kg·K) × 3.8889 K) = 200,000 ÷ 4694.7 = 42.60 m³/s
    expect(withLamps.requiredFlowM3PerS).toBeCloseTo(42.6, 1);
    expect(withLamps.lampGoverningHour).toBe(2);
    expect(withLamps.lampFlowM3PerS).toBeCloseTo(42.6 - 40.64, 1);
    // 100 W/m² in the same hour needs only 21.3 m³/s: the floor-area flow still governs
    heatByHourW[2] = 100_000;
    const dim = requiredCapacity(
      { ...base, lamps: { heatByHourW, sunShareByHour: Array(24).fill(0), airHeatCapacityJPerM3K: 1.2 * 1006 } },
      ref,
    );
    expect(dim.requiredFlowM3PerS).toBeCloseTo(40.64, 2);
    expect(dim.lampGoverningHour).toBeNull();
  });
});

function houseWith(lampsOrNull: Lamps | null): HouseSpec {
  return { ...demoSeasonInput().house, lamps: lampsOrNull };
}

function coolingInput(house: HouseSpec, designDate = '2026-07-21'): CoolingInput {
  return {
    house,
    site: { latitudeDeg: 45.6, longitudeDeg: -94.2, elevationM: 300 },
    conditions: {
      designDate,
      summerDesignC: 32,
      dailyRangeK: 12,
      summerDesignWetBulbC: 23,
    },
  };
}

describe('lamps in the estimates', () => {
  it('the design night never credits the lamps: the same heat loss and required output, with lamps shown and a caution', () => {
    const conditions = {
      designOutdoorC: -29,
      insideRelativeHumidityPct: 80,
      elevationM: 300,
    };
    const without = estimateHeating({ house: houseWith(null), conditions }, ref);
    const withLamps = estimateHeating({ house: houseWith(lamps({ powerDensityWPerM2: 100 })), conditions }, ref);
    expect(withLamps.heatLoss.totalW).toBe(without.heatLoss.totalW);
    expect(withLamps.heater.requiredOutputW).toBe(without.heater.requiredOutputW);
    expect(without.lamps).toBeNull();
    // by hand: 100 W/m² × the floor area, and 0.95 of it as heat
    const floor = withLamps.geometry.floorAreaM2;
    expect(withLamps.lamps).toEqual({
      electricW: 100 * floor,
      heatW: 95 * floor,
      creditedW: 0,
      shareOfDesignLoss: (95 * floor) / withLamps.heatLoss.totalW,
    });
    expect(withLamps.assumptions.some((a) => a.key === 'lamps.notCredited')).toBe(true);
    expect(withLamps.cautions.some((c) => /licensed electrician/.test(c))).toBe(true);
  });

  it('the season shows the electricity, the heat into the house and the fuel saved, month by month and in total', () => {
    const input = demoSeasonInput({ season: { startDate: '2026-01-01', endDate: '2026-01-31' } });
    const withLamps = estimateSeason(
      // 6 h before a January sunrise near 07:15 stays within each day (no block reaches before 1 January)
      {
        ...input,
        house: { ...input.house, lamps: lamps({ hoursPerDayByMonth: Array(12).fill(6), heatToHouseFraction: 1 }) },
      },
      ref,
      sunCache,
    );
    const without = estimateSeason(input, ref, sunCache);
    expect(without.lamps).toBeNull();
    const result = withLamps.lamps!;
    // by hand: 50 W/m² × floor × 6 h × 31 heated days
    const floor = withLamps.heatLoss.floorAreaM2;
    expect(result.electricityKWh).toBeCloseTo((50 * floor * 6 * 31) / 1000, 6);
    expect(result.heatToHouseKWh).toBeCloseTo(result.electricityKWh, 9);
    expect(withLamps.monthly[0].lampElectricityKWh).toBeCloseTo(result.electricityKWh, 6);
    // a January night at the demo site (42° N, nights near −8 °C) needs far more than 50 W/m² of floor, so
    // every lamp watt replaces heater heat, and the season's heat falls by exactly that
    expect(result.heatSavedKWh).toBeCloseTo(result.heatToHouseKWh, 3);
    expect(without.total.energyKWh - withLamps.total.energyKWh).toBeCloseTo(result.heatSavedKWh, 3);
    expect(result.fuelSaved.fuelInputKWh).toBeCloseTo(result.heatSavedKWh / input.heaterEfficiency, 3);
    expect(withLamps.degreeDays.steps.map((step) => step.key)).toContain('lamps');
    expect(withLamps.assumptions.map((a) => a.key)).toEqual(
      expect.arrayContaining(['lamps.power-density', 'lamps.hours-per-day', 'lamps.heat-to-house', 'lamps.schedule']),
    );
    expect(withLamps.cautions.map(proseToPlainSi).some((c) => /licensed electrician/.test(c))).toBe(true);
  });

  it('summer: lamps running before sunrise in July add their heat to those hours of the design day', () => {
    const july = lamps({ hoursPerDayByMonth: Array(12).fill(6), powerDensityWPerM2: 100 });
    const without = estimateCooling(coolingInput(houseWith(null)), ref);
    const withLamps = estimateCooling(coolingInput(houseWith(july)), ref);
    const lit = withLamps.designDay.hours.filter((hour) => hour.lampHeatW > 0);
    expect(lit.length).toBeGreaterThan(0);
    // the block ends at sunrise: the sun is (all but) down in every lit hour, late evening to dawn
    for (const hour of lit) expect(hour.sunAltitudeDeg).toBeLessThan(1);
    const hour = lit[Math.floor(lit.length / 2)];
    const same = without.designDay.hours[hour.hour];
    expect(hour.indoorWithFansC).toBeGreaterThan(same.indoorWithFansC);
    expect(withLamps.capacity.requiredFlowM3PerS).toBeGreaterThanOrEqual(without.capacity.requiredFlowM3PerS);
  });
});

describe('lamps: properties', () => {
  const seed = fc.readConfigureGlobal().seed;
  // printed so a failing run can be repeated with FC_SEED
  console.info(`lamps properties: fast-check seed ${String(seed)}`);
  const lampArbitrary = fc.record({
    lampTypeId: fc.constantFrom(null, 'hps-double-ended', 'led-horticultural'),
    powerDensityWPerM2: fc.double({ min: 1, max: 200, noNaN: true }),
    hoursPerDayByMonth: fc.array(fc.double({ min: 0, max: 24, noNaN: true }), { minLength: 12, maxLength: 12 }),
    heatToHouseFraction: fc.double({ min: 0.5, max: 1, noNaN: true }),
  });

  it('adding lamps never raises the season fuel', () => {
    const input = demoSeasonInput({ season: { startDate: '2026-02-01', endDate: '2026-02-28' } });
    const without = estimateSeason(input, ref, sunCache);
    fc.assert(
      fc.property(lampArbitrary, fc.boolean(), (lampSpec, smallHeaters) => {
        const heaters = smallHeaters
          ? input.house.heaters.map((group) => ({ ...group, ratedInputW: group.ratedInputW / 4 }))
          : input.house.heaters;
        const base = smallHeaters
          ? estimateSeason({ ...input, house: { ...input.house, heaters } }, ref, sunCache)
          : without;
        const lit = estimateSeason({ ...input, house: { ...input.house, heaters, lamps: lampSpec } }, ref, sunCache);
        expect(lit.total.fuelInputKWh).toBeLessThanOrEqual(base.total.fuelInputKWh + 1e-6);
        expect(lit.lamps!.heatSavedKWh).toBeLessThanOrEqual(lit.lamps!.heatToHouseKWh + 1e-6);
        expect(base.total.energyKWh - lit.total.energyKWh).toBeCloseTo(lit.lamps!.heatSavedKWh, 3);
      }),
      { numRuns: 25 },
    );
  });

  it('adding lamps never lowers the summer required fan flow', () => {
    fc.assert(
      fc.property(lampArbitrary, fc.constantFrom('2026-06-21', '2026-07-21', '2026-08-15'), (lampSpec, designDate) => {
        const without = estimateCooling(coolingInput(houseWith(null), designDate), ref);
        const lit = estimateCooling(coolingInput(houseWith(lampSpec), designDate), ref);
        expect(lit.capacity.requiredFlowM3PerS).toBeGreaterThanOrEqual(without.capacity.requiredFlowM3PerS - 1e-12);
        for (let hour = 0; hour < 24; hour++) {
          expect(lit.designDay.hours[hour].indoorWithFansC).toBeGreaterThanOrEqual(
            without.designDay.hours[hour].indoorWithFansC - 1e-9,
          );
        }
      }),
      { numRuns: 60 },
    );
  });
});
