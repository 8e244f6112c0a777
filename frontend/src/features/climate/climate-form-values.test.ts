import { describe, expect, it } from 'vitest';
import type { SiteClimate } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { climateChartSeries } from './climate-chart-data';
import { apiFieldToFormPath, climateToFormValues, formValuesToClimate } from './climate-form-values';

const storedClimate: SiteClimate = {
  winterDesignC: -23.3,
  summerDesignC: 31.7,
  summerDesignWetBulbC: 22.8,
  summerDailyRangeK: 11.1,
  monthly: Array.from({ length: 12 }, (_unused, index) => ({
    month: 12 - index, // stored out of order on purpose
    meanDailyMinC: -15 + (11 - index) * 2,
    meanDailyMaxC: -5 + (11 - index) * 2.5,
    clearness: index === 0 ? 0.45 : null,
  })),
  sourceNote: 'Test station',
};

describe('climate form values', () => {
  it('shows stored °C as °F for a US user, months in calendar order, clearness as %', () => {
    const values = climateToFormValues(storedClimate, unitsFor('us'));
    // −23.3 °C × 1.8 + 32 = −9.94 °F, shown to 1 decimal
    expect(values.winterDesignC).toBe('-9.9');
    // 11.1 K × 1.8 = 19.98 °F difference
    expect(values.summerDailyRangeK).toBe('20');
    // January (month 1) is the last stored row: min −15 °C = 5 °F
    expect(values.monthly[0]!.meanDailyMinC).toBe('5');
    // December carries clearness 0.45
    expect(values.monthly[11]!.clearnessPct).toBe('45');
    expect(values.monthly[0]!.clearnessPct).toBe('');
  });

  it('gives an empty form when no climate is stored', () => {
    const values = climateToFormValues(null, unitsFor('si'));
    expect(values.winterDesignC).toBe('');
    expect(values.monthly).toHaveLength(12);
    expect(values.monthly.every((month) => month.meanDailyMaxC === '')).toBe(true);
  });

  it('converts typed °F back to °C and keeps untouched values exactly as stored', () => {
    const units = unitsFor('us');
    const initial = climateToFormValues(storedClimate, units);
    const edited = structuredClone(initial);
    edited.winterDesignC = '-4'; // −4 °F = −20 °C exactly
    edited.monthly[2]!.clearnessPct = '50';
    const body = formValuesToClimate(edited, initial, storedClimate, units);
    expect(body.winterDesignC).toBeCloseTo(-20, 12);
    expect(body.summerDesignC).toBe(31.7);
    expect(body.summerDailyRangeK).toBe(11.1);
    expect(body.monthly.map((m) => m.month)).toEqual([1, 2, 3, 4, 5, 6, 7, 8, 9, 10, 11, 12]);
    expect(body.monthly[0]!.meanDailyMinC).toBe(-15);
    expect(body.monthly[2]!.clearness).toBeCloseTo(0.5, 12);
    expect(body.monthly[11]!.clearness).toBe(0.45);
    expect(body.monthly[5]!.clearness).toBeNull();
    expect(body.sourceNote).toBe('Test station');
  });

  it('maps the API field names (422 engine paths and 400 pipe paths) to form paths', () => {
    expect(apiFieldToFormPath('climate.monthly[2].meanDailyMinC')).toBe('monthly[2].meanDailyMinC');
    expect(apiFieldToFormPath('monthly.2.meanDailyMaxC')).toBe('monthly[2].meanDailyMaxC');
    expect(apiFieldToFormPath('climate.monthly[11].clearness')).toBe('monthly[11].clearnessPct');
    expect(apiFieldToFormPath('climate.summerDesignWetBulbC')).toBe('summerDesignWetBulbC');
  });
});

describe('climate chart data', () => {
  it('charts the typed months as numbers and leaves gaps for empty or non-numeric cells', () => {
    const values = climateToFormValues(storedClimate, unitsFor('si'));
    values.monthly[3]!.meanDailyMaxC = '';
    values.monthly[4]!.meanDailyMinC = 'abc';
    const series = climateChartSeries(values.monthly);
    expect(series.labels).toHaveLength(12);
    expect(series.labels[0]).toBe('Jan');
    expect(series.minimum[0]).toBe(-15);
    expect(series.maximum[3]).toBeNull();
    expect(series.minimum[4]).toBeNull();
  });
});
