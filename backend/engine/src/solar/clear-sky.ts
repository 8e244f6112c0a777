import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';

export interface ClearSkyMonthRow extends ReferenceRow {
  month: number;
  /** apparent solar irradiation at air mass 0, W/m² */
  aWPerM2: number;
  /** atmospheric extinction coefficient, – */
  b: number;
  /** diffuse radiation factor, – */
  c: number;
}

export interface ClearSkyIrradiance {
  directNormalWPerM2: number;
  diffuseHorizontalWPerM2: number;
  globalHorizontalWPerM2: number;
}

const DEG_TO_RAD = Math.PI / 180;

export function clearSkyMonthRow(month: number, ref: ReferenceData): ClearSkyMonthRow {
  if (!Number.isInteger(month) || month < 1 || month > 12) {
    throw new Error(`clearSkyIrradiance: month must be an integer 1–12, got ${month}`);
  }
  const id = `month-${String(month).padStart(2, '0')}`;
  const row = referenceRow<ClearSkyMonthRow>(ref, 'clear-sky', id);
  if (!row) throw new Error(`reference-data/clear-sky.json has no row ${id}`);
  return row;
}

/**
 * Clear-sky irradiance by the handbook's "original" model: DNI = A / exp(B / sin β),
 * diffuse horizontal = C × DNI, global horizontal = DNI sin β + diffuse. Zero with the sun at or
 * below the horizon. Monthly A, B, C come from reference-data/clear-sky.json.
 */
export function clearSkyIrradiance(altitudeDeg: number, month: number, ref: ReferenceData): ClearSkyIrradiance {
  const row = clearSkyMonthRow(month, ref);
  if (!Number.isFinite(altitudeDeg) || altitudeDeg <= 0) {
    return { directNormalWPerM2: 0, diffuseHorizontalWPerM2: 0, globalHorizontalWPerM2: 0 };
  }
  const sinAltitude = Math.sin(Math.min(altitudeDeg, 90) * DEG_TO_RAD);
  const directNormalWPerM2 = row.aWPerM2 / Math.exp(row.b / sinAltitude);
  const diffuseHorizontalWPerM2 = row.c * directNormalWPerM2;
  return {
    directNormalWPerM2,
    diffuseHorizontalWPerM2,
    globalHorizontalWPerM2: directNormalWPerM2 * sinAltitude + diffuseHorizontalWPerM2,
  };
}
