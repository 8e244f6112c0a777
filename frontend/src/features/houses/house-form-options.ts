import type { ReferenceData } from '../../api/types';
import type { SelectOption } from '../../components/form-fields';
import { referenceRows } from '../../lib/reference-data';
import type { Units } from '../../lib/units';
import type { HeaterFormValues, LampFormValues } from './house-form-values';

/** The house form's choices, read from the reference tables. */

export function optionsFrom(
  referenceData: ReferenceData,
  table: string,
  describe?: (row: Record<string, unknown>) => string | null,
): SelectOption[] {
  return referenceRows(referenceData, table).map((row) => {
    const extra = describe?.(row);
    const label = row.label ?? row.id;
    return { value: row.id, label: extra ? `${label} (${extra})` : label };
  });
}

export function coveringOptions(referenceData: ReferenceData, units: Units): SelectOption[] {
  return optionsFrom(referenceData, 'coverings', (row) =>
    typeof row.uWPerM2K === 'number' ? `U ${units.format('uValue', row.uWPerM2K)}` : null,
  );
}

/** The typical efficiency of a heater type (heater-types.json), or null when none is stated. */
export function typicalEfficiencyOf(referenceData: ReferenceData, heaterType: string): number | null {
  const row = referenceRows(referenceData, 'heater-types').find((candidate) => candidate.heaterType === heaterType);
  return row && typeof row.typicalEfficiency === 'number' ? row.typicalEfficiency : null;
}

export function newHeaterRow(referenceData: ReferenceData, units: Units): HeaterFormValues {
  const fuels = referenceRows(referenceData, 'fuels');
  return {
    count: '1',
    ratedInputW: units.toInput('power', 73_000),
    efficiency: '80',
    fuelId: fuels.find((row) => row.id === 'natural-gas')?.id ?? fuels[0]?.id ?? '',
    heaterType: '',
  };
}

/** A typical shade cloth (reference-data/shade-cloths.json) and the percent of the sun it lets through. */
export interface ShadeClothChoice {
  id: string;
  label: string;
  percent: number;
}

export function shadeClothChoices(referenceData: ReferenceData): ShadeClothChoice[] {
  return referenceRows(referenceData, 'shade-cloths')
    .filter((row) => typeof row.solarTransmittance === 'number')
    .map((row) => ({
      id: row.id,
      label: String(row.label ?? row.id),
      percent: Math.round((row.solarTransmittance as number) * 1000) / 10,
    }));
}

/** Lamp types (reference-data lamps.json rows of kind 'lamp-type'), with 'Not stated' first. */
export function lampTypeOptions(referenceData: ReferenceData): SelectOption[] {
  return [
    { value: '', label: 'Not stated' },
    ...referenceRows(referenceData, 'lamps')
      .filter((row) => row.kind === 'lamp-type')
      .map((row) => ({ value: row.id, label: row.label ?? row.id })),
  ];
}

function lampRow(referenceData: ReferenceData, id: string): Record<string, unknown> | undefined {
  return referenceRows(referenceData, 'lamps').find((row) => row.id === id);
}

/** The usual share of a lamp type's input that heats the house (lamps.json), or null. */
export function typicalLampHeatShareOf(referenceData: ReferenceData, lampTypeId: string): number | null {
  const row = lampTypeId === '' ? lampRow(referenceData, 'heat-to-house-default') : lampRow(referenceData, lampTypeId);
  return row && typeof row.heatToHouseFraction === 'number' ? row.heatToHouseFraction : null;
}

/** What "Add lamps" starts from: the LED row's typical power and heat share, and the starting schedule. */
export function startingLamps(referenceData: ReferenceData, units: Units): LampFormValues {
  const led = lampRow(referenceData, 'led-horticultural');
  const schedule = lampRow(referenceData, 'starting-schedule')?.hoursPerDayByMonth;
  const hours = Array.isArray(schedule) && schedule.length === 12 ? schedule.map(String) : Array(12).fill('0');
  const density = typeof led?.typicalPowerDensityWPerM2 === 'number' ? led.typicalPowerDensityWPerM2 : null;
  const share = typicalLampHeatShareOf(referenceData, led ? 'led-horticultural' : '');
  return {
    lampTypeId: led ? 'led-horticultural' : '',
    powerDensityWPerM2: density === null ? '' : units.toInput('powerPerFloorArea', density),
    hoursPerDayByMonth: hours,
    heatToHouseFraction: share === null ? '' : String(Math.round(share * 1000) / 10),
  };
}
