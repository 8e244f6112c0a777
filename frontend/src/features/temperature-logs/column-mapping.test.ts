import { describe, expect, it } from 'vitest';
import { ApiError } from '../../api/client';
import type { TemperatureCsvInspection } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { columnMappingSchema, columnRoles, fileProblems, mappingFormValues, toColumnMapping } from './column-mapping';
import { logChartSeries } from './log-chart-data';

export const hourlyInspection: TemperatureCsvInspection = {
  delimiter: ',',
  hasHeader: true,
  headers: ['Time', 'Temp (°C)'],
  sampleRows: [
    ['2026-01-10 00:00', '-10.0'],
    ['2026-01-10 01:00', '-9.8'],
  ],
  dataRowCount: 72,
  proposal: {
    timestampColumn: 'Time',
    dateColumn: null,
    timeColumn: null,
    temperatureColumn: 'Temp (°C)',
    minColumn: null,
    maxColumn: null,
    unit: 'C',
    unitReason: 'the column name says °C',
    resolution: 'hourly',
    dateOrder: 'YMD',
    dateOrderAmbiguous: false,
    decimalComma: false,
  },
  notes: [],
};

const dailyInspection: TemperatureCsvInspection = {
  ...hourlyInspection,
  delimiter: ';',
  headers: ['Date', 'Tmin', 'Tmax'],
  sampleRows: [['01/31/2026', '12', '30']],
  proposal: {
    ...hourlyInspection.proposal,
    timestampColumn: null,
    dateColumn: 'Date',
    temperatureColumn: null,
    minColumn: 'Tmin',
    maxColumn: 'Tmax',
    unit: 'F',
    resolution: 'daily',
    dateOrder: 'MDY',
  },
};

describe('column mapping confirmation', () => {
  it("starts from the server's proposal and sends back exactly the confirmed columns", () => {
    const values = mappingFormValues(hourlyInspection, 'north-station-2026.csv');
    expect(values.name).toBe('north-station-2026');
    expect(values.timeLayout).toBe('timestamp');
    expect(values.valueLayout).toBe('single');
    expect(toColumnMapping(values, hourlyInspection)).toEqual({
      timestampColumn: 'Time',
      dateColumn: null,
      timeColumn: null,
      temperatureColumn: 'Temp (°C)',
      minColumn: null,
      maxColumn: null,
      unit: 'C',
      resolution: 'hourly',
      dateOrder: 'YMD',
      decimalComma: false,
      delimiter: ',',
      hasHeader: true,
    });
  });

  it('reads a daily min/max file with a date column and keeps the user’s change of unit', () => {
    const values = mappingFormValues(dailyInspection, 'daily.csv');
    expect(values.timeLayout).toBe('date-and-time');
    expect(values.valueLayout).toBe('min-max');
    const mapping = toColumnMapping({ ...values, unit: 'C' }, dailyInspection);
    expect(mapping).toMatchObject({
      timestampColumn: null,
      dateColumn: 'Date',
      timeColumn: null,
      minColumn: 'Tmin',
      maxColumn: 'Tmax',
      temperatureColumn: null,
      unit: 'C',
      delimiter: ';',
    });
    expect(columnRoles(values).get('Tmin')).toBe('minimum (°F)');
  });

  it('refuses a mapping without the columns its layout needs', () => {
    const values = mappingFormValues(hourlyInspection, 'x.csv');
    expect(columnMappingSchema.isValidSync(values)).toBe(true);
    expect(columnMappingSchema.isValidSync({ ...values, temperatureColumn: '' })).toBe(false);
    expect(columnMappingSchema.isValidSync({ ...values, timeLayout: 'date-and-time', dateColumn: '' })).toBe(false);
    const minMax = { ...values, valueLayout: 'min-max' as const, minColumn: 'Temp (°C)', maxColumn: 'Temp (°C)' };
    expect(columnMappingSchema.isValidSync(minMax)).toBe(false);
  });

  it('lists a refused file’s problems by line', () => {
    const error = new ApiError(422, '2 problems', 'file', [
      { field: 'line 3', message: "the temperature 'abc' is not a number" },
      { field: 'file', message: '1 more problems not listed' },
    ]);
    expect(fileProblems(error)).toEqual([
      { where: 'Line 3', message: "the temperature 'abc' is not a number" },
      { where: 'File', message: '1 more problems not listed' },
    ]);
    expect(fileProblems(new Error('x'))).toEqual([]);
  });
});

describe('log chart data', () => {
  it('orders days and converts °C to the user’s unit, keeping gaps for missing minima', () => {
    const series = logChartSeries(
      [
        { date: '2026-01-11', minC: null, meanC: 0, maxC: null, readingCount: 1 },
        { date: '2026-01-10', minC: -10, meanC: -7.6, maxC: -5.2, readingCount: 24 },
      ],
      unitsFor('us'),
    );
    expect(series.labels).toEqual(['2026-01-10', '2026-01-11']);
    expect(series.minimum).toEqual([14, null]);
    expect(series.mean).toEqual([18.3, 32]);
    expect(series.unitLabel).toBe('°F');
  });
});
