import type { Lamps } from '../house.types';
import { lampPower, lampsInUse, overlapLength } from '../lamps/lamps';
import { sunTimes } from '../solar';

/**
 * The lamps on the summer design day (reference-data/lamps.json 'schedule-block-ending-at-sunrise'):
 * one block of the design month's hours ending at sunrise, on a day that repeats itself, so a
 * block reaching back before midnight runs in the evening of the same design day. Hour h of the
 * design day (local apparent solar time) stands for [h − ½, h + ½).
 */
export interface DesignDayLamps {
  /** electrical input while on, W */
  electricW: number;
  /** heat into the house while on, W */
  heatW: number;
  /** hours the lamps run on the design day (the design month's value) */
  hoursOn: number;
  /** sunrise in solar hours (0 where the sun does not set) */
  sunriseSolarHour: number;
  /** share of each design-day hour the lamps run, 0–1 (24 values) */
  onShareByHour: number[];
  /** lamp heat in each design-day hour, W (24 values) */
  heatByHourW: number[];
}

/** Sunrise on the design date in hours of local apparent solar time (hour 12 = `noonUtc`). */
export function sunriseSolarHour(noonUtc: Date, latitudeDeg: number, longitudeDeg: number): number {
  const { sunrise } = sunTimes(noonUtc, latitudeDeg, longitudeDeg);
  if (!sunrise) return 0;
  return 12 + (sunrise.getTime() - noonUtc.getTime()) / 3_600_000;
}

/** Share of each of the 24 design-day hours inside the daily block [end − hoursOn, end]. */
export function blockShareByHour(hoursOn: number, endHour: number): number[] {
  const start = endHour - hoursOn;
  return Array.from({ length: 24 }, (_, hour) => {
    let on = 0;
    for (const shift of [-24, 0, 24]) on += overlapLength(hour - 0.5, hour + 0.5, start + shift, endHour + shift);
    return Math.min(1, on);
  });
}

/** The lamps on the design day; null without lamps or when they do not run in the design month. */
export function designDayLamps(
  lamps: Lamps | null | undefined,
  floorAreaM2: number,
  month: number,
  noonUtc: Date,
  latitudeDeg: number,
  longitudeDeg: number,
): DesignDayLamps | null {
  if (!lampsInUse(lamps)) return null;
  const hoursOn = lamps.hoursPerDayByMonth[month - 1];
  if (!(hoursOn > 0)) return null;
  const power = lampPower(lamps, floorAreaM2);
  const sunrise = sunriseSolarHour(noonUtc, latitudeDeg, longitudeDeg);
  const onShareByHour = blockShareByHour(hoursOn, sunrise);
  return {
    ...power,
    hoursOn,
    sunriseSolarHour: sunrise,
    onShareByHour,
    heatByHourW: onShareByHour.map((share) => share * power.heatW),
  };
}
