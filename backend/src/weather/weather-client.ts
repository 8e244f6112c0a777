import { HttpException, HttpStatus } from '@nestjs/common';

/** One calendar year (UTC) of hourly weather as the service gave it; null where it has no value. */
export interface FetchedWeatherYear {
  year: number;
  /** the grid point the service answered for */
  latitudeDeg: number;
  longitudeDeg: number;
  elevationM: number;
  startUtcMs: number;
  temperatureC: (number | null)[];
  dewPointC: (number | null)[];
  globalHorizontalWPerM2: (number | null)[];
}

export interface WeatherClientOptions {
  baseUrl: string;
  timeoutMs: number;
  /** attempts in all (1 = no retry) */
  attempts: number;
  /** first back-off, doubled at each retry */
  backoffMs: number;
}

/** The weather service could not give usable hours: 502 (bad answer) or 504 (no answer in time). */
export class WeatherServiceError extends HttpException {
  constructor(message: string, status: HttpStatus = HttpStatus.BAD_GATEWAY) {
    super({ message, field: 'weather' }, status);
  }
}

const HOURLY = 'temperature_2m,dew_point_2m,shortwave_radiation';

function isNumberOrNullArray(value: unknown, length: number): value is (number | null)[] {
  return (
    Array.isArray(value) &&
    value.length === length &&
    value.every((v) => v === null || (typeof v === 'number' && Number.isFinite(v)))
  );
}

/**
 * The hourly weather-history service's JSON API (GET /v1/archive), one calendar year a request,
 * with a time-out, retries with doubling back-off on network faults, 429 and 5xx, and a plain
 * message when it cannot be reached or answers something that is not hourly weather.
 */
export class WeatherClient {
  calls = 0;

  constructor(private readonly options: WeatherClientOptions) {}

  async fetchYear(latitudeDeg: number, longitudeDeg: number, year: number): Promise<FetchedWeatherYear> {
    const url = new URL('/v1/archive', this.options.baseUrl);
    url.search = new URLSearchParams({
      latitude: latitudeDeg.toFixed(4),
      longitude: longitudeDeg.toFixed(4),
      start_date: `${year}-01-01`,
      end_date: `${year}-12-31`,
      hourly: HOURLY,
      timezone: 'GMT',
    }).toString();

    let lastProblem = '';
    for (let attempt = 1; attempt <= this.options.attempts; attempt++) {
      if (attempt > 1) await new Promise((r) => setTimeout(r, this.options.backoffMs * 2 ** (attempt - 2)));
      this.calls++;
      let response: Response;
      let text: string;
      const signal = AbortSignal.timeout(this.options.timeoutMs);
      try {
        response = await fetch(url, { signal });
        // The time-out covers the body too: a stalled body is a time-out, not garbage.
        text = await response.text();
      } catch (error) {
        // The signal, not the error's class, says whether time ran out (errors differ between runtimes).
        const timedOut = signal.aborted || (error instanceof Error && error.name === 'TimeoutError');
        lastProblem = timedOut
          ? `did not answer within ${Math.round(this.options.timeoutMs / 1000)} s`
          : 'could not be reached';
        if (attempt === this.options.attempts) {
          throw new WeatherServiceError(
            `The weather service ${lastProblem} (${this.options.attempts} attempts for ${year}). Try again later.`,
            timedOut ? HttpStatus.GATEWAY_TIMEOUT : HttpStatus.BAD_GATEWAY,
          );
        }
        continue;
      }
      if (response.status === 429 || response.status >= 500) {
        lastProblem = `answered ${response.status}`;
        if (attempt === this.options.attempts) {
          throw new WeatherServiceError(
            `The weather service ${lastProblem} (${this.options.attempts} attempts for ${year}). Try again later.`,
          );
        }
        continue;
      }
      if (!response.ok) {
        let reason = `status ${response.status}`;
        try {
          const body = JSON.parse(text) as { reason?: unknown };
          if (typeof body.reason === 'string') reason = body.reason;
        } catch {
          // not JSON: keep the status
        }
        throw new WeatherServiceError(`The weather service refused the request for ${year}: ${reason}`);
      }
      return this.parse(text, year);
    }
    throw new WeatherServiceError(`The weather service ${lastProblem}. Try again later.`);
  }

  private parse(text: string, year: number): FetchedWeatherYear {
    const garbage = () =>
      new WeatherServiceError(`The weather service answered ${year} with something that is not hourly weather`);
    let body: {
      latitude?: unknown;
      longitude?: unknown;
      elevation?: unknown;
      hourly?: Record<string, unknown>;
    };
    try {
      body = JSON.parse(text);
    } catch {
      throw garbage();
    }
    const hourly = body?.hourly;
    if (!hourly || !Array.isArray(hourly.time) || hourly.time.length === 0) throw garbage();
    const length = hourly.time.length;
    const first = Date.parse(`${String(hourly.time[0])}:00Z`);
    if (!Number.isFinite(first)) throw garbage();
    const temperature = hourly.temperature_2m;
    const dewPoint = hourly.dew_point_2m;
    const radiation = hourly.shortwave_radiation;
    if (!isNumberOrNullArray(temperature, length)) throw garbage();
    if (!isNumberOrNullArray(dewPoint, length) || !isNumberOrNullArray(radiation, length)) throw garbage();
    const latitude = Number(body.latitude);
    const longitude = Number(body.longitude);
    const elevation = Number(body.elevation);
    return {
      year,
      latitudeDeg: Number.isFinite(latitude) ? latitude : Number.NaN,
      longitudeDeg: Number.isFinite(longitude) ? longitude : Number.NaN,
      elevationM: Number.isFinite(elevation) ? elevation : 0,
      startUtcMs: first,
      temperatureC: temperature,
      dewPointC: dewPoint,
      globalHorizontalWPerM2: radiation,
    };
  }
}
