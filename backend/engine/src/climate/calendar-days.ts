/**
 * Calendar arithmetic on plain day numbers (days since 1970-01-01) so hot loops need no Date
 * objects. All dates here are civil dates of the farm's local standard time.
 */

export const MS_PER_HOUR = 3_600_000;
export const MS_PER_DAY = 86_400_000;

export function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

export function daysInYear(year: number): number {
  return isLeapYear(year) ? 366 : 365;
}

export function daysInMonth(year: number, month: number): number {
  return new Date(Date.UTC(year, month, 0)).getUTCDate();
}

/** Days since 1970-01-01 of a civil date. */
export function dayNumber(year: number, month: number, day: number): number {
  return Math.round(Date.UTC(year, month - 1, day) / MS_PER_DAY);
}

export interface CivilDate {
  year: number;
  month: number;
  day: number;
}

export function civilDate(dayNumberValue: number): CivilDate {
  const date = new Date(dayNumberValue * MS_PER_DAY);
  return { year: date.getUTCFullYear(), month: date.getUTCMonth() + 1, day: date.getUTCDate() };
}

const ISO_DATE = /^(\d{4})-(\d{2})-(\d{2})$/;

/** Parses 'YYYY-MM-DD' strictly; returns null for anything else or an impossible date. */
export function parseIsoDate(text: string): CivilDate | null {
  const match = ISO_DATE.exec(typeof text === 'string' ? text.trim() : '');
  if (!match) return null;
  const year = Number(match[1]);
  const month = Number(match[2]);
  const day = Number(match[3]);
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  return { year, month, day };
}

export function isoDate(date: CivilDate): string {
  return `${String(date.year).padStart(4, '0')}-${pad2(date.month)}-${pad2(date.day)}`;
}

/** 'YYYY-MM-DDTHH:MM' of a local-standard-time hour counted from a day number's midnight. */
export function isoLocalHour(dayNumberValue: number, hourOfDay: number): string {
  const whole = Math.floor(hourOfDay);
  const minutes = Math.round((hourOfDay - whole) * 60);
  const extraHour = minutes === 60 ? 1 : 0;
  const date = civilDate(dayNumberValue + Math.floor((whole + extraHour) / 24));
  return `${isoDate(date)}T${pad2((whole + extraHour) % 24)}:${pad2(minutes % 60)}`;
}

export function pad2(value: number): string {
  return String(value).padStart(2, '0');
}
