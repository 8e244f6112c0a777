import { EngineInputError } from '../errors';
import { JOULES_PER_BTU, JOULES_PER_KWH, type FuelRow } from '../season/fuel';

/**
 * Fuel bought, in one of the fuel's two purchase units (reference-data/fuels.json: `unitSi` such
 * as 'L' or 'm³', `unitUs` such as 'US gal' or 'therm'), as the energy it holds (higher heat
 * content), kWh.
 */
export function fuelUnits(fuel: FuelRow): string[] {
  return fuel.unitSi === fuel.unitUs ? [fuel.unitSi] : [fuel.unitSi, fuel.unitUs];
}

/** kWh of fuel energy in one `unit` of the fuel. */
export function kWhPerFuelUnit(fuel: FuelRow, unit: string, field = 'quantityUnit'): number {
  if (unit === fuel.unitSi) return fuel.heatContentJPerUnitSi / JOULES_PER_KWH;
  if (unit === fuel.unitUs) return (fuel.heatContentBtuPerUnitUs * JOULES_PER_BTU) / JOULES_PER_KWH;
  throw new EngineInputError(field, `${fuel.label} is counted in ${fuelUnits(fuel).join(' or ')}, not in ${unit}`);
}

export function fuelQuantityToKWh(quantity: number, unit: string, fuel: FuelRow, field?: string): number {
  return quantity * kWhPerFuelUnit(fuel, unit, field);
}
