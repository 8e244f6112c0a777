import type { MonthlyClimate, SiteClimate } from '../../api/types';
import type { Units } from '../../lib/units';
import { MONTH_NAMES } from '@thermbay/engine/vocabulary';

export { MONTH_NAMES };

export const MONTH_SHORT_NAMES = MONTH_NAMES.map((name) => name.slice(0, 3));

/** One month as typed: temperatures in the user's unit, clearness in %. */
export interface MonthFormValues {
  meanDailyMinC: string;
  meanDailyMaxC: string;
  clearnessPct: string;
}

export interface ClimateFormValues {
  winterDesignC: string;
  summerDesignC: string;
  summerDesignWetBulbC: string;
  summerDailyRangeK: string;
  monthly: MonthFormValues[];
  sourceNote: string;
  /** '' = the wind the U tables assume */
  designWindSpeedMPerS: string;
}

function monthRow(climate: SiteClimate | null, month: number): MonthlyClimate | undefined {
  return climate?.monthly.find((row) => row.month === month);
}

export function climateToFormValues(climate: SiteClimate | null, units: Units): ClimateFormValues {
  return {
    winterDesignC: units.toInput('temperature', climate?.winterDesignC),
    summerDesignC: units.toInput('temperature', climate?.summerDesignC),
    summerDesignWetBulbC: units.toInput('temperature', climate?.summerDesignWetBulbC),
    summerDailyRangeK: units.toInput('temperatureDifference', climate?.summerDailyRangeK),
    monthly: MONTH_NAMES.map((_name, index) => {
      const row = monthRow(climate, index + 1);
      return {
        meanDailyMinC: units.toInput('temperature', row?.meanDailyMinC),
        meanDailyMaxC: units.toInput('temperature', row?.meanDailyMaxC),
        clearnessPct: units.toInput('fraction', row?.clearness ?? null),
      };
    }),
    sourceNote: climate?.sourceNote ?? '',
    designWindSpeedMPerS: units.toInput('windSpeed', climate?.designWindSpeedMPerS ?? null),
  };
}

/**
 * Typed values → the API's SI body. A value the user left as it was goes back exactly as stored
 * (no rounded round trip through °F).
 */
export function formValuesToClimate(
  values: ClimateFormValues,
  initial: ClimateFormValues,
  stored: SiteClimate | null,
  units: Units,
): SiteClimate {
  const temperature = (typed: string, initialTyped: string, storedC: number | undefined) =>
    storedC !== undefined && typed === initialTyped ? storedC : units.fromDisplay('temperature', Number(typed));
  return {
    winterDesignC: temperature(values.winterDesignC, initial.winterDesignC, stored?.winterDesignC),
    summerDesignC: temperature(values.summerDesignC, initial.summerDesignC, stored?.summerDesignC),
    summerDesignWetBulbC: temperature(
      values.summerDesignWetBulbC,
      initial.summerDesignWetBulbC,
      stored?.summerDesignWetBulbC,
    ),
    summerDailyRangeK:
      stored && values.summerDailyRangeK === initial.summerDailyRangeK
        ? stored.summerDailyRangeK
        : units.fromDisplay('temperatureDifference', Number(values.summerDailyRangeK)),
    monthly: values.monthly.map((month, index) => {
      const storedRow = monthRow(stored, index + 1);
      const initialRow = initial.monthly[index]!;
      const clearnessTyped = month.clearnessPct.trim();
      let clearness: number | null;
      if (clearnessTyped === '') clearness = null;
      else if (storedRow?.clearness != null && clearnessTyped === initialRow.clearnessPct)
        clearness = storedRow.clearness;
      else clearness = units.fromDisplay('fraction', Number(clearnessTyped));
      return {
        month: index + 1,
        meanDailyMinC: temperature(month.meanDailyMinC, initialRow.meanDailyMinC, storedRow?.meanDailyMinC),
        meanDailyMaxC: temperature(month.meanDailyMaxC, initialRow.meanDailyMaxC, storedRow?.meanDailyMaxC),
        clearness,
      };
    }),
    sourceNote: values.sourceNote.trim() || null,
    designWindSpeedMPerS:
      values.designWindSpeedMPerS.trim() === ''
        ? null
        : stored?.designWindSpeedMPerS != null && values.designWindSpeedMPerS === initial.designWindSpeedMPerS
          ? stored.designWindSpeedMPerS
          : units.fromDisplay('windSpeed', Number(values.designWindSpeedMPerS)),
  };
}

/**
 * The API names a field as the engine does ('climate.monthly[2].meanDailyMinC', 422) or as the
 * validation pipe does ('monthly.2.meanDailyMinC', 400); both become the form's path.
 */
export function apiFieldToFormPath(field: string): string {
  return field
    .replace(/^climate\./, '')
    .replace(/\.(\d+)(?=\.|$)/g, '[$1]')
    .replace(/\.clearness$/, '.clearnessPct');
}
