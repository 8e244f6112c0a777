/**
 * How far a value can be trusted, and the record every estimate keeps of each value it used.
 * Handbook values arrive as rows of reference-data/ carrying a confidence; values the user typed
 * carry 'user-entered'.
 */
export type Confidence =
  /** read in a copy of the named source */
  | 'verified'
  /** read, but in a secondary copy or quotation of the source */
  | 'verified-secondary'
  /** derived by arithmetic from sourced values (the derivation is in `notes`) */
  | 'derived'
  /** recalled from handbooks without a copy at hand; treat as a range */
  | 'memory'
  /** a rule of thumb of the trade with no single published source */
  | 'common-practice';

export const CONFIDENCE_LEVELS: readonly Confidence[] = [
  'verified',
  'verified-secondary',
  'derived',
  'memory',
  'common-practice',
];

export type AssumptionConfidence = Confidence | 'user-entered';

export const ASSUMPTION_CONFIDENCES: readonly AssumptionConfidence[] = [...CONFIDENCE_LEVELS, 'user-entered'];

/** One value an estimate used: what it is, its value and unit, and where it came from. */
export interface Assumption {
  key: string;
  /** may hold {{kind:valueSI}} quantity tokens (see quantities.ts) */
  label: string;
  value: number | string;
  unit: string;
  source: string;
  confidence: AssumptionConfidence;
  /** true where the user's own value replaced the reference value */
  overridden: boolean;
}
