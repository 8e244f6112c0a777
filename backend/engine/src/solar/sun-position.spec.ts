import { solarNoonUtc, sunPosition, sunTimes } from './sun-position';

/**
 * Independent check of suncalc against the NOAA Global Monitoring Division "General Solar
 * Position Calculations" (fractional-year series for equation of time and declination,
 * true solar time, hour angle, zenith and azimuth), evaluated here from the published equations.
 * Those equations give geometric (unrefracted) altitude; the checks stay above 15° where
 * refraction is under 0.07°, and allow 0.5°.
 */
function noaaSolarPosition(atUtc: Date, latitudeDeg: number, longitudeDeg: number) {
  const year = atUtc.getUTCFullYear();
  const isLeap = (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
  const startOfYear = Date.UTC(year, 0, 1);
  const dayOfYear = Math.floor((atUtc.getTime() - startOfYear) / 86_400_000) + 1;
  const hour = atUtc.getUTCHours() + atUtc.getUTCMinutes() / 60 + atUtc.getUTCSeconds() / 3600;
  const gamma = ((2 * Math.PI) / (isLeap ? 366 : 365)) * (dayOfYear - 1 + (hour - 12) / 24);
  const eqTimeMin =
    229.18 *
    (0.000075 +
      0.001868 * Math.cos(gamma) -
      0.032077 * Math.sin(gamma) -
      0.014615 * Math.cos(2 * gamma) -
      0.040849 * Math.sin(2 * gamma));
  const declRad =
    0.006918 -
    0.399912 * Math.cos(gamma) +
    0.070257 * Math.sin(gamma) -
    0.006758 * Math.cos(2 * gamma) +
    0.000907 * Math.sin(2 * gamma) -
    0.002697 * Math.cos(3 * gamma) +
    0.00148 * Math.sin(3 * gamma);
  const timeOffsetMin = eqTimeMin + 4 * longitudeDeg; // time zone 0: the instant is UTC
  const trueSolarTimeMin = hour * 60 + timeOffsetMin;
  // wrap the hour angle into (−180°, 180°] so its sign says morning or afternoon
  const hourAngleDeg = ((((trueSolarTimeMin / 4 - 180) % 360) + 540) % 360) - 180;
  const hourAngleRad = (hourAngleDeg * Math.PI) / 180;
  const latRad = (latitudeDeg * Math.PI) / 180;
  const cosZenith =
    Math.sin(latRad) * Math.sin(declRad) + Math.cos(latRad) * Math.cos(declRad) * Math.cos(hourAngleRad);
  const zenithRad = Math.acos(cosZenith);
  // Azimuth clockwise from north from the same spherical triangle:
  // cos θ = (sin δ − sin φ_lat cos ζ) / (cos φ_lat sin ζ); afternoon (positive hour angle) → west.
  const cosAzimuth =
    (Math.sin(declRad) - Math.sin(latRad) * Math.cos(zenithRad)) / (Math.cos(latRad) * Math.sin(zenithRad));
  let azimuthDeg = (Math.acos(Math.max(-1, Math.min(1, cosAzimuth))) * 180) / Math.PI;
  if (hourAngleRad > 0) azimuthDeg = 360 - azimuthDeg;
  return { altitudeDeg: 90 - (zenithRad * 180) / Math.PI, azimuthDeg };
}

function angleBetweenSunDirectionsDeg(
  a: { altitudeDeg: number; azimuthDeg: number },
  b: { altitudeDeg: number; azimuthDeg: number },
): number {
  const toRad = Math.PI / 180;
  const cosAngle =
    Math.sin(a.altitudeDeg * toRad) * Math.sin(b.altitudeDeg * toRad) +
    Math.cos(a.altitudeDeg * toRad) * Math.cos(b.altitudeDeg * toRad) * Math.cos((a.azimuthDeg - b.azimuthDeg) * toRad);
  return Math.acos(Math.min(1, cosAngle)) / toRad;
}

describe('sunPosition (suncalc) against the NOAA GMD general solar position equations', () => {
  const cases: Array<[string, Date, number, number]> = [
    ['Atlanta-like site, July morning', new Date(Date.UTC(2026, 6, 21, 14, 0)), 33.75, -84.39],
    ['Atlanta-like site, July afternoon', new Date(Date.UTC(2026, 6, 21, 20, 30)), 33.75, -84.39],
    ['mid-Europe, spring noon', new Date(Date.UTC(2026, 2, 20, 11, 30)), 52.0, 5.0],
    ['southern hemisphere, January', new Date(Date.UTC(2027, 0, 15, 2, 0)), -33.9, 151.2],
    ['tropics, December', new Date(Date.UTC(2026, 11, 1, 16, 0)), 9.9, -84.1],
  ];
  it.each(cases)('%s agrees within 0.5°', (_label, at, lat, lon) => {
    const expected = noaaSolarPosition(at, lat, lon);
    expect(expected.altitudeDeg).toBeGreaterThan(15);
    const actual = sunPosition(at, lat, lon);
    expect(Math.abs(actual.altitudeDeg - expected.altitudeDeg)).toBeLessThan(0.5);
    // azimuth is ill-conditioned near the zenith, so compare the angle between the two sun directions
    expect(angleBetweenSunDirectionsDeg(actual, expected)).toBeLessThan(0.5);
  });

  it('puts the northern-hemisphere afternoon sun in the west and the morning sun in the east', () => {
    const morning = sunPosition(new Date(Date.UTC(2026, 6, 21, 13, 0)), 40, -90);
    const afternoon = sunPosition(new Date(Date.UTC(2026, 6, 21, 21, 0)), 40, -90);
    expect(morning.azimuthDeg).toBeGreaterThan(45);
    expect(morning.azimuthDeg).toBeLessThan(135);
    expect(afternoon.azimuthDeg).toBeGreaterThan(225);
    expect(afternoon.azimuthDeg).toBeLessThan(315);
  });
});

describe('sunTimes and solarNoonUtc', () => {
  it('orders sunrise < solar noon < sunset and puts the noon sun at its highest', () => {
    const lat = 33.75;
    const lon = -84.39;
    const noon = solarNoonUtc(2026, 7, 21, lat, lon);
    const times = sunTimes(noon, lat, lon);
    expect(times.sunrise).not.toBeNull();
    expect(times.sunset).not.toBeNull();
    expect(times.sunrise!.getTime()).toBeLessThan(noon.getTime());
    expect(noon.getTime()).toBeLessThan(times.sunset!.getTime());
    const atNoon = sunPosition(noon, lat, lon).altitudeDeg;
    const hourBefore = sunPosition(new Date(noon.getTime() - 3_600_000), lat, lon).altitudeDeg;
    const hourAfter = sunPosition(new Date(noon.getTime() + 3_600_000), lat, lon).altitudeDeg;
    expect(atNoon).toBeGreaterThan(hourBefore);
    expect(atNoon).toBeGreaterThan(hourAfter);
    // geometric noon altitude = 90 − |lat − declination|; declination on 21 July ≈ +20.5° (NOAA series)
    expect(atNoon).toBeGreaterThan(76);
    expect(atNoon).toBeLessThan(77.5);
  });

  it('solar noon at longitude −84.39 on 21 July falls near 17:44 UTC (5.63 h offset + ≈6 min equation of time)', () => {
    const noon = solarNoonUtc(2026, 7, 21, 33.75, -84.39);
    const hoursUtc = noon.getUTCHours() + noon.getUTCMinutes() / 60;
    expect(noon.getUTCDate()).toBe(21);
    expect(hoursUtc).toBeGreaterThan(17.6);
    expect(hoursUtc).toBeLessThan(17.9);
  });

  it('returns null sunset in polar day', () => {
    const times = sunTimes(new Date(Date.UTC(2026, 5, 21, 12)), 80, 0);
    expect(times.sunset).toBeNull();
  });
});
