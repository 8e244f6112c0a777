import type { CalibrationMeter, CalibrationPeriod } from '../../api/types';

/** Calibration results in words and as chart series. */

export function formatFactor(value: number | null | undefined): string {
  return value === null || value === undefined || !Number.isFinite(value) ? '—' : value.toFixed(2);
}

/** "1.24 (90 % interval 1.18 to 1.30)" */
export function factorWithInterval(meter: CalibrationMeter): string {
  if (!meter.fitted || meter.factor === null) return 'not fitted';
  return `${formatFactor(meter.factor)} (90 % interval ${formatFactor(meter.factorLow90)} to ${formatFactor(meter.factorHigh90)})`;
}

export function verdictLabel(meter: CalibrationMeter): { severity: 'success' | 'warning' | 'info'; label: string } {
  if (!meter.fitted) return { severity: 'info', label: 'No factor fitted' };
  return meter.meetsGuideline14
    ? { severity: 'success', label: 'Meets ASHRAE Guideline 14 (monthly)' }
    : { severity: 'warning', label: 'Does not meet ASHRAE Guideline 14 (monthly)' };
}

export function periodLabel(period: Pick<CalibrationPeriod, 'startDate' | 'endDate'>): string {
  return `${period.startDate} – ${period.endDate}`;
}

export interface MeterChartSeries {
  labels: string[];
  unit: string;
  billed: number[];
  handbook: number[];
  fitted: Array<number | null>;
}

/**
 * Billed and modelled fuel per period in the bills' own unit. Bills of a meter can be in
 * different units of the same fuel, so the chart uses the energy (kWh of fuel) when they differ.
 */
export function meterChartSeries(meter: CalibrationMeter): MeterChartSeries {
  const units = new Set(meter.periods.map((period) => period.quantityUnit));
  const sameUnit = units.size === 1;
  const unit = sameUnit ? [...units][0] : 'kWh of fuel';
  return {
    labels: meter.periods.map(periodLabel),
    unit,
    billed: meter.periods.map((p) => (sameUnit ? p.billedQuantity : p.billedFuelKWh)),
    handbook: meter.periods.map((p) => (sameUnit ? p.handbookQuantity : p.handbookFuelKWh)),
    fitted: meter.periods.map((p) => (sameUnit ? p.fittedQuantity : p.fittedFuelKWh)),
  };
}

function round(value: number): string {
  return new Intl.NumberFormat('en-US', { maximumFractionDigits: value >= 100 ? 0 : 1 }).format(value);
}

/** The chart's text alternative: totals and the period furthest off. */
export function meterChartSummary(meter: CalibrationMeter): string {
  const series = meterChartSeries(meter);
  if (series.labels.length === 0) return 'No bills.';
  const sum = (values: Array<number | null>) => values.reduce<number>((total, value) => total + (value ?? 0), 0);
  const parts = [
    `${series.labels.length} bills from ${meter.periods[0].startDate} to ${meter.periods[meter.periods.length - 1].endDate}`,
    `billed ${round(sum(series.billed))} ${series.unit} in all`,
    `the handbook model ${round(sum(series.handbook))} ${series.unit}`,
  ];
  if (meter.fitted) parts.push(`the calibrated model ${round(sum(series.fitted))} ${series.unit}`);
  let worst = -1;
  let worstGap = -1;
  series.billed.forEach((billed, index) => {
    const modelled = series.fitted[index] ?? series.handbook[index];
    const gap = billed > 0 ? Math.abs(modelled - billed) / billed : 0;
    if (gap > worstGap) {
      worstGap = gap;
      worst = index;
    }
  });
  if (worst >= 0)
    parts.push(`the furthest off is ${series.labels[worst]}, by ${Math.round(worstGap * 100)} % of its bill`);
  return `${parts.join('; ')}.`;
}
