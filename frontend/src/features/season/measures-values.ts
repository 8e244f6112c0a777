import type { Measure, MeasureComparison, MeasureKind, MeasureResult } from '../../api/types';
import type { Units } from '../../lib/units';

/** A measure's own settings (surfaces, heater type, degrees lowered …), kept as the API gave them. */
export type MeasureSettings = Omit<Measure, 'kind' | 'costAmount'>;

/** A measure as the user lists it: its kind, its settings and what it would cost ('' = not priced yet). */
export interface MeasureRow {
  kind: MeasureKind;
  cost: string;
  settings?: MeasureSettings;
}

/** Heater types a heater upgrade may install (fuel-fired, vented); the engine's default is condensing. */
export const UPGRADE_HEATER_TYPES: NonNullable<Measure['heaterType']>[] = [
  'condensing',
  'separated-combustion',
  'power-vented',
];

/** Rows from measures kept with the house (or any request list): cost as typed text, settings kept. */
export function rowsFromMeasures(measures: Measure[]): MeasureRow[] {
  return measures.map(({ kind, costAmount, ...settings }) => ({
    kind,
    cost: costAmount === null || costAmount === undefined ? '' : String(costAmount),
    ...(Object.keys(settings).length > 0 ? { settings } : {}),
  }));
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
  return rows.map((row) => ({
    kind: row.kind,
    ...(row.settings ?? {}),
    ...(row.cost.trim() === '' ? {} : { costAmount: Number(row.cost) }),
  }));
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
