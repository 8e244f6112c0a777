import { loadReferenceData } from '../testing/reference-data';
import { sunTimes } from '../solar';
import { precomputeSunHours, SunCache } from './sun-hours';

const ref = loadReferenceData();
const site = { latitudeDeg: 42, longitudeDeg: -72.5, utcOffsetHours: -5 };

describe('precomputed sun hours', () => {
  const sun = precomputeSunHours(site, 2026, ref);

  it('covers every hour of the year in local standard time (8,760 h, 8,784 in a leap year)', () => {
    expect(sun.hourCount).toBe(8760);
    expect(sun.altitudeDeg).toHaveLength(8760);
    expect(sun.sunriseHour).toHaveLength(365 + 2);
    expect(precomputeSunHours(site, 2028, ref).hourCount).toBe(8784);
  });

  it('matches the solar module’s sunrise for a given day', () => {
    // 21 June 2026 is day index 172 (1 January = 1)
    const localNoonUtc = new Date(Date.UTC(2026, 5, 21, 12) + 5 * 3_600_000);
    const times = sunTimes(localNoonUtc, site.latitudeDeg, site.longitudeDeg);
    const dayStartUtcMs = Date.UTC(2026, 5, 21) + 5 * 3_600_000;
    expect(sun.sunriseHour[172]).toBeCloseTo((times.sunrise!.getTime() - dayStartUtcMs) / 3_600_000, 9);
    expect(sun.sunsetHour[172] - sun.sunriseHour[172]).toBeGreaterThan(sun.sunsetHour[355] - sun.sunriseHour[355]);
  });

  it('has sunlight only while the sun is up, and about half the year’s hours in daylight', () => {
    let daylightHours = 0;
    for (let hour = 0; hour < sun.hourCount; hour++) {
      daylightHours += sun.dayFraction[hour];
      if (sun.altitudeDeg[hour] <= 0) expect(sun.clearSkyGlobalHorizontalWPerM2[hour]).toBe(0);
      else if (sun.altitudeDeg[hour] > 2) expect(sun.clearSkyGlobalHorizontalWPerM2[hour]).toBeGreaterThan(0);
    }
    // refraction and the sun's disc make daylight a little longer than half the year
    expect(daylightHours).toBeGreaterThan(4380);
    expect(daylightHours).toBeLessThan(4560);
    // local standard noon in January is daylight, midnight is not
    expect(sun.dayFraction[12]).toBe(1);
    expect(sun.dayFraction[0]).toBe(0);
  });

  it('is computed once per site and year by the cache', () => {
    const cache = new SunCache();
    const first = cache.get(site, 2026, ref);
    expect(cache.get({ ...site }, 2026, ref)).toBe(first);
    expect(cache.size).toBe(1);
    cache.get(site, 2027, ref);
    expect(cache.size).toBe(2);
  });
});
