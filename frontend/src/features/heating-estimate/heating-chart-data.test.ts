import { describe, expect, it } from 'vitest';
import { unitsFor } from '../../lib/units';
import { demoHouseBHeating } from '../../test/estimate-fixtures';
import { heatLossChartData, heatLossRows } from './heating-chart-data';

const colors = { covering: 'amber', ground: 'green', air: 'blue' };
const components = demoHouseBHeating.heatLoss.components;

describe('heatLossChartData', () => {
  it('puts the largest part first, in kW for an SI user, rounded as shown', () => {
    const data = heatLossChartData(components, unitsFor('si'), colors);
    expect(data.labels).toEqual(['Roof', 'Sidewalls', 'Endwalls', 'Air leakage', 'Perimeter']);
    const bars = data.datasets[0]!;
    expect(bars.label).toBe('Heat loss (kW)');
    // roof 60 324.5 W → 60.3 kW
    expect(bars.data[0]).toBe(60.3);
    expect(bars.data).toEqual([...bars.data].sort((a, b) => b - a));
    expect(bars.backgroundColor).toEqual(['amber', 'amber', 'amber', 'blue', 'green']);
  });

  it('gives Btu/h for a US user (1 Btu/h = 0.293 071 1 W, NIST SP 811 B.8)', () => {
    const data = heatLossChartData(components, unitsFor('us'), colors);
    expect(data.datasets[0]!.label).toBe('Heat loss (Btu/h)');
    expect(data.datasets[0]!.data[0]).toBe(Math.round(60324.5290676169 / 0.29307107));
  });

  it('sums to the total the panel shows (within display rounding)', () => {
    const data = heatLossChartData(components, unitsFor('si'), colors);
    const sumKw = data.datasets[0]!.data.reduce((sum, value) => sum + value, 0);
    expect(sumKw).toBeCloseTo(demoHouseBHeating.heatLoss.totalW / 1000, 0);
  });
});

describe('heatLossRows', () => {
  it('labels each part, names its covering and converts each number', () => {
    const rows = heatLossRows(components, unitsFor('si'));
    const roof = rows.find((row) => row.key === 'roof')!;
    expect(roof.detail).toBe('Single polyethylene film');
    expect(roof.quantity).toBe('232 m²');
    expect(roof.coefficient).toBe('U 6.67 W/(m²·K)');
    expect(roof.loss).toBe('60.3 kW');
    expect(roof.share).toBe('62 %');
    const perimeter = rows.find((row) => row.key === 'perimeter')!;
    expect(perimeter.coefficient).toBe('F 1.38 W/(m·K)');
    expect(perimeter.quantity).toBe('71 m');
    const air = rows.find((row) => row.key === 'infiltration')!;
    expect(air.label).toBe('Air leakage');
    expect(air.detail).toBeNull();
    expect(air.coefficient).toBe('0.8 ACH');
  });

  it('shows US users ft², ft and Btu/(h·ft²·°F)', () => {
    const rows = heatLossRows(components, unitsFor('us'));
    const roof = rows.find((row) => row.key === 'roof')!;
    // 6.67 W/(m²·K) ÷ 5.678 263 = 1.175 Btu/(h·ft²·°F) (NIST SP 811 B.8)
    expect(roof.coefficient).toBe('U 1.175 Btu/(h·ft²·°F)');
    expect(roof.quantity).toBe('2,496 ft²');
    expect(rows.find((row) => row.key === 'perimeter')!.quantity).toBe('232 ft');
  });
});

describe('the clear-night row', () => {
  it('shows radiation to the sky per m² of floor, not as a U-value', () => {
    const rows = heatLossRows(
      [
        {
          key: 'sky',
          label: 'Radiation to a clear night sky',
          quantity: 270,
          quantityUnit: 'm2',
          coefficient: 26.28,
          conductanceWPerK: 236.5,
          watts: 7095.6,
          share: 0.12,
        },
      ],
      unitsFor('si'),
    );
    expect(rows[0]).toMatchObject({ label: 'Clear night sky', coefficient: '26 W/m² of floor', loss: '7.1 kW' });
  });
});
