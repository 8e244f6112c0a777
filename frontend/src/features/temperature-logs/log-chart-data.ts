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
