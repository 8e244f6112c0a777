/**
 * For specs only (left out of the build): the repository's reference-data/ tables, read from disk
 * and checked for provenance exactly as the API does at boot.
 */
import { readdirSync, readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { provenanceProblems, type ReferenceData, type ReferenceTable } from '../reference-data.types';

const REFERENCE_DATA_DIR = resolve(__dirname, '..', '..', '..', '..', 'reference-data');

export function loadReferenceData(dir: string = REFERENCE_DATA_DIR): ReferenceData {
  const data: ReferenceData = {};
  for (const file of readdirSync(dir)
    .filter((name) => name.endsWith('.json'))
    .sort()) {
    const tableName = file.replace(/\.json$/, '');
    const table = JSON.parse(readFileSync(join(dir, file), 'utf8')) as ReferenceTable;
    const problems = provenanceProblems(tableName, table);
    if (problems.length > 0) throw new Error(`reference-data/${file}: ${problems.join('; ')}`);
    data[tableName] = table;
  }
  return data;
}
