/**
 * Handbook values are never bare numbers in the engine: they arrive as rows of the JSON tables
 * in the repository's reference-data/ folder, each row carrying where it came from.
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

export interface ReferenceRow {
  id: string;
  label?: string;
  source: string;
  confidence: Confidence;
  notes?: string;
  [key: string]: unknown;
}

export interface ReferenceTable<Row extends ReferenceRow = ReferenceRow> {
  title: string;
  description?: string;
  rows: Row[];
}

/** Every table in reference-data/, keyed by file name without `.json`. */
export type ReferenceData = Record<string, ReferenceTable>;

/** Looks a row up by id; throws a plain Error (a programming error, not user input) if the table is absent. */
export function referenceTable<Row extends ReferenceRow = ReferenceRow>(
  ref: ReferenceData,
  tableName: string,
): ReferenceTable<Row> {
  const table = ref[tableName];
  if (!table) throw new Error(`reference-data/${tableName}.json is missing`);
  return table as ReferenceTable<Row>;
}

export function referenceRow<Row extends ReferenceRow = ReferenceRow>(
  ref: ReferenceData,
  tableName: string,
  id: string,
): Row | undefined {
  return referenceTable<Row>(ref, tableName).rows.find((row) => row.id === id);
}
