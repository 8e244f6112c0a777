import { clearSkyIrradiance, sunPosition } from '@thermbay/engine/solar';
import type { ReferenceData } from '@thermbay/engine/reference-data.types';

/**
 * Invented hourly weather for any coordinate, for the local stand-in of the weather-history
 * service. It is NOT real weather: it exists so that Thermbay works offline and in tests. The model
 * is deliberately simple and stated here so nobody mistakes it for data:
 * - annual mean air temperature 28 °C − 0.5 °C per degree of latitude, less 6.5 K per km of elevation
 *   (the standard-atmosphere lapse rate);
 * - a seasonal swing of ±(1 + 0.38·|latitude|) K, coldest around 20 January in the north and
 *   20 July in the south;
 * - a daily swing of ±7 K in clear weather (±3 K under cloud), coldest near 06:00 and warmest near
 *   15:00 local solar time;
 * - weather noise: a first-order autoregressive anomaly (persistence 0.995 per hour, standard
 *   deviation 4 K) from a generator seeded by the rounded coordinates and the year, so the same
 *   request always gets the same answer;
 * - a cloud factor per day (0.25–1) that scales the engine's clear-sky irradiance;
 * - a dew point 3–12 K below the air, smaller under cloud and at night.
 */
export interface InventedHours {
  /** UTC instant of hour 0 */
  startUtcMs: number;
  temperatureC: number[];
  dewPointC: number[];
  globalHorizontalWPerM2: number[];
}

const HOUR_MS = 3_600_000;

/** mulberry32: a small, well-known 32-bit seeded generator; uniform in [0, 1). */
function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (state + 0x6d2b79f5) >>> 0;
    let t = state;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4_294_967_296;
  };
}

function gaussian(random: () => number): number {
  // Box–Muller; 1 − u keeps the logarithm finite.
  const u = 1 - random();
  const v = random();
  return Math.sqrt(-2 * Math.log(u)) * Math.cos(2 * Math.PI * v);
}

function seedOf(latitudeDeg: number, longitudeDeg: number, year: number): number {
  const lat = Math.round(latitudeDeg * 10);
  const lon = Math.round(longitudeDeg * 10);
  return (Math.imul(lat + 1000, 73_856_093) ^ Math.imul(lon + 2000, 19_349_663) ^ Math.imul(year, 83_492_791)) >>> 0;
}

function round1(value: number): number {
  return Math.round(value * 10) / 10;
}

/** Invented hours from startUtcMs for hourCount hours (continuous across years for a given seed year). */
export function inventHourlyWeather(
  latitudeDeg: number,
  longitudeDeg: number,
  elevationM: number,
  startUtcMs: number,
  hourCount: number,
  ref: ReferenceData,
): InventedHours {
  const startYear = new Date(startUtcMs).getUTCFullYear();
  const random = seededRandom(seedOf(latitudeDeg, longitudeDeg, startYear));
  const annualMeanC = 28 - 0.5 * Math.abs(latitudeDeg) - 0.0065 * elevationM;
  const seasonalSwingK = 1 + 0.38 * Math.abs(latitudeDeg);
  const coldestDay = latitudeDeg >= 0 ? 20 : 201;
  const persistence = 0.995;
  const innovationK = 4 * Math.sqrt(1 - persistence * persistence);
  let anomalyK = gaussian(random) * 4;
  let cloudFactor = 0.7;
  let dayIndex = -1;

  const temperatureC: number[] = new Array(hourCount);
  const dewPointC: number[] = new Array(hourCount);
  const globalHorizontalWPerM2: number[] = new Array(hourCount);
  for (let i = 0; i < hourCount; i++) {
    const atMs = startUtcMs + i * HOUR_MS + HOUR_MS / 2;
    const at = new Date(atMs);
    const dayOfYear = (atMs - Date.UTC(at.getUTCFullYear(), 0, 1)) / 86_400_000;
    const solarHour = (((at.getUTCHours() + at.getUTCMinutes() / 60 + longitudeDeg / 15) % 24) + 24) % 24;
    const today = Math.floor((atMs + (longitudeDeg / 15) * HOUR_MS) / 86_400_000);
    if (today !== dayIndex) {
      dayIndex = today;
      cloudFactor = Math.min(1, Math.max(0.25, 0.5 * cloudFactor + 0.5 * (0.25 + 0.75 * random())));
    }
    anomalyK = persistence * anomalyK + innovationK * gaussian(random);
    const clear = (cloudFactor - 0.25) / 0.75;
    const dailySwingK = 3 + 4 * clear;
    const seasonalC = annualMeanC - seasonalSwingK * Math.cos((2 * Math.PI * (dayOfYear - coldestDay)) / 365.25);
    const dailyC = dailySwingK * Math.cos((2 * Math.PI * (solarHour - 15)) / 24);
    const t = seasonalC + dailyC + anomalyK;
    const depressionK = 3 + 9 * clear * (0.5 + 0.5 * Math.cos((2 * Math.PI * (solarHour - 15)) / 24));
    temperatureC[i] = round1(t);
    dewPointC[i] = round1(t - depressionK);
    const month = at.getUTCMonth() + 1;
    const altitudeDeg = sunPosition(at, latitudeDeg, longitudeDeg).altitudeDeg;
    globalHorizontalWPerM2[i] =
      altitudeDeg > 0 ? round1(cloudFactor * clearSkyIrradiance(altitudeDeg, month, ref).globalHorizontalWPerM2) : 0;
  }
  return { startUtcMs, temperatureC, dewPointC, globalHorizontalWPerM2 };
}
