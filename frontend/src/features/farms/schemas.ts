import { BOUNDS, isCurrencyCode } from '@thermbay/engine/vocabulary';
import * as yup from 'yup';
import type { Units } from '../../lib/units';

export function isKnownTimeZone(timeZone: string): boolean {
  try {
    new Intl.DateTimeFormat('en-US', { timeZone });
    return true;
  } catch {
    return false;
  }
}

const numberField = (label: string) =>
  yup
    .number()
    .transform((value: number, original: unknown) => (original === '' || original === null ? undefined : value))
    .typeError(`${label} must be a number`)
    .required(`Enter the ${label.toLowerCase()}`);

const between = (schema: yup.NumberSchema, label: string, range: { min: number; max: number }, unit = '') =>
  schema
    .min(range.min, `${label} must be between ${range.min} and ${range.max}${unit ? ` ${unit}` : ''}`)
    .max(range.max, `${label} must be between ${range.min} and ${range.max}${unit ? ` ${unit}` : ''}`);

/** Farm form values are strings typed in the user's units; elevation follows the length unit. */
export function farmFormSchema(units: Units) {
  return yup.object({
    name: yup.string().trim().max(120, 'At most 120 characters').required('Enter a name'),
    latitudeDeg: between(numberField('Latitude'), 'Latitude', BOUNDS.latitudeDeg, '°'),
    longitudeDeg: between(numberField('Longitude'), 'Longitude', BOUNDS.longitudeDeg, '°'),
    elevationM: between(
      numberField('Elevation'),
      'Elevation',
      units.range('length', BOUNDS.elevationM),
      units.label('length'),
    ),
    timeZone: yup
      .string()
      .required('Choose a time zone')
      .test('known-time-zone', 'Choose a time zone from the list', (value) => !value || isKnownTimeZone(value)),
    currency: yup
      .string()
      .required('Choose the currency the farm pays in')
      .test('known-currency', 'Choose a currency from the list (a three-letter code such as USD or EUR)', (value) =>
        !value ? true : isCurrencyCode(value),
      ),
  });
}

export interface FarmFormValues {
  name: string;
  latitudeDeg: string;
  longitudeDeg: string;
  elevationM: string;
  timeZone: string;
  /** ISO 4217 code, e.g. USD */
  currency: string;
}
