import { BOUNDS, SURFACE_GROUPS, type SurfaceGroup } from '../vocabulary';
import { requireInRange } from '../errors';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { requiredRow } from './heating-reference';

/**
 * Wind on the design night. Tabulated U-values assume a winter wind of about 6.7 m/s (15 mph);
 * at another design wind w each covering's U is scaled by the measured slope of small houses
 * (Mihara & Hayashi 1979, k = a + b·w, reference-data/wind.json):
 *   U(w) = U_table × (a + b·w) / (a + b·w_table)
 * with (a, b) for single film, single glass or rigid sheet, or a double covering. Opaque
 * coverings (layers 0) keep their U. Air leakage follows the stated rule
 *   ACH(w) = ACH_table × (s + (1 − s) · w / w_table),
 * s being the share not driven by wind. Both factors grow with w, so more wind never lowers the loss.
 */
export interface WindCorrection {
  windSpeedMPerS: number;
  /** the wind the tables assume, m/s */
  tableWindSpeedMPerS: number;
  /** U(w) ÷ U_table per covering group */
  uFactor: Record<SurfaceGroup, number>;
  /** which measured relation each group follows (a wind.json row id), or null for an opaque covering */
  relation: Record<SurfaceGroup, string | null>;
  /** ACH(w) ÷ ACH_table */
  infiltrationFactor: number;
  rows: { defaultWind: WindRow; infiltration: WindRow; relations: WindRow[] };
}

export interface WindRow extends ReferenceRow {
  label: string;
  valueMPerS?: number;
  aWPerM2K?: number;
  bWsPerM3K?: number;
  stackShare?: number;
  referenceWindMPerS?: number;
}

interface CoveringKindRow extends ReferenceRow {
  layers?: number;
}

/** The measured relation a covering follows: by its layers, and film against rigid sheet. */
export function windRelationId(covering: CoveringKindRow): string | null {
  const layers = covering.layers ?? 1;
  if (layers <= 0) return null;
  if (layers >= 2) return 'wind-u-double';
  return /poly|film/.test(covering.id) ? 'wind-u-single-film' : 'wind-u-single-rigid';
}

export function windCorrection(house: HouseSpec, ref: ReferenceData, windSpeedMPerS?: number): WindCorrection {
  const defaultWind = requiredRow<WindRow>(ref, 'wind', 'design-wind-default');
  const infiltration = requiredRow<WindRow>(ref, 'wind', 'wind-infiltration');
  const tableWind = defaultWind.valueMPerS as number;
  const w =
    windSpeedMPerS === undefined
      ? tableWind
      : requireInRange(
          'conditions.designWindSpeedMPerS',
          windSpeedMPerS,
          BOUNDS.designWindSpeedMPerS.min,
          BOUNDS.designWindSpeedMPerS.max,
        );
  const uFactor = {} as Record<SurfaceGroup, number>;
  const relation = {} as Record<SurfaceGroup, string | null>;
  const relations: WindRow[] = [];
  for (const group of SURFACE_GROUPS) {
    const covering = referenceRow<CoveringKindRow>(ref, 'coverings', house.coverings[group]);
    const id = covering ? windRelationId(covering) : null;
    relation[group] = id;
    if (id === null) {
      uFactor[group] = 1;
      continue;
    }
    const row = requiredRow<WindRow>(ref, 'wind', id);
    if (!relations.includes(row)) relations.push(row);
    const a = row.aWPerM2K as number;
    const b = row.bWsPerM3K as number;
    uFactor[group] = (a + b * w) / (a + b * tableWind);
  }
  const stackShare = infiltration.stackShare as number;
  const infiltrationFactor = stackShare + ((1 - stackShare) * w) / (infiltration.referenceWindMPerS as number);
  return {
    windSpeedMPerS: w,
    tableWindSpeedMPerS: tableWind,
    uFactor,
    relation,
    infiltrationFactor,
    rows: { defaultWind, infiltration, relations },
  };
}
