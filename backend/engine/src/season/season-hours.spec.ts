import { loadReferenceData } from '../testing/reference-data';
import { EngineInputError } from '../errors';
import { buildSeasonHours, localHourNumber, validateSeasonRange } from './season-hours';
import { SunCache } from './sun-hours';

const ref = loadReferenceData();
const site = { latitudeDeg: 42, longitudeDeg: -72.5, utcOffsetHours: -5 };
const clearness = new Array(12).fill(0.5);

describe('season hours', () => {
  it('reads times as local standard time, converting those that name their zone', () => {
    const local = localHourNumber('2026-01-01T07:00', -5)!;
    expect(localHourNumber('2026-01-01T12:00Z', -5)).toBe(local);
    expect(localHourNumber('2026-01-01T08:00-04:00', -5)).toBe(local);
    expect(localHourNumber('2026-01-01', -5)).toBe(local - 7);
    expect(localHourNumber('yesterday', -5)).toBeNull();
  });

  it('counts inclusive days and refuses over-long ranges', () => {
    expect(validateSeasonRange({ startDate: '2028-01-01', endDate: '2028-12-31' }).dayCount).toBe(366);
    expect(() => validateSeasonRange({ startDate: '2026-01-01', endDate: '2027-01-02' })).toThrow(EngineInputError);
  });

  it('bridges short gaps in an hourly log and refuses long ones', () => {
    const cache = new SunCache();
    const range = { startDate: '2026-01-10', endDate: '2026-01-10' };
    const withShortGap = [
      { at: '2026-01-09T23:00', temperatureC: 0 },
      ...['04', '08', '12', '16', '20'].map((hour) => ({ at: `2026-01-10T${hour}:00`, temperatureC: 5 })),
      { at: '2026-01-11T00:00', temperatureC: 5 },
    ];
    const hours = buildSeasonHours(
      { site, range, climate: { readings: withShortGap, resolution: 'hourly' }, clearnessByMonth: clearness },
      ref,
      cache,
    );
    expect(hours.outdoorC[0]).toBeCloseTo(1.5, 9); // 00:30 is 1.5 h into a 5 K rise over 5 h
    expect(hours.dailyMaxC[0]).toBe(5);
    const withLongGap = [
      { at: '2026-01-10T00:00', temperatureC: 0 },
      { at: '2026-01-10T12:00', temperatureC: 5 },
      { at: '2026-01-11T00:00', temperatureC: 5 },
    ];
    expect(() =>
      buildSeasonHours(
        { site, range, climate: { readings: withLongGap, resolution: 'hourly' }, clearnessByMonth: clearness },
        ref,
        cache,
      ),
    ).toThrow(/gap of 12.0 h/);
  });

  it('takes each day’s sun from the site-year cache and its month’s clearness', () => {
    const cache = new SunCache();
    const hours = buildSeasonHours(
      {
        site,
        range: { startDate: '2026-12-30', endDate: '2027-01-02' },
        climate: {
          readings: ['2026-12-29', '2026-12-30', '2026-12-31', '2027-01-01', '2027-01-02', '2027-01-03'].map((at) => ({
            at,
            temperatureC: 0,
          })),
          resolution: 'daily',
        },
        clearnessByMonth: Array.from({ length: 12 }, (_, index) => index / 20),
      },
      ref,
      cache,
    );
    expect(cache.size).toBe(2);
    expect(hours.months).toEqual([
      { year: 2026, month: 12 },
      { year: 2027, month: 1 },
    ]);
    expect(Array.from(hours.clearnessOfDay)).toEqual([11 / 20, 11 / 20, 0, 0]);
    expect(hours.clearSkyGlobalHorizontalWPerM2[12]).toBeGreaterThan(0);
  });
});
