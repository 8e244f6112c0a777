import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Confidence, ReferenceData, ReferenceTable } from '../engine/reference-data.types';

export const CONFIDENCE_MARKS: readonly Confidence[] = [
  'verified',
  'verified-secondary',
  'derived',
  'memory',
  'common-practice',
];

/** The repository's reference-data/ folder, found from this file whether run from src/ or dist/. */
export const DEFAULT_REFERENCE_DATA_DIR = resolve(__dirname, '..', '..', '..', 'reference-data');

/**
 * Reads every JSON table in `dir` and refuses to go on if any row lacks an id, a source or a
 * known confidence mark: a handbook value without provenance is not allowed into the engine.
 */
export function loadReferenceData(dir: string = DEFAULT_REFERENCE_DATA_DIR): ReferenceData {
  const data: ReferenceData = {};
  for (const file of readdirSync(dir).filter((name) => name.endsWith('.json')).sort()) {
    const tableName = file.replace(/\.json$/, '');
    const table = JSON.parse(readFileSync(join(dir, file), 'utf8')) as ReferenceTable;
    const problems = provenanceProblems(tableName, table);
    if (problems.length > 0) {
      throw new Error(`reference-data/${file}: ${problems.join('; ')}`);
    }
    data[tableName] = table;
  }
  return data;
}

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
    if (!CONFIDENCE_MARKS.includes(row.confidence)) {
      problems.push(`${where} has no known confidence mark`);
    }
  });
  return problems;
}
