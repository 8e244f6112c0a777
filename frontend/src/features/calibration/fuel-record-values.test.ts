import { describe, expect, it } from 'vitest';
import {
  newRow,
  nextDay,
  parseCellNumber,
  rowChanges,
  rowProblems,
  unitsOfFuel,
  type FuelOption,
  type FuelRecordRow,
} from './fuel-record-values';

const fuels: FuelOption[] = [
  { id: 'propane', label: 'Propane', units: ['L', 'US gal'] },
  { id: 'electricity', label: 'Electricity', units: ['kWh'] },
];

const row: FuelRecordRow = {
  id: 1,
  fuelId: 'propane',
  quantity: 1200,
  quantityUnit: 'US gal',
  cost: null,
  startDate: '2025-12-01',
  endDate: '2025-12-31',
  houseIds: [3, 4],
  nonHeatingPerDay: null,
  version: 2,
};

describe('fuel record rows', () => {
  it('accepts a complete row', () => {
    expect(rowProblems(row, fuels)).toEqual([]);
  });

  it('names each problem in the user’s words', () => {
    const problems = rowProblems(
      { ...row, quantity: 0, quantityUnit: 'therm', endDate: '2025-11-30', houseIds: [] },
      fuels,
    );
    expect(problems.map((problem) => problem.field)).toEqual(['quantityUnit', 'quantity', 'endDate', 'houseIds']);
    expect(problems[0].message).toBe('Choose the unit: L or US gal.');
    expect(problems[2].message).toBe('The period ends before it starts.');
  });

  it('refuses dates that do not exist', () => {
    expect(rowProblems({ ...row, endDate: '2026-02-30' }, fuels).map((p) => p.field)).toEqual(['endDate']);
  });

  it('a new row follows the previous bill: same fuel, unit and houses, from the day after it ended', () => {
    const next = newRow(fuels, row, 'us', 7);
    expect(next).toMatchObject({
      id: 'new-7',
      isNew: true,
      fuelId: 'propane',
      quantityUnit: 'US gal',
      startDate: '2026-01-01',
      houseIds: [3, 4],
      quantity: null,
    });
    expect(newRow(fuels, undefined, 'si', 1)).toMatchObject({ fuelId: 'propane', quantityUnit: 'L', startDate: '' });
    expect(newRow(fuels, undefined, 'us', 1).quantityUnit).toBe('US gal');
  });

  it('sends only what changed', () => {
    expect(rowChanges({ ...row, quantity: 1300, houseIds: [3] }, row)).toEqual({ quantity: 1300, houseIds: [3] });
    expect(rowChanges(row, row)).toEqual({});
  });

  it('reads typed numbers with a decimal comma, and empty as none', () => {
    expect(parseCellNumber('1200,5')).toBe(1200.5);
    expect(parseCellNumber('')).toBeNull();
    expect(parseCellNumber('abc')).toBeNaN();
    expect(parseCellNumber(42)).toBe(42);
  });

  it('knows each fuel’s units and the day after a date (leap year)', () => {
    expect(unitsOfFuel(fuels, 'electricity')).toEqual(['kWh']);
    expect(unitsOfFuel(fuels, 'unknown')).toEqual([]);
    expect(nextDay('2028-02-28')).toBe('2028-02-29');
  });
});
