import { BOUNDS, CLIMATE_BOUNDS } from '@thermbay/engine/vocabulary';
import * as yup from 'yup';
import type { Units } from '../../lib/units';

const typedNumber = (label: string) =>
  yup
    .number()
    .transform((value: number, original: unknown) => (original === '' || original === null ? undefined : value))
    .typeError(`${label} must be a number`);

const inRange = (label: string, range: { min: number; max: number }, unit: string) =>
  typedNumber(label)
    .min(range.min, `${label} must be between ${range.min} and ${range.max} ${unit}`)
    .max(range.max, `${label} must be between ${range.min} and ${range.max} ${unit}`);

/** The climate form's values are strings in the user's units; ranges are the API's, converted. */
export function climateFormSchema(units: Units) {
  const t = units.label('temperature');
  const outdoor = units.range('temperature', CLIMATE_BOUNDS.monthlyMeanC);
  const month = yup.object({
    meanDailyMinC: inRange('Minimum', outdoor, t).required('Enter the mean daily minimum'),
    meanDailyMaxC: inRange('Maximum', outdoor, t)
      .required('Enter the mean daily maximum')
      .test('max-above-min', 'The maximum cannot be below the minimum', function check(value) {
        const minimum = Number(this.parent.meanDailyMinC);
        return value === undefined || this.parent.meanDailyMinC === '' || !Number.isFinite(minimum) || value >= minimum;
      }),
    clearnessPct: inRange('Clearness', { min: 0, max: 100 }, '%').optional(),
  });
  return yup.object({
    winterDesignC: inRange('Heating design temperature', units.range('temperature', BOUNDS.designOutdoorC), t).required(
      'Enter the heating design temperature',
    ),
    summerDesignC: inRange('Cooling design temperature', units.range('temperature', BOUNDS.summerDesignC), t).required(
      'Enter the cooling design temperature',
    ),
    summerDesignWetBulbC: inRange(
      'Coincident wet bulb',
      units.range('temperature', CLIMATE_BOUNDS.summerDesignWetBulbC),
      t,
    )
      .required('Enter the wet bulb that goes with the cooling design temperature')
      .test('wet-below-dry', 'The wet bulb cannot be above the dry bulb it goes with', function check(value) {
        const dry = Number(this.parent.summerDesignC);
        return value === undefined || this.parent.summerDesignC === '' || !Number.isFinite(dry) || value <= dry;
      }),
    summerDailyRangeK: inRange(
      'Daily range',
      units.range('temperatureDifference', CLIMATE_BOUNDS.summerDailyRangeK),
      units.label('temperatureDifference'),
    ).required('Enter the mean daily range on the design day'),
    monthly: yup.array(month).length(12),
    sourceNote: yup
      .string()
      .max(CLIMATE_BOUNDS.sourceNoteLength.max, `At most ${CLIMATE_BOUNDS.sourceNoteLength.max} characters`),
    designWindSpeedMPerS: inRange(
      'Design wind speed',
      units.range('windSpeed', BOUNDS.designWindSpeedMPerS),
      units.label('windSpeed'),
    ).optional(),
  });
}
