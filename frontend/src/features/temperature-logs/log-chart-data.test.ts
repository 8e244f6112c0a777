import { describe, expect, it } from 'vitest';
import { logSummary } from './log-chart-data';

describe('logSummary (the temperature chart in words)', () => {
  it('names the number of days and the coldest and warmest day by their mean', () => {
    const days = [
      { date: '2027-01-01', meanC: -2 },
      { date: '2027-01-02', meanC: -9.5 },
      { date: '2027-01-03', meanC: 4 },
    ];
    expect(logSummary(days, (c) => `${c} °C`)).toBe(
      '3 days; the coldest day by its mean was 2027-01-02 (-9.5 °C), the warmest 2027-01-03 (4 °C).',
    );
  });

  it('says so when there are no days', () => {
    expect(logSummary([], String)).toBe('No days in this log.');
  });
});
