import { BadRequestException, Injectable, Logger, type OnModuleDestroy, type OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectModel } from '@nestjs/sequelize';
import { UniqueConstraintError } from 'sequelize';
import { EngineInputError } from '@thermbay/engine/errors';
import { climateFromHourlyWeather, type HourlyWeatherSpan } from '@thermbay/engine/climate/hourly-climate';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { Environment } from '../config/environment';
import { ClimateService } from '../climate/climate.service';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import { standardUtcOffsetHours } from '../season/site-time';
import type { TemperatureLogDto } from '../temperature-logs/dto/temperature-log.dto';
import { TemperatureLogsService } from '../temperature-logs/temperature-logs.service';
import {
  FIRST_WEATHER_YEAR,
  MAX_WEATHER_SPAN_YEARS,
  type ClimateProposalDto,
  type WeatherSourceDto,
  type WeatherYearStatusDto,
} from './dto/weather.dto';
import { WeatherYear } from './models/weather-year.model';
import { WeatherStandIn } from './stand-in/weather-stand-in';
import { WeatherClient } from './weather-client';

const STAND_IN_KEY = 'stand-in';
const RETRY_BACKOFF_MS = 500;

/** Coordinates rounded to the 0.1° grid the hours are cached on. */
export function gridOf(degrees: number): number {
  return Math.round(degrees * 10) / 10;
}

const round2 = (value: number) => Math.round(value * 100) / 100;

@Injectable()
export class WeatherService implements OnModuleInit, OnModuleDestroy {
  private readonly logger = new Logger('Weather');
  private standIn: WeatherStandIn | null = null;
  private client!: WeatherClient;
  private serviceUrl: string | null = null;

  constructor(
    private readonly config: ConfigService<Environment, true>,
    @InjectModel(WeatherYear) private readonly years: typeof WeatherYear,
    @InjectModel(Farm) private readonly farms: typeof Farm,
    private readonly access: FarmAccessService,
    private readonly climate: ClimateService,
    private readonly reference: ReferenceDataService,
    private readonly temperatureLogs: TemperatureLogsService,
  ) {}

  async onModuleInit(): Promise<void> {
    this.serviceUrl = this.config.get('WEATHER_API_URL', { infer: true });
    let baseUrl = this.serviceUrl;
    if (!baseUrl) {
      this.standIn = new WeatherStandIn(this.reference.data);
      baseUrl = await this.standIn.start(this.config.get('WEATHER_STANDIN_PORT', { infer: true }));
    } else {
      this.logger.log(`weather history from ${baseUrl}`);
    }
    this.client = new WeatherClient({
      baseUrl,
      timeoutMs: this.config.get('WEATHER_TIMEOUT_MS', { infer: true }),
      attempts: this.config.get('WEATHER_ATTEMPTS', { infer: true }),
      backoffMs: RETRY_BACKOFF_MS,
    });
  }

  async onModuleDestroy(): Promise<void> {
    await this.standIn?.stop();
  }

  /** The local stand-in, for tests that make it fail or count its requests; null with a real service. */
  get localStandIn(): WeatherStandIn | null {
    return this.standIn;
  }

  get sourceKey(): string {
    return this.serviceUrl ?? STAND_IN_KEY;
  }

  source(now = new Date()): WeatherSourceDto {
    // Reanalysis history runs a few days behind: the last complete year is last calendar year.
    const lastCompleteYear = now.getUTCFullYear() - 1;
    return {
      standIn: this.standIn !== null,
      serviceUrl: this.serviceUrl,
      note: this.standIn
        ? 'The weather here is INVENTED by the local stand-in built into Thermbay, for trying the app offline. ' +
          'Set WEATHER_API_URL to the hourly weather-history service to use real reanalysis weather.'
        : `Hourly reanalysis weather from ${this.serviceUrl}, on a 0.1° grid around the farm.`,
      defaultFromYear: lastCompleteYear - 9,
      defaultToYear: lastCompleteYear,
      lastCompleteYear,
    };
  }

  async sourceForFarm(user: AuthenticatedUser, farmId: number): Promise<WeatherSourceDto> {
    await this.access.require(user, farmId, 'farm:read');
    return this.source();
  }

  async fetchYear(user: AuthenticatedUser, farmId: number, year: number): Promise<WeatherYearStatusDto> {
    await this.access.require(user, farmId, 'estimate:run');
    this.checkYears(year, year);
    const farm = await this.farms.findByPk(farmId, { rejectOnEmpty: true });
    const { row, fromCache } = await this.yearFor(farm, year);
    return { year, fromCache, hourCount: row.hourCount, missingHourCount: row.missingHourCount };
  }

  async proposeClimate(
    user: AuthenticatedUser,
    farmId: number,
    fromYear: number,
    toYear: number,
  ): Promise<ClimateProposalDto> {
    await this.access.require(user, farmId, 'estimate:run');
    this.checkYears(fromYear, toYear);
    const farm = await this.farms.findByPk(farmId, { rejectOnEmpty: true });
    const spans: HourlyWeatherSpan[] = [];
    for (let year = fromYear; year <= toYear; year++) {
      const { row } = await this.yearFor(farm, year);
      spans.push({
        year,
        startUtcMs: new Date(row.startAt).getTime(),
        dryBulbC: row.hours.temperatureC,
        dewPointC: row.hours.dewPointC,
        globalHorizontalWPerM2: row.hours.globalHorizontalWPerM2,
      });
    }
    const site = {
      latitudeDeg: farm.latitudeDeg,
      longitudeDeg: farm.longitudeDeg,
      elevationM: farm.elevationM,
      utcOffsetHours: standardUtcOffsetHours(farm.timeZone, toYear),
    };
    const result = climateFromHourlyWeather(spans, site, this.reference.data);
    const coincidentWetBulb = result.summerCoincidentWetBulb1C ?? result.summerCoincidentWetBulb04C;
    if (coincidentWetBulb === null) {
      throw new EngineInputError(
        'weather',
        'The weather hours carry no dew point, so no summer wet bulb can be proposed',
      );
    }
    const source = this.source();
    const used = result.spansUsed.map((s) => s.year);
    const span = used.length === 1 ? `${used[0]}` : `${used[0]}–${used[used.length - 1]}`;
    const leftOut = result.spansLeftOut.length ? `; left out ${result.spansLeftOut.map((s) => s.year).join(', ')}` : '';
    const sourceNote = source.standIn
      ? `INVENTED weather from Thermbay's local stand-in (not measured), ${span}${leftOut}: 99.6 % heating and 1 % cooling design values`
      : `hourly reanalysis weather ${span}${leftOut} at ${gridOf(farm.latitudeDeg)}°, ${gridOf(farm.longitudeDeg)}° (${source.serviceUrl}): 99.6 % heating and 1 % cooling design values`;
    const monthly = result.monthly.map((m) => ({
      month: m.month,
      meanDailyMinC: round2(m.meanDailyMinC),
      meanDailyMaxC: round2(m.meanDailyMaxC),
      clearness: m.clearness === null ? null : round2(m.clearness),
      dayCount: m.dayCount,
    }));
    return {
      farmId,
      fromYear,
      toYear,
      source,
      gridLatitudeDeg: gridOf(farm.latitudeDeg),
      gridLongitudeDeg: gridOf(farm.longitudeDeg),
      yearsUsed: result.spansUsed,
      yearsLeftOut: result.spansLeftOut,
      hoursUsed: result.hoursUsed,
      winterDesign996C: round2(result.winterDesign996C),
      winterDesign99C: round2(result.winterDesign99C),
      summerDesign04C: round2(result.summerDesign04C),
      summerDesign1C: round2(result.summerDesign1C),
      summerCoincidentWetBulb04C:
        result.summerCoincidentWetBulb04C === null ? null : round2(result.summerCoincidentWetBulb04C),
      summerCoincidentWetBulb1C:
        result.summerCoincidentWetBulb1C === null ? null : round2(result.summerCoincidentWetBulb1C),
      summerDailyRangeK: round2(result.summerDailyRangeK),
      monthly,
      proposedClimate: {
        winterDesignC: round2(result.winterDesign996C),
        summerDesignC: round2(result.summerDesign1C),
        summerDesignWetBulbC: round2(coincidentWetBulb),
        summerDailyRangeK: round2(result.summerDailyRangeK),
        monthly: monthly.map(({ month, meanDailyMinC, meanDailyMaxC, clearness }) => ({
          month,
          meanDailyMinC,
          meanDailyMaxC,
          clearness,
        })),
        sourceNote,
      },
      currentClimate: await this.climate.findForFarm(farmId),
    };
  }

  /**
   * Keeps one year of the history as a temperature log of the farm (hours in local standard
   * time), so a season can run on that year's actual hours like on an uploaded log.
   */
  async keepYearAsTemperatureLog(user: AuthenticatedUser, farmId: number, year: number): Promise<TemperatureLogDto> {
    await this.access.require(user, farmId, 'house:write');
    this.checkYears(year, year);
    const farm = await this.farms.findByPk(farmId, { rejectOnEmpty: true });
    const { row } = await this.yearFor(farm, year);
    const offsetMs = standardUtcOffsetHours(farm.timeZone, year) * 3_600_000;
    const startMs = new Date(row.startAt).getTime();
    const readings = row.hours.temperatureC.flatMap((temperatureC, i) =>
      temperatureC === null
        ? []
        : [{ at: new Date(startMs + i * 3_600_000 + offsetMs).toISOString().slice(0, 16), temperatureC }],
    );
    const name = this.standIn
      ? `Weather history ${year} (INVENTED by the local stand-in)`
      : `Weather history ${year} (${gridOf(farm.latitudeDeg)}°, ${gridOf(farm.longitudeDeg)}°)`;
    return this.temperatureLogs.storeReadings(farmId, name, readings, {
      timestampColumn: 'time',
      temperatureColumn: 'temperature_2m',
      unit: 'C',
      resolution: 'hourly',
      hasHeader: true,
    });
  }

  private checkYears(fromYear: number, toYear: number): void {
    const { lastCompleteYear } = this.source();
    if (fromYear < FIRST_WEATHER_YEAR || toYear > lastCompleteYear) {
      throw new BadRequestException({
        message: `Weather history covers whole years from ${FIRST_WEATHER_YEAR} to ${lastCompleteYear}`,
        field: fromYear < FIRST_WEATHER_YEAR ? 'fromYear' : 'toYear',
      });
    }
    if (toYear < fromYear)
      throw new BadRequestException({ message: 'toYear must not be before fromYear', field: 'toYear' });
    if (toYear - fromYear + 1 > MAX_WEATHER_SPAN_YEARS) {
      throw new BadRequestException({
        message: `Ask for at most ${MAX_WEATHER_SPAN_YEARS} years at once`,
        field: 'fromYear',
      });
    }
  }

  /** The cached year, or the service's answer stored now. Nothing is stored from a failed fetch. */
  private async yearFor(farm: Farm, year: number): Promise<{ row: WeatherYear; fromCache: boolean }> {
    const where = {
      sourceKey: this.sourceKey,
      gridLatitudeDeg: gridOf(farm.latitudeDeg),
      gridLongitudeDeg: gridOf(farm.longitudeDeg),
      year,
    };
    const cached = await this.years.findOne({ where });
    if (cached) return { row: cached, fromCache: true };
    const fetched = await this.client.fetchYear(where.gridLatitudeDeg, where.gridLongitudeDeg, year);
    const missingHourCount = fetched.temperatureC.filter((t) => t === null).length;
    try {
      const row = await this.years.create({
        ...where,
        elevationM: fetched.elevationM,
        startAt: new Date(fetched.startUtcMs),
        hourCount: fetched.temperatureC.length,
        missingHourCount,
        hours: {
          temperatureC: fetched.temperatureC,
          dewPointC: fetched.dewPointC,
          globalHorizontalWPerM2: fetched.globalHorizontalWPerM2,
        },
      });
      return { row, fromCache: false };
    } catch (error) {
      // Another request stored the same year a moment ago: use theirs.
      if (error instanceof UniqueConstraintError) {
        return { row: await this.years.findOne({ where, rejectOnEmpty: true }), fromCache: true };
      }
      throw error;
    }
  }
}
