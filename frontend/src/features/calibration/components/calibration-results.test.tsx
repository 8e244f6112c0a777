import { screen, within } from '@testing-library/react';
import { describe, expect, it } from 'vitest';
import type { Calibration, CalibrationPeriod } from '../../../api/types';
import { renderWithProviders } from '../../../test/render-with-providers';
import { CalibrationResults } from './calibration-results';

const period = (overrides: Partial<CalibrationPeriod>): CalibrationPeriod => ({
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
});

const calibration: Calibration = {
  id: 7,
  farmId: 3,
  createdAt: '2026-12-02T10:00:00.000Z',
  recordCount: 3,
  houses: [{ houseId: 1, name: 'House A', factor: 1.24, meterKey: 'propane:1' }],
  notes: ['Where several houses share a meter or tank, they share one factor.'],
  meters: [
    {
      key: 'propane:1',
      fuelId: 'propane',
      fuelLabel: 'Propane',
      houseIds: [1],
      houseNames: ['House A'],
      fitted: true,
      refusal: null,
      factor: 1.24,
      factorLow90: 1.19,
      factorHigh90: 1.29,
      standardError: 0.02,
      degreesOfFreedom: 2,
      nmbePercent: 0.3,
      cvRmsePercent: 2.4,
      meetsGuideline14: true,
      verdict: "The model with this factor meets ASHRAE Guideline 14's limits for monthly data.",
      meaning: 'About 24 % more heat loss than the handbook values assume.',
      periods: [
        period({}),
        period({
          recordId: 2,
          startDate: '2026-01-01',
          endDate: '2026-01-31',
          climateFrom: 'temperature-log',
          temperatureLogName: 'January',
        }),
        period({ recordId: 3, startDate: '2026-02-01', endDate: '2026-02-28', days: 28 }),
      ],
    },
    {
      key: 'natural-gas:2',
      fuelId: 'natural-gas',
      fuelLabel: 'Natural gas',
      houseIds: [2],
      houseNames: ['House B'],
      fitted: false,
      refusal: 'A factor needs at least 3 bills with heating in them for the same houses and fuel.',
      factor: null,
      factorLow90: null,
      factorHigh90: null,
      standardError: null,
      degreesOfFreedom: null,
      nmbePercent: null,
      cvRmsePercent: null,
      meetsGuideline14: null,
      verdict: 'refused',
      meaning: 'No factor was fitted.',
      periods: [period({ recordId: 4, quantityUnit: 'therm', fittedQuantity: null, fittedFuelKWh: null })],
    },
  ],
};

describe('CalibrationResults', () => {
  it('shows each meter’s factor with its interval and verdict, or why none was fitted', () => {
    renderWithProviders(<CalibrationResults calibration={calibration} />);
    expect(screen.getByTestId('factor-propane:1').textContent).toBe('1.24 (90 % interval 1.19 to 1.29)');
    expect(screen.getByText('Meets ASHRAE Guideline 14 (monthly)')).toBeTruthy();
    expect(screen.getByText(/About 24 % more heat loss/)).toBeTruthy();
    expect(screen.getByText('No factor fitted')).toBeTruthy();
    expect(screen.getByText(/needs at least 3 bills/)).toBeTruthy();
  });

  it('lists billed against modelled fuel per bill, and where its temperatures came from', () => {
    renderWithProviders(<CalibrationResults calibration={calibration} />);
    const table = screen.getByRole('table', { name: 'Billed and modelled fuel, House A' });
    const rows = within(table).getAllByRole('row');
    expect(rows).toHaveLength(4);
    expect(rows[2].textContent).toContain('Log: January');
    expect(rows[1].textContent).toContain('Normals (no log covers it)');
    expect(rows[1].textContent).toContain('1,000');
    // the chart's text alternative
    expect(screen.getByText(/^3 bills from 2025-12-01 to 2026-02-28; billed 3,000 US gal in all/)).toBeTruthy();
  });
});
