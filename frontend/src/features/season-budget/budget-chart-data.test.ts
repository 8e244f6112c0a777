import { describe, expect, it } from 'vitest';
import type { SeasonBudget } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { budgetChartSeries } from './budget-chart-data';

describe('budget chart data', () => {
  it('orders the months across the year end, rounds cost to cents and shows heat in the user’s unit', () => {
    const budget = {
      monthly: [
        { year: 2027, month: 1, energyKWh: 176_159.5, fuelInputKWh: 0, cost: 6962.3075, byFuel: [] },
        { year: 2026, month: 9, energyKWh: 21_497.1, fuelInputKWh: 0, cost: 895.28046, byFuel: [] },
      ],
    } as unknown as Pick<SeasonBudget, 'monthly'>;
    const si = budgetChartSeries(budget, unitsFor('si'));
    expect(si.labels).toEqual(['Sep 2026', 'Jan 2027']);
    expect(si.cost).toEqual([895.28, 6962.31]);
    expect(si.heat).toEqual([21_497, 176_160]);
    const us = budgetChartSeries(budget, unitsFor('us'));
    // 176 159.5 kWh = 601.08 MMBtu (1 MMBtu = 293.0711 kWh, NIST SP 811 B.8)
    expect(us.heat[1]).toBeCloseTo(601.08, 2);
    expect(us.heatUnitLabel).toBe('MMBtu');
  });
});
