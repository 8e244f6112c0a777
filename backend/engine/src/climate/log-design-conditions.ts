/**
 * Design conditions proposed from a farm's own hourly temperature log.
 *
 * The log's readings are put on an hourly grid of the farm's local standard time (several
 * readings in one hour are averaged; an hour without a reading is missing), then go through
 * `climateFromHourlyWeather` (hourly-climate.ts), the one implementation of the ASHRAE
 * Handbook — Fundamentals ch. 14 definitions, so a log and weather history give the same figures
 * for the same hours:
 * - winter design dry bulb at 99.6 % / 99 %: the temperature that 99.6 % / 99 % of the hours are at
 *   or above;
 * - summer design dry bulb at 1 % (and 0.4 %): the temperature that 1 % (0.4 %) of the hours are at
 *   or above;
 * - monthly mean daily minimum and maximum by local standard day (a day needs 20 valid hours).
 *
 * Percentiles are order statistics without interpolation: with the n valid hours sorted
 * ascending (index 0 the coldest), the 99.6 % / 99 % heating values are the values at index
 * ⌊0.004·n⌋ / ⌊0.01·n⌋ and the 1 % / 0.4 % cooling values those at index n − 1 − ⌊0.01·n⌋ /
 * n − 1 − ⌊0.004·n⌋. At least (1 − p)·n hours are then at or above the heating value, and at
 * least p·n hours at or above the cooling value.
 *
 * A proposal needs a year: at least 365 days from the first to the last logged hour, and at least
 * 365 × 24 = 8,760 hours with a reading (a percentile of a shorter log would describe only the
 * part of the year it covers). A log with more than 10 % of its hours missing is refused too.
 */
import { EngineInputError } from '../errors';
import type { ReferenceData } from '../reference-data.types';
import { localHourNumber, type TemperatureReading } from '../season/season-hours';
import { MS_PER_HOUR } from './calendar-days';
import { climateFromHourlyWeather, type HourlyClimate } from './hourly-climate';

export const HOURS_PER_YEAR = 365 * 24;
/** Larger than any log the upload accepts; guards the hourly grid's size. */
const MAX_LOG_HOURS = 11 * 366 * 24;
const MAX_MISSING_SHARE = 0.1;

export interface LogDesignSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  /** the farm's standard-time offset from UTC, hours */
  utcOffsetHours: number;
}

export interface LogDesignConditions extends HourlyClimate {
  /** first and last hour on the grid, local standard time 'YYYY-MM-DDTHH:00' */
  firstHour: string;
  lastHour: string;
  /** hours on the grid from first to last */
  hourCount: number;
  /** hours with at least one reading */
  loggedHourCount: number;
}

function hourLabel(localHour: number): string {
  return new Date(localHour * MS_PER_HOUR).toISOString().slice(0, 13) + ':00';
}

/** Readings → one value per local standard hour (mean of the readings in it), NaN where none. */
export function hourlyGridOfReadings(
  readings: readonly TemperatureReading[],
  utcOffsetHours: number,
): { firstLocalHour: number; values: Float64Array; loggedHourCount: number } {
  let first = Infinity;
  let last = -Infinity;
  const hours = new Float64Array(readings.length);
  readings.forEach((reading, index) => {
    const hour = localHourNumber(reading.at, utcOffsetHours);
    if (hour === null || !Number.isFinite(reading.temperatureC)) {
      throw new EngineInputError('readings', `reading ${index + 1} has no valid time and temperature`);
    }
    const whole = Math.floor(hour);
    hours[index] = whole;
    if (whole < first) first = whole;
    if (whole > last) last = whole;
  });
  if (readings.length === 0) throw new EngineInputError('readings', 'the log has no readings');
  const count = last - first + 1;
  if (count > MAX_LOG_HOURS) throw new EngineInputError('readings', 'the log spans more than ten years');
  const sums = new Float64Array(count);
  const counts = new Uint16Array(count);
  readings.forEach((reading, index) => {
    const slot = hours[index]! - first;
    sums[slot] += reading.temperatureC;
    counts[slot] = Math.min(65_535, counts[slot]! + 1);
  });
  const values = new Float64Array(count);
  let loggedHourCount = 0;
  for (let i = 0; i < count; i++) {
    if (counts[i]! > 0) {
      values[i] = sums[i]! / counts[i]!;
      loggedHourCount++;
    } else values[i] = Number.NaN;
  }
  return { firstLocalHour: first, values, loggedHourCount };
}

/**
 * Winter and summer design dry bulbs and monthly mean daily extremes from an hourly log that
 * covers at least a year. Throws EngineInputError('readings', reason) for a daily log, a log
 * shorter than a year, or one with too many hours missing.
 */
export function designConditionsFromLog(
  log: { readings: readonly TemperatureReading[]; resolution: 'hourly' | 'daily' },
  site: LogDesignSite,
  ref: ReferenceData,
): LogDesignConditions {
  if (log.resolution !== 'hourly') {
    throw new EngineInputError(
      'readings',
      'design temperatures need hourly readings; this log has one reading a day, which hides the coldest and warmest hours',
    );
  }
  const grid = hourlyGridOfReadings(log.readings, site.utcOffsetHours);
  const spanDays = grid.values.length / 24;
  if (grid.values.length < HOURS_PER_YEAR || grid.loggedHourCount < HOURS_PER_YEAR) {
    const days = Math.floor(Math.min(spanDays, grid.loggedHourCount / 24));
    throw new EngineInputError(
      'readings',
      `design temperatures need a whole year of hours (365 days, ${HOURS_PER_YEAR.toLocaleString('en-US')} hourly readings); this log covers about ${days} days, so its coldest and warmest hours may not be the year's`,
    );
  }
  const missingShare = 1 - grid.loggedHourCount / grid.values.length;
  if (missingShare > MAX_MISSING_SHARE) {
    throw new EngineInputError(
      'readings',
      `${Math.round(missingShare * 1000) / 10} % of the hours between the first and last reading have no reading (at most ${MAX_MISSING_SHARE * 100} % may be missing)`,
    );
  }
  const startLocalMs = grid.firstLocalHour * MS_PER_HOUR;
  const climate = climateFromHourlyWeather(
    [
      {
        year: new Date(startLocalMs).getUTCFullYear(),
        startUtcMs: startLocalMs - site.utcOffsetHours * MS_PER_HOUR,
        dryBulbC: grid.values,
      },
    ],
    site,
    ref,
    { maxMissingShare: MAX_MISSING_SHARE },
  );
  return {
    ...climate,
    firstHour: hourLabel(grid.firstLocalHour),
    lastHour: hourLabel(grid.firstLocalHour + grid.values.length - 1),
    hourCount: grid.values.length,
    loggedHourCount: grid.loggedHourCount,
  };
}
