import { MONTH_SHORT_NAMES, type MonthFormValues } from './climate-form-values';

export interface ClimateChartSeries {
  labels: string[];
  /** mean daily minimum per month in the user's unit; null where the field is empty or not a number */
  minimum: (number | null)[];
  maximum: (number | null)[];
}

function typedNumber(text: string): number | null {
  if (text.trim() === '') return null;
  const value = Number(text);
  return Number.isFinite(value) ? value : null;
}

/**
 * The twelve months as typed (already in the user's unit), shaped for a line chart, so the
 * chart follows the table while the user edits it.
 */
export function climateChartSeries(monthly: MonthFormValues[]): ClimateChartSeries {
  return {
    labels: [...MONTH_SHORT_NAMES],
    minimum: MONTH_SHORT_NAMES.map((_label, index) => typedNumber(monthly[index]?.meanDailyMinC ?? '')),
    maximum: MONTH_SHORT_NAMES.map((_label, index) => typedNumber(monthly[index]?.meanDailyMaxC ?? '')),
  };
}
