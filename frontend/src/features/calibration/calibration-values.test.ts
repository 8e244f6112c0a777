import { describe, expect, it } from 'vitest';
import type { CalibrationMeter, CalibrationPeriod } from '../../api/types';
import { factorWithInterval, meterChartSeries, meterChartSummary, verdictLabel } from './calibration-values';

function period(overrides: Partial<CalibrationPeriod>): CalibrationPeriod {
  return {
    recordId: 1,
    startDate: '2025-12-01',
    endDate: '2025-12-31',
    days: 31,
    climateFrom: 'normals',
    temperatureLogName: null,
    quantityUnit: 'US gal',
    billedQuantity: 1000,
    handbookQuantity: 800,
    fittedQuantity: 990,
    billedFuelKWh: 26767,
    handbookFuelKWh: 21414,
    fittedFuelKWh: 26500,
    nonHeatingFuelKWh: 0,
    usedInFit: true,
    note: null,
    ...overrides,
  };
}

const meter: CalibrationMeter = {
  key: 'propane:1',
  fuelId: 'propane',
  fuelLabel: 'Propane',
  houseIds: [1],
  houseNames: ['House A'],
  fitted: true,
  refusal: null,
  factor: 1.2345,
  factorLow90: 1.18,
  factorHigh90: 1.289,
  standardError: 0.02,
  degreesOfFreedom: 4,
  nmbePercent: 0.4,
  cvRmsePercent: 3.1,
  meetsGuideline14: true,
  verdict: 'meets',
  meaning: 'About 23 % more heat loss',
  periods: [
    period({}),
    period({ recordId: 2, startDate: '2026-01-01', endDate: '2026-01-31', billedQuantity: 1200, fittedQuantity: 1000 }),
  ],
};

describe('calibration results in words', () => {
  it('the factor with its 90 % interval, two decimals', () => {
    expect(factorWithInterval(meter)).toBe('1.23 (90 % interval 1.18 to 1.29)');
    expect(factorWithInterval({ ...meter, fitted: false, factor: null })).toBe('not fitted');
  });

  it('the verdict against Guideline 14', () => {
    expect(verdictLabel(meter)).toEqual({ severity: 'success', label: 'Meets ASHRAE Guideline 14 (monthly)' });
    expect(verdictLabel({ ...meter, meetsGuideline14: false }).severity).toBe('warning');
  });

  it('charts the bills in their own unit, or in kWh of fuel when the units differ', () => {
    expect(meterChartSeries(meter)).toMatchObject({ unit: 'US gal', billed: [1000, 1200], fitted: [990, 1000] });
    const mixed = { ...meter, periods: [meter.periods[0], { ...meter.periods[1], quantityUnit: 'L' }] };
    expect(meterChartSeries(mixed)).toMatchObject({ unit: 'kWh of fuel', billed: [26767, 26767] });
  });

  it('a text alternative with totals and the bill furthest off', () => {
    // billed 2200, handbook 1600, calibrated 1990; January misses by |1000 − 1200| / 1200 = 17 %
    expect(meterChartSummary(meter)).toBe(
      '2 bills from 2025-12-01 to 2026-01-31; billed 2,200 US gal in all; the handbook model 1,600 US gal; the calibrated model 1,990 US gal; the furthest off is 2026-01-01 – 2026-01-31, by 17 % of its bill.',
    );
  });
});
