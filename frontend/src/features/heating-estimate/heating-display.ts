import type { HeatingConditionsSource, HeatingEstimate, ReferenceData } from '../../api/types';
import { referenceRows } from '../../lib/reference-data';

/** Words and small rules for showing a heating estimate (no components here). */

const SOURCE_WORDS = {
  'farm climate': 'farm climate',
  request: 'typed here',
  farm: 'farm',
  'reference data': 'default',
  'house night setpoint': 'night setpoint',
  default: 'default',
} as const;

/** How the API's source of a condition reads beside its value. */
export function sourceWord(source: HeatingConditionsSource[keyof HeatingConditionsSource]): string {
  return SOURCE_WORDS[source];
}

const LAYER_WORDS: Record<number, string> = { 0: 'opaque', 1: 'single layer', 2: 'double layer', 3: 'triple layer' };

/** A covering's name and, where the reference data says, its layers ("double layer"). */
export function coveringOf(
  referenceData: ReferenceData | undefined,
  coveringId: string,
): { label: string; layers: string | null } {
  const row = referenceRows(referenceData, 'coverings').find((candidate) => candidate.id === coveringId);
  const layers = typeof row?.layers === 'number' ? (LAYER_WORDS[row.layers] ?? `${row.layers} layers`) : null;
  return { label: row?.label ?? coveringId, layers };
}

/** The fewest heating units the estimate recommends (its assumption, else 2). */
export function minimumUnitCount(estimate: HeatingEstimate): number {
  const value = estimate.assumptions.find((assumption) => assumption.key === 'heater.minimumUnitCount')?.value;
  return typeof value === 'number' && value >= 1 ? value : 2;
}

export const NO_WRAP = { whiteSpace: 'nowrap' } as const;

export const SURFACE_LABELS = { roof: 'Roof', sidewalls: 'Sidewalls', endwalls: 'Endwalls' } as const;
