import fc from 'fast-check';
import { loadReferenceData } from './testing/reference-data';
import { EngineInputError } from './errors';
import { estimateSeason, type EstimateSeasonInput } from './estimate-season';
import { computeHouseGeometry } from './geometry/house-geometry';
import { heatLossCoefficients } from './heating/heat-loss';
import { dryAirDensityByHand } from './testing/air-by-hand';
import { expectRelativelyClose } from './testing/relative-tolerance';
import type { SiteClimate } from './climate/site-climate';
import { demoClimate, demoSeasonInput } from './season/demo-season';
import { SunCache } from './season/sun-hours';
import { proseToPlainSi } from './vocabulary';
import { sunTimes } from './solar';

const ref = loadReferenceData();
const sunCache = new SunCache();

/** A climate with the same outdoor temperature every hour of the year and no sun. */
function constantClimate(outdoorC: number): SiteClimate {
  return {
    ...demoClimate(),
    monthly: Array.from({ length: 12 }, (_, index) => ({
      month: index + 1,
      meanDailyMinC: outdoorC,
      meanDailyMaxC: outdoorC,
      clearness: 0,
    })),
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

describe('estimateSeason', () => {
  it('agrees with the degree-day method at a constant outdoor temperature with no sun and one setpoint, then adds the night sky', () => {
    const input = demoSeasonInput({
      climate: constantClimate(2),
      season: { startDate: '2026-01-01', endDate: '2026-03-31' },
      house: { ...demoSeasonInput().house, setpoints: { dayHeatingC: 15, nightHeatingC: 15, coolingC: 24 } },
    });
    const estimate = estimateSeason(input, ref, sunCache);
    expect(estimate.total.energyKWh).toBeGreaterThan(0);
    const step = (key: string) => estimate.degreeDays.steps.find((s) => s.key === key)!;
    // up to the sky step the hourly walk is the degree-day figure exactly
    expect(Math.abs(step('curtain').energyKWh / estimate.degreeDays.energyKWh - 1)).toBeLessThan(1e-9);
    expect(estimate.degreeDays.degreeDaysKDay).toBeCloseTo(13 * 90, 6);
    expect(estimate.solarOffsetKWh).toBe(0);

    // and it equals UA × ΔT × hours with UA computed directly by the heating engine
    const house = input.house;
    const ua = heatLossCoefficients(house, computeHouseGeometry(house), ref, {
      curtainClosed: false,
      // dry air at the 15 °C setpoint and the demo site's 60 m by hand (testing/air-by-hand.ts):
      // p = 101325 × (1 − 2.25577e−5 × 60)^5.2559 = 100,606 Pa; ρ = 100606 / (287.042 × 288.15) = 1.21636 kg/m³
      airDensityKgPerM3: dryAirDensityByHand(15, input.site.elevationM),
    }).totalWPerK;
    expect(input.site.elevationM).toBe(60);
    expect(dryAirDensityByHand(15, 60)).toBeCloseTo(1.21636, 5);
    expectRelativelyClose(step('curtain').energyKWh, (ua * 13 * 90 * 24) / 1000, 1e-6);
    expect(estimate.total.heatingHours).toBe(90 * 24);

    // The night sky, by hand (reference-data/sky-radiation.json, coverings.json, surface-coefficients.json):
    //   clearness 0 → cloud cover 10 tenths (Kasten & Czeplak inverted: ((1 − 0)/0.75)^(1/3.4) > 1, held at 1)
    //   dew point = the day's minimum, 2 °C (FAO-56 with 0 K depression)
    //   ε_clear = 0.711 + 0.56 × 0.02 + 0.73 × 0.02² = 0.722492; overcast × 1.154 (Clark & Allen) = 0.833756
    //   deficit = σ T⁴ (1 − ε) = 5.670374e−8 × 275.15⁴ × 0.166244 = 325.0048 × 0.166244 = 54.0302 W/m²
    //   coupling: crop 0.30 × 0.95 × 270 m² = 76.95 m²; coverings (1172.999 + 571.68 W/K) × 0.4 / 33.4
    //     + 213.588 W/K × 0.9 / 33.4 = 20.8944 + 5.7554 = 26.6497 m² (U·A from heating/heat-loss.spec.ts); 103.5997 m²
    //   sky loss = 103.5997 × 54.0302 = 5597.51 W in every night share of an hour
    // Night hours: 90 × 24 h less the day lengths from sunrise to sunset (solar/sunTimes at the demo site).
    let dayHours = 0;
    for (let day = 0; day < 90; day++) {
      const { sunrise, sunset } = sunTimes(new Date(Date.UTC(2026, 0, 1 + day, 17)), 42, -72.5);
      dayHours += (sunset!.getTime() - sunrise!.getTime()) / 3_600_000;
    }
    const nightHours = 90 * 24 - dayHours;
    expect(nightHours).toBeGreaterThan(90 * 12); // winter nights are longer than days
    expectRelativelyClose(estimate.lossBreakdown.skyKWh, (5597.51 * nightHours) / 1000, 1e-5);
    expectRelativelyClose(estimate.total.energyKWh, (ua * 13 * 2160 + 5597.51 * nightHours) / 1000, 1e-5);
    expectRelativelyClose(step('sky').changeKWh, estimate.lossBreakdown.skyKWh, 1e-9);
    expectRelativelyClose(estimate.peak!.heatW, ua * 13 + 5597.51, 1e-6);
  });

  it('sets the conventional 65 °F base beside the setpoint base, saying why the setpoint base suits a greenhouse', () => {
    const input = demoSeasonInput({
      climate: constantClimate(2),
      season: { startDate: '2026-01-01', endDate: '2026-03-31' },
      house: { ...demoSeasonInput().house, setpoints: { dayHeatingC: 15, nightHeatingC: 15, coolingC: 24 } },
    });
    const { degreeDays } = estimateSeason(input, ref, sunCache);
    const conventional = degreeDays.conventionalBase;
    // 65 °F = (65 − 32) / 1.8 = 18.333 °C (AMS Glossary of Meteorology, 'heating degree-day'); at a
    // constant 2 °C every one of the 90 days adds 16.333 K·day.
    expect(conventional.baseTemperatureC).toBeCloseTo(18.3333, 4);
    expect(conventional.degreeDaysKDay).toBeCloseTo((18.3333 - 2) * 90, 3);
    expect(conventional.degreeDaysFDay).toBeCloseTo((65 - 35.6) * 90, 1);
    // same UA, same formula: heat scales with the degree-days
    expectRelativelyClose(conventional.energyKWh / degreeDays.energyKWh, (18.3333 - 2) / 13, 1e-6);
    expect(conventional.note).toMatch(/internal gains/);
    expect(conventional.note).toMatch(/night-setpoint base is the one to use for a greenhouse/);
  });

  it('returns monthly totals that add up to the season total, with fuel and cost in the fuel’s units', () => {
    const estimate = estimateSeason(demoSeasonInput(), ref, sunCache);
    expect(estimate.monthly).toHaveLength(12);
    const sum = (key: 'energyKWh' | 'fuelQuantityUs' | 'fuelQuantitySi' | 'cost') =>
      estimate.monthly.reduce((total, month) => total + month[key]!, 0);
    expect(sum('energyKWh')).toBeCloseTo(estimate.total.energyKWh, 6);
    expect(sum('fuelQuantityUs')).toBeCloseTo(estimate.total.fuelQuantityUs, 6);
    expect(sum('cost')).toBeCloseTo(estimate.total.cost!, 6);
    expect(estimate.total.cost).toBeCloseTo(estimate.total.fuelQuantityUs * 2.2, 6);
    expect(estimate.fuel).toMatchObject({ fuelId: 'propane', unitUs: 'US gal', priceUnitLabel: 'US gal' });
    // January needs more than July
    expect(estimate.monthly[0].energyKWh).toBeGreaterThan(10 * estimate.monthly[6].energyKWh);
    expect(estimate.peak).not.toBeNull();
    expect(Math.max(...estimate.monthly.map((month) => month.peakW))).toBeCloseTo(estimate.peak!.heatW, 9);
    expect(estimate.peak!.at).toMatch(/^2026-\d{2}-\d{2}T\d{2}:00$/);
    expect(estimate.cautions.join(' ')).toMatch(/carbon monoxide/);
  });

  it('computes heat and fuel without a price, and leaves every cost empty', () => {
    const priced = estimateSeason(demoSeasonInput(), ref, sunCache);
    const base = demoSeasonInput();
    const unpriced = estimateSeason({ ...base, fuel: { ...base.fuel, pricePerUnit: null } }, ref, sunCache);
    expect(unpriced.total.energyKWh).toBe(priced.total.energyKWh);
    expect(unpriced.total.fuelQuantityUs).toBe(priced.total.fuelQuantityUs);
    expect(unpriced.total.cost).toBeNull();
    expect(unpriced.monthly.every((month) => month.cost === null)).toBe(true);
    expect(unpriced.degreeDays.cost).toBeNull();
    expect(unpriced.fuel.pricePerUnit).toBeNull();
  });

  it('counts sun by day: the hourly estimate is below the degree-day figure and each step is explained', () => {
    const estimate = estimateSeason(demoSeasonInput(), ref, sunCache);
    expect(estimate.solarOffsetKWh).toBeGreaterThan(0);
    const { steps, explanation } = estimate.degreeDays;
    expect(steps.map((step) => step.key)).toEqual([
      'degree-day',
      'hourly-curve',
      'day-setpoint',
      'curtain',
      'sky',
      'sun',
    ]);
    expect(steps[0].energyKWh).toBeCloseTo(estimate.degreeDays.energyKWh, 9);
    expect(steps[5].energyKWh).toBeCloseTo(estimate.total.energyKWh, 9);
    expect(steps[2].changeKWh).toBeGreaterThan(0); // day setpoint 18 °C above night 15 °C
    expect(steps[3].changeKWh).toBe(0); // the demo house has no curtain
    // double poly passes 30 % of the crop's long-wave radiation: the night sky adds heat
    expect(steps[4].changeKWh).toBeGreaterThan(0);
    // the step is what the sky adds; the breakdown's sky part is larger where the sky makes a warm
    // night (outdoors above the setpoint) need heat: the sky's whole part counts there, and the
    // envelope's part is a gain
    expect(steps[4].changeKWh).toBeLessThanOrEqual(estimate.lossBreakdown.skyKWh + 1e-6);
    expect(steps[5].changeKWh).toBeCloseTo(-estimate.solarOffsetKWh, 6);
    expect(explanation.join(' ')).toMatch(/sun/i);
    expect(explanation.join(' ')).toMatch(/sky is colder than the air/);
    expect(estimate.degreeDays.baseTemperatureC).toBe(15);
    // quantities are tokens (energy in joules, temperature in °C); the reader's units show them
    expect(estimate.degreeDays.baseDescription).toBe('the night setpoint, {{temperature:15}}');
    expect(proseToPlainSi(estimate.degreeDays.baseDescription)).toBe('the night setpoint, 15.0 °C');
    expect(explanation[0]).toContain(`{{energy:${Number((estimate.degreeDays.energyKWh * 3.6e6).toPrecision(6))}}}`);
    const kWh = (value: number) => `${Math.round(value).toLocaleString('en-US')} kWh`;
    expect(proseToPlainSi(explanation[0])).toContain(
      `It gives ${kWh(estimate.degreeDays.energyKWh)} of heat; the hour-by-hour estimate gives ${kWh(estimate.total.energyKWh)}.`,
    );
    for (const sentence of explanation) expect(sentence).not.toMatch(/\d\s*(kWh|°C|K)\b/);
  });

  it('draws the curtain at night only', () => {
    const base = demoSeasonInput();
    const withCurtain = estimateSeason(
      { ...base, house: { ...base.house, curtainId: 'energy-screen-aluminised' } },
      ref,
      sunCache,
    );
    const without = estimateSeason(base, ref, sunCache);
    expect(withCurtain.heatLoss.uaCurtainClosedWPerK).toBeLessThan(withCurtain.heatLoss.uaCurtainOpenWPerK);
    expect(withCurtain.heatLoss.uaCurtainOpenWPerK).toBeCloseTo(without.heatLoss.uaCurtainOpenWPerK, 9);
    expect(withCurtain.total.energyKWh).toBeLessThan(without.total.energyKWh);
    expect(withCurtain.degreeDays.steps[3].changeKWh).toBeLessThan(0);
    expect(withCurtain.assumptions.map((assumption) => assumption.key)).toContain('ua-curtain-closed');
  });

  it('leaves empty periods unheated, with periods that wrap the year end', () => {
    const estimate = estimateSeason(
      demoSeasonInput({
        calendar: [
          { startMonthDay: '11-01', endMonthDay: '03-31', mode: 'heated' },
          { startMonthDay: '01-01', endMonthDay: '01-14', mode: 'empty' },
        ],
      }),
      ref,
      sunCache,
    );
    for (const month of estimate.monthly) {
      if (month.month >= 4 && month.month <= 10) expect(month.energyKWh).toBe(0);
      else expect(month.energyKWh).toBeGreaterThan(0);
    }
    expect(estimate.period.heatedDays).toBe(31 + 28 + 31 + 30 + 31 - 14);
    expect(estimate.monthly[0].heatingHours).toBeLessThanOrEqual(17 * 24);
  });

  it('uses a period’s own setpoints', () => {
    const warm = estimateSeason(
      demoSeasonInput({
        calendar: [
          { startMonthDay: '01-01', endMonthDay: '12-31', mode: 'heated', nightHeatingC: 18, dayHeatingC: 21 },
        ],
      }),
      ref,
      sunCache,
    );
    const plain = estimateSeason(demoSeasonInput(), ref, sunCache);
    expect(warm.total.energyKWh).toBeGreaterThan(plain.total.energyKWh);
    expect(warm.degreeDays.baseTemperatureC).toBe(18);
  });

  it('runs a season across the year end with months in order', () => {
    const estimate = estimateSeason(
      demoSeasonInput({ season: { startDate: '2026-10-01', endDate: '2027-04-30' } }),
      ref,
      sunCache,
    );
    expect(estimate.monthly.map((month) => `${month.year}-${month.month}`)).toEqual([
      '2026-10',
      '2026-11',
      '2026-12',
      '2027-1',
      '2027-2',
      '2027-3',
      '2027-4',
    ]);
    expect(estimate.period.days).toBe(212);
  });

  it('uses hourly logged temperatures instead of normals', () => {
    const readings = [];
    for (let hour = 0; hour <= 24 * 3; hour++) {
      const day = 1 + Math.floor(hour / 24);
      readings.push({
        at: `2026-02-${String(day).padStart(2, '0')}T${String(hour % 24).padStart(2, '0')}:00`,
        temperatureC: 0,
      });
    }
    const input = demoSeasonInput({
      climate: { readings, clearnessByMonth: new Array(12).fill(0) },
      season: { startDate: '2026-02-01', endDate: '2026-02-03' },
      house: { ...demoSeasonInput().house, setpoints: { dayHeatingC: 15, nightHeatingC: 15, coolingC: 24 } },
    });
    const logged = estimateSeason(input, ref, sunCache);
    const normals = estimateSeason({ ...input, climate: constantClimate(0) }, ref, sunCache);
    expect(logged.total.energyKWh).toBeCloseTo(normals.total.energyKWh, 6);
    expect(logged.assumptions.find((assumption) => assumption.key === 'clearness-by-month')?.overridden).toBe(true);
  });

  it('uses daily logged minima and maxima through the daily curve', () => {
    const readings = ['2026-02-01', '2026-02-02', '2026-02-03'].map((at) => ({
      at,
      temperatureC: 2,
      minC: -3,
      maxC: 7,
    }));
    const estimate = estimateSeason(
      demoSeasonInput({ climate: { readings }, season: { startDate: '2026-02-01', endDate: '2026-02-03' } }),
      ref,
      sunCache,
    );
    expect(estimate.degreeDays.degreeDaysKDay).toBeCloseTo(3 * 13, 9);
    expect(estimate.total.energyKWh).toBeGreaterThan(0);
  });

  it('refuses logged temperatures that do not cover the season', () => {
    const readings = [
      { at: '2026-02-01T00:00', temperatureC: 0 },
      { at: '2026-02-01T05:00', temperatureC: 1 },
    ];
    expect(
      fieldOf(() =>
        estimateSeason(
          demoSeasonInput({ climate: { readings }, season: { startDate: '2026-02-01', endDate: '2026-02-02' } }),
          ref,
          sunCache,
        ),
      ),
    ).toBe('climate.readings');
  });

  it('names bad inputs', () => {
    expect(
      fieldOf(() =>
        estimateSeason(demoSeasonInput({ season: { startDate: '2026-03-01', endDate: '2026-02-01' } }), ref, sunCache),
      ),
    ).toBe('season.endDate');
    expect(
      fieldOf(() =>
        estimateSeason(demoSeasonInput({ season: { startDate: '2026-01-01', endDate: '2027-06-01' } }), ref, sunCache),
      ),
    ).toBe('season.endDate');
    expect(
      fieldOf(() =>
        estimateSeason(demoSeasonInput({ season: { startDate: '2026-02-30', endDate: '2026-03-01' } }), ref, sunCache),
      ),
    ).toBe('season.startDate');
    expect(fieldOf(() => estimateSeason(demoSeasonInput({ heaterEfficiency: 0 }), ref, sunCache))).toBe(
      'heaterEfficiency',
    );
    expect(
      fieldOf(() =>
        estimateSeason(
          demoSeasonInput({ site: { latitudeDeg: 42, longitudeDeg: -72, elevationM: 0, utcOffsetHours: 20 } }),
          ref,
          sunCache,
        ),
      ),
    ).toBe('site.utcOffsetHours');
    expect(
      fieldOf(() =>
        estimateSeason(
          demoSeasonInput({ calendar: [{ startMonthDay: '13-01', endMonthDay: '03-01', mode: 'heated' }] }),
          ref,
          sunCache,
        ),
      ),
    ).toBe('calendar[0].startMonthDay');
  });

  it('lists its assumptions with source and confidence, marking the user’s own values', () => {
    const climate = demoClimate();
    climate.monthly[0].clearness = 0.4;
    const estimate = estimateSeason(demoSeasonInput({ climate, solarUsefulFraction: 0.4 }), ref, sunCache);
    const byKey = new Map(estimate.assumptions.map((assumption) => [assumption.key, assumption]));
    for (const key of [
      'ua-curtain-open',
      'roof-light-transmittance',
      'solar-useful-fraction',
      'clearness-by-month',
      'daily-curve-peak',
      'fuel-heat-content-us',
      'heater-efficiency',
      'degree-day-base',
      'local-standard-time',
    ]) {
      expect(byKey.get(key)).toBeDefined();
    }
    expect(byKey.get('solar-useful-fraction')).toMatchObject({
      value: 0.4,
      overridden: true,
      confidence: 'user-entered',
    });
    expect(byKey.get('clearness-by-month')?.overridden).toBe(true);
    expect(byKey.get('fuel-heat-content-us')).toMatchObject({
      value: 91_333,
      unit: 'Btu/US gal',
      confidence: 'verified',
    });
    for (const assumption of estimate.assumptions) expect(assumption.source.length).toBeGreaterThan(3);
  });

  it('never needs more fuel for a better-insulated, tighter house (property)', () => {
    const base = demoSeasonInput({ season: { startDate: '2026-01-01', endDate: '2026-02-28' } });
    const uValue = fc.double({ min: 1, max: 8, noNaN: true });
    fc.assert(
      fc.property(
        fc.record({ roof: uValue, sidewalls: uValue, endwalls: uValue }),
        fc.double({ min: 0.2, max: 4, noNaN: true }),
        fc.boolean(),
        fc.record({
          roof: fc.double({ min: 0, max: 1, noNaN: true }),
          sidewalls: fc.double({ min: 0, max: 1, noNaN: true }),
          endwalls: fc.double({ min: 0, max: 1, noNaN: true }),
          ach: fc.double({ min: 0, max: 1, noNaN: true }),
        }),
        fc.boolean(),
        (uValues, ach, perimeterInsulated, improvement, insulatePerimeter) => {
          const leaky: EstimateSeasonInput = {
            ...base,
            house: {
              ...base.house,
              coveringUOverridesWPerM2K: uValues,
              airChangesPerHourOverride: ach,
              perimeterInsulated,
            },
          };
          const better: EstimateSeasonInput = {
            ...base,
            house: {
              ...base.house,
              coveringUOverridesWPerM2K: {
                roof: Math.max(0.5, uValues.roof * (1 - 0.8 * improvement.roof)),
                sidewalls: Math.max(0.5, uValues.sidewalls * (1 - 0.8 * improvement.sidewalls)),
                endwalls: Math.max(0.5, uValues.endwalls * (1 - 0.8 * improvement.endwalls)),
              },
              airChangesPerHourOverride: Math.max(0.1, ach * (1 - 0.9 * improvement.ach)),
              perimeterInsulated: perimeterInsulated || insulatePerimeter,
            },
          };
          const before = estimateSeason(leaky, ref, sunCache).total.fuelQuantitySi;
          const after = estimateSeason(better, ref, sunCache).total.fuelQuantitySi;
          expect(after).toBeLessThanOrEqual(before * (1 + 1e-12));
        },
      ),
      { numRuns: 25 },
    );
  });
});

describe('estimateSeason with the installed heaters as a limit', () => {
  const winter = { startDate: '2026-12-01', endDate: '2027-02-28' };
  const house = demoSeasonInput().house;
  const withHeaters = (heaters: EstimateSeasonInput['house']['heaters']) =>
    estimateSeason(demoSeasonInput({ house: { ...house, heaters }, season: winter }), ref, sunCache);

  it('a tiny heater leaves hours below the setpoint; fuel is the capped heat ÷ efficiency', () => {
    const ample = withHeaters([{ count: 4, ratedInputW: 100_000, efficiency: 0.8, fuelId: 'propane' }]);
    const tiny = withHeaters([{ count: 1, ratedInputW: 10_000, efficiency: 0.8, fuelId: 'propane' }]);
    expect(tiny.heaterCapacity.installedOutputW).toBeCloseTo(8000, 9);
    expect(tiny.total.hoursBelowSetpoint).toBeGreaterThan(0);
    expect(tiny.total.unmetHeatKWh).toBeGreaterThan(0);
    // delivered ≤ output × heating hours, and delivered + unmet = what the house needs
    expect(tiny.total.energyKWh).toBeLessThanOrEqual((8000 * tiny.total.heatingHours) / 1000 + 1e-9);
    expect(tiny.total.energyKWh + tiny.total.unmetHeatKWh).toBeCloseTo(ample.total.energyKWh, 3);
    expect(tiny.total.fuelInputKWh).toBeCloseTo(tiny.total.energyKWh / 0.8, 6);
    const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);
    expect(sum(tiny.monthly.map((m) => m.hoursBelowSetpoint))).toBe(tiny.total.hoursBelowSetpoint);
    expect(sum(tiny.monthly.map((m) => m.unmetHeatKWh))).toBeCloseTo(tiny.total.unmetHeatKWh, 6);
    // the caution names the hours and carries its quantities as tokens
    const caution = tiny.heaterCapacity.caution!;
    expect(caution).toContain(`for ${tiny.total.hoursBelowSetpoint} hours of the season`);
    expect(caution).toContain('{{power:8000}}');
    expect(caution).toMatch(/crop sits below its setpoint/);
    expect(caution).toMatch(/heater sizing/);
    expect(proseToPlainSi(caution)).toMatch(/8\.0 kW/);
    // the degree-day walk stays uncapped and ends with the heaters' limit as its own step
    const steps = tiny.degreeDays.steps;
    expect(steps.map((s) => s.key)).toEqual([
      'degree-day',
      'hourly-curve',
      'day-setpoint',
      'curtain',
      'sky',
      'sun',
      'heater-capacity',
    ]);
    expect(steps[5].energyKWh).toBeCloseTo(ample.total.energyKWh, 3);
    expect(steps[6].changeKWh).toBeCloseTo(-tiny.total.unmetHeatKWh, 3);
    expect(tiny.degreeDays.energyKWh).toBeCloseTo(ample.degreeDays.energyKWh, 9);
    expect(tiny.degreeDays.explanation.join(' ')).toMatch(/assumes the heaters deliver whatever the house needs/);
  });

  it('with ample heaters the result is the uncapped one: nothing unmet, no caution, no extra step', () => {
    const ample = withHeaters([{ count: 4, ratedInputW: 100_000, efficiency: 0.8, fuelId: 'propane' }]);
    const huge = withHeaters([{ count: 40, ratedInputW: 1_000_000, efficiency: 0.8, fuelId: 'propane' }]);
    expect(ample.total).toEqual(huge.total);
    expect(ample.monthly).toEqual(huge.monthly);
    expect(ample.total.hoursBelowSetpoint).toBe(0);
    expect(ample.total.unmetHeatKWh).toBe(0);
    expect(ample.heaterCapacity.caution).toBeNull();
    expect(ample.degreeDays.steps).toHaveLength(6);
  });

  it('without heaters nothing is delivered, no fuel is burnt and every heating hour is below the setpoint', () => {
    const none = withHeaters([]);
    expect(none.total.energyKWh).toBe(0);
    expect(none.total.fuelInputKWh).toBe(0);
    expect(none.total.hoursBelowSetpoint).toBe(none.total.heatingHours);
    expect(none.heaterCapacity.caution).toMatch(/^The house has no heaters/);
  });
});

describe('estimateSeason: efficiency on the higher-heating-value basis', () => {
  it('refuses a fuel-fired efficiency above 1.0, naming heaterEfficiency', () => {
    expect(() => estimateSeason(demoSeasonInput({ heaterEfficiency: 1.03 }), ref)).toThrow(
      expect.objectContaining({ field: 'heaterEfficiency' }),
    );
  });
});

describe('estimateSeason: the night sky', () => {
  const singlePoly = (overrides: Partial<EstimateSeasonInput['house']> = {}) => ({
    ...demoSeasonInput().house,
    coverings: { roof: 'poly-single', sidewalls: 'poly-single', endwalls: 'poly-single' },
    ...overrides,
  });

  it('breaks the season down by part: the parts less the sun and the unmet heat are the heat delivered', () => {
    const estimate = estimateSeason(demoSeasonInput(), ref, sunCache);
    const breakdown = estimate.lossBreakdown;
    expect(breakdown.parts.map((part) => part.key)).toEqual([
      'roof',
      'sidewalls',
      'endwalls',
      'perimeter',
      'infiltration',
      'sky',
    ]);
    const sum = (values: number[]) => values.reduce((a, b) => a + b, 0);
    expectRelativelyClose(sum(breakdown.parts.map((part) => part.energyKWh)), breakdown.lostKWh, 1e-12);
    expectRelativelyClose(
      breakdown.lostKWh - breakdown.solarOffsetKWh - breakdown.unmetHeatKWh,
      estimate.total.energyKWh,
      1e-9,
    );
    expect(breakdown.deliveredKWh).toBe(estimate.total.energyKWh);
    expect(breakdown.solarOffsetKWh).toBe(estimate.solarOffsetKWh);
    expect(sum(breakdown.parts.map((part) => part.share))).toBeCloseTo(1, 12);
    const sky = breakdown.parts.find((part) => part.key === 'sky')!;
    expect(sky.energyKWh).toBe(breakdown.skyKWh);
    expect(sky.energyKWh).toBeGreaterThan(0);
    // the roof (double poly, U 3.97 on 295.5 m²) loses more than the endwalls (twin-wall, U 3.49 on 61.2 m²)
    const part = (key: string) => breakdown.parts.find((p) => p.key === key)!.energyKWh;
    expectRelativelyClose(part('roof') / part('endwalls'), 1172.999 / 213.588, 1e-6);
  });

  it('an IR-blocking inner film, glass or polycarbonate loses less to the sky than single poly', () => {
    // coverings.json: τ_IR single poly 0.55, IR double 0.19, glass 0.04, twin-wall 0.04; outer emissivities 0.4, 0.4, 0.84, 0.9
    const skyOf = (coveringId: string) =>
      estimateSeason(
        demoSeasonInput({
          house: singlePoly({ coverings: { roof: coveringId, sidewalls: coveringId, endwalls: coveringId } }),
        }),
        ref,
        sunCache,
      ).lossBreakdown.skyKWh;
    const poly = skyOf('poly-single');
    for (const other of ['poly-double-inflated', 'poly-double-ir-inner', 'glass-single', 'polycarbonate-twin-8mm']) {
      expect(skyOf(other)).toBeLessThan(poly);
    }
    expect(skyOf('poly-double-ir-inner')).toBeLessThan(skyOf('poly-double-inflated'));
    expect(skyOf('foam-board-50mm')).toBeLessThan(skyOf('glass-single'));
  });

  const SEED = 20_261_203;
  it(`a clearer sky never lowers the sky loss or the night heat of an IR-transparent film (property, fast-check seed ${SEED})`, () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 12, maxLength: 12 }),
        fc.array(fc.double({ min: 0, max: 1, noNaN: true }), { minLength: 12, maxLength: 12 }),
        fc.double({ min: -30, max: 10, noNaN: true }),
        fc.double({ min: 0, max: 15, noNaN: true }),
        (a, b, minC, rangeK) => {
          const climate = (clearness: number[]): SiteClimate => ({
            ...demoClimate(),
            monthly: clearness.map((value, index) => ({
              month: index + 1,
              meanDailyMinC: minC,
              meanDailyMaxC: minC + rangeK,
              clearness: value,
            })),
          });
          const run = (clearness: number[]) =>
            estimateSeason(
              demoSeasonInput({
                house: singlePoly(),
                climate: climate(clearness),
                season: { startDate: '2026-01-01', endDate: '2026-02-28' },
              }),
              ref,
              sunCache,
            );
          const clearer = run(a.map((value, index) => Math.max(value, b[index])));
          const cloudier = run(a.map((value, index) => Math.min(value, b[index])));
          const nightHeat = (estimate: ReturnType<typeof run>) => estimate.nightShareOfHeat * estimate.total.energyKWh;
          expect(clearer.lossBreakdown.skyKWh).toBeGreaterThanOrEqual(cloudier.lossBreakdown.skyKWh * (1 - 1e-12));
          expect(nightHeat(clearer)).toBeGreaterThanOrEqual(nightHeat(cloudier) * (1 - 1e-12));
        },
      ),
      { seed: SEED, numRuns: 40 },
    );
  });

  it('a heat-loss factor scales the sky loss with the rest, and a monthly dew point from the climate is used and said', () => {
    // constant −2 °C, no sun: every hour loses heat, so the whole season scales with the factor
    const input = demoSeasonInput({
      climate: constantClimate(-2),
      season: { startDate: '2026-01-01', endDate: '2026-01-31' },
    });
    const handbook = estimateSeason(input, ref, sunCache);
    const fitted = estimateSeason({ ...input, heatLossFactor: 1.5 }, ref, sunCache);
    expectRelativelyClose(fitted.lossBreakdown.skyKWh, 1.5 * handbook.lossBreakdown.skyKWh, 1e-9);
    expectRelativelyClose(fitted.total.energyKWh, 1.5 * handbook.total.energyKWh, 1e-9);

    // the climate's dew point −12 °C in January (drier than the −2 °C daily minimum): a colder sky, more loss.
    // Overcast (clearness 0): deficit ratio (1 − 1.154 ε(−12)) / (1 − 1.154 ε(−2)) with ε(−12) = 0.654312 and
    // ε(−2) = 0.711 − 0.0112 + 0.000292 = 0.700092: (1 − 0.755076) / (1 − 0.807906) = 0.244924 / 0.192094 = 1.27502
    const dry = constantClimate(-2);
    dry.monthly[0].meanDewPointC = -12;
    const withDewPoint = estimateSeason({ ...input, climate: dry }, ref, sunCache);
    expectRelativelyClose(withDewPoint.lossBreakdown.skyKWh / handbook.lossBreakdown.skyKWh, 1.27502, 1e-5);
    const said = (estimate: typeof handbook) => estimate.assumptions.find((a) => a.key === 'sky-dew-point')!;
    expect(said(withDewPoint)).toMatchObject({ source: 'the farm’s climate', overridden: true });
    expect(said(withDewPoint).value).toMatch(/^-12\.0 – /);
    expect(said(handbook)).toMatchObject({ value: 0, unit: 'K', confidence: 'memory', overridden: false });
    expect(said(handbook).source).toMatch(/FAO Irrigation and Drainage Paper 56/);
    const cloud = handbook.assumptions.find((a) => a.key === 'sky-cloud-cover')!;
    expect(cloud.value).toBe(new Array(12).fill('10.0').join(' '));
    expect(cloud.source).toMatch(/Kasten/);
    expect(handbook.assumptions.find((a) => a.key === 'sky-roof-ir-transmittance')).toMatchObject({ value: 0.3 });

    // a dew point above the month's mean daily maximum is refused, naming the field
    const wrong = constantClimate(-2);
    wrong.monthly[3].meanDewPointC = 5;
    expect(fieldOf(() => estimateSeason({ ...input, climate: wrong }, ref, sunCache))).toBe(
      'climate.monthly[3].meanDewPointC',
    );
  });
});
