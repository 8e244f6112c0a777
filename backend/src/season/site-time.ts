import { EngineInputError } from '@thermbay/engine/errors';
import type { SeasonRange } from '@thermbay/engine/season/season-hours';

/** Offset of an IANA zone from UTC at an instant, hours (e.g. −6 for 'GMT-06:00'). */
export function zoneOffsetHoursAt(timeZone: string, instant: Date): number {
  const parts = new Intl.DateTimeFormat('en-US', { timeZone, timeZoneName: 'longOffset' }).formatToParts(instant);
  const name = parts.find((part) => part.type === 'timeZoneName')?.value ?? 'GMT';
  const match = /^GMT(?:([+-])(\d{1,2})(?::(\d{2}))?)?$/.exec(name);
  if (!match) throw new Error(`cannot read the UTC offset '${name}' of ${timeZone}`);
  if (!match[1]) return 0;
  return (match[1] === '-' ? -1 : 1) * (Number(match[2]) + Number(match[3] ?? 0) / 60);
}

/**
 * The zone's standard-time offset in a year: the smaller of its mid-January and mid-July offsets,
 * since daylight saving time only ever adds (January for northern zones, July for southern).
 * The season engine works in local standard time all year.
 */
export function standardUtcOffsetHours(timeZone: string, year: number, field = 'farm.timeZone'): number {
  try {
    const january = zoneOffsetHoursAt(timeZone, new Date(Date.UTC(year, 0, 15, 12)));
    const july = zoneOffsetHoursAt(timeZone, new Date(Date.UTC(year, 6, 15, 12)));
    return Math.min(january, july);
  } catch {
    throw new EngineInputError(field, `the farm's time zone '${timeZone}' is not a known IANA zone`);
  }
}

function isoDay(year: number, month: number, day: number): string {
  return `${String(year).padStart(4, '0')}-${String(month).padStart(2, '0')}-${String(day).padStart(2, '0')}`;
}

/**
 * The heating season in progress on `today` or, between seasons, the next one:
 * 1 September – 31 May north of the equator, 1 March – 30 November south of it.
 */
export function defaultHeatingSeason(latitudeDeg: number, today: Date): SeasonRange {
  const year = today.getUTCFullYear();
  const monthDay = (today.getUTCMonth() + 1) * 100 + today.getUTCDate();
  if (latitudeDeg >= 0) {
    const startYear = monthDay <= 531 ? year - 1 : year;
    return { startDate: isoDay(startYear, 9, 1), endDate: isoDay(startYear + 1, 5, 31) };
  }
  const seasonYear = monthDay <= 1130 ? year : year + 1;
  return { startDate: isoDay(seasonYear, 3, 1), endDate: isoDay(seasonYear, 11, 30) };
}
