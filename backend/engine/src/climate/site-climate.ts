import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS, OUTDOOR_TEMPERATURE_LIMITS_C } from '../vocabulary';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';

/** Monthly climate normals of one month. */
export interface MonthlyClimate {
  /** 1 = January … 12 = December */
  month: number;
  /** mean of the daily minimum temperatures, °C */
  meanDailyMinC: number;
  /** mean of the daily maximum temperatures, °C */
  meanDailyMaxC: number;
  /** actual ÷ clear-sky global horizontal irradiance over the month, 0–1; default from reference data */
  clearness?: number;
  /**
   * mean dew point of the month, °C; the season's night sky uses it where given, else the day's
   * minimum temperature (reference-data/sky-radiation.json night-dew-point-from-daily-minimum)
   */
  meanDewPointC?: number | null;
}

/** The climate of a farm: design temperatures and 12 months of normals. */
export interface SiteClimate {
  /** heating design dry bulb (99 % or 99.6 %), °C */
  winterDesignC: number;
  /** cooling design dry bulb (1 %), °C */
  summerDesignC: number;
  /** wet bulb coincident with the summer design dry bulb, °C */
  summerDesignWetBulbC: number;
  /** exactly 12 rows, one per month */
  monthly: MonthlyClimate[];
}

interface ClearnessRow extends ReferenceRow {
  clearnessByMonth: number[];
}

export const DEFAULT_CLEARNESS_ROW_ID = 'clearness-monthly-default';

/** Throws EngineInputError naming the field unless the climate is complete and physically sensible. */
export function validateSiteClimate(climate: SiteClimate, fieldPrefix = 'climate'): SiteClimate {
  if (!climate || typeof climate !== 'object') {
    throw new EngineInputError(fieldPrefix, `${fieldPrefix} is required`);
  }
  requireInRange(
    `${fieldPrefix}.winterDesignC`,
    climate.winterDesignC,
    BOUNDS.designOutdoorC.min,
    BOUNDS.designOutdoorC.max,
  );
  requireInRange(
    `${fieldPrefix}.summerDesignC`,
    climate.summerDesignC,
    BOUNDS.summerDesignC.min,
    BOUNDS.summerDesignC.max,
  );
  requireInRange(
    `${fieldPrefix}.summerDesignWetBulbC`,
    climate.summerDesignWetBulbC,
    OUTDOOR_TEMPERATURE_LIMITS_C.min,
    OUTDOOR_TEMPERATURE_LIMITS_C.max,
  );
  if (climate.summerDesignWetBulbC > climate.summerDesignC) {
    throw new EngineInputError(
      `${fieldPrefix}.summerDesignWetBulbC`,
      'the wet bulb cannot be above the dry bulb it goes with',
    );
  }
  if (!Array.isArray(climate.monthly) || climate.monthly.length !== 12) {
    throw new EngineInputError(`${fieldPrefix}.monthly`, 'monthly normals need exactly 12 rows, one per month');
  }
  const seen = new Set<number>();
  climate.monthly.forEach((row, index) => {
    const at = `${fieldPrefix}.monthly[${index}]`;
    requireInRange(`${at}.month`, row.month, 1, 12);
    if (!Number.isInteger(row.month)) throw new EngineInputError(`${at}.month`, 'month must be a whole number 1–12');
    if (seen.has(row.month)) throw new EngineInputError(`${at}.month`, `month ${row.month} appears twice`);
    seen.add(row.month);
    const { min, max } = OUTDOOR_TEMPERATURE_LIMITS_C;
    requireInRange(`${at}.meanDailyMinC`, row.meanDailyMinC, min, max);
    requireInRange(`${at}.meanDailyMaxC`, row.meanDailyMaxC, min, max);
    if (row.meanDailyMinC > row.meanDailyMaxC) {
      throw new EngineInputError(
        `${at}.meanDailyMinC`,
        'the mean daily minimum cannot be above the mean daily maximum',
      );
    }
    if (row.clearness !== undefined && row.clearness !== null) requireInRange(`${at}.clearness`, row.clearness, 0, 1);
    if (row.meanDewPointC !== undefined && row.meanDewPointC !== null) {
      requireInRange(`${at}.meanDewPointC`, row.meanDewPointC, min, row.meanDailyMaxC);
    }
  });
  return climate;
}

/** The climate's rows ordered January → December (validation has made sure all 12 exist). */
export function monthsInOrder(climate: SiteClimate): MonthlyClimate[] {
  return [...climate.monthly].sort((a, b) => a.month - b.month);
}

/** The reference row of default monthly clearness (a placeholder; see climate-defaults.json). */
export function defaultClearnessRow(ref: ReferenceData): ClearnessRow {
  const row = referenceRow<ClearnessRow>(ref, 'climate-defaults', DEFAULT_CLEARNESS_ROW_ID);
  if (!row || !Array.isArray(row.clearnessByMonth) || row.clearnessByMonth.length !== 12) {
    throw new Error(`reference-data/climate-defaults.json needs a ${DEFAULT_CLEARNESS_ROW_ID} row with 12 values`);
  }
  return row;
}

/**
 * Clearness per month (index 0 = January), the climate's own value where given, otherwise the
 * reference default. `overridden[i]` says whether month i came from the user.
 */
export function clearnessByMonth(
  climate: SiteClimate | null,
  ref: ReferenceData,
): { clearness: number[]; fromUser: boolean[] } {
  const defaults = defaultClearnessRow(ref).clearnessByMonth;
  const clearness = defaults.slice();
  const fromUser = defaults.map(() => false);
  if (climate) {
    for (const row of climate.monthly) {
      if (typeof row.clearness === 'number') {
        clearness[row.month - 1] = row.clearness;
        fromUser[row.month - 1] = true;
      }
    }
  }
  return { clearness, fromUser };
}
