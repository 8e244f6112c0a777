import { loadReferenceData } from '../reference-data/load-reference-data';
import type { FuelRecordColumnMappingDto } from './dto/fuel-record.dto';
import { proposeMapping, readFuelCsv, recordProblems, recordsFromCsv } from './fuel-record-rules';

const ref = loadReferenceData();
const context = {
  ref,
  farmHouseIds: new Set([3, 4]),
  houseByName: new Map([
    ['north', 3],
    ['south', 4],
  ]),
};
const bytes = (text: string) => new TextEncoder().encode(text);

describe('fuel record rules', () => {
  const good = {
    fuelId: 'propane',
    quantity: 500,
    quantityUnit: 'US gal',
    cost: null,
    startDate: '2025-12-01',
    endDate: '2025-12-31',
    houseIds: [3],
    nonHeatingPerDay: null,
    note: null,
  };

  it('accepts a complete record and names each field that is wrong', () => {
    expect(recordProblems(good, ref, context.farmHouseIds)).toEqual([]);
    const fields = recordProblems(
      { ...good, quantity: 0, quantityUnit: 'kg', endDate: '2025-11-01', houseIds: [9] },
      ref,
      context.farmHouseIds,
    ).map((problem) => problem.field);
    expect(fields).toEqual(['quantityUnit', 'quantity', 'endDate', 'houseIds']);
  });

  it('reads a semicolon file with a byte-order mark and proposes its columns', () => {
    const csv = readFuelCsv(
      bytes('\uFEFFDelivered;Previous fill;Gallons;Greenhouse;Total $\n2026-01-10;2025-12-11;420;North;1.050,00\n'),
    );
    expect(csv.columns).toEqual(['Delivered', 'Previous fill', 'Gallons', 'Greenhouse', 'Total $']);
    expect(proposeMapping(csv.columns)).toMatchObject({
      startColumn: 'Previous fill',
      quantityColumn: 'Delivered',
      housesColumn: 'Greenhouse',
      costColumn: 'Total $',
    });
  });

  it('refuses an empty file and one that is not UTF-8, saying so', () => {
    expect(() => readFuelCsv(bytes(''))).toThrow();
    try {
      readFuelCsv(new Uint8Array([0x66, 0xff, 0xfe, 0x0a]));
    } catch (problems) {
      expect((problems as Array<{ message: string }>)[0].message).toMatch(/not UTF-8/);
    }
  });

  it('turns rows into records, or lists every problem by row (the header is row 1) and field', () => {
    const csv = readFuelCsv(
      bytes('From,To,Qty,Houses\n2025-12-01,2025-12-31,500,North; South\n2026-01-31,2026-01-01,-3,West\n'),
    );
    const mapping = {
      startColumn: 'From',
      endColumn: 'To',
      quantityColumn: 'Qty',
      housesColumn: 'Houses',
      fuelId: 'propane',
      unit: 'US gal',
    } as FuelRecordColumnMappingDto;
    const { records, problems } = recordsFromCsv(csv, mapping, context);
    expect(records).toEqual([{ ...good, houseIds: [3, 4], cost: null }]);
    expect(problems.map((problem) => problem.message)).toEqual([
      'Row 3, houses: there is no house called "West" on this farm',
      'Row 3, quantity: the quantity must be more than zero',
      'Row 3, end date: the period ends (2026-01-01) before it starts (2026-01-31)',
    ]);
  });

  it('asks for the fuel, unit and houses when the mapping gives neither a column nor a value', () => {
    const csv = readFuelCsv(bytes('From,To,Qty\n2025-12-01,2025-12-31,500\n'));
    const { problems } = recordsFromCsv(
      csv,
      { startColumn: 'From', endColumn: 'To', quantityColumn: 'Qty' } as FuelRecordColumnMappingDto,
      context,
    );
    expect(problems.map((problem) => problem.field)).toEqual([
      'mapping.fuelColumn',
      'mapping.unitColumn',
      'mapping.housesColumn',
    ]);
  });
});
