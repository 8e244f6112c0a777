import type { ReferenceData } from '../reference-data.types';
import { clearSkyIrradiance, sunPosition, sunTimes } from '../solar';
import { daysInYear, MS_PER_HOUR } from '../climate/calendar-days';

/** What the sun's path needs to know about a farm. */
export interface SunSite {
  latitudeDeg: number;
  longitudeDeg: number;
  /**
   * Fixed offset of the farm's local standard time from UTC, hours (the API derives it from the
   * IANA zone). Daylight saving time is ignored: every hour is local standard time.
   */
  utcOffsetHours: number;
}

/**
 * A site's sun for one calendar year of local standard time, computed once and reused by every
 * season run at that site. Hour i covers [i, i + 1) hours after local midnight of 1 January; sun
 * values are taken at the middle of the hour.
 */
export interface SunHours {
  key: string;
  year: number;
  site: SunSite;
  dayCount: number;
  hourCount: number;
  /** per day, length dayCount + 2: index 0 = 31 Dec of the year before, index dayCount + 1 = 1 Jan after */
  sunriseHour: Float64Array;
  sunsetHour: Float64Array;
  solarNoonHour: Float64Array;
  /** true where the sun neither rose nor set that day (polar day or night) */
  noSunriseOrSunset: Uint8Array;
  /** per hour of the year */
  altitudeDeg: Float64Array;
  /** clear-sky global horizontal irradiance at mid-hour, W/m² (0 with the sun down) */
  clearSkyGlobalHorizontalWPerM2: Float64Array;
  /** share of the hour between sunrise and sunset, 0–1 */
  dayFraction: Float64Array;
  /** month 1–12 of each day of the year (length dayCount) */
  monthOfDay: Uint8Array;
}

export function sunHoursKey(site: SunSite, year: number): string {
  return `${site.latitudeDeg.toFixed(4)},${site.longitudeDeg.toFixed(4)},${site.utcOffsetHours},${year}`;
}

/** Precomputes the sun of one site and year (one sun position per hour, sunrise/sunset per day). */
export function precomputeSunHours(site: SunSite, year: number, ref: ReferenceData): SunHours {
  const dayCount = daysInYear(year);
  const hourCount = dayCount * 24;
  const offsetMs = site.utcOffsetHours * MS_PER_HOUR;
  const yearStartUtcMs = Date.UTC(year, 0, 1) - offsetMs;

  const sunriseHour = new Float64Array(dayCount + 2);
  const sunsetHour = new Float64Array(dayCount + 2);
  const solarNoonHour = new Float64Array(dayCount + 2);
  const noSunriseOrSunset = new Uint8Array(dayCount + 2);
  // Solar noon without the equation of time, for days the sun does not rise or set.
  const roughSolarNoonHour = 12 - site.longitudeDeg / 15 + site.utcOffsetHours;
  for (let index = 0; index < dayCount + 2; index++) {
    const dayStartUtcMs = yearStartUtcMs + (index - 1) * 24 * MS_PER_HOUR;
    const localNoon = new Date(dayStartUtcMs + 12 * MS_PER_HOUR);
    const times = sunTimes(localNoon, site.latitudeDeg, site.longitudeDeg);
    if (times.sunrise && times.sunset) {
      sunriseHour[index] = (times.sunrise.getTime() - dayStartUtcMs) / MS_PER_HOUR;
      sunsetHour[index] = (times.sunset.getTime() - dayStartUtcMs) / MS_PER_HOUR;
      solarNoonHour[index] = (sunriseHour[index] + sunsetHour[index]) / 2;
    } else {
      noSunriseOrSunset[index] = 1;
      solarNoonHour[index] = roughSolarNoonHour;
      const noonAltitude = sunPosition(
        new Date(dayStartUtcMs + roughSolarNoonHour * MS_PER_HOUR),
        site.latitudeDeg,
        site.longitudeDeg,
      ).altitudeDeg;
      if (noonAltitude > 0) {
        sunriseHour[index] = 0;
        sunsetHour[index] = 24;
      } else {
        sunriseHour[index] = roughSolarNoonHour;
        sunsetHour[index] = roughSolarNoonHour;
      }
    }
  }

  const monthOfDay = new Uint8Array(dayCount);
  for (let day = 0; day < dayCount; day++) {
    monthOfDay[day] = new Date(Date.UTC(year, 0, 1 + day)).getUTCMonth() + 1;
  }

  const altitudeDeg = new Float64Array(hourCount);
  const clearSkyGlobalHorizontalWPerM2 = new Float64Array(hourCount);
  const dayFraction = new Float64Array(hourCount);
  for (let hour = 0; hour < hourCount; hour++) {
    const position = sunPosition(
      new Date(yearStartUtcMs + (hour + 0.5) * MS_PER_HOUR),
      site.latitudeDeg,
      site.longitudeDeg,
    );
    altitudeDeg[hour] = position.altitudeDeg;
    const day = (hour / 24) | 0;
    if (position.altitudeDeg > 0) {
      clearSkyGlobalHorizontalWPerM2[hour] = clearSkyIrradiance(
        position.altitudeDeg,
        monthOfDay[day],
        ref,
      ).globalHorizontalWPerM2;
    }
    dayFraction[hour] = daylightShareOfHour(sunriseHour, sunsetHour, day + 1, hour - day * 24);
  }

  return {
    key: sunHoursKey(site, year),
    year,
    site: { ...site },
    dayCount,
    hourCount,
    sunriseHour,
    sunsetHour,
    solarNoonHour,
    noSunriseOrSunset,
    altitudeDeg,
    clearSkyGlobalHorizontalWPerM2,
    dayFraction,
    monthOfDay,
  };
}

/** Overlap of [hourOfDay, hourOfDay + 1) with daylight of this day and its neighbours (sunset may pass midnight). */
function daylightShareOfHour(sunrise: Float64Array, sunset: Float64Array, index: number, hourOfDay: number): number {
  let share = 0;
  for (let neighbour = -1; neighbour <= 1; neighbour++) {
    const from = sunrise[index + neighbour] + 24 * neighbour;
    const to = sunset[index + neighbour] + 24 * neighbour;
    share += Math.max(0, Math.min(hourOfDay + 1, to) - Math.max(hourOfDay, from));
  }
  return Math.min(1, share);
}

/** Keeps each site-year's sun so repeated estimates (measures, comparisons) skip the astronomy. */
export class SunCache {
  private readonly entries = new Map<string, SunHours>();

  constructor(private readonly maxEntries = 64) {}

  get(site: SunSite, year: number, ref: ReferenceData): SunHours {
    const key = sunHoursKey(site, year);
    let entry = this.entries.get(key);
    if (!entry) {
      entry = precomputeSunHours(site, year, ref);
      if (this.entries.size >= this.maxEntries) {
        const oldest = this.entries.keys().next().value;
        if (oldest !== undefined) this.entries.delete(oldest);
      }
      this.entries.set(key, entry);
    }
    return entry;
  }

  get size(): number {
    return this.entries.size;
  }
}
