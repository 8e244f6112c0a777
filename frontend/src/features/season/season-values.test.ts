import { describe, expect, it } from 'vitest';
import type { HouseSeasonEstimate, MeasureComparison, MeasureResult } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { calendarFormSchema, calendarFormValues, isMonthDay, toCalendarInput } from './calendar-values';
import { lightChangeText, measuresRequestBody, paybackText, rowsFromComparison } from './measures-values';
import { hourlyVersusDegreeDayText, nightStartDate, seasonChartSeries, seasonLossRows } from './season-chart-data';

const month = (
  year: number,
  monthNumber: number,
  energyKWh: number,
  fuelQuantitySi: number,
  fuelQuantityUs: number,
) => ({
  year,
  month: monthNumber,
  energyKWh,
  fuelInputKWh: energyKWh / 0.8,
  fuelQuantitySi,
  fuelQuantityUs,
  cost: fuelQuantityUs * 1.6,
  heatingHours: 100,
  peakW: 50_000,
  degreeDaysKDay: 300,
});

const season = {
  fuel: {
    fuelId: 'propane',
    label: 'Propane',
    unitSi: 'L',
    unitUs: 'US gal',
    pricePerUnit: 1.6,
    priceUnit: 'us',
    priceUnitLabel: 'US gal',
    heaterEfficiency: 0.8,
  },
  monthly: [
    month(2027, 1, 23_437.4, 4143.16, 1094.51),
    month(2026, 12, 0, 0, 0),
    month(2026, 11, 25_567.6, 4519.72, 1193.99),
  ],
} as unknown as Pick<HouseSeasonEstimate, 'monthly' | 'fuel'>;

describe('season chart data', () => {
  it('orders the months and gives fuel in the unit of the user’s system', () => {
    const us = seasonChartSeries(season, unitsFor('us'));
    expect(us.labels).toEqual(['Nov 2026', 'Dec 2026', 'Jan 2027']);
    expect(us.fuel).toEqual([1194, 0, 1094.5]);
    expect(us.fuelUnitLabel).toBe('US gal');
    // 25 567.6 kWh × 3.6 MJ/kWh ÷ 1055.056 MJ/MMBtu = 87.24 MMBtu
    expect(us.heat[0]).toBeCloseTo(87.24, 2);
    expect(us.heatUnitLabel).toBe('MMBtu');
    const si = seasonChartSeries(season, unitsFor('si'));
    expect(si.fuel[2]).toBe(4143.2);
    expect(si.heat[2]).toBe(23_437);
  });

  it('says in words how the hourly result differs from the degree-day one', () => {
    expect(hourlyVersusDegreeDayText({ hourlyDifferenceFraction: -0.1334 })).toBe(
      'The hour-by-hour estimate is 13 % lower than the degree-day estimate.',
    );
    expect(hourlyVersusDegreeDayText({ hourlyDifferenceFraction: 0.05 })).toContain('5 % higher');
    expect(hourlyVersusDegreeDayText({ hourlyDifferenceFraction: 0.001 })).toContain('agree to within 1 %');
    expect(hourlyVersusDegreeDayText({ hourlyDifferenceFraction: null })).toContain('no heat needed');
  });
});

describe('where the season’s heat goes', () => {
  // hand-made breakdown: 12,000 + 3,000 + 5,000 = 20,000 kWh lost; 4,000 kWh from the sun and
  // 1,000 kWh the heaters cannot give are taken off: 15,000 kWh delivered
  const breakdown = {
    parts: [
      { key: 'roof', label: 'Roof (Single polyethylene film)', energyKWh: 12_000, share: 0.6 },
      { key: 'infiltration', label: 'Air leakage (infiltration)', energyKWh: 3_000, share: 0.15 },
      { key: 'sky', label: 'Radiation to the night sky', energyKWh: 5_000, share: 0.25 },
    ],
    lostKWh: 20_000,
    skyKWh: 5_000,
    solarOffsetKWh: 4_000,
    unmetHeatKWh: 1_000,
    deliveredKWh: 15_000,
  } as HouseSeasonEstimate['lossBreakdown'];

  it('lists each part with its share, the sky its own row, then what is taken off and the heat delivered', () => {
    const rows = seasonLossRows(breakdown, unitsFor('si'));
    expect(rows.map((row) => row.key)).toEqual(['roof', 'infiltration', 'sky', 'sun', 'unmet', 'delivered']);
    expect(rows[2]).toEqual({ key: 'sky', label: 'Radiation to the night sky', heat: '5,000 kWh', share: '25 %' });
    expect(rows[3].heat).toBe('−4,000 kWh');
    expect(rows[3].share).toBe('');
    expect(rows[5].heat).toBe('15,000 kWh');
  });

  it('shows US energy units and leaves out the unmet row when the heaters hold the house', () => {
    const rows = seasonLossRows({ ...breakdown, unmetHeatKWh: 0, deliveredKWh: 16_000 }, unitsFor('us'));
    expect(rows.map((row) => row.key)).not.toContain('unmet');
    // 5,000 kWh × 3.6 MJ/kWh ÷ 1055.056 MJ/MMBtu = 17.06 MMBtu
    expect(rows.find((row) => row.key === 'sky')!.heat).toBe('17.06 MMBtu');
  });
});

describe('night of the peak hour', () => {
  it('puts a morning hour in the night that began the evening before, across month and year ends', () => {
    expect(nightStartDate('2027-01-16T08:00')).toBe('2027-01-15');
    expect(nightStartDate('2027-01-01T03:00')).toBe('2026-12-31');
    expect(nightStartDate('2027-03-01T00:00')).toBe('2027-02-28');
    expect(nightStartDate('2027-01-16T19:00')).toBe('2027-01-16');
  });
});

describe('production calendar values', () => {
  it('accepts real MM-DD days only', () => {
    expect(isMonthDay('02-29')).toBe(true);
    expect(isMonthDay('02-30')).toBe(false);
    expect(isMonthDay('13-01')).toBe(false);
    expect(isMonthDay('1-15')).toBe(false);
  });

  it('converts setpoints typed in °F and keeps untouched ones as stored; an empty period carries none', () => {
    const units = unitsFor('us');
    const stored = [
      { startMonthDay: '09-01', endMonthDay: '11-30', mode: 'heated' as const, nightHeatingC: 16, label: 'Fall crop' },
      { startMonthDay: '12-01', endMonthDay: '01-14', mode: 'empty' as const },
    ];
    const initial = calendarFormValues(stored, units);
    expect(initial.periods[0]!.nightHeatingC).toBe('60.8');
    const edited = structuredClone(initial);
    edited.periods[0]!.dayHeatingC = '68'; // 20 °C
    edited.periods[1]!.nightHeatingC = '50'; // ignored: the house is empty then
    const body = toCalendarInput(edited, initial, stored, units);
    expect(body.periods[0]).toEqual({
      startMonthDay: '09-01',
      endMonthDay: '11-30',
      mode: 'heated',
      dayHeatingC: 20,
      nightHeatingC: 16,
      label: 'Fall crop',
    });
    expect(body.periods[0]!.dayHeatingC).toBeCloseTo(20, 12);
    expect(body.periods[1]).toEqual({ startMonthDay: '12-01', endMonthDay: '01-14', mode: 'empty' });
  });

  it('refuses a setpoint outside the shared bounds, in the user’s unit', () => {
    const schema = calendarFormSchema(unitsFor('si'));
    const period = {
      startMonthDay: '01-01',
      endMonthDay: '02-01',
      mode: 'heated',
      dayHeatingC: '55',
      nightHeatingC: '',
      label: '',
    };
    expect(schema.isValidSync({ periods: [period] })).toBe(false);
    expect(schema.isValidSync({ periods: [{ ...period, dayHeatingC: '20' }] })).toBe(true);
  });
});

describe('measures values', () => {
  const result = (overrides: Partial<MeasureResult>): MeasureResult =>
    ({
      index: 0,
      kind: 'thermal-curtain',
      label: 'Curtain',
      description: '',
      costAmount: null,
      applicable: true,
      notApplicableReason: null,
      heatSavedKWh: 0,
      fuelInputSavedKWh: 0,
      fuelSavedSi: 0,
      fuelSavedUs: 0,
      yearlyMoneySaved: 0,
      paybackStatus: 'enter-cost',
      paybackYears: null,
      paybackText: 'enter a cost',
      lightChange: null,
      notes: [],
      ...overrides,
    }) as MeasureResult;

  it('prices the default measures in request order and sends unpriced ones without a cost', () => {
    const comparison = {
      measures: [result({ index: 1, kind: 'sealing' }), result({ index: 0, kind: 'thermal-curtain' })],
    } as MeasureComparison;
    const rows = rowsFromComparison(comparison);
    expect(rows.map((row) => row.kind)).toEqual(['thermal-curtain', 'sealing']);
    rows[0]!.cost = '9500';
    expect(measuresRequestBody(rows)).toEqual([{ kind: 'thermal-curtain', costAmount: 9500 }, { kind: 'sealing' }]);
    rows[1]!.cost = '0';
    expect(measuresRequestBody(rows)[1]).toEqual({ kind: 'sealing', costAmount: 0 });
  });

  it('shows the light change beside layer and screen measures, and payback in words', () => {
    const curtain = result({
      lightChange: { surface: 'roof', before: 0.78, after: 0.7566, relativeChange: -0.03, source: 'x' },
    });
    expect(lightChangeText(curtain, unitsFor('si'))).toBe('Roof: 78 % → 76 % (3 % less light)');
    expect(lightChangeText(result({}), unitsFor('si'))).toBe('—');
    expect(paybackText(result({}))).toBe('enter a cost');
    expect(paybackText(result({ costAmount: 100, paybackStatus: 'never', paybackText: 'never' }))).toBe('never');
    expect(
      paybackText(result({ costAmount: 0, paybackStatus: 'immediate', paybackYears: 0, paybackText: 'immediately' })),
    ).toBe('immediately');
    expect(
      paybackText(result({ costAmount: 9500, paybackStatus: 'years', paybackYears: 4.5, paybackText: '4.5 years' })),
    ).toBe('4.5 years');
    expect(
      paybackText(result({ applicable: false, paybackStatus: 'not-applicable', paybackText: 'not applicable' })),
    ).toBe('—');
  });
});
