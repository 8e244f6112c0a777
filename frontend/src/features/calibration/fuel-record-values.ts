import type { FuelRecord, FuelRecordInput, FuelRecordUpdate, ReferenceData } from '../../api/types';
import { referenceRows } from '../../lib/reference-data';

/** Fuel records as rows of the editing table, and the checks made before a row is sent. */

export interface FuelOption {
  id: string;
  label: string;
  /** the fuel's purchase units, SI first (e.g. ['L', 'US gal']) */
  units: string[];
}

export interface FuelRecordRow {
  /** the stored id, or a temporary 'new-…' id for a row not saved yet */
  id: number | string;
  isNew?: boolean;
  fuelId: string;
  quantity: number | null;
  quantityUnit: string;
  cost: number | null;
  startDate: string;
  endDate: string;
  houseIds: number[];
  nonHeatingPerDay: number | null;
  version: number;
}

export interface RowProblem {
  field: keyof FuelRecordRow;
  message: string;
}

export function fuelOptions(data: ReferenceData | undefined): FuelOption[] {
  return referenceRows(data, 'fuels').map((row) => {
    const unitSi = String(row.unitSi ?? '');
    const unitUs = String(row.unitUs ?? '');
    return { id: row.id, label: String(row.label ?? row.id), units: unitSi === unitUs ? [unitSi] : [unitSi, unitUs] };
  });
}

export function unitsOfFuel(fuels: FuelOption[], fuelId: string): string[] {
  return fuels.find((fuel) => fuel.id === fuelId)?.units ?? [];
}

export function recordToRow(record: FuelRecord): FuelRecordRow {
  return {
    id: record.id,
    fuelId: record.fuelId,
    quantity: record.quantity,
    quantityUnit: record.quantityUnit,
    cost: record.cost,
    startDate: record.startDate,
    endDate: record.endDate,
    houseIds: record.houseIds,
    nonHeatingPerDay: record.nonHeatingPerDay,
    version: record.version,
  };
}

/** A new row: the fuel and unit of the last record (or the first fuel, in the user's unit), all houses of the last record. */
export function newRow(
  fuels: FuelOption[],
  previous: FuelRecordRow | undefined,
  system: 'si' | 'us',
  serial: number,
): FuelRecordRow {
  const fuel =
    fuels.find((option) => option.id === previous?.fuelId) ?? fuels.find((f) => f.id === 'propane') ?? fuels[0];
  const unit = previous?.quantityUnit ?? (system === 'us' ? fuel?.units.at(-1) : fuel?.units[0]) ?? '';
  return {
    id: `new-${serial}`,
    isNew: true,
    fuelId: fuel?.id ?? '',
    quantity: null,
    quantityUnit: unit,
    cost: null,
    startDate: previous ? nextDay(previous.endDate) : '',
    endDate: '',
    houseIds: previous?.houseIds ?? [],
    nonHeatingPerDay: null,
    version: 0,
  };
}

/** The day after an ISO date (a tank delivery's period starts the day after the previous fill). */
export function nextDay(isoDate: string): string {
  const ms = Date.parse(`${isoDate}T00:00:00Z`);
  if (Number.isNaN(ms)) return '';
  return new Date(ms + 86_400_000).toISOString().slice(0, 10);
}

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

function isDate(value: string): boolean {
  if (!ISO_DATE.test(value)) return false;
  const date = new Date(`${value}T00:00:00Z`);
  return !Number.isNaN(date.getTime()) && date.toISOString().slice(0, 10) === value;
}

/** What is wrong with a row, in the user's words (the server checks the same and more). */
export function rowProblems(row: FuelRecordRow, fuels: FuelOption[]): RowProblem[] {
  const problems: RowProblem[] = [];
  const units = unitsOfFuel(fuels, row.fuelId);
  if (units.length === 0) problems.push({ field: 'fuelId', message: 'Choose the fuel.' });
  else if (!units.includes(row.quantityUnit))
    problems.push({ field: 'quantityUnit', message: `Choose the unit: ${units.join(' or ')}.` });
  if (row.quantity === null || !Number.isFinite(row.quantity) || row.quantity <= 0)
    problems.push({ field: 'quantity', message: 'The quantity must be more than zero.' });
  if (row.cost !== null && !(row.cost >= 0)) problems.push({ field: 'cost', message: 'The cost cannot be negative.' });
  if (!isDate(row.startDate)) problems.push({ field: 'startDate', message: 'Write the start date as YYYY-MM-DD.' });
  if (!isDate(row.endDate)) problems.push({ field: 'endDate', message: 'Write the end date as YYYY-MM-DD.' });
  if (isDate(row.startDate) && isDate(row.endDate) && row.endDate < row.startDate)
    problems.push({ field: 'endDate', message: 'The period ends before it starts.' });
  if (row.houseIds.length === 0) problems.push({ field: 'houseIds', message: 'Choose the houses the fuel went to.' });
  if (row.nonHeatingPerDay !== null && !(row.nonHeatingPerDay >= 0))
    problems.push({ field: 'nonHeatingPerDay', message: 'The non-heating use per day cannot be negative.' });
  return problems;
}

export function rowToInput(row: FuelRecordRow): FuelRecordInput {
  return {
    fuelId: row.fuelId,
    quantity: row.quantity ?? 0,
    quantityUnit: row.quantityUnit,
    cost: row.cost,
    startDate: row.startDate,
    endDate: row.endDate,
    houseIds: row.houseIds,
    nonHeatingPerDay: row.nonHeatingPerDay,
  };
}

/** Only the fields that changed, for a PATCH. */
export function rowChanges(row: FuelRecordRow, before: FuelRecordRow): FuelRecordUpdate {
  const now = rowToInput(row);
  const then = rowToInput(before);
  const changes: Record<string, unknown> = {};
  for (const key of Object.keys(now) as Array<keyof FuelRecordInput>) {
    if (JSON.stringify(now[key]) !== JSON.stringify(then[key])) changes[key] = now[key];
  }
  return changes as FuelRecordUpdate;
}

/** A number typed into a cell: '' is no value; a comma is read as a decimal point. */
export function parseCellNumber(text: unknown): number | null {
  if (typeof text === 'number') return Number.isFinite(text) ? text : null;
  if (typeof text !== 'string' || text.trim() === '') return null;
  const value = Number(text.trim().replace(',', '.'));
  return Number.isFinite(value) ? value : NaN;
}
