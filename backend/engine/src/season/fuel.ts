import { EngineInputError, requireInRange } from '../errors';
import { BOUNDS } from '../vocabulary';
import { referenceRow, referenceTable, type ReferenceData, type ReferenceRow } from '../reference-data.types';

/** A row of reference-data/fuels.json. */
export interface FuelRow extends ReferenceRow {
  label: string;
  fuelFired: boolean;
  unitSi: string;
  heatContentJPerUnitSi: number;
  unitUs: string;
  heatContentBtuPerUnitUs: number;
}

/** Which of the fuel's two purchase units a price is quoted in. */
export type PriceUnit = 'si' | 'us';

export interface FuelPrice {
  fuelId: string;
  /**
   * money per purchase unit, in the farm's currency; null = no price known yet: quantities are
   * computed, every cost is null
   */
  pricePerUnit: number | null;
  /** 'si': per the fuel's unitSi (m³, L, kg, kWh); 'us': per its unitUs (therm, US gal, short ton, kWh) */
  priceUnit: PriceUnit;
}

/** International Table Btu in joules (definition). */
export const JOULES_PER_BTU = 1055.05585262;
export const JOULES_PER_KWH = 3_600_000;

export interface FuelQuantity {
  /** energy the heater burns (delivered heat ÷ efficiency), kWh */
  fuelInputKWh: number;
  /** in the fuel's unitSi */
  quantitySi: number;
  /** in the fuel's unitUs */
  quantityUs: number;
}

export function fuelRow(ref: ReferenceData, fuelId: string, field = 'fuel.fuelId'): FuelRow {
  const row = referenceRow<FuelRow>(ref, 'fuels', fuelId);
  if (!row) {
    const known = referenceTable(ref, 'fuels')
      .rows.map((fuel) => fuel.id)
      .join(', ');
    throw new EngineInputError(field, `unknown fuel '${fuelId}' (known: ${known})`);
  }
  return row;
}

/** Fuel bought for `heatDeliveredKWh` of useful heat from a heater of the given efficiency. */
export function fuelForHeat(heatDeliveredKWh: number, fuel: FuelRow, heaterEfficiency: number): FuelQuantity {
  const fuelInputKWh = heatDeliveredKWh / heaterEfficiency;
  const fuelInputJ = fuelInputKWh * JOULES_PER_KWH;
  return {
    fuelInputKWh,
    quantitySi: fuelInputJ / fuel.heatContentJPerUnitSi,
    quantityUs: fuelInputJ / JOULES_PER_BTU / fuel.heatContentBtuPerUnitUs,
  };
}

/** Cost of a quantity at a price quoted per the stated unit; null without a price. */
export function fuelCost(quantity: FuelQuantity, price: Pick<FuelPrice, 'pricePerUnit' | 'priceUnit'>): number | null {
  if (price.pricePerUnit === null) return null;
  return (price.priceUnit === 'si' ? quantity.quantitySi : quantity.quantityUs) * price.pricePerUnit;
}

/** a − b, or null when either is unknown (a saving between two costs). */
export function costDifference(a: number | null, b: number | null): number | null {
  return a === null || b === null ? null : a - b;
}

/** The unit a price refers to, e.g. 'US gal' or 'm³'. */
export function priceUnitLabel(fuel: FuelRow, priceUnit: PriceUnit): string {
  return priceUnit === 'si' ? fuel.unitSi : fuel.unitUs;
}

export function validateFuelPrice(price: FuelPrice, ref: ReferenceData, field = 'fuel'): FuelRow {
  if (!price || typeof price !== 'object') throw new EngineInputError(field, `${field} is required`);
  const row = fuelRow(ref, price.fuelId, `${field}.fuelId`);
  if (price.pricePerUnit !== null) requireInRange(`${field}.pricePerUnit`, price.pricePerUnit, 0, 1e6);
  if (price.priceUnit !== 'si' && price.priceUnit !== 'us') {
    throw new EngineInputError(
      `${field}.priceUnit`,
      `say which unit the price is per: 'si' (per ${row.unitSi}) or 'us' (per ${row.unitUs})`,
    );
  }
  return row;
}

export function validateHeaterEfficiency(efficiency: number, field = 'heaterEfficiency'): number {
  return requireInRange(field, efficiency, BOUNDS.heaterEfficiency.min, BOUNDS.heaterEfficiency.max);
}

/** Cautions shown wherever a season's fuel is burnt in the house. */
export function fuelCautions(fuel: FuelRow): string[] {
  if (!fuel.fuelFired) {
    return [
      'Electric heaters and their circuits in a wet greenhouse need correct wiring and ground-fault protection; have a licensed electrician install them to local code.',
    ];
  }
  return [
    `${fuel.label} heaters need combustion air and proper venting. Unvented or poorly vented heaters put carbon monoxide (dangerous to people), ethylene (injures crops at very low concentrations), sulfur dioxide and water into the house air; a yellow flame is a warning sign.`,
    'These figures are planning estimates; heater sizing, venting and installation rest with licensed installers and local codes.',
  ];
}
