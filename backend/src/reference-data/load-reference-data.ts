import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { provenanceProblems, type ReferenceData, type ReferenceTable } from '@thermbay/engine/reference-data.types';

/** The repository's reference-data/ folder, found from this file whether run from src/ or dist/. */
export const DEFAULT_REFERENCE_DATA_DIR = resolve(__dirname, '..', '..', '..', 'reference-data');

/**
 * Reads every JSON table in `dir` and refuses to go on if any row lacks an id, a source or a
 * known confidence mark: a handbook value without provenance is not allowed into the engine.
 */
export function loadReferenceData(dir: string = DEFAULT_REFERENCE_DATA_DIR): ReferenceData {
  const data: ReferenceData = {};
  for (const file of readdirSync(dir)
    .filter((name) => name.endsWith('.json'))
    .sort()) {
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
