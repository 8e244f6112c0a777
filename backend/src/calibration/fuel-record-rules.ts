import { parse } from 'csv-parse/sync';
import { isCalendarDate } from '../common/validation';
import type { FieldProblem } from '../common/filters/all-exceptions.filter';
import { fuelUnits } from '@thermbay/engine/calibration/fuel-units';
import { MAX_SEASON_DAYS } from '@thermbay/engine/season/season-hours';
import { referenceTable, type ReferenceData } from '@thermbay/engine/reference-data.types';
import type { FuelRow } from '@thermbay/engine/season/fuel';
import type { FuelRecordColumnMappingDto } from './dto/fuel-record.dto';

/** The rules a fuel record must meet, shared by the form, the table and the CSV upload. */

export const FUEL_RECORD_CSV_MAX_BYTES = 256 * 1024;
export const FUEL_RECORD_CSV_MAX_ROWS = 2000;
const MAX_LISTED_PROBLEMS = 30;

/** What the user calls each field, for messages. */
export const FIELD_WORDS: Record<string, string> = {
  fuelId: 'fuel',
  quantity: 'quantity',
  quantityUnit: 'unit',
  cost: 'cost',
  startDate: 'start date',
  endDate: 'end date',
  houseIds: 'houses',
  nonHeatingPerDay: 'non-heating use per day',
};

export interface FuelRecordCandidate {
  fuelId: string;
  quantity: number;
  quantityUnit: string;
  cost: number | null;
  startDate: string;
  endDate: string;
  houseIds: number[];
  nonHeatingPerDay: number | null;
  note: string | null;
}

export function daysOf(startDate: string, endDate: string): number {
  return Math.round((Date.parse(`${endDate}T00:00:00Z`) - Date.parse(`${startDate}T00:00:00Z`)) / 86_400_000) + 1;
}

export function fuelById(ref: ReferenceData, fuelId: string): FuelRow | undefined {
  return referenceTable(ref, 'fuels').rows.find((row) => row.id === fuelId) as FuelRow | undefined;
}

/** Problems of a record that do not depend on what is stored, besides its houses being the farm's. */
export function recordProblems(
  record: FuelRecordCandidate,
  ref: ReferenceData,
  farmHouseIds: ReadonlySet<number>,
): FieldProblem[] {
  const problems: FieldProblem[] = [];
  const fuel = fuelById(ref, record.fuelId);
  if (!fuel) {
    const known = referenceTable(ref, 'fuels')
      .rows.map((row) => (row as FuelRow).label.toLowerCase())
      .join(', ');
    problems.push({ field: 'fuelId', message: `"${record.fuelId}" is not a fuel Thermbay knows (${known})` });
  } else if (!fuelUnits(fuel).includes(record.quantityUnit)) {
    problems.push({
      field: 'quantityUnit',
      message: `${fuel.label} is counted in ${fuelUnits(fuel).join(' or ')}, not in "${record.quantityUnit}"`,
    });
  }
  if (!(record.quantity > 0)) problems.push({ field: 'quantity', message: 'the quantity must be more than zero' });
  if (isCalendarDate(record.startDate) && isCalendarDate(record.endDate)) {
    if (record.endDate < record.startDate) {
      problems.push({
        field: 'endDate',
        message: `the period ends (${record.endDate}) before it starts (${record.startDate})`,
      });
    } else if (daysOf(record.startDate, record.endDate) > MAX_SEASON_DAYS) {
      problems.push({ field: 'endDate', message: `one bill covers at most ${MAX_SEASON_DAYS} days; split it` });
    }
  }
  if (record.houseIds.length === 0)
    problems.push({ field: 'houseIds', message: 'choose at least one house the fuel went to' });
  const strangers = record.houseIds.filter((id) => !farmHouseIds.has(id));
  if (strangers.length > 0) {
    problems.push({ field: 'houseIds', message: `house ${strangers.join(', ')} is not on this farm` });
  }
  return problems;
}

// ---------------------------------------------------------------------------------------------
// CSV

export interface ParsedCsv {
  columns: string[];
  rows: string[][];
}

/** Reads a small CSV (comma, semicolon or tab; UTF-8, byte-order mark allowed); throws FieldProblem[] on failure. */
export function readFuelCsv(bytes: Uint8Array): ParsedCsv {
  if (bytes.length === 0) throw [{ field: 'file', message: 'the file is empty' }];
  let text: string;
  try {
    text = new TextDecoder('utf-8', { fatal: true }).decode(bytes);
  } catch {
    throw [{ field: 'file', message: 'the file is not UTF-8 text; save it as "CSV UTF-8" and try again' }];
  }
  text = text.replace(/^\uFEFF/, '');
  const firstLine = text.split(/\r?\n/, 1)[0] ?? '';
  const delimiter = [',', ';', '\t'].reduce((best, candidate) =>
    firstLine.split(candidate).length > firstLine.split(best).length ? candidate : best,
  );
  let records: string[][];
  try {
    records = parse(text, { delimiter, skip_empty_lines: true, relax_column_count: true, trim: true });
  } catch (error) {
    throw [{ field: 'file', message: `the file cannot be read as CSV: ${(error as Error).message}` }];
  }
  if (records.length < 2) throw [{ field: 'file', message: 'the file needs a header row and at least one bill' }];
  if (records.length - 1 > FUEL_RECORD_CSV_MAX_ROWS) {
    throw [{ field: 'file', message: `the file holds more than ${FUEL_RECORD_CSV_MAX_ROWS} bills; split it` }];
  }
  return { columns: records[0], rows: records.slice(1) };
}

const GUESSES: Array<[keyof FuelRecordColumnMappingDto, RegExp]> = [
  ['fuelColumn', /^(fuel|fuel type|energy)$/i],
  ['quantityColumn', /(quantity|amount|volume|qty|delivered|used)/i],
  ['unitColumn', /^(unit|units|uom)$/i],
  ['costColumn', /(cost|price|total|\$|€|£)/i],
  ['startColumn', /(start|from|begin|previous)/i],
  ['endColumn', /(end|to|until|delivery date|date)/i],
  ['housesColumn', /(house|greenhouse|serves|meter|tank)/i],
  ['nonHeatingColumn', /(non.?heating|other use|dryer)/i],
];

/** Columns guessed from the header names; each column is proposed for one field at most. */
export function proposeMapping(columns: string[]): Partial<FuelRecordColumnMappingDto> {
  const proposed: Partial<Record<keyof FuelRecordColumnMappingDto, string>> = {};
  const taken = new Set<string>();
  for (const [field, pattern] of GUESSES) {
    const column = columns.find((name) => !taken.has(name) && pattern.test(name));
    if (column) {
      proposed[field] = column;
      taken.add(column);
    }
  }
  return proposed as Partial<FuelRecordColumnMappingDto>;
}

export interface CsvContext {
  ref: ReferenceData;
  farmHouseIds: ReadonlySet<number>;
  /** house name (lower case) → id */
  houseByName: Map<string, number>;
}

function readNumber(text: string): number {
  const cleaned = text.replace(/[\s$€£]/g, '').replace(/,(?=\d{3}(\D|$))/g, '');
  return cleaned === '' ? NaN : Number(cleaned.replace(',', '.'));
}

/**
 * Every row of the file as a record, or every problem found, each naming the row (as counted in
 * a spreadsheet: the header is row 1) and the field in the user's words.
 */
export function recordsFromCsv(
  csv: ParsedCsv,
  mapping: FuelRecordColumnMappingDto,
  context: CsvContext,
): { records: FuelRecordCandidate[]; problems: FieldProblem[] } {
  const mappingProblems: FieldProblem[] = [];
  const columnIndex = (name: string | undefined, field: string): number | null => {
    if (name === undefined) return null;
    const index = csv.columns.indexOf(name);
    if (index < 0) mappingProblems.push({ field: `mapping.${field}`, message: `the file has no column "${name}"` });
    return index;
  };
  const fuelCol = columnIndex(mapping.fuelColumn, 'fuelColumn');
  const quantityCol = columnIndex(mapping.quantityColumn, 'quantityColumn');
  const unitCol = columnIndex(mapping.unitColumn, 'unitColumn');
  const costCol = columnIndex(mapping.costColumn, 'costColumn');
  const startCol = columnIndex(mapping.startColumn, 'startColumn');
  const endCol = columnIndex(mapping.endColumn, 'endColumn');
  const housesCol = columnIndex(mapping.housesColumn, 'housesColumn');
  const nonHeatingCol = columnIndex(mapping.nonHeatingColumn, 'nonHeatingColumn');
  if (fuelCol === null && !mapping.fuelId)
    mappingProblems.push({
      field: 'mapping.fuelColumn',
      message: 'say which column holds the fuel, or choose one fuel for every row',
    });
  if (unitCol === null && !mapping.unit)
    mappingProblems.push({
      field: 'mapping.unitColumn',
      message: 'say which column holds the unit, or choose one unit for every row',
    });
  if (housesCol === null && !(mapping.houseIds && mapping.houseIds.length > 0))
    mappingProblems.push({
      field: 'mapping.housesColumn',
      message: 'say which column names the houses, or choose the houses for every row',
    });
  if (mappingProblems.length > 0) return { records: [], problems: mappingProblems };

  const fuels = referenceTable(context.ref, 'fuels').rows as FuelRow[];
  const records: FuelRecordCandidate[] = [];
  const problems: FieldProblem[] = [];
  csv.rows.forEach((cells, index) => {
    const rowNumber = index + 2;
    const cell = (column: number | null) => (column === null ? '' : (cells[column] ?? '').trim());
    const rowProblems: FieldProblem[] = [];
    let fuelId = mapping.fuelId ?? '';
    if (fuelCol !== null) {
      const text = cell(fuelCol).toLowerCase();
      fuelId = fuels.find((fuel) => fuel.id === text || fuel.label.toLowerCase() === text)?.id ?? cell(fuelCol);
    }
    const quantity = readNumber(cell(quantityCol));
    if (Number.isNaN(quantity))
      rowProblems.push({ field: 'quantity', message: `"${cell(quantityCol)}" is not a number` });
    const costText = cell(costCol);
    const cost = costText === '' ? null : readNumber(costText);
    if (cost !== null && !(cost >= 0))
      rowProblems.push({ field: 'cost', message: `"${costText}" is not an amount of money` });
    const startDate = cell(startCol);
    const endDate = cell(endCol);
    if (!isCalendarDate(startDate))
      rowProblems.push({ field: 'startDate', message: `"${startDate}" is not a date written YYYY-MM-DD` });
    if (!isCalendarDate(endDate))
      rowProblems.push({ field: 'endDate', message: `"${endDate}" is not a date written YYYY-MM-DD` });
    let houseIds = mapping.houseIds ?? [];
    if (housesCol !== null) {
      houseIds = [];
      for (const name of cell(housesCol)
        .split(/[;|]/)
        .map((part) => part.trim())
        .filter(Boolean)) {
        const id = context.houseByName.get(name.toLowerCase());
        if (id === undefined)
          rowProblems.push({ field: 'houseIds', message: `there is no house called "${name}" on this farm` });
        else houseIds.push(id);
      }
    }
    const nonHeatingText = cell(nonHeatingCol);
    const nonHeatingPerDay = nonHeatingText === '' ? null : readNumber(nonHeatingText);
    if (nonHeatingPerDay !== null && !(nonHeatingPerDay >= 0))
      rowProblems.push({ field: 'nonHeatingPerDay', message: `"${nonHeatingText}" is not a quantity per day` });
    const candidate: FuelRecordCandidate = {
      fuelId,
      quantity,
      quantityUnit: mapping.unit && unitCol === null ? mapping.unit : cell(unitCol),
      cost,
      startDate,
      endDate,
      houseIds,
      nonHeatingPerDay,
      note: null,
    };
    const seen = new Set(rowProblems.map((problem) => problem.field));
    rowProblems.push(
      ...recordProblems(candidate, context.ref, context.farmHouseIds).filter((problem) => !seen.has(problem.field)),
    );
    for (const problem of rowProblems) {
      problems.push({
        field: `row ${rowNumber}.${problem.field}`,
        message: `Row ${rowNumber}, ${FIELD_WORDS[problem.field] ?? problem.field}: ${problem.message}`,
      });
    }
    if (rowProblems.length === 0) records.push(candidate);
  });
  return { records, problems: problems.slice(0, MAX_LISTED_PROBLEMS) };
}
