import type { MeasureResult, PaybackStatus } from './measure-types';

/** Simple payback and the order measures are listed in. */

export function paybackText(
  paybackYears: number | null,
  status: PaybackStatus = paybackYears === null ? 'never' : 'years',
): string {
  switch (status) {
    case 'immediate':
      return 'immediately';
    case 'enter-cost':
      return 'enter a cost';
    case 'enter-price':
      return 'enter the fuel price';
    case 'never':
      return 'never';
    case 'not-applicable':
      return 'not applicable';
    default:
      return paybackYears === null
        ? 'never'
        : `${paybackYears < 10 ? paybackYears.toFixed(1) : Math.round(paybackYears)} years`;
  }
}

/**
 * Status and years of a simple payback: cost ÷ yearly money saved. Without a fuel price
 * (`yearlyMoneySaved` null) a measure that saves fuel asks for the price.
 */
export function payback(
  costMoney: number | null,
  yearlyMoneySaved: number | null,
  applicable: boolean,
  fuelInputSavedKWh = 0,
): { status: PaybackStatus; years: number | null } {
  if (!applicable) return { status: 'not-applicable', years: null };
  if (yearlyMoneySaved === null) return { status: fuelInputSavedKWh > 0 ? 'enter-price' : 'never', years: null };
  if (!(yearlyMoneySaved > 0)) return { status: 'never', years: null };
  if (costMoney === null) return { status: 'enter-cost', years: null };
  if (costMoney === 0) return { status: 'immediate', years: 0 };
  return { status: 'years', years: costMoney / yearlyMoneySaved };
}

const STATUS_ORDER: Record<PaybackStatus, number> = {
  immediate: 0,
  years: 0,
  'enter-cost': 1,
  'enter-price': 1,
  never: 2,
  'not-applicable': 3,
};

/** Years ascending (immediate first), then without a cost, then never, then not applicable; ties by larger saving. */
export function compareMeasureResults(a: MeasureResult, b: MeasureResult): number {
  const byStatus = STATUS_ORDER[a.paybackStatus] - STATUS_ORDER[b.paybackStatus];
  if (byStatus !== 0) return byStatus;
  if (a.paybackStatus === 'not-applicable') return a.index - b.index;
  const byYears = (a.paybackYears ?? 0) - (b.paybackYears ?? 0);
  const bySaving = (b.yearlyMoneySaved ?? 0) - (a.yearlyMoneySaved ?? 0) || b.fuelInputSavedKWh - a.fuelInputSavedKWh;
  return byYears || bySaving || a.index - b.index;
}
