// Dates, times and numbers as loggers write them.
import { daysInMonth } from '@thermbay/engine/climate/calendar-days';

/** order of day, month and year in dates written with / . or - and a year at the end */
export type DateOrder = 'YMD' | 'MDY' | 'DMY';

export interface ParsedDate {
  year: number;
  month: number;
  day: number;
}

export interface ParsedStamp {
  date: ParsedDate;
  /** hours after midnight, or null for a date alone */
  hour: number | null;
  /** '+HH:MM' / 'Z' when the stamp names its zone */
  zone: string | null;
}

export function validDate(year: number, month: number, day: number): ParsedDate | null {
  if (year < 100) year += 2000;
  if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return null;
  return { year, month, day };
}

/** A date alone: YYYY-MM-DD, YYYY/MM/DD, YYYY.MM.DD, or day/month/year in the given order. */
export function parseDate(text: string, order: DateOrder): ParsedDate | null {
  let match = /^(\d{4})[-/.](\d{1,2})[-/.](\d{1,2})$/.exec(text);
  if (match) return validDate(Number(match[1]), Number(match[2]), Number(match[3]));
  match = /^(\d{1,2})[-/.](\d{1,2})[-/.](\d{4}|\d{2})$/.exec(text);
  if (match) {
    const first = Number(match[1]);
    const second = Number(match[2]);
    const year = Number(match[3]);
    return order === 'MDY' ? validDate(year, first, second) : validDate(year, second, first);
  }
  return null;
}

/** A time of day: H:MM, HH:MM:SS(.fff), optionally with AM/PM. */
export function parseTime(text: string): number | null {
  const match = /^(\d{1,2}):(\d{2})(?::(\d{2})(?:[.,]\d+)?)?\s*([AaPp][Mm])?$/.exec(text);
  if (!match) return null;
  let hour = Number(match[1]);
  const minute = Number(match[2]);
  const second = Number(match[3] ?? 0);
  const meridiem = match[4]?.toUpperCase();
  if (meridiem) {
    if (hour < 1 || hour > 12) return null;
    hour = (hour % 12) + (meridiem === 'PM' ? 12 : 0);
  }
  if (hour > 24 || minute > 59 || second > 59 || (hour === 24 && (minute > 0 || second > 0))) return null;
  return hour + minute / 60 + second / 3600;
}

export function parseStamp(text: string, order: DateOrder): ParsedStamp | null {
  const trimmed = text.trim();
  const zoneMatch = /(Z|[+-]\d{2}:?\d{2})$/.exec(trimmed);
  let body = trimmed;
  let zone: string | null = null;
  if (zoneMatch && /\d[T ]?\d{1,2}:\d{2}/.test(trimmed)) {
    zone = zoneMatch[1] === 'Z' ? 'Z' : `${zoneMatch[1].slice(0, 3)}:${zoneMatch[1].slice(-2)}`;
    body = trimmed.slice(0, -zoneMatch[1].length).trim();
  }
  const split = /^(\S+?)(?:[T ]+(.+))?$/.exec(body);
  if (!split) return null;
  const date = parseDate(split[1], order);
  if (!date) return null;
  if (split[2] === undefined) return zone ? null : { date, hour: null, zone: null };
  const hour = parseTime(split[2].trim());
  if (hour === null) return null;
  return { date, hour, zone };
}

/** A number as loggers write it: decimal point or (when told) comma, Unicode minus, an optional unit suffix. */
export function parseNumber(text: string, decimalComma: boolean): number | null {
  let cleaned = text
    .trim()
    .replace(/\u2212/g, '-')
    .replace(/\s*°?\s*[CcFf]$/, '')
    .replace(/°$/, '')
    .trim();
  if (decimalComma) cleaned = cleaned.replace(',', '.');
  if (!/^[-+]?(\d+\.?\d*|\.\d+)([eE][-+]?\d+)?$/.test(cleaned)) return null;
  return Number(cleaned);
}

/** Which columns hold a row's time: one timestamp column, or a date column and a time column. */
export interface StampColumns {
  timestampColumn?: string | null;
  dateColumn?: string | null;
  timeColumn?: string | null;
}

export function stampHours(stamp: ParsedStamp): number {
  let hours = Date.UTC(stamp.date.year, stamp.date.month - 1, stamp.date.day) / 3_600_000 + (stamp.hour ?? 0);
  if (stamp.zone && stamp.zone !== 'Z') {
    const sign = stamp.zone[0] === '-' ? -1 : 1;
    hours -= sign * (Number(stamp.zone.slice(1, 3)) + Number(stamp.zone.slice(4, 6)) / 60);
  }
  return hours;
}

export function stampOfRow(
  cells: string[],
  headers: string[],
  mapping: StampColumns,
  order: DateOrder,
): ParsedStamp | null {
  if (mapping.timestampColumn) {
    return parseStamp(cells[headers.indexOf(mapping.timestampColumn)] ?? '', order);
  }
  if (mapping.dateColumn && mapping.timeColumn) {
    const date = parseDate((cells[headers.indexOf(mapping.dateColumn)] ?? '').trim(), order);
    const hour = parseTime((cells[headers.indexOf(mapping.timeColumn)] ?? '').trim());
    return date && hour !== null ? { date, hour, zone: null } : null;
  }
  return null;
}
