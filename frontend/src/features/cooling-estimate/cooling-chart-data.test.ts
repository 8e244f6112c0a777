import { describe, expect, it } from 'vitest';
import type { DesignDayHour } from '../../api/types';
import { unitsFor } from '../../lib/units';
import { demoHouseBCooling } from '../../test/estimate-fixtures';
import { designDayChartData, hourRanges } from './cooling-chart-data';

const colors = { outdoor: 'grey', fans: 'amber', pads: 'blue', setpoint: 'red' };
const hours = demoHouseBCooling.designDay.hours;

describe('designDayChartData', () => {
  it('draws outdoor, indoor with fans and the setpoint, without a pads line when there are no pads', () => {
    const data = designDayChartData(hours, 24, unitsFor('si'), colors);
    expect(data.labels).toHaveLength(24);
    expect(data.labels[0]).toBe('00:00');
    expect(data.labels[14]).toBe('14:00');
    expect(data.datasets.map((dataset) => dataset.label)).toEqual([
      'Outdoor (°C)',
      'Indoor with fans (°C)',
      'Cooling setpoint (°C)',
    ]);
    // hour 14 of the fixture: indoor 40.39 °C shown to one decimal
    expect(data.datasets[1]!.data[14]).toBe(40.4);
    const setpoint = data.datasets[2]!;
    expect(new Set(setpoint.data)).toEqual(new Set([24]));
    expect(setpoint.borderDash).toEqual([6, 4]);
  });

  it('adds the pads line when the result has pads', () => {
    const withPads: DesignDayHour[] = hours.map((hour) => ({ ...hour, indoorWithPadsC: hour.indoorWithFansC - 3 }));
    const data = designDayChartData(withPads, 24, unitsFor('si'), colors);
    expect(data.datasets.map((dataset) => dataset.label)).toContain('Indoor with pads (°C)');
    const pads = data.datasets.find((dataset) => dataset.label.startsWith('Indoor with pads'))!;
    expect(pads.borderColor).toBe('blue');
    expect(pads.data[14]).toBe(37.4);
  });

  it('converts to °F for a US user (t/°F = 1.8 t/°C + 32, NIST SP 811 B.9)', () => {
    const data = designDayChartData(hours, 24, unitsFor('us'), colors);
    expect(data.datasets[0]!.label).toBe('Outdoor (°F)');
    // outdoor 31 °C at hour 15 → 87.8 °F; setpoint 24 °C → 75.2 °F
    expect(data.datasets[0]!.data[15]).toBe(87.8);
    expect(data.datasets[2]!.data[0]).toBe(75.2);
  });
});

describe('hourRanges', () => {
  it('joins runs of consecutive hours', () => {
    expect(hourRanges([7, 8, 9, 12, 14, 15])).toBe('7–9, 12, 14–15');
    expect(hourRanges([21, 7, 8])).toBe('7–8, 21');
    expect(hourRanges([5])).toBe('5');
    expect(hourRanges([])).toBe('');
  });
});
