import type { SeasonHours } from './season-simulation';

/**
 * Heating degree-days and the degree-day fuel method, used as a cross-check beside the hourly
 * simulation.
 *
 * - Daily mean = (daily maximum + daily minimum) / 2 (US EPA heat-island glossary); a day adds
 *   max(0, base − daily mean) degree-days (AMS Glossary of Meteorology, 'heating degree-day').
 * - Base: the conventional 65 °F (18.3 °C) base suits homes; a greenhouse's balance temperature
 *   is its setpoint minus what sun and internal gains supply (T_balance = T_set − gains / UA).
 *   Greenhouse practice counts degree-days to the night setpoint, as the sun covers much of the
 *   day's loss; this module does the same, day by day, so a calendar with different setpoints
 *   (and empty periods, which count nothing) is respected.
 * - Heat Q = UA × 24 h × DD, fuel F = Q / (H × η) (degree-day method of energy estimating).
 */

/** Degree-days of one day to a base temperature, K·day. */
export function heatingDegreeDaysOfDay(dailyMinC: number, dailyMaxC: number, baseC: number): number {
  return Math.max(0, baseC - (dailyMinC + dailyMaxC) / 2);
}

/** Kelvin-days → °F-days. */
export const FAHRENHEIT_DEGREES_PER_KELVIN = 1.8;

/** Heat the degree-day method gives for a heat-loss coefficient and degree-days, kWh. */
export function degreeDayHeatKWh(uaWPerK: number, degreeDaysKDay: number): number {
  return (uaWPerK * 24 * degreeDaysKDay) / 1000;
}

/** Degree-days of every heated day of a range to that day's base (NaN base = unheated day). */
export function seasonDegreeDays(
  hours: SeasonHours,
  baseCOfDay: Float64Array,
): { total: number; byMonthSlot: Float64Array } {
  const byMonthSlot = new Float64Array(hours.months.length);
  let total = 0;
  for (let day = 0; day < hours.dayCount; day++) {
    const baseC = baseCOfDay[day];
    if (baseC !== baseC) continue;
    const degreeDays = heatingDegreeDaysOfDay(hours.dailyMinC[day], hours.dailyMaxC[day], baseC);
    byMonthSlot[hours.monthSlotOfDay[day]] += degreeDays;
    total += degreeDays;
  }
  return { total, byMonthSlot };
}
