import * as yup from 'yup';
import { ApiError } from '../../api/client';
import type { TemperatureColumnMapping, TemperatureCsvInspection } from '../../api/types';

export type TimeLayout = 'timestamp' | 'date-and-time';
export type ValueLayout = 'single' | 'min-max';

/** What the user confirms after inspecting a file; '' = no column chosen. */
export interface ColumnMappingFormValues {
  name: string;
  timeLayout: TimeLayout;
  timestampColumn: string;
  dateColumn: string;
  timeColumn: string;
  valueLayout: ValueLayout;
  temperatureColumn: string;
  minColumn: string;
  maxColumn: string;
  unit: 'C' | 'F';
  resolution: 'hourly' | 'daily';
  dateOrder: 'YMD' | 'MDY' | 'DMY';
  decimalComma: boolean;
}

/** "north-station-2025.csv" → "north-station-2025" as the log's first name. */
export function logNameFromFile(fileName: string): string {
  return fileName.replace(/\.[^.]+$/, '').slice(0, 200) || 'Temperature log';
}

/** The server's proposal as the form's starting values. */
export function mappingFormValues(inspection: TemperatureCsvInspection, fileName: string): ColumnMappingFormValues {
  const proposal = inspection.proposal;
  const hasMinMax = Boolean(proposal.minColumn && proposal.maxColumn);
  return {
    name: logNameFromFile(fileName),
    timeLayout: proposal.timestampColumn || !proposal.dateColumn ? 'timestamp' : 'date-and-time',
    timestampColumn: proposal.timestampColumn ?? '',
    dateColumn: proposal.dateColumn ?? '',
    timeColumn: proposal.timeColumn ?? '',
    valueLayout: !proposal.temperatureColumn && hasMinMax ? 'min-max' : 'single',
    temperatureColumn: proposal.temperatureColumn ?? '',
    minColumn: proposal.minColumn ?? '',
    maxColumn: proposal.maxColumn ?? '',
    unit: proposal.unit,
    resolution: proposal.resolution,
    dateOrder: proposal.dateOrder,
    decimalComma: proposal.decimalComma,
  };
}

export const columnMappingSchema = yup.object({
  name: yup.string().trim().max(200, 'At most 200 characters').required('Name the log'),
  timeLayout: yup.mixed<TimeLayout>().oneOf(['timestamp', 'date-and-time']).required(),
  timestampColumn: yup.string().when('timeLayout', {
    is: 'timestamp',
    then: (schema: yup.StringSchema) => schema.required('Choose the column with the date and time'),
  }),
  dateColumn: yup.string().when('timeLayout', {
    is: 'date-and-time',
    then: (schema: yup.StringSchema) => schema.required('Choose the date column'),
  }),
  timeColumn: yup.string().when(['timeLayout', 'resolution'], {
    is: (timeLayout: TimeLayout, resolution: string) => timeLayout === 'date-and-time' && resolution === 'hourly',
    then: (schema: yup.StringSchema) => schema.required('Hourly readings need the time column'),
  }),
  valueLayout: yup.mixed<ValueLayout>().oneOf(['single', 'min-max']).required(),
  temperatureColumn: yup.string().when('valueLayout', {
    is: 'single',
    then: (schema: yup.StringSchema) => schema.required('Choose the temperature column'),
  }),
  minColumn: yup.string().when('valueLayout', {
    is: 'min-max',
    then: (schema: yup.StringSchema) => schema.required('Choose the minimum column'),
  }),
  maxColumn: yup
    .string()
    .when('valueLayout', {
      is: 'min-max',
      then: (schema: yup.StringSchema) => schema.required('Choose the maximum column'),
    })
    .test('not-min', 'The maximum must be another column than the minimum', function check(value) {
      return this.parent.valueLayout !== 'min-max' || !value || value !== this.parent.minColumn;
    }),
  unit: yup.mixed<'C' | 'F'>().oneOf(['C', 'F']).required(),
  resolution: yup.mixed<'hourly' | 'daily'>().oneOf(['hourly', 'daily']).required(),
  dateOrder: yup.mixed<'YMD' | 'MDY' | 'DMY'>().oneOf(['YMD', 'MDY', 'DMY']).required(),
  decimalComma: yup.boolean().required(),
});

const orNull = (value: string) => (value === '' ? null : value);

/** The confirmed form → the mapping the upload sends (only the chosen layout's columns). */
export function toColumnMapping(
  values: ColumnMappingFormValues,
  inspection: TemperatureCsvInspection,
): TemperatureColumnMapping {
  const byTimestamp = values.timeLayout === 'timestamp';
  const single = values.valueLayout === 'single';
  return {
    timestampColumn: byTimestamp ? orNull(values.timestampColumn) : null,
    dateColumn: byTimestamp ? null : orNull(values.dateColumn),
    timeColumn: byTimestamp ? null : orNull(values.timeColumn),
    temperatureColumn: single || values.temperatureColumn ? orNull(values.temperatureColumn) : null,
    minColumn: single ? null : orNull(values.minColumn),
    maxColumn: single ? null : orNull(values.maxColumn),
    unit: values.unit,
    resolution: values.resolution,
    dateOrder: values.dateOrder,
    decimalComma: values.decimalComma,
    delimiter: inspection.delimiter,
    hasHeader: inspection.hasHeader,
  };
}

/** What each column of the file is used for, to label the sample's headers. */
export function columnRoles(values: ColumnMappingFormValues): Map<string, string> {
  const roles = new Map<string, string>();
  const add = (columnName: string, role: string) => {
    if (!columnName) return;
    roles.set(columnName, roles.has(columnName) ? `${roles.get(columnName)}, ${role}` : role);
  };
  if (values.timeLayout === 'timestamp') add(values.timestampColumn, 'date & time');
  else {
    add(values.dateColumn, 'date');
    add(values.timeColumn, 'time');
  }
  if (values.valueLayout === 'single') add(values.temperatureColumn, `temperature (°${values.unit})`);
  else {
    add(values.minColumn, `minimum (°${values.unit})`);
    add(values.maxColumn, `maximum (°${values.unit})`);
    add(values.temperatureColumn, `mean (°${values.unit})`);
  }
  return roles;
}

export interface FileProblem {
  /** 'Line 12' or 'File' */
  where: string;
  message: string;
}

/** A refused upload's problems, line by line ('line 12' → 'Line 12'). */
export function fileProblems(error: unknown): FileProblem[] {
  if (!(error instanceof ApiError)) return [];
  return error.details.map((detail) => ({
    where: detail.field
      .replace(/^line\b/, 'Line')
      .replace(/^file$/, 'File')
      .replace(/^mapping\./, 'Mapping: '),
    message: detail.message,
  }));
}
