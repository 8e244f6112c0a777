import { BOUNDS, COOLING_BOUNDS } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { HouseSpec } from '../house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../reference-data.types';
import { padTypeIds, padTypeRow, ventilationValue, type PadTypeRow, type SourcedValue } from './cooling-reference';

/** The inputs of the cooling estimate: their checks, the rows they name and the defaults of what was left out. */

export interface CoolingSite {
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
}

export interface CoolingConditions {
  /** 'YYYY-MM-DD'; hours of the day are local apparent solar time */
  designDate: string;
  /** summer design dry bulb (the day's maximum), °C */
  summerDesignC: number;
  /** difference between the day's maximum and minimum, K */
  dailyRangeK: number;
  /** wet bulb coincident with the design dry bulb, °C */
  summerDesignWetBulbC: number;
  /** allowed inlet-to-fan temperature rise, K */
  allowedTemperatureRiseK?: number;
  /**
   * peak light at plant height under the roof before any shade cloth, lux; when left out the design
   * day's own clear-sky light through the roof is used. A shade cloth in place multiplies either.
   */
  peakInteriorLightLux?: number;
  /** distance from inlet (pad) wall to the exhaust fans, m; defaults to the house length */
  padToFanDistanceM?: number;
  /** share of transmitted solar heat taken up by crop transpiration, 0–0.9 */
  transpirationFraction?: number;
  evaporativePad?: { padTypeId: string; areaM2: number } | null;
  /** winter design outdoor temperature for the humidity-ventilation heat cost, °C */
  winterDesignC?: number;
}

/** The optional conditions as used: entered, or the reference default (with the row it came from). */
export interface CoolingInputsWithDefaults {
  /** an entered peak interior light (before shade), or undefined for the design day's own */
  enteredPeakInteriorLightLux: number | undefined;
  /** lumens per watt of daylight, to turn the design day's irradiance into light */
  luminousEfficacy: SourcedValue;
  allowedTemperatureRiseK: number;
  riseDefault: SourcedValue;
  transpirationFraction: number;
  transpirationDefault: SourcedValue;
  /** defaults to the house length */
  padToFanDistanceM: number;
  winterDesignC: number;
  winterDefault: SourcedValue;
}

export function coolingInputsWithDefaults(
  conditions: CoolingConditions,
  house: HouseSpec,
  ref: ReferenceData,
): CoolingInputsWithDefaults {
  const luminousEfficacy = ventilationValue(ref, 'daylight-luminous-efficacy', 'lumensPerWatt');
  const riseDefault = ventilationValue(ref, 'temperature-rise-factor', 'defaultAllowedRiseK');
  const allowedTemperatureRiseK = conditions.allowedTemperatureRiseK ?? riseDefault.value;
  const transpirationDefault = ventilationValue(ref, 'transpiration-share', 'fraction');
  const transpirationFraction = conditions.transpirationFraction ?? transpirationDefault.value;
  const padToFanDistanceM = conditions.padToFanDistanceM ?? house.lengthM;
  const winterDefault = ventilationValue(ref, 'winter-ventilation-default-outdoor', 'outdoorC');
  const winterDesignC = conditions.winterDesignC ?? winterDefault.value;
  return {
    enteredPeakInteriorLightLux: conditions.peakInteriorLightLux,
    luminousEfficacy,
    allowedTemperatureRiseK,
    riseDefault,
    transpirationFraction,
    transpirationDefault,
    padToFanDistanceM,
    winterDesignC,
    winterDefault,
  };
}

export function validateCoolingSite(site: CoolingSite): void {
  if (!site || typeof site !== 'object') throw new EngineInputError('site', 'site is required');
  requireInRange('site.latitudeDeg', site.latitudeDeg, BOUNDS.latitudeDeg.min, BOUNDS.latitudeDeg.max);
  requireInRange('site.longitudeDeg', site.longitudeDeg, BOUNDS.longitudeDeg.min, BOUNDS.longitudeDeg.max);
  requireInRange('site.elevationM', site.elevationM, BOUNDS.elevationM.min, BOUNDS.elevationM.max);
}

export function validateHouseCoolingFields(house: HouseSpec): void {
  if (!house || typeof house !== 'object') throw new EngineInputError('house', 'house is required');
  const fans = house.exhaustFans;
  if (!fans || typeof fans !== 'object')
    throw new EngineInputError('house.exhaustFans', 'house.exhaustFans is required');
  const count = requireInRange('house.exhaustFans.count', fans.count, BOUNDS.fanCount.min, BOUNDS.fanCount.max);
  if (!Number.isInteger(count)) {
    throw new EngineInputError('house.exhaustFans.count', 'house.exhaustFans.count must be a whole number');
  }
  // a house without fans may leave the fan size at 0
  requireInRange(
    'house.exhaustFans.capacityEachM3PerS',
    fans.capacityEachM3PerS,
    count === 0 ? 0 : BOUNDS.fanCapacityM3PerS.min,
    BOUNDS.fanCapacityM3PerS.max,
  );
  requireInRange('house.inletAreaM2', house.inletAreaM2, BOUNDS.inletAreaM2.min, BOUNDS.inletAreaM2.max);
  if (!house.setpoints || typeof house.setpoints !== 'object') {
    throw new EngineInputError('house.setpoints', 'house.setpoints is required');
  }
  for (const key of ['dayHeatingC', 'nightHeatingC', 'coolingC'] as const) {
    requireInRange(`house.setpoints.${key}`, house.setpoints[key], BOUNDS.setpointC.min, BOUNDS.setpointC.max);
  }
}

export function validateDesignDate(designDate: unknown): { year: number; month: number; day: number } {
  const field = 'conditions.designDate';
  if (typeof designDate !== 'string' || !/^\d{4}-\d{2}-\d{2}$/.test(designDate)) {
    throw new EngineInputError(field, `${field} must be a date written YYYY-MM-DD`);
  }
  const [year, month, day] = designDate.split('-').map(Number);
  const probe = new Date(Date.UTC(year, month - 1, day));
  if (probe.getUTCFullYear() !== year || probe.getUTCMonth() !== month - 1 || probe.getUTCDate() !== day) {
    throw new EngineInputError(field, `${field} is not a calendar date`);
  }
  if (year < 1900 || year > 2200) throw new EngineInputError(field, `${field} must fall between 1900 and 2200`);
  return { year, month, day };
}

export function validateCoolingConditions(conditions: CoolingConditions): void {
  if (!conditions || typeof conditions !== 'object')
    throw new EngineInputError('conditions', 'conditions are required');
  const b = COOLING_BOUNDS;
  const summerDesignC = requireInRange(
    'conditions.summerDesignC',
    conditions.summerDesignC,
    BOUNDS.summerDesignC.min,
    BOUNDS.summerDesignC.max,
  );
  requireInRange('conditions.dailyRangeK', conditions.dailyRangeK, b.dailyRangeK.min, b.dailyRangeK.max);
  requireInRange(
    'conditions.summerDesignWetBulbC',
    conditions.summerDesignWetBulbC,
    b.summerDesignWetBulbC.min,
    Math.min(b.summerDesignWetBulbC.max, summerDesignC),
  );
  const optional: Array<[keyof CoolingConditions, { min: number; max: number }]> = [
    ['allowedTemperatureRiseK', b.allowedTemperatureRiseK],
    ['peakInteriorLightLux', b.peakInteriorLightLux],
    ['padToFanDistanceM', b.padToFanDistanceM],
    ['transpirationFraction', b.transpirationFraction],
    ['winterDesignC', BOUNDS.designOutdoorC],
  ];
  for (const [key, range] of optional) {
    if (conditions[key] !== undefined) requireInRange(`conditions.${key}`, conditions[key], range.min, range.max);
  }
  const pad = conditions.evaporativePad;
  if (pad !== undefined && pad !== null) {
    if (typeof pad !== 'object')
      throw new EngineInputError('conditions.evaporativePad', 'evaporativePad must be an object or null');
    requireInRange('conditions.evaporativePad.areaM2', pad.areaM2, b.padAreaM2.min, b.padAreaM2.max);
  }
}

export function resolvePadType(conditions: CoolingConditions, ref: ReferenceData): PadTypeRow | null {
  const pad = conditions.evaporativePad;
  if (pad === undefined || pad === null) return null;
  const row = typeof pad.padTypeId === 'string' ? padTypeRow(ref, pad.padTypeId) : undefined;
  if (!row) {
    throw new EngineInputError(
      'conditions.evaporativePad.padTypeId',
      `unknown pad type; choose one of ${padTypeIds(ref).join(', ')}`,
    );
  }
  return row;
}

export interface RoofCoveringRow extends ReferenceRow {
  lightTransmittance: number;
}

export function roofCoveringRow(house: HouseSpec, ref: ReferenceData): RoofCoveringRow {
  const id = house.coverings?.roof;
  const row = typeof id === 'string' ? referenceRow<RoofCoveringRow>(ref, 'coverings', id) : undefined;
  if (!row) throw new EngineInputError('house.coverings.roof', 'unknown roof covering');
  if (typeof row.lightTransmittance !== 'number' || !(row.lightTransmittance > 0)) {
    throw new EngineInputError(
      'house.coverings.roof',
      `${row.label ?? row.id} does not transmit light and cannot be a roof covering here`,
    );
  }
  return row;
}
