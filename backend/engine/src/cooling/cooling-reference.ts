import { referenceRow, referenceTable, type ReferenceData, type ReferenceRow } from '../reference-data.types';

/** Typed access to the rows of ventilation.json, evaporative-pads.json and air-properties.json. */

/** A row the installation must have: a missing one is a data error, not user input. */
export function requireRow<Row extends ReferenceRow>(ref: ReferenceData, table: string, id: string): Row {
  const row = referenceRow<Row>(ref, table, id);
  if (!row) throw new Error(`reference-data/${table}.json needs a row ${id}`);
  return row;
}

function requireNumber(row: ReferenceRow, key: string, table: string): number {
  const value = row[key];
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new Error(`reference-data/${table}.json row ${row.id} needs a numeric ${key}`);
  }
  return value;
}

export interface SourcedValue {
  value: number;
  row: ReferenceRow;
}

export function ventilationValue(ref: ReferenceData, id: string, key: string): SourcedValue {
  const row = requireRow(ref, 'ventilation', id);
  return { value: requireNumber(row, key, 'ventilation'), row };
}

export interface ElevationFactorRow extends ReferenceRow {
  elevationsFt: number[];
  factors: number[];
}

export function elevationFactorRow(ref: ReferenceData): ElevationFactorRow {
  const row = requireRow<ElevationFactorRow>(ref, 'ventilation', 'elevation-factor');
  if (
    !Array.isArray(row.elevationsFt) ||
    !Array.isArray(row.factors) ||
    row.elevationsFt.length !== row.factors.length ||
    row.elevationsFt.length < 2
  ) {
    throw new Error('reference-data/ventilation.json elevation-factor needs matching elevationsFt and factors');
  }
  return row;
}

export interface PadTypeRow extends ReferenceRow {
  faceVelocityMPerS: number;
  saturationEfficiency: number;
}

export function padTypeRow(ref: ReferenceData, padTypeId: string): PadTypeRow | undefined {
  return referenceRow<PadTypeRow>(ref, 'evaporative-pads', padTypeId);
}

export function padTypeIds(ref: ReferenceData): string[] {
  return referenceTable(ref, 'evaporative-pads').rows.map((row) => row.id);
}

export interface DailyRangeProfileRow extends ReferenceRow {
  fractionsByHour1To24: number[];
}

export function dailyRangeProfileRow(ref: ReferenceData): DailyRangeProfileRow {
  const row = requireRow<DailyRangeProfileRow>(ref, 'clear-sky', 'daily-range-profile');
  if (!Array.isArray(row.fractionsByHour1To24) || row.fractionsByHour1To24.length !== 24) {
    throw new Error('reference-data/clear-sky.json daily-range-profile needs 24 fractions');
  }
  return row;
}

export function airSpecificHeat(ref: ReferenceData): SourcedValue {
  const row = requireRow(ref, 'air-properties', 'cp-dry-air');
  return { value: requireNumber(row, 'valueJPerKgK', 'air-properties'), row };
}
