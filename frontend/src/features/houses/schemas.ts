import { BOUNDS, LAMP_MONTHS } from '@thermbay/engine/vocabulary';
import * as yup from 'yup';
import type { Quantity, Units } from '../../lib/units';
import { HOUSE_SHAPES } from './house-form-values';

/**
 * The house form's Yup schema. Values are strings typed in the user's units; each SI bound from
 * the shared bounds module is converted to that unit (narrowed inward to the shown decimals) so
 * the form refuses exactly what the API would.
 */

function numeric(label: string) {
  return yup
    .number()
    .transform((value: number, original: unknown) =>
      original === '' || original === null || original === undefined ? undefined : value,
    )
    .typeError(`${label} must be a number`);
}

function rangeMessage(label: string, range: { min: number; max: number }, unit: string) {
  return `${label} must be between ${range.min} and ${range.max}${unit ? ` ${unit}` : ''}`;
}

export function houseFormSchema(units: Units) {
  const measured = (label: string, quantity: Quantity, siRange: { min: number; max: number }) => {
    const range = units.range(quantity, siRange);
    const message = rangeMessage(label, range, units.label(quantity));
    return numeric(label).min(range.min, message).max(range.max, message);
  };
  const counted = (label: string, range: { min: number; max: number }) => {
    const message = rangeMessage(label, range, '');
    return numeric(label).integer(`${label} must be a whole number`).min(range.min, message).max(range.max, message);
  };
  const efficiencyRangePct = {
    min: Math.round(BOUNDS.heaterEfficiency.min * 100),
    max: Math.round(BOUNDS.heaterEfficiency.max * 100),
  };
  const optionalU = (label: string) => measured(label, 'uValue', BOUNDS.uValueWPerM2K).optional();
  const shadePct = {
    min: Math.round(BOUNDS.shadeClothTransmittance.min * 100),
    max: Math.round(BOUNDS.shadeClothTransmittance.max * 100),
  };
  const monthRange = BOUNDS.shadeClothMonth;
  const lampSharePct = {
    min: Math.round(BOUNDS.lampHeatToHouseFraction.min * 100),
    max: Math.round(BOUNDS.lampHeatToHouseFraction.max * 100),
  };
  const hoursMessage = rangeMessage('Lamp hours', BOUNDS.lampHoursPerDay, 'h');
  const lampsSchema = yup.object({
    lampTypeId: yup.string(),
    powerDensityWPerM2: measured('Lamp power', 'powerPerFloorArea', BOUNDS.lampPowerDensityWPerM2).required(
      'Enter the lamps’ power per floor area',
    ),
    hoursPerDayByMonth: yup
      .array(
        numeric('Lamp hours')
          .min(BOUNDS.lampHoursPerDay.min, hoursMessage)
          .max(BOUNDS.lampHoursPerDay.max, hoursMessage)
          .required('Enter the hours (0 for none)'),
      )
      .length(LAMP_MONTHS, `Enter ${LAMP_MONTHS} months of hours`),
    heatToHouseFraction: numeric('Heat share')
      .min(lampSharePct.min, rangeMessage('Heat share', lampSharePct, '%'))
      .max(lampSharePct.max, rangeMessage('Heat share', lampSharePct, '%'))
      .required('Enter the share of the lamps’ power that heats the house'),
  });

  return yup.object({
    name: yup
      .string()
      .trim()
      .max(BOUNDS.nameLength.max, `At most ${BOUNDS.nameLength.max} characters`)
      .required('Enter a name for the house'),
    notes: yup
      .string()
      .max(BOUNDS.notesLength.max, `At most ${BOUNDS.notesLength.max.toLocaleString('en-US')} characters`),
    shape: yup
      .mixed()
      .oneOf([...HOUSE_SHAPES], 'Choose a shape')
      .required('Choose a shape'),
    spans: counted('Spans', BOUNDS.spans).required('Enter the number of spans'),
    widthM: measured('Width', 'length', BOUNDS.widthM).required('Enter the span width'),
    lengthM: measured('Length', 'length', BOUNDS.lengthM).required('Enter the length'),
    eaveHeightM: measured('Eave height', 'length', BOUNDS.eaveHeightM).required('Enter the eave height'),
    ridgeHeightM: measured('Ridge height', 'length', BOUNDS.ridgeHeightM)
      .required('Enter the ridge height')
      .test('above-eave', 'The ridge must be higher than the eave', function ridgeAboveEave(ridge) {
        const eave = Number(this.parent.eaveHeightM);
        return ridge === undefined || !Number.isFinite(eave) || ridge > eave;
      }),
    coverings: yup.object({
      roof: yup.string().required('Choose the roof covering'),
      sidewalls: yup.string().required('Choose the sidewall covering'),
      endwalls: yup.string().required('Choose the endwall covering'),
    }),
    coveringUOverridesWPerM2K: yup.object({
      roof: optionalU('Roof U-value'),
      sidewalls: optionalU('Sidewall U-value'),
      endwalls: optionalU('Endwall U-value'),
    }),
    airLeakageClassId: yup.string().required('Choose how tight the house is'),
    airChangesPerHourOverride: numeric('Air changes per hour')
      .min(BOUNDS.airChangesPerHour.min, rangeMessage('Air changes per hour', BOUNDS.airChangesPerHour, '/h'))
      .max(BOUNDS.airChangesPerHour.max, rangeMessage('Air changes per hour', BOUNDS.airChangesPerHour, '/h'))
      .optional(),
    perimeterInsulated: yup.boolean(),
    curtainId: yup.string(),
    kneewallHeightM: measured('Kneewall height', 'length', BOUNDS.kneewallHeightM)
      .optional()
      .test('below-eave', 'The kneewall cannot be higher than the eave', function kneewallBelowEave(height) {
        const eave = Number(this.parent.eaveHeightM);
        return height === undefined || !Number.isFinite(eave) || height <= eave;
      }),
    kneewallId: yup.string(),
    shadeCloth: yup.object({
      present: yup.boolean(),
      solarTransmittance: numeric('Sun it lets through').when('present', {
        is: true,
        then: (schema) =>
          schema
            .min(shadePct.min, rangeMessage('Sun it lets through', shadePct, '%'))
            .max(shadePct.max, rangeMessage('Sun it lets through', shadePct, '%'))
            .required('Enter the share of the sun the cloth lets through'),
        otherwise: (schema) => schema.notRequired(),
      }),
      months: yup
        .array(
          yup
            .number()
            .integer('Months are whole numbers')
            .min(monthRange.min, `Months run from ${monthRange.min} to ${monthRange.max}`)
            .max(monthRange.max, `Months run from ${monthRange.min} to ${monthRange.max}`)
            .required(),
        )
        .when('present', {
          is: true,
          then: (schema) => schema.min(1, 'Tick at least one month the cloth is in place'),
        }),
    }),
    heaters: yup
      .array(
        yup.object({
          count: counted('Heater count', BOUNDS.heaterCount).required('Enter how many'),
          ratedInputW: measured('Rated input', 'power', BOUNDS.heaterInputW).required('Enter the rated input'),
          efficiency: numeric('Efficiency')
            .min(efficiencyRangePct.min, rangeMessage('Efficiency', efficiencyRangePct, '%'))
            .max(efficiencyRangePct.max, rangeMessage('Efficiency', efficiencyRangePct, '%'))
            .required('Enter the efficiency'),
          fuelId: yup.string().required('Choose the fuel'),
          heaterType: yup.string(),
        }),
      )
      .max(BOUNDS.heaterGroups.max, `At most ${BOUNDS.heaterGroups.max} heater groups`),
    exhaustFans: yup.object({
      count: counted('Fan count', BOUNDS.fanCount).required('Enter how many fans'),
      capacityEachM3PerS: measured('Fan capacity', 'airFlow', BOUNDS.fanCapacityM3PerS).required(
        'Enter the capacity of one fan',
      ),
    }),
    inletAreaM2: measured('Inlet area', 'area', BOUNDS.inletAreaM2).required('Enter the inlet free area'),
    setpoints: yup.object({
      dayHeatingC: measured('Day heating setpoint', 'temperature', BOUNDS.setpointC).required('Enter a setpoint'),
      nightHeatingC: measured('Night heating setpoint', 'temperature', BOUNDS.setpointC).required('Enter a setpoint'),
      coolingC: measured('Cooling setpoint', 'temperature', BOUNDS.setpointC).required('Enter a setpoint'),
    }),
    lampsOn: yup.boolean(),
    // checked only while the house has lamps
    lamps: yup.object().when('lampsOn', {
      is: true,
      then: () => lampsSchema,
      otherwise: (schema) => schema,
    }),
  });
}
