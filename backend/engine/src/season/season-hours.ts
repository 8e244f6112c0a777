import { EngineInputError } from '../errors';
import type { ReferenceData } from '../reference-data.types';
import { civilDate, dayNumber, isoDate, MS_PER_HOUR, parseIsoDate } from '../climate/calendar-days';
import {
  dailyExtremesFromNormals,
  hourlyTemperaturesC,
  peakHoursAfterSolarNoon,
  type DailyCurveDays,
} from '../climate/daily-temperature-curve';
import type { SiteClimate } from '../climate/site-climate';
import { skyConstants } from '../heating/sky-radiation';
import type { MonthSlot, SeasonHours } from './season-simulation';
import { nightSky } from './season-sky';
import { type SunCache, type SunHours, type SunSite } from './sun-hours';

/** One logged outdoor temperature (the shape the temperature-log parser returns). */
export interface TemperatureReading {
  /**
   * 'YYYY-MM-DDTHH:MM[:SS]' for hourly logs or 'YYYY-MM-DD' for daily ones. Without a zone
   * designator the time is the farm's local standard time; with 'Z' or ±HH:MM it is converted.
   */
  at: string;
  temperatureC: number;
  /** daily logs may carry the day's minimum and maximum */
  minC?: number;
  maxC?: number;
}

export interface LoggedTemperatures {
  readings: TemperatureReading[];
  resolution: 'hourly' | 'daily';
}

export interface SeasonRange {
  /** 'YYYY-MM-DD', first day (inclusive) */
  startDate: string;
  /** 'YYYY-MM-DD', last day (inclusive) */
  endDate: string;
}

/** Longest range one estimate covers: a full (leap) year. */
export const MAX_SEASON_DAYS = 366;
/** Gaps in an hourly log up to this long are bridged by straight-line interpolation. */
export const MAX_INTERPOLATED_GAP_HOURS = 6;
/** Missing days in a daily log up to this many in a row are interpolated. */
export const MAX_INTERPOLATED_GAP_DAYS = 2;

export function validateSeasonRange(
  range: SeasonRange,
  field = 'season',
): { firstDayNumber: number; dayCount: number } {
  if (!range || typeof range !== 'object') throw new EngineInputError(field, `${field} is required`);
  const start = parseIsoDate(range.startDate);
  if (!start) throw new EngineInputError(`${field}.startDate`, 'the start date must be a date written YYYY-MM-DD');
  const end = parseIsoDate(range.endDate);
  if (!end) throw new EngineInputError(`${field}.endDate`, 'the end date must be a date written YYYY-MM-DD');
  if (start.year < 1900 || start.year > 2200) {
    throw new EngineInputError(`${field}.startDate`, 'the start date must fall between 1900 and 2200');
  }
  const firstDayNumber = dayNumber(start.year, start.month, start.day);
  const lastDayNumber = dayNumber(end.year, end.month, end.day);
  if (lastDayNumber < firstDayNumber) {
    throw new EngineInputError(`${field}.endDate`, 'the end date must not come before the start date');
  }
  const dayCount = lastDayNumber - firstDayNumber + 1;
  if (dayCount > MAX_SEASON_DAYS) {
    throw new EngineInputError(`${field}.endDate`, `a season covers at most ${MAX_SEASON_DAYS} days`);
  }
  return { firstDayNumber, dayCount };
}

/** Hours since 1970-01-01T00:00 of the farm's local standard time, or null if `at` is not an ISO time. */
export function localHourNumber(at: string, utcOffsetHours: number): number | null {
  const match = /^(\d{4})-(\d{2})-(\d{2})(?:[T ](\d{2}):(\d{2})(?::(\d{2})(?:\.\d+)?)?)?\s*(Z|[+-]\d{2}:?\d{2})?$/.exec(
    typeof at === 'string' ? at.trim() : '',
  );
  if (!match) return null;
  const [, y, mo, d, h, mi, s, zone] = match;
  let ms = Date.UTC(Number(y), Number(mo) - 1, Number(d), Number(h ?? 0), Number(mi ?? 0), Number(s ?? 0));
  if (Number.isNaN(ms)) return null;
  if (zone) {
    const zoneOffsetHours =
      zone === 'Z' ? 0 : (zone[0] === '-' ? -1 : 1) * (Number(zone.slice(1, 3)) + Number(zone.slice(-2)) / 60);
    ms += (utcOffsetHours - zoneOffsetHours) * MS_PER_HOUR;
  }
  return ms / MS_PER_HOUR;
}

interface SunDayLookup {
  sun: SunHours;
  index: number;
}

/** The site-year sun record and its day index (0 … dayCount + 1) for each day of the range and its two neighbours. */
function sunDays(
  site: SunSite,
  firstDayNumber: number,
  dayCount: number,
  ref: ReferenceData,
  cache: SunCache,
): SunDayLookup[] {
  const lookups: SunDayLookup[] = [];
  for (let k = -1; k <= dayCount; k++) {
    const inner = Math.min(Math.max(k, 0), dayCount - 1);
    const year = civilDate(firstDayNumber + inner).year;
    const sun = cache.get(site, year, ref);
    lookups.push({ sun, index: firstDayNumber + k - dayNumber(year, 1, 1) + 1 });
  }
  return lookups;
}

export interface BuildSeasonHoursInput {
  site: SunSite;
  range: SeasonRange;
  /** climate normals, or logged temperatures covering the range */
  climate: SiteClimate | LoggedTemperatures;
  /** clearness by month, index 0 = January */
  clearnessByMonth: number[];
  /** the climate's dew point by month, index 0 = January (null where it gives none); absent: none */
  dewPointCByMonth?: ReadonlyArray<number | null> | null;
}

export function isLoggedTemperatures(climate: SiteClimate | LoggedTemperatures): climate is LoggedTemperatures {
  return Array.isArray((climate as LoggedTemperatures).readings);
}

/** Lays out the hours of a range: outdoor temperature, sun, clearness, night sky and month of each hour. */
export function buildSeasonHours(input: BuildSeasonHoursInput, ref: ReferenceData, cache: SunCache): SeasonHours {
  const { firstDayNumber, dayCount } = validateSeasonRange(input.range);
  const hourCount = dayCount * 24;
  const lookups = sunDays(input.site, firstDayNumber, dayCount, ref, cache);

  const dayFraction = new Float64Array(hourCount);
  const irradiance = new Float64Array(hourCount);
  const clearnessOfDay = new Float64Array(dayCount);
  const monthSlotOfDay = new Uint8Array(dayCount);
  const sunriseHourOfDay = new Float64Array(dayCount + 2);
  const sunsetHourOfDay = new Float64Array(dayCount + 2);
  lookups.forEach(({ sun, index }, k) => {
    sunriseHourOfDay[k] = sun.sunriseHour[index];
    sunsetHourOfDay[k] = sun.sunsetHour[index];
  });
  const monthOfDay = new Uint8Array(dayCount);
  const months: MonthSlot[] = [];
  for (let day = 0; day < dayCount; day++) {
    const { sun, index } = lookups[day + 1];
    const sourceHour = (index - 1) * 24;
    dayFraction.set(sun.dayFraction.subarray(sourceHour, sourceHour + 24), day * 24);
    irradiance.set(sun.clearSkyGlobalHorizontalWPerM2.subarray(sourceHour, sourceHour + 24), day * 24);
    const month = sun.monthOfDay[index - 1];
    monthOfDay[day] = month;
    clearnessOfDay[day] = input.clearnessByMonth[month - 1];
    const last = months[months.length - 1];
    if (!last || last.month !== month || last.year !== sun.year) months.push({ year: sun.year, month });
    monthSlotOfDay[day] = months.length - 1;
  }

  const curve = curveDays(lookups, firstDayNumber, dayCount, ref);
  let outdoorC: Float64Array;
  let dailyMinC: Float64Array;
  let dailyMaxC: Float64Array;
  if (isLoggedTemperatures(input.climate)) {
    if (input.climate.resolution === 'daily') {
      fillCurveFromDailyReadings(curve, input.climate.readings, input.site.utcOffsetHours);
      outdoorC = hourlyTemperaturesC(curve);
      dailyMinC = curve.minC.slice(1, dayCount + 1);
      dailyMaxC = curve.maxC.slice(1, dayCount + 1);
    } else {
      outdoorC = hourlyFromReadings(input.climate.readings, input.site.utcOffsetHours, firstDayNumber, hourCount);
      ({ dailyMinC, dailyMaxC } = dailyExtremesOfHours(outdoorC, dayCount));
    }
  } else {
    const { minC, maxC } = dailyExtremesFromNormals(input.climate, firstDayNumber, dayCount);
    curve.minC = minC;
    curve.maxC = maxC;
    outdoorC = hourlyTemperaturesC(curve);
    dailyMinC = minC.slice(1, dayCount + 1);
    dailyMaxC = maxC.slice(1, dayCount + 1);
  }

  const sky = nightSky(
    { outdoorC, dayFraction, dailyMinC, clearnessOfDay, monthOfDay, dewPointCByMonth: input.dewPointCByMonth ?? null },
    skyConstants(ref),
  );

  return {
    firstDayNumber,
    dayCount,
    hourCount,
    outdoorC,
    dayFraction,
    sunriseHourOfDay,
    sunsetHourOfDay,
    clearSkyGlobalHorizontalWPerM2: irradiance,
    clearnessOfDay,
    monthSlotOfDay,
    months,
    dailyMinC,
    dailyMaxC,
    skyDeficitWPerM2: sky.deficitWPerM2,
    cloudCoverTenthsOfDay: sky.cloudCoverTenthsOfDay,
  };
}

/** Sunrise and peak hours of each day (plus neighbours) for the daily temperature curve. */
function curveDays(
  lookups: SunDayLookup[],
  firstDayNumber: number,
  dayCount: number,
  ref: ReferenceData,
): DailyCurveDays {
  const hoursAfterNoon = peakHoursAfterSolarNoon(ref);
  const sunriseHour = new Float64Array(dayCount + 2);
  const peakHour = new Float64Array(dayCount + 2);
  lookups.forEach(({ sun, index }, k) => {
    const noon = sun.solarNoonHour[index];
    // Where the sun neither rises nor sets, place the minimum six hours before solar noon.
    const sunrise = sun.noSunriseOrSunset[index] ? noon - 6 : sun.sunriseHour[index];
    sunriseHour[k] = sunrise;
    peakHour[k] = Math.max(noon + hoursAfterNoon, sunrise + 1);
  });
  return {
    firstDayNumber,
    dayCount,
    minC: new Float64Array(dayCount + 2),
    maxC: new Float64Array(dayCount + 2),
    sunriseHour,
    peakHour,
  };
}

function readingsCoverError(message: string): EngineInputError {
  return new EngineInputError('climate.readings', message);
}

/** Daily minima/maxima from a daily log (a day with only a mean is flat), gaps of ≤ 2 days interpolated. */
function fillCurveFromDailyReadings(
  curve: DailyCurveDays,
  readings: TemperatureReading[],
  utcOffsetHours: number,
): void {
  const byDay = new Map<number, { minC: number; maxC: number }>();
  for (const reading of readings) {
    const hourNumber = localHourNumber(reading.at, utcOffsetHours);
    if (hourNumber === null) throw readingsCoverError(`reading time '${reading.at}' is not an ISO date`);
    const minC = typeof reading.minC === 'number' ? reading.minC : reading.temperatureC;
    const maxC = typeof reading.maxC === 'number' ? reading.maxC : reading.temperatureC;
    byDay.set(Math.floor(hourNumber / 24), { minC: Math.min(minC, maxC), maxC: Math.max(minC, maxC) });
  }
  const known = [...byDay.keys()].sort((a, b) => a - b);
  if (known.length === 0) throw readingsCoverError('the temperature log holds no readings');
  const first = curve.firstDayNumber;
  const last = first + curve.dayCount - 1;
  if (known[0] > first || known[known.length - 1] < last) {
    throw readingsCoverError(
      `the log runs ${isoDate(civilDate(known[0]))} to ${isoDate(civilDate(known[known.length - 1]))}; the season needs ${isoDate(civilDate(first))} to ${isoDate(civilDate(last))}`,
    );
  }
  let cursor = 0;
  for (let k = 0; k < curve.dayCount + 2; k++) {
    const day = Math.min(Math.max(first - 1 + k, known[0]), known[known.length - 1]);
    while (cursor < known.length - 1 && known[cursor + 1] <= day) cursor++;
    const before = known[cursor];
    const exact = byDay.get(day);
    if (exact) {
      curve.minC[k] = exact.minC;
      curve.maxC[k] = exact.maxC;
      continue;
    }
    const after = known[cursor + 1];
    if (after - before - 1 > MAX_INTERPOLATED_GAP_DAYS) {
      throw readingsCoverError(
        `the log has no readings from ${isoDate(civilDate(before + 1))} to ${isoDate(civilDate(after - 1))}`,
      );
    }
    const weight = (day - before) / (after - before);
    const a = byDay.get(before)!;
    const b = byDay.get(after)!;
    curve.minC[k] = a.minC + (b.minC - a.minC) * weight;
    curve.maxC[k] = a.maxC + (b.maxC - a.maxC) * weight;
  }
}

/** Hourly temperatures at mid-hour, interpolated between logged readings. */
function hourlyFromReadings(
  readings: TemperatureReading[],
  utcOffsetHours: number,
  firstDayNumber: number,
  hourCount: number,
): Float64Array {
  const times = new Float64Array(readings.length);
  const values = new Float64Array(readings.length);
  readings.forEach((reading, index) => {
    const hourNumber = localHourNumber(reading.at, utcOffsetHours);
    if (hourNumber === null) throw readingsCoverError(`reading time '${reading.at}' is not an ISO date-time`);
    if (index > 0 && hourNumber <= times[index - 1]) {
      throw readingsCoverError(`readings must be in time order without repeats (at '${reading.at}')`);
    }
    times[index] = hourNumber;
    values[index] = reading.temperatureC;
  });
  if (readings.length === 0) throw readingsCoverError('the temperature log holds no readings');
  const firstHour = firstDayNumber * 24;
  const describe = (hourNumber: number) => new Date(hourNumber * MS_PER_HOUR).toISOString().slice(0, 16);
  const needFrom = firstHour + 0.5;
  const needTo = firstHour + hourCount - 0.5;
  // Allow the log to start or end within an hour of the range's edges.
  if (times[0] > needFrom + 1 || times[times.length - 1] < needTo - 1) {
    throw readingsCoverError(
      `the log runs ${describe(times[0])} to ${describe(times[times.length - 1])}; the season needs ${describe(firstHour)} to ${describe(firstHour + hourCount)} (local standard time)`,
    );
  }
  const out = new Float64Array(hourCount);
  let cursor = 0;
  for (let hour = 0; hour < hourCount; hour++) {
    const t = firstHour + hour + 0.5;
    while (cursor < times.length - 1 && times[cursor + 1] <= t) cursor++;
    if (t <= times[0]) {
      out[hour] = values[0];
    } else if (cursor >= times.length - 1) {
      out[hour] = values[times.length - 1];
    } else {
      const gap = times[cursor + 1] - times[cursor];
      if (gap > MAX_INTERPOLATED_GAP_HOURS) {
        throw readingsCoverError(
          `the log has a gap of ${gap.toFixed(1)} h after ${describe(times[cursor])}; at most ${MAX_INTERPOLATED_GAP_HOURS} h is bridged`,
        );
      }
      const weight = (t - times[cursor]) / gap;
      out[hour] = values[cursor] + (values[cursor + 1] - values[cursor]) * weight;
    }
  }
  return out;
}

function dailyExtremesOfHours(
  outdoorC: Float64Array,
  dayCount: number,
): { dailyMinC: Float64Array; dailyMaxC: Float64Array } {
  const dailyMinC = new Float64Array(dayCount);
  const dailyMaxC = new Float64Array(dayCount);
  for (let day = 0; day < dayCount; day++) {
    let min = Infinity;
    let max = -Infinity;
    for (let hour = day * 24; hour < day * 24 + 24; hour++) {
      if (outdoorC[hour] < min) min = outdoorC[hour];
      if (outdoorC[hour] > max) max = outdoorC[hour];
    }
    dailyMinC[day] = min;
    dailyMaxC[day] = max;
  }
  return { dailyMinC, dailyMaxC };
}
