import fc from 'fast-check';
import { expectRelativelyClose } from '../testing/relative-tolerance';
import { simulateSeason, type SeasonHours, type SimulationParameters } from './season-simulation';

/** One day of hand-made hours: 0 °C all day, daylight 08:00–16:00 with a half-daylight hour at 07:00. */
function oneDay(irradianceWPerM2: number): SeasonHours {
  const dayFraction = new Float64Array(24);
  const irradiance = new Float64Array(24);
  for (let hour = 8; hour < 16; hour++) {
    dayFraction[hour] = 1;
    irradiance[hour] = irradianceWPerM2;
  }
  dayFraction[7] = 0.5;
  return {
    firstDayNumber: 0,
    dayCount: 1,
    hourCount: 24,
    outdoorC: new Float64Array(24).fill(0),
    dayFraction,
    sunriseHourOfDay: new Float64Array([7.5, 7.5, 7.5]),
    sunsetHourOfDay: new Float64Array([16, 16, 16]),
    clearSkyGlobalHorizontalWPerM2: irradiance,
    clearnessOfDay: new Float64Array([0.5]),
    monthSlotOfDay: new Uint8Array([0]),
    months: [{ year: 1970, month: 1 }],
    dailyMinC: new Float64Array([0]),
    dailyMaxC: new Float64Array([0]),
    skyDeficitWPerM2: new Float64Array(24),
    cloudCoverTenthsOfDay: new Float64Array([10]),
  };
}

function parameters(overrides: Partial<SimulationParameters> = {}): SimulationParameters {
  return {
    uaDayWPerK: 100,
    uaNightWPerK: 60,
    skyNightM2: 0,
    solarGainAreaM2: 0,
    daySetpointC: new Float64Array([20]),
    nightSetpointC: new Float64Array([10]),
    heaterOutputW: Infinity,
    ...overrides,
  };
}

describe('hourly season simulation', () => {
  it('switches setpoint and curtain UA at sunrise and sunset, splitting the sunrise hour', () => {
    const result = simulateSeason(oneDay(0), parameters());
    // 8.5 day hours at 100 W/K × 20 K, 15.5 night hours at 60 W/K × 10 K
    expect(result.totalHeatWh).toBeCloseTo(8.5 * 2000 + 15.5 * 600, 9);
    expect(result.nightHeatWh).toBeCloseTo(15.5 * 600, 9);
    expect(result.peakW).toBe(2000);
    expect(result.peakHourIndex).toBe(8);
    expect(result.heatingHours).toBe(24);
  });

  it('lets sunlight offset daytime loss but never turns it into negative heat', () => {
    // gain = 1000 W/m² × clearness 0.5 × 5 m² = 2500 W > 2000 W loss
    const result = simulateSeason(oneDay(1000), parameters({ solarGainAreaM2: 5 }));
    expect(result.totalHeatWh).toBeCloseTo(0.5 * 2000 + 15.5 * 600, 9);
    expect(result.solarOffsetWh).toBeCloseTo(8 * 2000, 9);
    expect(result.heatingHours).toBe(16);
  });

  it('skips unheated days', () => {
    const result = simulateSeason(
      oneDay(0),
      parameters({ daySetpointC: new Float64Array([NaN]), nightSetpointC: new Float64Array([NaN]) }),
    );
    expect(result.totalHeatWh).toBe(0);
    expect(result.peakHourIndex).toBe(-1);
  });
});

describe('hourly season simulation with a shade cloth', () => {
  /** Two hand-made days, one in June (slot 0) and one in July (slot 1), the same hours as `oneDay`. */
  function juneAndJuly(irradianceWPerM2: number): SeasonHours {
    const day = oneDay(irradianceWPerM2);
    const twice = (a: Float64Array) => {
      const both = new Float64Array(a.length * 2);
      both.set(a);
      both.set(a, a.length);
      return both;
    };
    return {
      ...day,
      dayCount: 2,
      hourCount: 48,
      outdoorC: twice(day.outdoorC),
      dayFraction: twice(day.dayFraction),
      clearSkyGlobalHorizontalWPerM2: twice(day.clearSkyGlobalHorizontalWPerM2),
      skyDeficitWPerM2: twice(day.skyDeficitWPerM2),
      clearnessOfDay: new Float64Array([0.5, 0.5]),
      monthSlotOfDay: new Uint8Array([0, 1]),
      months: [
        { year: 2026, month: 6 },
        { year: 2026, month: 7 },
      ],
      dailyMinC: new Float64Array([0, 0]),
      dailyMaxC: new Float64Array([0, 0]),
    };
  }
  const twoDays = { daySetpointC: new Float64Array([20, 20]), nightSetpointC: new Float64Array([10, 10]) };

  it('a 50 % cloth in July only halves the July gain: 1000 W/m² × 0.5 clearness × 2 m² × 0.5 = 500 W', () => {
    const shade = new Array(12).fill(1);
    shade[6] = 0.5; // July
    const hours = juneAndJuly(1000);
    const result = simulateSeason(hours, parameters({ ...twoDays, solarGainAreaM2: 2, solarShadeByMonth: shade }));
    // June: gain 1000 W against a 2000 W loss → 1000 W of heat for 8 h; July: 500 W → 1500 W for 8 h;
    // both days: 0.5 h × 2000 W at the sunrise hour (no sun yet) and 15.5 h × 600 W at night
    const night = 0.5 * 2000 + 15.5 * 600;
    expect(result.monthlyHeatWh[0]).toBeCloseTo(8 * 1000 + night, 9);
    expect(result.monthlyHeatWh[1]).toBeCloseTo(8 * 1500 + night, 9);
    expect(result.solarOffsetWh).toBeCloseTo(8 * 1000 + 8 * 500, 9);
    // without shade both days are June's
    const open = simulateSeason(hours, parameters({ ...twoDays, solarGainAreaM2: 2 }));
    expect(open.monthlyHeatWh[1]).toBeCloseTo(8 * 1000 + night, 9);
  });

  it('shade never adds heat from the sun, whatever share it is given (fast-check, seeded)', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -1, max: 2, noNaN: true }), { minLength: 12, maxLength: 12 }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        (shade, irradiance) => {
          const hours = juneAndJuly(irradiance);
          const open = simulateSeason(hours, parameters({ ...twoDays, solarGainAreaM2: 3 }));
          const shaded = simulateSeason(
            hours,
            parameters({ ...twoDays, solarGainAreaM2: 3, solarShadeByMonth: shade }),
          );
          expect(shaded.solarOffsetWh).toBeLessThanOrEqual(open.solarOffsetWh + 1e-9);
          expect(shaded.totalHeatWh).toBeGreaterThanOrEqual(open.totalHeatWh - 1e-9);
        },
      ),
      { seed: 20261202, numRuns: 100 },
    );
  });
});

describe('hourly season simulation with the night sky', () => {
  it('adds coupling × sky deficit to each night share, and sums the parts for the breakdown', () => {
    const hours = oneDay(0);
    hours.skyDeficitWPerM2.fill(50); // W/m² in every hour; only night shares may use it
    const result = simulateSeason(hours, parameters({ skyNightM2: 2 }));
    // by night 60 W/K × 10 K + 2 m² × 50 W/m² = 700 W over 15.5 night-share hours; by day 100 W/K × 20 K over 8.5 h
    expect(result.totalHeatWh).toBeCloseTo(8.5 * 2000 + 15.5 * 700, 9);
    expect(result.nightHeatWh).toBeCloseTo(15.5 * 700, 9);
    expect(result.skyWh).toBeCloseTo(15.5 * 100, 9);
    expect(result.dayDegreeHoursKh).toBeCloseTo(8.5 * 20, 9);
    expect(result.nightDegreeHoursKh).toBeCloseTo(15.5 * 10, 9);
    // delivered = UA_day × day degree-hours + UA_night × night degree-hours + sky − sun − unmet
    expect(100 * result.dayDegreeHoursKh + 60 * result.nightDegreeHoursKh + result.skyWh).toBeCloseTo(
      result.totalHeatWh,
      9,
    );
  });

  it('a clear sky can make a night above the setpoint need heat; the envelope then gains', () => {
    const hours = oneDay(0);
    hours.outdoorC.fill(12); // 2 K above the 10 °C night setpoint
    // 60 W/K × (10 − 12) K = −120 W; a 50 W/m² deficit on 2 m² adds only 100 W: no heat
    hours.skyDeficitWPerM2.fill(50);
    const calm = simulateSeason(hours, parameters({ skyNightM2: 2, daySetpointC: new Float64Array([10]) }));
    expect(calm.nightHeatWh).toBe(0);
    // 100 W/m² on 2 m² = 200 W: 80 W in each of the 15.5 night-share hours
    hours.skyDeficitWPerM2.fill(100);
    const clear = simulateSeason(hours, parameters({ skyNightM2: 2, daySetpointC: new Float64Array([10]) }));
    expect(clear.nightHeatWh).toBeCloseTo(15.5 * 80, 9);
    expect(clear.skyWh).toBeCloseTo(15.5 * 200, 9);
    expect(clear.nightDegreeHoursKh).toBeCloseTo(15.5 * -2, 9);
  });
});

describe('hourly season simulation with the heaters’ output as a limit', () => {
  it('delivers at most the installed output in each part of the hour; the rest is unmet', () => {
    // demand: 8.5 h at 2000 W by day, 15.5 h at 600 W by night; heaters give 500 W
    const capped = simulateSeason(oneDay(0), parameters({ heaterOutputW: 500 }));
    expect(capped.totalHeatWh).toBeCloseTo(24 * 500, 9);
    expect(capped.unmetHeatWh).toBeCloseTo(8.5 * 1500 + 15.5 * 100, 9);
    expect(capped.hoursBelowSetpoint).toBe(24);
    expect(capped.monthlyHoursBelowSetpoint[0]).toBe(24);
    expect(capped.monthlyUnmetHeatWh[0]).toBeCloseTo(capped.unmetHeatWh, 9);
    // the peak stays the demand the house had
    expect(capped.peakW).toBe(2000);
    // 1000 W hold the night (600 W) but not the day (2000 W): 8 day hours and the split sunrise hour
    const dayShort = simulateSeason(oneDay(0), parameters({ heaterOutputW: 1000 }));
    expect(dayShort.hoursBelowSetpoint).toBe(9);
    expect(dayShort.nightHeatWh).toBeCloseTo(15.5 * 600, 9);
  });

  it('without heaters nothing is delivered and every heated hour is below the setpoint', () => {
    const none = simulateSeason(oneDay(0), parameters({ heaterOutputW: 0 }));
    const uncapped = simulateSeason(oneDay(0), parameters());
    expect(none.totalHeatWh).toBe(0);
    expect(none.unmetHeatWh).toBeCloseTo(uncapped.totalHeatWh, 9);
    expect(none.hoursBelowSetpoint).toBe(uncapped.heatingHours);
  });

  it('properties: unmet ≥ 0, delivered ≤ output × heating hours, delivered + unmet = the uncapped demand; ample heaters change nothing', () => {
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -30, max: 25, noNaN: true }), { minLength: 24, maxLength: 24 }),
        fc.double({ min: 0, max: 5000, noNaN: true }),
        fc.double({ min: 0, max: 2000, noNaN: true }),
        (temperatures, heaterOutputW, irradiance) => {
          const hours = oneDay(irradiance);
          hours.outdoorC = Float64Array.from(temperatures);
          const params = parameters({ solarGainAreaM2: 2 });
          const uncapped = simulateSeason(hours, params);
          const capped = simulateSeason(hours, { ...params, heaterOutputW });
          expect(capped.unmetHeatWh).toBeGreaterThanOrEqual(0);
          expect(capped.totalHeatWh).toBeLessThanOrEqual(heaterOutputW * capped.heatingHours + 1e-9);
          expectRelativelyClose(capped.totalHeatWh + capped.unmetHeatWh, uncapped.totalHeatWh, 1e-9);
          expect(capped.hoursBelowSetpoint).toBeLessThanOrEqual(capped.heatingHours);
          expect(capped.hoursBelowSetpoint > 0).toBe(capped.unmetHeatWh > 0);
          const ample = simulateSeason(hours, {
            ...params,
            heaterOutputW: uncapped.peakW / Math.min(...hours.dayFraction.map((f) => Math.max(f, 1 - f))) + 1,
          });
          expect(ample).toEqual(uncapped);
        },
      ),
    );
  });
});
