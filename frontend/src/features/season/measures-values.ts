import type { Measure, MeasureComparison, MeasureKind, MeasureResult } from '../../api/types';
import type { Units } from '../../lib/units';

/** A measure as the user lists it: its kind and what it would cost ('' = not priced yet). */
export interface MeasureRow {
  kind: MeasureKind;
  cost: string;
}

export const MEASURE_KIND_LABELS: Record<MeasureKind, string> = {
  'second-poly-layer': 'Add a second plastic layer',
  'thermal-curtain': 'Install a thermal curtain',
  'perimeter-insulation': 'Insulate the perimeter',
  sealing: 'Seal air leaks',
  'night-setpoint-lower': 'Lower the night setpoint',
  'later-start': 'Start the heated crop later',
  'heater-efficiency': 'More efficient heaters',
  'fuel-switch': 'Switch fuel',
};

/** Measures a user may add from the page; a fuel switch needs a fuel and a price, so it is left out. */
export const ADDABLE_MEASURE_KINDS: MeasureKind[] = [
  'second-poly-layer',
  'thermal-curtain',
  'perimeter-insulation',
  'sealing',
  'night-setpoint-lower',
  'later-start',
  'heater-efficiency',
];

/** The default comparison's measures, in request order, as rows to price. */
export function rowsFromComparison(comparison: MeasureComparison): MeasureRow[] {
  return [...comparison.measures]
    .sort((a, b) => a.index - b.index)
    .map((measure) => ({ kind: measure.kind, cost: '' }));
}

export function isValidCost(text: string): boolean {
  if (text.trim() === '') return true;
  const value = Number(text);
  return Number.isFinite(value) && value >= 0 && value <= 1e9;
}

/** Rows → the request's measures; an unpriced measure goes without a cost (its payback then asks for one). */
export function measuresRequestBody(rows: MeasureRow[]): Measure[] {
  return rows.map((row) =>
    row.cost.trim() === '' ? { kind: row.kind } : { kind: row.kind, costAmount: Number(row.cost) },
  );
}

/** "Roof: 78 % → 76 % (3 % less light)" for layer and screen measures. */
export function lightChangeText(measure: Pick<MeasureResult, 'lightChange'>, units: Units): string {
  const change = measure.lightChange;
  if (!change) return '—';
  const surface = change.surface === 'roof' ? 'Roof' : 'Sidewalls';
  const relative = units.format('fraction', Math.abs(change.relativeChange));
  const direction = change.relativeChange < 0 ? 'less' : 'more';
  return `${surface}: ${units.format('fraction', change.before)} → ${units.format('fraction', change.after)} (${relative} ${direction} light)`;
}

const PAYBACK_WORDS: Record<Exclude<MeasureResult['paybackStatus'], 'years'>, string> = {
  immediate: 'immediately',
  'enter-cost': 'enter a cost',
  'enter-price': 'enter the fuel price',
  never: 'never',
  'not-applicable': '—',
};

/** The payback as the table shows it, from the API's status (never from its wording). */
export function paybackText(measure: Pick<MeasureResult, 'paybackStatus' | 'paybackYears' | 'paybackText'>): string {
  if (measure.paybackStatus === 'years') return measure.paybackText;
  return PAYBACK_WORDS[measure.paybackStatus];
}
