import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { ReferenceTable } from '@thermbay/engine/reference-data.types';
import { CONFIDENCE_LEVELS } from '@thermbay/engine/vocabulary';
import { provenanceProblems } from '@thermbay/engine/reference-data.types';
import { DEFAULT_REFERENCE_DATA_DIR, loadReferenceData } from './load-reference-data';

describe('reference-data provenance', () => {
  const ref = loadReferenceData();

  it('loads at least the heating tables', () => {
    for (const table of [
      'coverings',
      'air-leakage',
      'perimeter',
      'curtains',
      'surface-coefficients',
      'air-properties',
      'fuels',
      'heater-types',
      'heater-sizing',
      'safety',
    ]) {
      expect(ref[table]?.rows.length).toBeGreaterThan(0);
    }
  });

  it('every row of every table has a unique id, a source and a known confidence mark', () => {
    for (const [tableName, table] of Object.entries(ref)) {
      expect(provenanceProblems(tableName, table)).toEqual([]);
      for (const row of table.rows) {
        expect(typeof row.id).toBe('string');
        expect(row.source.trim().length).toBeGreaterThanOrEqual(8);
        expect(CONFIDENCE_LEVELS).toContain(row.confidence);
      }
    }
  });

  it('finds each kind of deliberate breakage in an in-memory table', () => {
    const good = { id: 'ok', source: 'A publication, table 1', confidence: 'memory' };
    const broken = {
      title: 'Broken',
      rows: [
        good,
        { ...good },
        { id: '', source: 'A publication, table 1', confidence: 'memory' },
        { id: 'no-source', confidence: 'verified' },
        { id: 'bad-mark', source: 'A publication, table 1', confidence: 'hearsay' },
      ],
    } as unknown as ReferenceTable;
    const problems = provenanceProblems('broken', broken);
    expect(problems).toEqual([
      expect.stringMatching(/row 1 .*repeats an id/),
      expect.stringMatching(/row 2 .*has no id/),
      expect.stringMatching(/row 3 .*has no source/),
      expect.stringMatching(/row 4 .*confidence/),
    ]);
    expect(provenanceProblems('untitled', { rows: [] } as unknown as ReferenceTable)).toHaveLength(1);
  });

  it('refuses to load a folder holding a table with a row lacking provenance', () => {
    const dir = mkdtempSync(join(tmpdir(), 'thermbay-ref-'));
    try {
      writeFileSync(
        join(dir, 'good.json'),
        JSON.stringify({ title: 'Good', rows: [{ id: 'a', source: 'A publication, table 1', confidence: 'derived' }] }),
      );
      expect(Object.keys(loadReferenceData(dir))).toEqual(['good']);
      writeFileSync(join(dir, 'bad.json'), JSON.stringify({ title: 'Bad', rows: [{ id: 'b', confidence: 'memory' }] }));
      expect(() => loadReferenceData(dir)).toThrow(/bad\.json.*no source/);
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('fuel SI heat contents are the US figures converted (1 Btu = 1055.056 J; 1 US gal = 3.785412 L; 1 ft³ = 0.0283168 m³; 1 short ton = 907.18474 kg; derived)', () => {
    const btuJ = 1055.056;
    const siPerUs: Record<string, number> = { 'US gal': 3.785412, 'short ton': 907.18474, kWh: 1 };
    const fuels = ref['fuels'].rows;
    for (const fuel of fuels) {
      const perUsUnitJ = (fuel.heatContentBtuPerUnitUs as number) * btuJ;
      if (fuel.id === 'natural-gas') {
        // billed per therm; SI per m³ from the per-ft³ figure (EIA 1,036 Btu/ft³)
        expect(fuel.heatContentBtuPerUnitUs).toBe(100_000);
        const perM3J = ((fuel.btuPerCubicFoot as number) * btuJ) / 0.0283168;
        expect(Math.abs((fuel.heatContentJPerUnitSi as number) / perM3J - 1)).toBeLessThan(0.001);
        continue;
      }
      const factor = siPerUs[fuel.unitUs as string];
      expect(factor).toBeDefined();
      expect(Math.abs(((fuel.heatContentJPerUnitSi as number) * factor) / perUsUnitJ - 1)).toBeLessThan(0.001);
    }
    // EIA: 3,412 Btu per kWh; NRCan: natural gas ≈ 37.5 MJ/m³ and propane ≈ 25.3 MJ/L (within 5 %)
    const byId = new Map(fuels.map((fuel) => [fuel.id, fuel]));
    expect(byId.get('electricity')!.heatContentBtuPerUnitUs).toBe(3412);
    expect(Math.abs((byId.get('natural-gas')!.heatContentJPerUnitSi as number) / 37.5e6 - 1)).toBeLessThan(0.05);
    expect(Math.abs((byId.get('propane')!.heatContentJPerUnitSi as number) / 25.3e6 - 1)).toBeLessThan(0.05);
  });

  it('reads the repository folder by default', () => {
    expect(DEFAULT_REFERENCE_DATA_DIR.endsWith('reference-data')).toBe(true);
  });
});
