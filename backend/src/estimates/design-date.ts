import { referenceRow, type ReferenceData, type ReferenceRow } from '@thermbay/engine/reference-data.types';

interface DesignDateRow extends ReferenceRow {
  monthDayNorth: string;
  monthDaySouth: string;
}

/** The year it is now at the farm (a farm in Auckland reaches the new year before one in Chicago). */
export function yearAtFarm(now: Date, timeZone: string): number {
  try {
    return Number(new Intl.DateTimeFormat('en-US', { timeZone, year: 'numeric' }).format(now));
  } catch {
    // a stored zone the runtime does not know: the UTC year is at most a day off
    return now.getUTCFullYear();
  }
}

/**
 * The default cooling design day: the reference-data month-day for the farm's hemisphere in the
 * current year at the farm. The clock is read by the caller and passed in.
 */
export function defaultCoolingDesignDate(latitudeDeg: number, now: Date, timeZone: string, ref: ReferenceData): string {
  const row = referenceRow<DesignDateRow>(ref, 'estimate-defaults', 'cooling-design-date');
  if (!row || typeof row.monthDayNorth !== 'string' || typeof row.monthDaySouth !== 'string') {
    throw new Error(
      'reference-data/estimate-defaults.json needs a row cooling-design-date with monthDayNorth and monthDaySouth',
    );
  }
  const monthDay = latitudeDeg >= 0 ? row.monthDayNorth : row.monthDaySouth;
  return `${yearAtFarm(now, timeZone)}-${monthDay}`;
}
