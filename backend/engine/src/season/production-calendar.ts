import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS } from '../vocabulary';
import { civilDate, daysInMonth, pad2 } from '../climate/calendar-days';

/**
 * A house's production calendar: which parts of the year it is heated and to what setpoints.
 * Periods are inclusive and may wrap the year end (start '11-15', end '03-31'). When a calendar
 * is given, days it does not cover are unheated; where periods overlap the later one wins.
 */
export interface ProductionPeriod {
  /** 'MM-DD', first day of the period */
  startMonthDay: string;
  /** 'MM-DD', last day of the period (inclusive) */
  endMonthDay: string;
  mode: 'heated' | 'empty';
  /** replaces the house's day heating setpoint in this period, °C */
  dayHeatingC?: number;
  /** replaces the house's night heating setpoint in this period, °C */
  nightHeatingC?: number;
}

export type ProductionCalendar = ProductionPeriod[];

const MONTH_DAY = /^(\d{2})-(\d{2})$/;

export interface MonthDay {
  month: number;
  day: number;
}

export function parseMonthDay(text: string, field: string): MonthDay {
  const match = MONTH_DAY.exec(typeof text === 'string' ? text.trim() : '');
  const month = match ? Number(match[1]) : NaN;
  const day = match ? Number(match[2]) : NaN;
  // 29 February is allowed: in common years it simply matches no day.
  if (!match || month < 1 || month > 12 || day < 1 || day > daysInMonth(2000, month)) {
    throw new EngineInputError(field, `${field} must be a date written MM-DD, for example 11-15`);
  }
  return { month, day };
}

export function validateCalendar(calendar: ProductionCalendar, field = 'calendar'): ProductionCalendar {
  if (!Array.isArray(calendar)) throw new EngineInputError(field, `${field} must be a list of periods`);
  if (calendar.length > 24) throw new EngineInputError(field, `${field} may hold at most 24 periods`);
  calendar.forEach((period, index) => {
    const at = `${field}[${index}]`;
    parseMonthDay(period.startMonthDay, `${at}.startMonthDay`);
    parseMonthDay(period.endMonthDay, `${at}.endMonthDay`);
    if (period.mode !== 'heated' && period.mode !== 'empty') {
      throw new EngineInputError(`${at}.mode`, `${at}.mode must be 'heated' or 'empty'`);
    }
    for (const key of ['dayHeatingC', 'nightHeatingC'] as const) {
      if (period[key] !== undefined && period[key] !== null) {
        requireInRange(`${at}.${key}`, period[key], BOUNDS.setpointC.min, BOUNDS.setpointC.max);
      }
    }
  });
  return calendar;
}

function monthDayOrdinal(monthDay: MonthDay): number {
  return monthDay.month * 100 + monthDay.day;
}

function coversMonthDay(start: MonthDay, end: MonthDay, month: number, day: number): boolean {
  const value = month * 100 + day;
  const from = monthDayOrdinal(start);
  const to = monthDayOrdinal(end);
  return from <= to ? value >= from && value <= to : value >= from || value <= to;
}

export interface DailySetpoints {
  /** °C per day of the range; NaN on unheated days */
  daySetpointC: Float64Array;
  nightSetpointC: Float64Array;
}

/** Setpoints of each day of a range (day numbers since 1970-01-01), from the house and its calendar. */
export function dailySetpoints(
  firstDayNumber: number,
  dayCount: number,
  houseSetpoints: { dayHeatingC: number; nightHeatingC: number },
  calendar: ProductionCalendar | undefined | null,
  nightSetpointShiftK = 0,
): DailySetpoints {
  const daySetpointC = new Float64Array(dayCount);
  const nightSetpointC = new Float64Array(dayCount);
  const periods = (calendar ?? []).map((period) => ({
    period,
    start: parseMonthDay(period.startMonthDay, 'calendar.startMonthDay'),
    end: parseMonthDay(period.endMonthDay, 'calendar.endMonthDay'),
  }));
  for (let day = 0; day < dayCount; day++) {
    let dayC: number = houseSetpoints.dayHeatingC;
    let nightC: number = houseSetpoints.nightHeatingC;
    if (calendar) {
      const { month, day: dayOfMonth } = civilDate(firstDayNumber + day);
      let covering: ProductionPeriod | null = null;
      for (const entry of periods) {
        if (coversMonthDay(entry.start, entry.end, month, dayOfMonth)) covering = entry.period;
      }
      if (!covering || covering.mode === 'empty') {
        dayC = NaN;
        nightC = NaN;
      } else {
        dayC = covering.dayHeatingC ?? dayC;
        nightC = covering.nightHeatingC ?? nightC;
      }
    }
    daySetpointC[day] = dayC;
    nightSetpointC[day] = nightC - nightSetpointShiftK;
  }
  return { daySetpointC, nightSetpointC };
}

/** 'MM-DD' moved by a number of days (counted in a leap year so 02-29 stays valid). */
export function shiftMonthDay(monthDay: string, days: number): string {
  const { month, day } = parseMonthDay(monthDay, 'monthDay');
  const shifted = new Date(Date.UTC(2000, month - 1, day + days));
  return `${pad2(shifted.getUTCMonth() + 1)}-${pad2(shifted.getUTCDate())}`;
}

/**
 * The calendar with the start of its first heated period (the one whose start comes first on
 * or after `seasonStart`, counting round the year) moved later by `days`.
 */
export function delayFirstHeatedPeriod(
  calendar: ProductionCalendar,
  seasonStart: MonthDay,
  days: number,
): ProductionCalendar {
  let chosen = -1;
  let chosenDistance = Infinity;
  calendar.forEach((period, index) => {
    if (period.mode !== 'heated') return;
    const start = parseMonthDay(period.startMonthDay, `calendar[${index}].startMonthDay`);
    const distance = (dayOfLeapYear(start) - dayOfLeapYear(seasonStart) + 366) % 366;
    if (distance < chosenDistance) {
      chosenDistance = distance;
      chosen = index;
    }
  });
  if (chosen < 0) return calendar;
  return calendar.map((period, index) => {
    if (index !== chosen) return period;
    const start = dayOfLeapYear(parseMonthDay(period.startMonthDay, `calendar[${index}].startMonthDay`));
    const end = dayOfLeapYear(parseMonthDay(period.endMonthDay, `calendar[${index}].endMonthDay`));
    const lengthDays = ((end - start + 366) % 366) + 1;
    // Delayed past its own end, the period is not heated at all.
    if (days >= lengthDays) return { ...period, mode: 'empty' as const };
    return { ...period, startMonthDay: shiftMonthDay(period.startMonthDay, days) };
  });
}

function dayOfLeapYear(monthDay: MonthDay): number {
  return Math.round((Date.UTC(2000, monthDay.month - 1, monthDay.day) - Date.UTC(2000, 0, 1)) / 86_400_000);
}
