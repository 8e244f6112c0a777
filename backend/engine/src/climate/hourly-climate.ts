/**
 * A farm's design climate from hours of measured (or reanalysed) weather: the one implementation
 * used for weather-service history and for a farm's own temperature log.
 *
 * Definitions (ASHRAE Handbook — Fundamentals, ch. 14 "Climatic design information"):
 * - heating design dry bulb at 99.6 % / 99 %: the dry bulb that 99.6 % / 99 % of the hours are at
 *   or above. Here: sort the valid hours ascending, take the value at index ⌊p·n⌋ with p = 0.004 /
 *   0.01; at least (1 − p)·n hours are then at or above it.
 * - cooling design dry bulb at 0.4 % / 1 %: the dry bulb that 0.4 % / 1 % of the hours are at or
 *   above: the value at index n − 1 − ⌊p·n⌋ of the same ascending order.
 * - mean coincident wet bulb: the mean wet bulb of the hours at the design dry bulb. The handbook
 *   bins hours by dry bulb; here the band is ±0.5 K around the design value, widened to ±1.5 K when
 *   fewer than 5 hours fall in it (our choice, stated so it can be checked).
 * - daily range: the mean of (daily maximum − daily minimum) over the days of the warmest month.
 * Monthly clearness is measured global horizontal irradiation over the month divided by what the
 * engine's clear-sky model (solar/clear-sky.ts) gives for the same hours.
 */
import { EngineInputError } from '../errors';
import type { ReferenceData } from '../reference-data.types';
import { clearSkyIrradiance, sunPosition } from '../solar';
import { standardAtmosphericPressurePa, wetBulbFromDewPointC } from '../psychrometrics';
import { MS_PER_HOUR } from './calendar-days';

/** A year (or any span) of hourly weather. Missing values are NaN (or null in JSON). */
export interface HourlyWeatherSpan {
  /** label for messages and reports, usually the calendar year */
  year: number;
  /** UTC instant at the start of hour 0; hour i starts at startUtcMs + i hours */
  startUtcMs: number;
  dryBulbC: ArrayLike<number | null>;
  /** dew point, °C; optional (a temperature log has none) */
  dewPointC?: ArrayLike<number | null>;
  /** global horizontal irradiance, mean over the hour, W/m²; optional */
  globalHorizontalWPerM2?: ArrayLike<number | null>;
}

export interface HourlyClimateSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  /** the farm's standard-time offset from UTC, hours: days run midnight to midnight local standard time */
  utcOffsetHours: number;
}

export interface HourlyClimateOptions {
  /** a span with a larger share of missing dry-bulb hours is left out (default 0.10) */
  maxMissingShare?: number;
}

export interface MonthlyFromHours {
  month: number;
  meanDailyMinC: number;
  meanDailyMaxC: number;
  /** measured ÷ clear-sky global horizontal over the month, 0–1; null without radiation data */
  clearness: number | null;
  /** whole days that counted (a day needs 20 or more valid hours) */
  dayCount: number;
}

export interface SpanUsage {
  year: number;
  hourCount: number;
  missingHourCount: number;
  missingShare: number;
}

export interface HourlyClimate {
  spansUsed: SpanUsage[];
  /** spans left out, with the reason (too many missing hours) */
  spansLeftOut: (SpanUsage & { reason: string })[];
  hoursUsed: number;
  winterDesign996C: number;
  winterDesign99C: number;
  summerDesign04C: number;
  summerDesign1C: number;
  /** null where the hours carry no dew point */
  summerCoincidentWetBulb04C: number | null;
  summerCoincidentWetBulb1C: number | null;
  /** mean daily range of the warmest month, K */
  summerDailyRangeK: number;
  /** 12 rows, January first; a month without a whole day is an error */
  monthly: MonthlyFromHours[];
}

const MIN_VALID_HOURS_PER_DAY = 20;
const COINCIDENT_BAND_K = 0.5;
const COINCIDENT_WIDE_BAND_K = 1.5;
const COINCIDENT_MIN_HOURS = 5;

function finite(value: number | null | undefined): value is number {
  return typeof value === 'number' && Number.isFinite(value);
}

/** Index-based order statistic (see the file comment): p = share of hours below (heating). */
function lowQuantile(sortedAscending: Float64Array, share: number): number {
  return sortedAscending[Math.floor(share * sortedAscending.length)]!;
}

function highQuantile(sortedAscending: Float64Array, share: number): number {
  return sortedAscending[sortedAscending.length - 1 - Math.floor(share * sortedAscending.length)]!;
}

export function climateFromHourlyWeather(
  spans: HourlyWeatherSpan[],
  site: HourlyClimateSite,
  ref: ReferenceData,
  options: HourlyClimateOptions = {},
): HourlyClimate {
  const maxMissingShare = options.maxMissingShare ?? 0.1;
  if (!Array.isArray(spans) || spans.length === 0) {
    throw new EngineInputError('weather', 'no hours of weather to work from');
  }
  const spansUsed: SpanUsage[] = [];
  const spansLeftOut: (SpanUsage & { reason: string })[] = [];
  const kept: HourlyWeatherSpan[] = [];
  for (const span of spans) {
    const hourCount = span.dryBulbC.length;
    let missing = 0;
    for (let i = 0; i < hourCount; i++) if (!finite(span.dryBulbC[i])) missing++;
    const usage = {
      year: span.year,
      hourCount,
      missingHourCount: missing,
      missingShare: hourCount ? missing / hourCount : 1,
    };
    if (hourCount === 0 || usage.missingShare > maxMissingShare) {
      spansLeftOut.push({
        ...usage,
        reason: `${Math.round(usage.missingShare * 1000) / 10} % of its hours are missing (more than ${maxMissingShare * 100} %)`,
      });
    } else {
      spansUsed.push(usage);
      kept.push(span);
    }
  }
  if (kept.length === 0) {
    throw new EngineInputError(
      'weather',
      `every span has more than ${maxMissingShare * 100} % of its hours missing: ${spansLeftOut.map((s) => s.year).join(', ')}`,
    );
  }

  // Valid dry bulbs with their dew points (NaN where none). Wet bulbs, an iterative psychrometric
  // solve, are computed only for the few hours near a design dry bulb.
  const total = spansUsed.reduce((sum, s) => sum + s.hourCount - s.missingHourCount, 0);
  const dryBulbs = new Float64Array(total);
  const dewPoints = new Float64Array(total).fill(Number.NaN);
  const pressurePa = standardAtmosphericPressurePa(site.elevationM);
  let hasDewPoint = false;
  let n = 0;
  for (const span of kept) {
    for (let i = 0; i < span.dryBulbC.length; i++) {
      const t = span.dryBulbC[i];
      if (!finite(t)) continue;
      dryBulbs[n] = t;
      const dewPoint = span.dewPointC?.[i];
      if (finite(dewPoint)) {
        hasDewPoint = true;
        dewPoints[n] = Math.min(dewPoint, t);
      }
      n++;
    }
  }
  const sorted = Float64Array.from(dryBulbs).sort();
  const summerDesign04C = highQuantile(sorted, 0.004);
  const summerDesign1C = highQuantile(sorted, 0.01);

  const coincidentWetBulb = (designC: number): number | null => {
    if (!hasDewPoint) return null;
    for (const band of [COINCIDENT_BAND_K, COINCIDENT_WIDE_BAND_K]) {
      let sum = 0;
      let count = 0;
      for (let i = 0; i < n; i++) {
        if (Math.abs(dryBulbs[i]! - designC) <= band && Number.isFinite(dewPoints[i]!)) {
          sum += wetBulbFromDewPointC(dryBulbs[i]!, dewPoints[i]!, pressurePa);
          count++;
        }
      }
      if (count >= COINCIDENT_MIN_HOURS || band === COINCIDENT_WIDE_BAND_K) return count ? sum / count : null;
    }
    return null;
  };

  const monthly = monthlyFromHours(kept, site, ref);
  const warmest = monthly.reduce((a, b) => (b.meanDailyMaxC > a.meanDailyMaxC ? b : a));
  return {
    spansUsed,
    spansLeftOut,
    hoursUsed: n,
    winterDesign996C: lowQuantile(sorted, 0.004),
    winterDesign99C: lowQuantile(sorted, 0.01),
    summerDesign04C,
    summerDesign1C,
    summerCoincidentWetBulb04C: coincidentWetBulb(summerDesign04C),
    summerCoincidentWetBulb1C: coincidentWetBulb(summerDesign1C),
    summerDailyRangeK: warmest.meanDailyMaxC - warmest.meanDailyMinC,
    monthly,
  };
}

/** Daily extremes by local standard day, averaged per month; clearness per month. */
function monthlyFromHours(spans: HourlyWeatherSpan[], site: HourlyClimateSite, ref: ReferenceData): MonthlyFromHours[] {
  const minSum = new Float64Array(13);
  const maxSum = new Float64Array(13);
  const days = new Float64Array(13);
  const measuredGhi = new Float64Array(13);
  const clearSkyGhi = new Float64Array(13);
  const offsetMs = site.utcOffsetHours * MS_PER_HOUR;
  // The sun's altitude at a UTC day-of-year and hour differs between years by well under a
  // degree: computed once (for the first year it is needed) and reused for every year.
  const altitudeByHourOfYear = new Float64Array(367 * 24).fill(Number.NaN);
  let utcDay = Number.NaN;
  let utcDayOfYear = 0;

  for (const span of spans) {
    let dayKey = Number.NaN;
    let dayMonth = 0;
    let dayMin = Infinity;
    let dayMax = -Infinity;
    let dayValid = 0;
    const closeDay = () => {
      if (dayValid >= MIN_VALID_HOURS_PER_DAY) {
        minSum[dayMonth] += dayMin;
        maxSum[dayMonth] += dayMax;
        days[dayMonth]++;
      }
    };
    for (let i = 0; i < span.dryBulbC.length; i++) {
      const startMs = span.startUtcMs + i * MS_PER_HOUR;
      const key = Math.floor((startMs + offsetMs) / 86_400_000);
      if (key !== dayKey) {
        if (!Number.isNaN(dayKey)) closeDay();
        dayKey = key;
        // The month changes only with the day: one Date a day, not one an hour.
        dayMonth = new Date(key * 86_400_000).getUTCMonth() + 1;
        dayMin = Infinity;
        dayMax = -Infinity;
        dayValid = 0;
      }
      const t = span.dryBulbC[i];
      if (finite(t)) {
        if (t < dayMin) dayMin = t;
        if (t > dayMax) dayMax = t;
        dayValid++;
      }
      const ghi = span.globalHorizontalWPerM2?.[i];
      // Hours without measured sunshine are night (the sun's position is the costly part here).
      if (finite(ghi) && ghi > 0) {
        const day = Math.floor(startMs / 86_400_000);
        if (day !== utcDay) {
          utcDay = day;
          const yearStartMs = Date.UTC(new Date(day * 86_400_000).getUTCFullYear(), 0, 1);
          utcDayOfYear = (day * 86_400_000 - yearStartMs) / 86_400_000;
        }
        const slot = utcDayOfYear * 24 + Math.floor((startMs - day * 86_400_000) / MS_PER_HOUR);
        if (Number.isNaN(altitudeByHourOfYear[slot]!)) {
          // Irradiance is the mean over the hour: compare with the clear sky at mid-hour.
          const midHour = new Date(startMs + MS_PER_HOUR / 2);
          altitudeByHourOfYear[slot] = sunPosition(midHour, site.latitudeDeg, site.longitudeDeg).altitudeDeg;
        }
        const altitudeDeg = altitudeByHourOfYear[slot]!;
        if (altitudeDeg > 0) {
          measuredGhi[dayMonth] += ghi;
          clearSkyGhi[dayMonth] += clearSkyIrradiance(altitudeDeg, dayMonth, ref).globalHorizontalWPerM2;
        }
      }
    }
    if (!Number.isNaN(dayKey)) closeDay();
  }

  const rows: MonthlyFromHours[] = [];
  for (let month = 1; month <= 12; month++) {
    if (days[month] === 0) {
      throw new EngineInputError(
        'weather',
        `month ${month} has no day with ${MIN_VALID_HOURS_PER_DAY} or more valid hours`,
      );
    }
    rows.push({
      month,
      meanDailyMinC: minSum[month]! / days[month]!,
      meanDailyMaxC: maxSum[month]! / days[month]!,
      clearness: clearSkyGhi[month]! > 0 ? Math.min(1, measuredGhi[month]! / clearSkyGhi[month]!) : null,
      dayCount: days[month]!,
    });
  }
  return rows;
}
