import * as SunCalc from 'suncalc';

export interface SunPosition {
  /** apparent (refraction-corrected) altitude above the horizon, degrees */
  altitudeDeg: number;
  /** degrees clockwise from north (90 = east, 180 = south) */
  azimuthDeg: number;
}

export interface SunTimes {
  /** null when the sun does not rise on that day (polar night) or does not set (polar day) */
  sunrise: Date | null;
  sunset: Date | null;
}

/** Sun position at an instant (UTC) seen from a site. suncalc 2.x works in degrees. */
export function sunPosition(at: Date, latitudeDeg: number, longitudeDeg: number): SunPosition {
  const position = SunCalc.getPosition(at, latitudeDeg, longitudeDeg);
  return { altitudeDeg: position.altitude, azimuthDeg: position.azimuth };
}

/** Sunrise and sunset of the solar day that contains `date` at the site. */
export function sunTimes(date: Date, latitudeDeg: number, longitudeDeg: number): SunTimes {
  const times = SunCalc.getTimes(date, latitudeDeg, longitudeDeg);
  return { sunrise: times.sunrise ?? null, sunset: times.sunset ?? null };
}

/**
 * The UTC instant of local solar noon on a calendar date (YYYY, month 1–12, day) at a longitude.
 * Hours of a design day in local apparent solar time are solar noon ± whole hours.
 */
export function solarNoonUtc(
  year: number,
  month: number,
  day: number,
  latitudeDeg: number,
  longitudeDeg: number,
): Date {
  // Start from the site's mean noon so suncalc picks this calendar day's transit, not a neighbour's.
  const meanNoonUtcMs = Date.UTC(year, month - 1, day, 12) - (longitudeDeg / 15) * 3_600_000;
  return SunCalc.getTimes(new Date(meanNoonUtcMs), latitudeDeg, longitudeDeg).solarNoon;
}
