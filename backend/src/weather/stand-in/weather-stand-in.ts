import { Logger } from '@nestjs/common';
import { createServer, type IncomingMessage, type Server, type ServerResponse } from 'node:http';
import type { AddressInfo } from 'node:net';
import type { ReferenceData } from '@thermbay/engine/reference-data.types';
import { inventHourlyWeather } from './invented-weather';

/** The hourly variables the stand-in knows, with the units the real service reports. */
const VARIABLES: Record<string, { unit: string; pick: 'temperatureC' | 'dewPointC' | 'globalHorizontalWPerM2' }> = {
  temperature_2m: { unit: '°C', pick: 'temperatureC' },
  dew_point_2m: { unit: '°C', pick: 'dewPointC' },
  shortwave_radiation: { unit: 'W/m²', pick: 'globalHorizontalWPerM2' },
};

const ISO_DATE = /^\d{4}-\d{2}-\d{2}$/;

/** What a test can make the stand-in do to the next requests (faults, gaps), and what it counts. */
export interface StandInControls {
  /** answer the next N archive requests with this HTTP status and an error body */
  failNext?: { status: number; count: number };
  /** hold the next N answers this many milliseconds (to provoke the client's time-out) */
  delayNext?: { ms: number; count: number };
  /** answer the next N requests with a body that is not hourly weather */
  garbageNext?: number;
  /** share of hours (0–1) set to null in these years */
  gapsByYear?: Record<number, number>;
}

/**
 * A local stand-in for the hourly weather-history service: the same request (GET /v1/archive with
 * latitude, longitude, start_date, end_date, hourly, timezone=GMT) answered in the same JSON format,
 * with INVENTED weather (see invented-weather.ts). Started by the app on 127.0.0.1 unless
 * WEATHER_API_URL names a real service.
 */
export class WeatherStandIn {
  private readonly logger = new Logger('WeatherStandIn');
  private server: Server | null = null;
  requestCount = 0;
  controls: StandInControls = {};

  constructor(private readonly ref: ReferenceData) {}

  async start(port: number): Promise<string> {
    this.server = createServer((req, res) => void this.handle(req, res));
    await new Promise<void>((resolve, reject) => {
      this.server!.once('error', reject);
      this.server!.listen(port, '127.0.0.1', () => resolve());
    });
    const url = `http://127.0.0.1:${(this.server.address() as AddressInfo).port}`;
    this.logger.log(`invented weather served at ${url} (set WEATHER_API_URL for the real service)`);
    return url;
  }

  async stop(): Promise<void> {
    const server = this.server;
    this.server = null;
    if (server) await new Promise<void>((resolve) => server.close(() => resolve()));
  }

  private async handle(req: IncomingMessage, res: ServerResponse): Promise<void> {
    const url = new URL(req.url ?? '/', 'http://stand-in');
    if (req.method !== 'GET' || url.pathname !== '/v1/archive')
      return send(res, 404, { error: true, reason: 'Not found' });
    this.requestCount++;
    const c = this.controls;
    if (c.delayNext && c.delayNext.count > 0) {
      c.delayNext.count--;
      await new Promise((resolve) => setTimeout(resolve, c.delayNext!.ms));
    }
    if (c.failNext && c.failNext.count > 0) {
      c.failNext.count--;
      return send(res, c.failNext.status, { error: true, reason: 'The stand-in was told to fail' });
    }
    if (c.garbageNext && c.garbageNext > 0) {
      c.garbageNext--;
      res.writeHead(200, { 'content-type': 'application/json' });
      return void res.end('{"hourly": {"time": [1, 2], "temperature_2m": "warm"');
    }
    const problem = validate(url.searchParams);
    if (problem) return send(res, 400, { error: true, reason: problem });

    const latitude = Number(url.searchParams.get('latitude'));
    const longitude = Number(url.searchParams.get('longitude'));
    const start = Date.parse(`${url.searchParams.get('start_date')}T00:00:00Z`);
    const end = Date.parse(`${url.searchParams.get('end_date')}T00:00:00Z`) + 86_400_000;
    const hourCount = Math.round((end - start) / 3_600_000);
    const elevation = 0;
    const hours = inventHourlyWeather(latitude, longitude, elevation, start, hourCount, this.ref);
    const variables = url.searchParams.get('hourly')!.split(',');
    const gapShare = c.gapsByYear?.[new Date(start).getUTCFullYear()] ?? 0;
    const hourly: Record<string, (string | number | null)[]> = {
      time: Array.from({ length: hourCount }, (_, i) => new Date(start + i * 3_600_000).toISOString().slice(0, 16)),
    };
    const hourlyUnits: Record<string, string> = { time: 'iso8601' };
    for (const name of variables) {
      const values: (number | null)[] = hours[VARIABLES[name]!.pick].slice();
      // Gaps spread evenly over the year, so the share missing is exact to one hour.
      if (gapShare > 0) {
        for (let i = 0; i < hourCount; i++)
          if (Math.floor((i + 1) * gapShare) > Math.floor(i * gapShare)) values[i] = null;
      }
      hourly[name] = values;
      hourlyUnits[name] = VARIABLES[name]!.unit;
    }
    send(res, 200, {
      latitude: Math.round(latitude * 10) / 10,
      longitude: Math.round(longitude * 10) / 10,
      generationtime_ms: 1,
      utc_offset_seconds: 0,
      timezone: 'GMT',
      timezone_abbreviation: 'GMT',
      elevation,
      hourly_units: hourlyUnits,
      hourly,
    });
  }
}

function validate(params: URLSearchParams): string | null {
  const latitude = Number(params.get('latitude'));
  const longitude = Number(params.get('longitude'));
  if (!params.has('latitude') || !Number.isFinite(latitude) || latitude < -90 || latitude > 90) {
    return `Latitude must be in range of -90 to 90°. Given: ${params.get('latitude')}.`;
  }
  if (!params.has('longitude') || !Number.isFinite(longitude) || longitude < -180 || longitude > 180) {
    return `Longitude must be in range of -180 to 180°. Given: ${params.get('longitude')}.`;
  }
  const startDate = params.get('start_date') ?? '';
  const endDate = params.get('end_date') ?? '';
  if (
    !ISO_DATE.test(startDate) ||
    !ISO_DATE.test(endDate) ||
    Number.isNaN(Date.parse(startDate)) ||
    Number.isNaN(Date.parse(endDate))
  ) {
    return 'start_date and end_date must be dates YYYY-MM-DD';
  }
  if (Date.parse(endDate) < Date.parse(startDate)) return 'end_date must not be before start_date';
  if (Date.parse(endDate) - Date.parse(startDate) > 400 * 86_400_000) return 'ask for at most about a year per request';
  if (Date.parse(startDate) < Date.UTC(1940, 0, 1))
    return 'Parameter start_date is out of allowed range from 1940-01-01';
  const hourly = (params.get('hourly') ?? '').split(',').filter(Boolean);
  if (hourly.length === 0) return 'hourly variables are required';
  const unknown = hourly.find((name) => !(name in VARIABLES));
  if (unknown) return `Cannot initialize WeatherVariable from invalid String value ${unknown}`;
  if ((params.get('timezone') ?? 'GMT') !== 'GMT') return 'the stand-in answers in GMT only';
  return null;
}

function send(res: ServerResponse, status: number, body: unknown): void {
  res.writeHead(status, { 'content-type': 'application/json' });
  res.end(JSON.stringify(body));
}
