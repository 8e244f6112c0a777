import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { civilDate, dayNumber, daysInMonth } from './calendar-days';
import { monthsInOrder, type SiteClimate } from './site-climate';

/**
 * Synthetic hourly outdoor temperature from daily minima and maxima.
 *
 * The curve (common practice for synthetic daily temperature curves; the hour of the maximum is
 * a reference-data row):
 * - the day's minimum falls at sunrise, the maximum `hoursAfterSolarNoon` after solar noon
 *   (about 15:00 solar time);
 * - from sunrise to the peak the temperature rises along a half cosine from the minimum to the
 *   maximum, T = Tmin + (Tmax − Tmin)·(1 − cos πx)/2, x = 0…1;
 * - from the peak to the next sunrise it falls along a half cosine to the next day's minimum.
 * Real nights cool faster early and slower late (closer to an exponential decay); the cosine
 * keeps the curve smooth and its daily mean close to (Tmin + Tmax)/2.
 *
 * Daily minima and maxima between monthly normals are interpolated linearly between mid-month
 * anchors (the 15th/16th of each month), wrapping December → January. Linear interpolation does
 * not preserve each month's mean exactly: months at a seasonal turning point (January, July)
 * come out slightly milder than their normals.
 */

export const PEAK_ROW_ID = 'daily-curve-peak-after-solar-noon';

interface PeakRow extends ReferenceRow {
  hoursAfterSolarNoon: number;
}

export function peakHoursAfterSolarNoon(ref: ReferenceData): number {
  const row = referenceRow<PeakRow>(ref, 'climate-defaults', PEAK_ROW_ID);
  if (!row || typeof row.hoursAfterSolarNoon !== 'number') {
    throw new Error(`reference-data/climate-defaults.json needs a ${PEAK_ROW_ID} row`);
  }
  return row.hoursAfterSolarNoon;
}

/**
 * Per-day inputs of the curve. Arrays hold `dayCount + 2` entries: index 0 is the day before the
 * first day, index dayCount + 1 the day after the last, so nights at the edges have neighbours.
 * Hours are local standard time from that day's midnight.
 */
export interface DailyCurveDays {
  /** day number (days since 1970-01-01) of index 1 */
  firstDayNumber: number;
  dayCount: number;
  minC: Float64Array;
  maxC: Float64Array;
  sunriseHour: Float64Array;
  peakHour: Float64Array;
}

/** Half-cosine easing from 0 to 1 over x = 0…1. */
function ease(x: number): number {
  return (1 - Math.cos(Math.PI * x)) / 2;
}

/**
 * Outdoor temperature at `hourOfDay` (0–24, local standard time) of the day at `index`
 * (1…dayCount) of the curve.
 */
export function curveTemperatureC(days: DailyCurveDays, index: number, hourOfDay: number): number {
  const sunrise = days.sunriseHour[index];
  const peak = days.peakHour[index];
  if (hourOfDay < sunrise) {
    const previousPeak = days.peakHour[index - 1] - 24;
    const x = (hourOfDay - previousPeak) / (sunrise - previousPeak);
    const fromC = days.maxC[index - 1];
    return fromC - (fromC - days.minC[index]) * ease(x);
  }
  if (hourOfDay <= peak) {
    const x = (hourOfDay - sunrise) / (peak - sunrise);
    return days.minC[index] + (days.maxC[index] - days.minC[index]) * ease(x);
  }
  const nextSunrise = days.sunriseHour[index + 1] + 24;
  const x = (hourOfDay - peak) / (nextSunrise - peak);
  const fromC = days.maxC[index];
  return fromC - (fromC - days.minC[index + 1]) * ease(x);
}

/** Hourly temperatures sampled at each hour's middle (hh:30), dayCount × 24 values. */
export function hourlyTemperaturesC(days: DailyCurveDays, out = new Float64Array(days.dayCount * 24)): Float64Array {
  for (let day = 1; day <= days.dayCount; day++) {
    const base = (day - 1) * 24;
    for (let hour = 0; hour < 24; hour++) out[base + hour] = curveTemperatureC(days, day, hour + 0.5);
  }
  return out;
}

/**
 * Daily minima and maxima for `dayCount + 2` days starting the day before `firstDayNumber`,
 * interpolated between the climate's monthly normals.
 */
export function dailyExtremesFromNormals(
  climate: SiteClimate,
  firstDayNumber: number,
  dayCount: number,
): { minC: Float64Array; maxC: Float64Array } {
  const months = monthsInOrder(climate);
  const minC = new Float64Array(dayCount + 2);
  const maxC = new Float64Array(dayCount + 2);
  for (let index = 0; index < dayCount + 2; index++) {
    const dayNumberValue = firstDayNumber - 1 + index;
    const { year, month, day } = civilDate(dayNumberValue);
    // position of this day's middle relative to the anchor (middle) of its month
    const monthLength = daysInMonth(year, month);
    const anchor = monthLength / 2;
    const position = day - 0.5;
    let otherYear = year;
    let otherMonth: number;
    if (position < anchor) {
      otherMonth = month === 1 ? 12 : month - 1;
      if (month === 1) otherYear = year - 1;
    } else {
      otherMonth = month === 12 ? 1 : month + 1;
      if (month === 12) otherYear = year + 1;
    }
    const thisAnchorDay = dayNumber(year, month, 1) + anchor;
    const otherAnchorDay = dayNumber(otherYear, otherMonth, 1) + daysInMonth(otherYear, otherMonth) / 2;
    const weightOther = Math.abs(dayNumberValue + 0.5 - thisAnchorDay) / Math.abs(otherAnchorDay - thisAnchorDay);
    const a = months[month - 1];
    const b = months[otherMonth - 1];
    minC[index] = a.meanDailyMinC + (b.meanDailyMinC - a.meanDailyMinC) * weightOther;
    maxC[index] = a.meanDailyMaxC + (b.meanDailyMaxC - a.meanDailyMaxC) * weightOther;
  }
  return { minC, maxC };
}
