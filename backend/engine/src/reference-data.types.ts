/**
 * Handbook values are never bare numbers in the engine: they arrive as rows of the JSON tables
 * in the repository's reference-data/ folder, each row carrying where it came from.
 */
import { CONFIDENCE_LEVELS, type Confidence } from './vocabulary';

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

/** What a table lacks to be allowed into the engine: ids, sources and known confidence marks. */
export function provenanceProblems(tableName: string, table: ReferenceTable): string[] {
  const problems: string[] = [];
  if (!table || typeof table.title !== 'string' || !Array.isArray(table.rows)) {
    return [`${tableName} needs a title and a rows array`];
  }
  const seen = new Set<string>();
  table.rows.forEach((row, index) => {
    const where = `row ${index} (${row?.id ?? 'no id'})`;
    if (typeof row.id !== 'string' || row.id === '') problems.push(`${where} has no id`);
    else if (seen.has(row.id)) problems.push(`${where} repeats an id`);
    else seen.add(row.id);
    if (typeof row.source !== 'string' || row.source.trim().length < 8) {
      problems.push(`${where} has no source`);
    }
    if (!CONFIDENCE_LEVELS.includes(row.confidence)) {
      problems.push(`${where} has no known confidence mark`);
    }
  });
  return problems;
}
