import { dayNumber } from './calendar-days';
import {
  curveTemperatureC,
  dailyExtremesFromNormals,
  hourlyTemperaturesC,
  type DailyCurveDays,
} from './daily-temperature-curve';
import { demoClimate } from '../season/demo-season';

function steadyDays(dayCount: number, minC: number, maxC: number, sunriseHour = 7, peakHour = 15): DailyCurveDays {
  return {
    firstDayNumber: dayNumber(2026, 1, 1),
    dayCount,
    minC: new Float64Array(dayCount + 2).fill(minC),
    maxC: new Float64Array(dayCount + 2).fill(maxC),
    sunriseHour: new Float64Array(dayCount + 2).fill(sunriseHour),
    peakHour: new Float64Array(dayCount + 2).fill(peakHour),
  };
}

describe('daily temperature curve', () => {
  it('reaches the minimum at sunrise and the maximum at the peak hour', () => {
    const days = steadyDays(3, -5, 7);
    expect(curveTemperatureC(days, 2, 7)).toBeCloseTo(-5, 12);
    expect(curveTemperatureC(days, 2, 15)).toBeCloseTo(7, 12);
    for (let hour = 0; hour <= 24; hour += 0.25) {
      const value = curveTemperatureC(days, 2, hour);
      expect(value).toBeGreaterThanOrEqual(-5 - 1e-9);
      expect(value).toBeLessThanOrEqual(7 + 1e-9);
    }
  });

  it('rises from sunrise to the peak and falls from the peak to the next sunrise', () => {
    const days = steadyDays(3, 0, 10);
    for (let hour = 7; hour < 15; hour += 0.5) {
      expect(curveTemperatureC(days, 2, hour + 0.5)).toBeGreaterThan(curveTemperatureC(days, 2, hour));
    }
    for (let hour = 15; hour < 24; hour += 0.5) {
      expect(curveTemperatureC(days, 2, hour + 0.5)).toBeLessThan(curveTemperatureC(days, 2, hour));
    }
  });

  it('is continuous across midnight into a colder next day', () => {
    const days = steadyDays(3, 0, 10);
    days.minC[3] = -6;
    const beforeMidnight = curveTemperatureC(days, 2, 24 - 1e-9);
    const afterMidnight = curveTemperatureC(days, 3, 0);
    expect(afterMidnight).toBeCloseTo(beforeMidnight, 6);
    expect(curveTemperatureC(days, 3, 7)).toBeCloseTo(-6, 12);
  });

  it('averages to (min + max) / 2 over a steady day (half-cosine segments are symmetric)', () => {
    const days = steadyDays(1, -4, 8);
    const hourly = hourlyTemperaturesC(days);
    const mean = hourly.reduce((sum, value) => sum + value, 0) / 24;
    expect(mean).toBeCloseTo(2, 1);
  });

  it('interpolates daily extremes between mid-month normals', () => {
    const climate = demoClimate();
    // 16 January's middle is January's anchor (15.5 days into a 31-day month)
    const first = dayNumber(2026, 1, 16);
    const { minC, maxC } = dailyExtremesFromNormals(climate, first, 1);
    expect(minC[1]).toBeCloseTo(-8, 10);
    expect(maxC[1]).toBeCloseTo(2, 10);
    // New Year's Day lies between December (−5 / 4) and January (−8 / 2)
    const newYear = dailyExtremesFromNormals(climate, dayNumber(2026, 1, 1), 1);
    expect(newYear.minC[1]).toBeLessThan(-5);
    expect(newYear.minC[1]).toBeGreaterThan(-8);
    // a day before and after are included
    expect(newYear.minC).toHaveLength(3);
  });
});
