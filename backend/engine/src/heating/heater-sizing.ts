import { BOUNDS } from '../vocabulary';
import { EngineInputError, requireInRange } from '../errors';
import type { HeaterGroup } from '../house.types';
import { quantityToken } from '../vocabulary';
import { referenceTable, type ReferenceData } from '../reference-data.types';
import {
  chosenRow,
  heaterTypeRow,
  requiredRow,
  type FuelFiredRow,
  type HeaterSizingRow,
  type HeaterTypeRow,
} from './heating-reference';

export type HeaterVerdict = 'adequate' | 'short' | 'none-installed';

export interface HeaterSizingResult {
  safetyMargin: number;
  requiredOutputW: number;
  requiredInputW: number;
  installedInputW: number;
  installedOutputW: number;
  verdict: HeaterVerdict;
  shortfallW: number;
  /** outdoor temperature at which the installed output just holds the inside temperature */
  lowestHeldOutdoorC: number | null;
  unitCount: number;
  largestUnitOutputW: number;
  /** same, with the largest unit out of service; null when there is no second unit */
  holdsWithLargestUnitOutC: number | null;
  /** may hold {{kind:valueSI}} quantity tokens (see ../prose.ts) */
  splitAdvice: string;
  fuelFired: boolean;
}

export interface HeaterSizingDetails {
  result: HeaterSizingResult;
  /** efficiency the required input is stated at */
  efficiencyForRequiredInput: number;
  /** 'installed': input-weighted mean of the house's heaters; 'typical': reference heater type */
  efficiencyBasis: 'installed' | 'typical';
  typicalHeaterType: HeaterTypeRow | null;
  safetyMarginRow: HeaterSizingRow;
  minimumUnitCountRow: HeaterSizingRow;
  /** input of fuel-fired units, W (for combustion-air sizing) */
  fuelFiredInputW: number;
  /** input of fuel-fired units stated as unvented, W: their combustion products stay in the house */
  unventedInputW: number;
  /** outdoor temperature one of the largest units alone holds; null with no heaters */
  oneLargestUnitAloneHoldsC: number | null;
}

export interface HeaterSizingInput {
  /** design-night heat loss, W */
  designHeatLossW: number;
  /** UA of the house in the same state as the design loss, W/K */
  totalConductanceWPerK: number;
  /** loss that does not follow the inside–outside difference (radiation to a clear sky), W; default 0 */
  fixedLossW?: number;
  /** inside temperature to hold, °C */
  insideC: number;
  heaters: HeaterGroup[];
}

/**
 * Fuel-fired output cannot exceed the heat the fuel holds on its higher-heating-value basis (the
 * basis of reference-data/fuels.json): an efficiency above 1.0 there is an input error.
 */
export function requireHhvEfficiency(
  field: string,
  efficiency: number,
  fuel: { fuelFired: boolean; label: string },
): void {
  if (fuel.fuelFired && efficiency > 1) {
    throw new EngineInputError(
      field,
      `${field} cannot exceed 1.0 for a heater burning ${fuel.label}: fuel heat contents are on the higher heating value, ` +
        'which no heater exceeds (ratings above 100 % are on the lower heating value)',
    );
  }
}

/** Checks each heater group and its fuel; throws EngineInputError naming e.g. `house.heaters.1.efficiency`. */
export function validateHeaterGroups(
  heaters: unknown,
  ref: ReferenceData,
  fieldPrefix = 'house.heaters',
): { group: HeaterGroup; fuel: FuelFiredRow; type: HeaterTypeRow | null }[] {
  if (!Array.isArray(heaters)) throw new EngineInputError(fieldPrefix, `${fieldPrefix} must be a list`);
  return heaters.map((group: HeaterGroup, index) => {
    const field = `${fieldPrefix}.${index}`;
    if (!group || typeof group !== 'object') throw new EngineInputError(field, `${field} must be a heater group`);
    requireInRange(`${field}.count`, group.count, BOUNDS.heaterCount.min, BOUNDS.heaterCount.max);
    if (!Number.isInteger(group.count)) {
      throw new EngineInputError(`${field}.count`, `${field}.count must be a whole number`);
    }
    requireInRange(`${field}.ratedInputW`, group.ratedInputW, BOUNDS.heaterInputW.min, BOUNDS.heaterInputW.max);
    requireInRange(`${field}.efficiency`, group.efficiency, BOUNDS.heaterEfficiency.min, BOUNDS.heaterEfficiency.max);
    const fuel = chosenRow<FuelFiredRow>(ref, 'fuels', group.fuelId, `${field}.fuelId`);
    requireHhvEfficiency(`${field}.efficiency`, group.efficiency, fuel);
    const type =
      group.heaterType === undefined || group.heaterType === null
        ? null
        : heaterTypeRow(ref, group.heaterType, `${field}.heaterType`);
    if (type && type.fuelFired !== fuel.fuelFired) {
      throw new EngineInputError(
        `${field}.heaterType`,
        type.fuelFired
          ? `a ${type.label.toLowerCase()} burns fuel; it cannot run on ${fuel.label}`
          : `a ${type.label.toLowerCase()} burns no fuel; it cannot run on ${fuel.label}`,
      );
    }
    return { group, fuel, type };
  });
}

// Quantities in the advice are tokens (see ../prose.ts): the reader's unit system shows them.
const kW = (watts: number) => quantityToken('power', watts);
const degC = (celsius: number) => quantityToken('temperature', celsius);

/**
 * Heater sizing for the design night.
 * - Required output = design loss × (1 + margin); the margin is a common-practice allowance for
 *   warm-up after a setback, wind above the design value and ageing coverings.
 * - Unit heaters are rated on input; output = input × efficiency.
 * - The temperature a given output holds: T_out = T_in − output / UA (steady state).
 */
export function sizeHeaters(input: HeaterSizingInput, ref: ReferenceData): HeaterSizingDetails {
  const groups = validateHeaterGroups(input.heaters, ref);
  const safetyMarginRow = requiredRow<HeaterSizingRow>(ref, 'heater-sizing', 'safety-margin');
  const minimumUnitCountRow = requiredRow<HeaterSizingRow>(ref, 'heater-sizing', 'minimum-unit-count');
  const safetyMargin = safetyMarginRow.fraction as number;
  const minimumUnitCount = minimumUnitCountRow.count as number;

  const installed = groups.filter(({ group }) => group.count > 0);
  const installedInputW = installed.reduce((sum, { group }) => sum + group.count * group.ratedInputW, 0);
  const installedOutputW = installed.reduce(
    (sum, { group }) => sum + group.count * group.ratedInputW * group.efficiency,
    0,
  );
  const fuelFiredInputW = installed
    .filter(({ fuel }) => fuel.fuelFired)
    .reduce((sum, { group }) => sum + group.count * group.ratedInputW, 0);
  const unventedInputW = installed
    .filter(({ fuel, type }) => fuel.fuelFired && type !== null && !type.vented)
    .reduce((sum, { group }) => sum + group.count * group.ratedInputW, 0);
  const unitCount = installed.reduce((sum, { group }) => sum + group.count, 0);
  const largestUnitOutputW = installed.reduce(
    (largest, { group }) => Math.max(largest, group.ratedInputW * group.efficiency),
    0,
  );

  let typicalHeaterType: HeaterTypeRow | null = null;
  let efficiencyForRequiredInput: number;
  if (installedInputW > 0) {
    efficiencyForRequiredInput = installedOutputW / installedInputW;
  } else {
    typicalHeaterType =
      referenceTable<HeaterTypeRow>(ref, 'heater-types').rows.find((row) => row.defaultForSizing) ?? null;
    if (!typicalHeaterType) throw new Error('reference-data/heater-types.json has no defaultForSizing row');
    efficiencyForRequiredInput = typicalHeaterType.typicalEfficiency;
  }

  const ua = input.totalConductanceWPerK;
  const fixedLossW = input.fixedLossW ?? 0;
  const holdsC = (outputW: number) => input.insideC - (outputW - fixedLossW) / ua;
  const requiredOutputW = Math.max(input.designHeatLossW, 0) * (1 + safetyMargin);
  const verdict: HeaterVerdict =
    unitCount === 0 ? 'none-installed' : installedOutputW >= requiredOutputW ? 'adequate' : 'short';
  const holdsWithLargestUnitOutC = unitCount >= 2 ? holdsC(installedOutputW - largestUnitOutputW) : null;
  const oneLargestUnitAloneHoldsC = unitCount >= 1 ? holdsC(largestUnitOutputW) : null;

  const splitOutputW = requiredOutputW / minimumUnitCount;
  let splitAdvice: string;
  if (unitCount === 0) {
    splitAdvice =
      `No heaters entered. Split the required ${kW(requiredOutputW)} output over at least ` +
      `${minimumUnitCount} units (about ${kW(splitOutputW)} output each) so that one failure does not leave the crop unheated.`;
  } else if (unitCount === 1) {
    splitAdvice =
      `A single unit: if it fails the house has no heat. It alone holds ${degC(input.insideC)} inside down to ` +
      `${degC(oneLargestUnitAloneHoldsC as number)} outside. Use at least ${minimumUnitCount} units (for example ` +
      `${minimumUnitCount} × ${kW(splitOutputW)} output) so one failure does not leave the crop unheated.`;
  } else if (unitCount === 2) {
    splitAdvice =
      `2 units. With one out of service (the larger, ${kW(largestUnitOutputW)} output, if they differ) the other holds ` +
      `${degC(input.insideC)} inside down to ${degC(holdsWithLargestUnitOutC as number)} outside.`;
  } else {
    splitAdvice =
      `${unitCount} units. With the largest (${kW(largestUnitOutputW)} output) out of service the rest hold ` +
      `${degC(input.insideC)} inside down to ${degC(holdsWithLargestUnitOutC as number)} outside; one of the ` +
      `largest units alone holds it down to ${degC(oneLargestUnitAloneHoldsC as number)}.`;
  }

  return {
    result: {
      safetyMargin,
      requiredOutputW,
      requiredInputW: requiredOutputW / efficiencyForRequiredInput,
      installedInputW,
      installedOutputW,
      verdict,
      shortfallW: Math.max(requiredOutputW - installedOutputW, 0),
      lowestHeldOutdoorC: unitCount > 0 ? holdsC(installedOutputW) : null,
      unitCount,
      largestUnitOutputW,
      holdsWithLargestUnitOutC,
      splitAdvice,
      fuelFired: fuelFiredInputW > 0,
    },
    efficiencyForRequiredInput,
    efficiencyBasis: installedInputW > 0 ? 'installed' : 'typical',
    typicalHeaterType,
    safetyMarginRow,
    minimumUnitCountRow,
    fuelFiredInputW,
    unventedInputW,
    oneLargestUnitAloneHoldsC,
  };
}
