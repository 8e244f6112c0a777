import type { HeaterType } from '../vocabulary';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import type { SeasonVariant, VariantOptions } from '../estimate-season';
import type { LightChange } from './measure-types';

/** What every measure's plan shares: its defaults row, its context and the plan it returns. */

export interface MeasureDefaultsRow extends ReferenceRow {
  targetCoveringId?: string;
  surfaces?: Array<'roof' | 'sidewalls'>;
  defaultCurtainId?: string;
  defaultAirLeakageClassId?: string;
  defaultLowerByK?: number;
  defaultDelayDays?: number;
  defaultHeaterType?: HeaterType;
  targetKneewallId?: string;
  defaultKneewallHeightM?: number;
  shadeFraction?: number;
}

export function measureDefaults(ref: ReferenceData, id: string): MeasureDefaultsRow {
  const row = referenceRow<MeasureDefaultsRow>(ref, 'measures', id);
  if (!row) throw new Error(`reference-data/measures.json has no row ${id}`);
  return row;
}

export const percent = (fraction: number) => `${Math.round(fraction * 100)} %`;

export interface PreparedMeasure {
  variant: SeasonVariant;
  options: VariantOptions;
  description: string;
  lightChange: LightChange | null;
  notes: string[];
  /** set when the measure changes nothing for this house */
  notApplicableReason: string | null;
}

/** The house variant a measure starts from, and where its errors point. */
export interface MeasureContext {
  /** dotted path of the measure in the request, e.g. measures[2] */
  field: string;
  base: SeasonVariant;
  house: HouseSpec;
  ref: ReferenceData;
  /** the base variant with some house fields changed */
  withHouse(changed: Partial<HouseSpec>): SeasonVariant;
}

export function measureContext(index: number, base: SeasonVariant, ref: ReferenceData): MeasureContext {
  const house = base.house;
  return {
    field: `measures[${index}]`,
    base,
    house,
    ref,
    withHouse: (changed) => ({ ...base, house: { ...house, ...changed } }),
  };
}

export function notApplicable(base: SeasonVariant, description: string, reason: string): PreparedMeasure {
  return { variant: base, options: {}, description, lightChange: null, notes: [], notApplicableReason: reason };
}
