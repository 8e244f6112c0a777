import type { TemperatureLogDay } from '../../api/types';
import type { Units } from '../../lib/units';

export interface LogChartSeries {
  labels: string[];
  minimum: (number | null)[];
  mean: number[];
  maximum: (number | null)[];
  unitLabel: string;
}

/** A stored log's days (°C) as chart series in the user's temperature unit, oldest first. */
export function logChartSeries(days: TemperatureLogDay[], units: Units): LogChartSeries {
  const ordered = [...days].sort((a, b) => a.date.localeCompare(b.date));
  const decimals = units.decimals('temperature');
  const shown = (celsius: number) => Number(units.toDisplay('temperature', celsius).toFixed(decimals));
  return {
    labels: ordered.map((day) => day.date),
    minimum: ordered.map((day) => (day.minC === null ? null : shown(day.minC))),
    mean: ordered.map((day) => shown(day.meanC)),
    maximum: ordered.map((day) => (day.maxC === null ? null : shown(day.maxC))),
    unitLabel: units.label('temperature'),
  };
}

/** The chart in words: how many days, the coldest and the warmest day by their mean. */
export function logSummary(
  days: ReadonlyArray<{ date: string; meanC: number }>,
  temperature: (celsius: number) => string,
): string {
  if (days.length === 0) return 'No days in this log.';
  let coldest = days[0];
  let warmest = days[0];
  for (const day of days) {
    if (day.meanC < coldest.meanC) coldest = day;
    if (day.meanC > warmest.meanC) warmest = day;
  }
  return `${days.length} day${days.length === 1 ? '' : 's'}; the coldest day by its mean was ${coldest.date} (${temperature(coldest.meanC)}), the warmest ${warmest.date} (${temperature(warmest.meanC)}).`;
}
