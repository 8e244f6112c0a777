/**
 * Supplemental lamps as the estimates see them: validation, the heat they give the house while
 * they run, when they run, and the rows of reference-data/lamps.json behind each choice.
 *
 *   electrical input while on  P_e = power density × floor area                (W)
 *   heat into the house        P_h = P_e × share of the input that heats it   (W)
 *
 * When they run (reference-data/lamps.json 'schedule-block-ending-at-sunrise', common practice):
 * each day one block of the month's hours that ends at sunrise, [sunrise − H, sunrise].
 */
import { BOUNDS, LAMP_MONTHS, quantityToken } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { Lamps } from '../house.types';
import { referenceRow, referenceTable, type ReferenceData, type ReferenceRow } from '../reference-data.types';

export const LAMP_SCHEDULE_ROW_ID = 'schedule-block-ending-at-sunrise';
export const LAMP_HEAT_DEFAULT_ROW_ID = 'heat-to-house-default';
export const LAMP_SIZING_ROW_ID = 'heater-sizing-without-lamps';
export const LAMP_SUMMER_ROW_ID = 'lamp-heat-in-summer';
export const LAMP_ELECTRICAL_ROW_ID = 'electrical-work';

export interface LampTypeRow extends ReferenceRow {
  kind: 'lamp-type';
  photonEfficacyUmolPerJ: number;
  heatToHouseFraction: number;
  typicalPowerDensityWPerM2: number;
}

/** The lamp types a house may name (rows of reference-data/lamps.json with kind 'lamp-type'). */
export function lampTypeRows(ref: ReferenceData): LampTypeRow[] {
  return referenceTable(ref, 'lamps').rows.filter((row): row is LampTypeRow => row.kind === 'lamp-type');
}

/** A method row of reference-data/lamps.json; a missing one is a programming error. */
export function lampMethodRow(ref: ReferenceData, id: string): ReferenceRow {
  const row = referenceRow(ref, 'lamps', id);
  if (!row) throw new Error(`reference-data/lamps.json needs a '${id}' row`);
  return row;
}

/**
 * Checks a house's lamps (EngineInputError naming `field.…`); null or absent is "no lamps".
 * With `ref`, a named lamp type must be a lamp-type row.
 */
export function validateLamps(
  lamps: Lamps | null | undefined,
  field = 'house.lamps',
  ref?: ReferenceData,
): Lamps | null {
  if (lamps === null || lamps === undefined) return null;
  if (typeof lamps !== 'object' || Array.isArray(lamps)) {
    throw new EngineInputError(field, `${field} must be an object or null`);
  }
  requireInRange(
    `${field}.powerDensityWPerM2`,
    lamps.powerDensityWPerM2,
    BOUNDS.lampPowerDensityWPerM2.min,
    BOUNDS.lampPowerDensityWPerM2.max,
  );
  requireInRange(
    `${field}.heatToHouseFraction`,
    lamps.heatToHouseFraction,
    BOUNDS.lampHeatToHouseFraction.min,
    BOUNDS.lampHeatToHouseFraction.max,
  );
  if (!Array.isArray(lamps.hoursPerDayByMonth) || lamps.hoursPerDayByMonth.length !== LAMP_MONTHS) {
    throw new EngineInputError(
      `${field}.hoursPerDayByMonth`,
      `${field}.hoursPerDayByMonth needs ${LAMP_MONTHS} values, January to December`,
    );
  }
  lamps.hoursPerDayByMonth.forEach((hours, index) =>
    requireInRange(
      `${field}.hoursPerDayByMonth[${index}]`,
      hours,
      BOUNDS.lampHoursPerDay.min,
      BOUNDS.lampHoursPerDay.max,
    ),
  );
  if (ref && lamps.lampTypeId !== undefined && lamps.lampTypeId !== null) {
    if (!lampTypeRows(ref).some((row) => row.id === lamps.lampTypeId)) {
      throw new EngineInputError(
        `${field}.lampTypeId`,
        `${field}.lampTypeId: "${String(lamps.lampTypeId)}" is not a lamp type in reference-data/lamps.json`,
      );
    }
  }
  return lamps;
}

/** Lamps that are there but never run give nothing: treated as none. */
export function lampsInUse(lamps: Lamps | null | undefined): lamps is Lamps {
  return !!lamps && lamps.hoursPerDayByMonth.some((hours) => hours > 0);
}

export interface LampPower {
  /** electrical input of all the lamps while they run, W */
  electricW: number;
  /** the part of it that ends as heat inside the house, W */
  heatW: number;
}

export function lampPower(lamps: Lamps, floorAreaM2: number): LampPower {
  const electricW = lamps.powerDensityWPerM2 * floorAreaM2;
  return { electricW, heatW: electricW * lamps.heatToHouseFraction };
}

/** Length of the overlap of [a0, a1] and [b0, b1] (0 when they do not meet). */
export function overlapLength(a0: number, a1: number, b0: number, b1: number): number {
  return Math.max(0, Math.min(a1, b1) - Math.max(a0, b0));
}

/** The lamp type a house names, or null. */
export function namedLampType(lamps: Lamps, ref: ReferenceData): LampTypeRow | null {
  if (lamps.lampTypeId === undefined || lamps.lampTypeId === null) return null;
  return lampTypeRows(ref).find((row) => row.id === lamps.lampTypeId) ?? null;
}

/** The electrical caution every estimate with lamps carries. */
export function lampElectricalCaution(lamps: LampPower): string {
  return (
    'Supplemental lamps are electrical loads: the circuits, wiring, protection and fixtures for the lamps ' +
    `(${quantityToken('power', lamps.electricW)} while they run) must be designed and installed by a licensed electrician to the local electrical code; ` +
    'fixtures in a greenhouse need ratings for damp locations and clearance from coverings, curtains and crops.'
  );
}
