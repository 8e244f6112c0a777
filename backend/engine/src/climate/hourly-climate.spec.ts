import psychrolib = require('psychrolib');
import { EngineInputError } from '../errors';
import { clearSkyIrradiance, sunPosition } from '../solar';
import { loadReferenceData } from '../testing/reference-data';
import { climateFromHourlyWeather, type HourlyWeatherSpan } from './hourly-climate';

const ref = loadReferenceData();
const HOUR = 3_600_000;
const site = { latitudeDeg: 45.55, longitudeDeg: -94.16, elevationM: 320, utcOffsetHours: -6 };

/** Hours of a local-standard calendar year, starting at local midnight of 1 January. */
function yearStart(year: number, utcOffsetHours: number): number {
  return Date.UTC(year, 0, 1) - utcOffsetHours * HOUR;
}

/**
 * A year whose hourly dry bulbs are a uniform grid on [a, b] in a scrambled order: the share of
 * hours below any t in [a, b] is (t − a)/(b − a), so the p-quantile is a + p·(b − a) in closed form.
 */
function uniformYear(year: number, a: number, b: number): HourlyWeatherSpan {
  const n = 8760;
  const values = new Array<number>(n);
  // 7919 is prime and does not divide 8760: i → 7919·i mod n is a permutation of the hours.
  for (let i = 0; i < n; i++) values[(i * 7919) % n] = a + ((b - a) * (i + 0.5)) / n;
  return { year, startUtcMs: yearStart(year, 0), dryBulbC: values };
}

/** Every local day: T = mean(month) + A·cos(2π(h − 15)/24), so daily max = mean + A, min = mean − A. */
function cosineYear(
  year: number,
  amplitudeK: number,
  meanByMonth: number[],
  clearnessByMonth?: number[],
): HourlyWeatherSpan {
  const start = yearStart(year, site.utcOffsetHours);
  const hours = (Date.UTC(year + 1, 0, 1) - Date.UTC(year, 0, 1)) / HOUR;
  const dryBulbC: number[] = [];
  const dewPointC: number[] = [];
  const ghi: number[] = [];
  for (let i = 0; i < hours; i++) {
    const local = new Date(Date.UTC(year, 0, 1) + i * HOUR);
    const month = local.getUTCMonth() + 1;
    const hourOfDay = local.getUTCHours();
    const t = meanByMonth[month - 1]! + amplitudeK * Math.cos((2 * Math.PI * (hourOfDay - 15)) / 24);
    dryBulbC.push(t);
    dewPointC.push(t - 8);
    if (clearnessByMonth) {
      const altitude = sunPosition(
        new Date(start + i * HOUR + HOUR / 2),
        site.latitudeDeg,
        site.longitudeDeg,
      ).altitudeDeg;
      ghi.push(
        altitude > 0
          ? clearnessByMonth[month - 1]! * clearSkyIrradiance(altitude, month, ref).globalHorizontalWPerM2
          : 0,
      );
    }
  }
  return { year, startUtcMs: start, dryBulbC, dewPointC, globalHorizontalWPerM2: clearnessByMonth ? ghi : undefined };
}

const MEANS = [-12, -9, -2, 7, 14, 19, 22, 20, 15, 8, -1, -9];

describe('climateFromHourlyWeather: design temperatures (ASHRAE Fundamentals ch. 14 definitions)', () => {
  it('matches the closed-form quantiles of a uniform year within one grid step', () => {
    // Uniform on [−30, 35] °C: 99.6 % at or above → a + 0.004(b − a) = −29.74 °C; 99 % → −29.35 °C;
    // 0.4 % at or above → b − 0.004(b − a) = 34.74 °C; 1 % → 34.35 °C. Grid step (b − a)/8760 ≈ 0.0074 K.
    const result = climateFromHourlyWeather([uniformYear(2021, -30, 35)], { ...site, utcOffsetHours: 0 }, ref);
    const step = 65 / 8760;
    expect(Math.abs(result.winterDesign996C - -29.74)).toBeLessThanOrEqual(step);
    expect(Math.abs(result.winterDesign99C - -29.35)).toBeLessThanOrEqual(step);
    expect(Math.abs(result.summerDesign04C - 34.74)).toBeLessThanOrEqual(step);
    expect(Math.abs(result.summerDesign1C - 34.35)).toBeLessThanOrEqual(step);
  });

  it('keeps the definition: at least 99.6 % of the hours are at or above the heating design value', () => {
    const span = uniformYear(2021, -30, 35);
    const result = climateFromHourlyWeather([span], { ...site, utcOffsetHours: 0 }, ref);
    const values = Array.from(span.dryBulbC as number[]);
    const atOrAbove = values.filter((t) => t >= result.winterDesign996C).length / values.length;
    expect(atOrAbove).toBeGreaterThanOrEqual(0.996);
    const hotAtOrAbove = values.filter((t) => t >= result.summerDesign04C).length / values.length;
    expect(hotAtOrAbove).toBeGreaterThanOrEqual(0.004);
    expect(hotAtOrAbove).toBeLessThan(0.0045);
  });

  it('takes the mean coincident wet bulb from psychrolib at the design dry bulb', () => {
    // Every hour's dew point is 8 K below its dry bulb: at the 0.4 % dry bulb the wet bulb is
    // psychrolib's wet bulb of (T, T − 8) at the site's standard-atmosphere pressure.
    const result = climateFromHourlyWeather([cosineYear(2022, 6, MEANS)], site, ref);
    psychrolib.SetUnitSystem(psychrolib.SI);
    const pressure = psychrolib.GetStandardAtmPressure(site.elevationM);
    const t = result.summerDesign04C;
    const expected = psychrolib.GetTWetBulbFromTDewPoint(t, t - 8, pressure);
    // The ±0.5 K band averages wet bulbs of dry bulbs near t: the slope dTwb/dT is below 1.
    expect(Math.abs(result.summerCoincidentWetBulb04C! - expected)).toBeLessThan(0.5);
  });
});

describe('climateFromHourlyWeather: monthly normals and daily range', () => {
  it('recovers each month mean daily minimum and maximum of a cosine day exactly', () => {
    const result = climateFromHourlyWeather([cosineYear(2022, 6, MEANS)], site, ref);
    result.monthly.forEach((row, index) => {
      expect(row.meanDailyMaxC).toBeCloseTo(MEANS[index]! + 6, 9);
      expect(row.meanDailyMinC).toBeCloseTo(MEANS[index]! - 6, 9);
    });
    expect(result.summerDailyRangeK).toBeCloseTo(12, 9);
    expect(result.monthly[0]!.dayCount).toBe(31);
    expect(result.monthly[1]!.dayCount).toBe(28);
  });

  it('measures clearness against the engine clear-sky model (ASHRAE clear-sky coefficients)', () => {
    const clearness = [0.45, 0.5, 0.55, 0.6, 0.62, 0.65, 0.7, 0.68, 0.6, 0.5, 0.4, 0.38];
    const result = climateFromHourlyWeather([cosineYear(2022, 6, MEANS, clearness)], site, ref);
    result.monthly.forEach((row, index) => expect(row.clearness).toBeCloseTo(clearness[index]!, 9));
  });

  it('gives no clearness and no wet bulb where the hours carry no radiation or dew point', () => {
    const span = cosineYear(2022, 6, MEANS);
    const result = climateFromHourlyWeather([{ ...span, dewPointC: undefined }], site, ref);
    expect(result.monthly.every((row) => row.clearness === null)).toBe(true);
    expect(result.summerCoincidentWetBulb04C).toBeNull();
  });
});

describe('climateFromHourlyWeather: gaps', () => {
  it('leaves out and names a year with more than 10 % of its hours missing', () => {
    const good = cosineYear(2021, 6, MEANS);
    const gappy = cosineYear(2022, 6, MEANS);
    const values = Array.from(gappy.dryBulbC as number[]) as (number | null)[];
    for (let i = 0; i < 1000; i++) values[i * 8] = null; // 1000 of 8760 hours = 11.4 %
    const result = climateFromHourlyWeather([good, { ...gappy, dryBulbC: values }], site, ref);
    expect(result.spansUsed.map((s) => s.year)).toEqual([2021]);
    expect(result.spansLeftOut).toHaveLength(1);
    expect(result.spansLeftOut[0]!.year).toBe(2022);
    expect(result.spansLeftOut[0]!.missingHourCount).toBe(1000);
    expect(result.spansLeftOut[0]!.reason).toMatch(/11\.4 %/);
  });

  it('counts the gaps of a year it keeps', () => {
    const span = cosineYear(2022, 6, MEANS);
    const values = Array.from(span.dryBulbC as number[]) as number[];
    for (let i = 0; i < 100; i++) values[i * 50] = Number.NaN;
    const result = climateFromHourlyWeather([{ ...span, dryBulbC: values }], site, ref);
    expect(result.spansUsed[0]!.missingHourCount).toBe(100);
    expect(result.hoursUsed).toBe(8760 - 100);
  });

  it('refuses when every year is too gappy, naming the field', () => {
    const span = cosineYear(2022, 6, MEANS);
    const values = new Array<number>(8760).fill(Number.NaN);
    expect(() => climateFromHourlyWeather([{ ...span, dryBulbC: values }], site, ref)).toThrow(EngineInputError);
    expect(() => climateFromHourlyWeather([], site, ref)).toThrow(/no hours/);
  });
});
