import { EngineInputError } from '../errors';
import type { TemperatureReading } from '../season/season-hours';
import { loadReferenceData } from '../testing/reference-data';
import { designConditionsFromLog, hourlyGridOfReadings } from './log-design-conditions';

const ref = loadReferenceData();
const site = { latitudeDeg: 45.55, longitudeDeg: -94.16, elevationM: 320, utcOffsetHours: -6 };
const HOURS_2025 = 8760;

/** 'YYYY-MM-DDTHH:00' of hour i after local midnight, 1 January 2025. */
function localHour(i: number): string {
  return new Date(Date.UTC(2025, 0, 1) + i * 3_600_000).toISOString().slice(0, 16);
}

/**
 * A year whose 8,760 hourly temperatures are −20.00, −19.99, …, 67.59 °C (step 0.01 K), each
 * used once, in a scrambled order (hour i gets step (7919·i) mod 8760; 7919 is prime and does not
 * divide 8760, so every step is used once).
 */
function uniformLog(hours = HOURS_2025): TemperatureReading[] {
  return Array.from({ length: hours }, (_, i) => ({
    at: localHour(i),
    temperatureC: -20 + ((7919 * i) % HOURS_2025) / 100,
  }));
}

function errorOf(run: () => unknown): EngineInputError {
  try {
    run();
  } catch (error) {
    expect(error).toBeInstanceOf(EngineInputError);
    return error as EngineInputError;
  }
  throw new Error('expected an EngineInputError');
}

describe('design conditions from a farm log', () => {
  it('takes the percentiles of a year of known distribution as order statistics (worked by hand)', () => {
    const result = designConditionsFromLog({ readings: uniformLog(), resolution: 'hourly' }, site, ref);
    // Sorted ascending the values are −20 + k/100, k = 0 … 8759 (n = 8760). Definitions as in
    // ASHRAE Handbook — Fundamentals ch. 14 (hours at or above the value), indices by hand:
    // 99.6 %: index ⌊0.004 × 8760⌋ = ⌊35.04⌋ = 35 → −20 + 0.35 = −19.65 °C
    expect(result.winterDesign996C).toBeCloseTo(-19.65, 9);
    // 99 %: index ⌊0.01 × 8760⌋ = ⌊87.6⌋ = 87 → −19.13 °C
    expect(result.winterDesign99C).toBeCloseTo(-19.13, 9);
    // 1 %: index 8759 − 87 = 8672 → −20 + 86.72 = 66.72 °C
    expect(result.summerDesign1C).toBeCloseTo(66.72, 9);
    // 0.4 %: index 8759 − 35 = 8724 → 67.24 °C
    expect(result.summerDesign04C).toBeCloseTo(67.24, 9);
    // and the definitions hold: 99.6 % of the hours at or above, 1 % at or above
    const values = uniformLog().map((reading) => reading.temperatureC);
    expect(values.filter((t) => t >= result.winterDesign996C - 1e-9).length).toBeGreaterThanOrEqual(0.996 * 8760);
    expect(values.filter((t) => t >= result.summerDesign1C - 1e-9).length).toBeGreaterThanOrEqual(0.01 * 8760);
    expect(result.hoursUsed).toBe(8760);
    expect(result.firstHour).toBe('2025-01-01T00:00');
    expect(result.lastHour).toBe('2025-12-31T23:00');
    expect(result.monthly.every((month) => month.clearness === null)).toBe(true);
  });

  it('gives each month its mean daily minimum and maximum from a known daily sinusoid', () => {
    // Month m (1–12) has a mean of 2·m − 12 °C and a daily swing of ±5 K: T = mean + 5·cos(2π(h − 15)/24),
    // so each day's maximum is mean + 5 (at 15:00) and its minimum mean − 5 (at 03:00).
    const readings = Array.from({ length: HOURS_2025 }, (_, i) => {
      const at = localHour(i);
      const month = Number(at.slice(5, 7));
      const hour = Number(at.slice(11, 13));
      return { at, temperatureC: 2 * month - 12 + 5 * Math.cos((2 * Math.PI * (hour - 15)) / 24) };
    });
    const result = designConditionsFromLog({ readings, resolution: 'hourly' }, site, ref);
    expect(result.monthly).toHaveLength(12);
    result.monthly.forEach((row) => {
      expect(row.meanDailyMinC).toBeCloseTo(2 * row.month - 12 - 5, 9);
      expect(row.meanDailyMaxC).toBeCloseTo(2 * row.month - 12 + 5, 9);
    });
    // the coldest hours are January's 03:00 readings (−15 °C, 31 of them) then its 02:00 and
    // 04:00 readings (−10 + 5·cos(13π/12) = −14.83 °C); index 35 falls among the latter
    expect(result.winterDesign996C).toBeCloseTo(-10 + 5 * Math.cos((13 * Math.PI) / 12), 9);
  });

  it('refuses a log shorter than a year, saying why', () => {
    const error = errorOf(() =>
      designConditionsFromLog({ readings: uniformLog(364 * 24), resolution: 'hourly' }, site, ref),
    );
    expect(error.field).toBe('readings');
    expect(error.message).toMatch(/a whole year of hours/);
    expect(error.message).toMatch(/about 364 days/);
  });

  it('refuses a daily log and a year with too many hours missing', () => {
    const daily = Array.from({ length: 400 }, (_, day) => ({ at: localHour(day * 24).slice(0, 10), temperatureC: 5 }));
    expect(errorOf(() => designConditionsFromLog({ readings: daily, resolution: 'daily' }, site, ref)).message).toMatch(
      /hourly readings/,
    );
    // every fifth hour missing over 400 days: 320 days of readings, 20 % missing
    const gappy = uniformLog(400 * 24).filter((_, i) => i % 5 !== 0);
    expect(
      errorOf(() => designConditionsFromLog({ readings: gappy, resolution: 'hourly' }, site, ref)).message,
    ).toMatch(/a whole year of hours/);
    const gappyLonger = Array.from({ length: 500 * 24 }, (_, i) => ({ at: localHour(i), temperatureC: 1 })).filter(
      (_, i) => i % 5 !== 0,
    );
    expect(
      errorOf(() => designConditionsFromLog({ readings: gappyLonger, resolution: 'hourly' }, site, ref)).message,
    ).toMatch(/20 % of the hours/);
  });

  it('averages readings within an hour and converts zoned times to local standard time', () => {
    const grid = hourlyGridOfReadings(
      [
        { at: '2025-01-01T00:00', temperatureC: 1 },
        { at: '2025-01-01T00:30', temperatureC: 3 },
        // 08:00 UTC is 02:00 at UTC−6
        { at: '2025-01-01T08:00Z', temperatureC: 7 },
      ],
      -6,
    );
    expect(Array.from(grid.values)).toEqual([2, Number.NaN, 7]);
    expect(grid.loggedHourCount).toBe(2);
  });
});
