import { EngineInputError } from '../errors';
import { HEATER_TYPES, type Confidence, type HeaterType, type SurfaceGroup } from '../vocabulary';
import { referenceRow, referenceTable, type ReferenceData, type ReferenceRow } from '../reference-data.types';

/** Typed rows of the reference tables the heating engine reads, and checked look-ups. */

export interface CoveringRow extends ReferenceRow {
  label: string;
  layers: number;
  uWPerM2K: number;
  uBtuPerHFt2F: number;
  uRangeWPerM2K?: [number, number];
  lightTransmittance: number;
  /** share of the crop's long-wave radiation the covering passes to the sky (0 opaque) */
  thermalIrTransmittance: number;
  irSource?: string;
  irConfidence?: Confidence;
  /** long-wave emissivity of the outer surface (how strongly it radiates to the sky) */
  outerLongWaveEmissivity: number;
}

export interface AirLeakageRow extends ReferenceRow {
  label: string;
  airChangesPerHour: number;
  minAch: number;
  maxAch: number;
}

export interface PerimeterRow extends ReferenceRow {
  label: string;
  insulated: boolean;
  wPerMK: number;
}

export interface KneewallRow extends ReferenceRow {
  label: string;
  uWPerM2K: number;
  insulated?: boolean;
}

export interface CurtainRow extends ReferenceRow {
  label: string;
  uReduction: number;
}

export interface SurfaceCoefficientRow extends ReferenceRow {
  label: string;
  hWPerM2K: number;
}

export interface AirPropertyRow extends ReferenceRow {
  label: string;
  valueJPerKgK?: number;
  valueKgPerM3?: number;
}

export interface HeaterTypeRow extends ReferenceRow {
  label: string;
  heaterType: HeaterType;
  typicalEfficiency: number;
  minEfficiency: number;
  maxEfficiency: number;
  fuelFired: boolean;
  vented: boolean;
  defaultForSizing?: boolean;
}

/** The reference row of a heater type; an unknown type is bad input on `field`. */
export function heaterTypeRow(ref: ReferenceData, heaterType: unknown, field: string): HeaterTypeRow {
  const row = referenceTable<HeaterTypeRow>(ref, 'heater-types').rows.find((r) => r.heaterType === heaterType);
  if (!row) {
    throw new EngineInputError(
      field,
      `${field} '${String(heaterType)}' is not known (one of: ${HEATER_TYPES.join(', ')})`,
    );
  }
  return row;
}

/** The part of a reference-data/fuels.json row the heating engine needs. */
export interface FuelFiredRow extends ReferenceRow {
  label: string;
  fuelFired: boolean;
}

export interface HeaterSizingRow extends ReferenceRow {
  label: string;
  fraction?: number;
  count?: number;
}

export interface SafetyRow extends ReferenceRow {
  label: string;
  valuePpm?: number;
  valueM?: number;
  valueFt?: number;
  valueM2PerW?: number;
  valuePercentByWeight?: number;
}

/** A row every installation must have: a missing one is a programming/data error, not user input. */
export function requiredRow<Row extends ReferenceRow>(ref: ReferenceData, table: string, id: string): Row {
  const row = referenceRow<Row>(ref, table, id);
  if (!row) throw new Error(`reference-data/${table}.json has no row '${id}'`);
  return row;
}

/** A row the user chose by id: an unknown id is bad input on `field`. */
export function chosenRow<Row extends ReferenceRow>(
  ref: ReferenceData,
  table: string,
  id: unknown,
  field: string,
): Row {
  const row = typeof id === 'string' ? referenceRow<Row>(ref, table, id) : undefined;
  if (!row) {
    const known = referenceTable(ref, table)
      .rows.map((candidate) => candidate.id)
      .join(', ');
    throw new EngineInputError(field, `${field} '${String(id)}' is not known (one of: ${known})`);
  }
  return row;
}

/** Inside film coefficient for a surface group: heat flows up through the roof, sideways through walls. */
export function insideSurfaceCoefficientRow(ref: ReferenceData, group: SurfaceGroup): SurfaceCoefficientRow {
  return requiredRow<SurfaceCoefficientRow>(
    ref,
    'surface-coefficients',
    group === 'roof' ? 'inside-heat-flow-up' : 'inside-vertical',
  );
}

export function specificHeatOfAirRow(ref: ReferenceData): AirPropertyRow & { valueJPerKgK: number } {
  const row = requiredRow<AirPropertyRow>(ref, 'air-properties', 'cp-dry-air');
  if (typeof row.valueJPerKgK !== 'number') throw new Error('air-properties cp-dry-air has no valueJPerKgK');
  return row as AirPropertyRow & { valueJPerKgK: number };
}
