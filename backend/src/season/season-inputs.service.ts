import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ClimateService } from '../climate/climate.service';
import type { LoggedClimateInput, SeasonSite } from '@thermbay/engine/estimate-season';
import { clearnessByMonth, type SiteClimate } from '@thermbay/engine/climate/site-climate';
import { EngineInputError } from '@thermbay/engine/errors';
import type { HouseSpec } from '@thermbay/engine/house.types';
import { fuelRow, type FuelPrice, type PriceUnit } from '@thermbay/engine/season/fuel';
import type { ProductionCalendar } from '@thermbay/engine/season/production-calendar';
import type { SeasonRange } from '@thermbay/engine/season/season-hours';
import { Farm } from '../farms/models/farm.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { TemperatureLog } from '../temperature-logs/models/temperature-log.model';
import { TemperatureLogsService } from '../temperature-logs/temperature-logs.service';
import type { ClimateSource, SeasonOptionsDto } from './dto/season-request.dto';
import type { SeasonRunInputsDto } from './dto/season-result.dto';
import { FarmFuelPrice } from './models/farm-fuel-price.model';
import { HouseCalendar } from './models/house-calendar.model';
import { defaultHeatingSeason, standardUtcOffsetHours } from './site-time';

export type SeasonFrom = 'request' | 'default-heating-season' | 'temperature-log';

/** The farm's side of a season run: site, climate and dates, shared by every house of the farm. */
export interface FarmSeasonContext {
  farm: Farm;
  site: SeasonSite;
  climate: SiteClimate | LoggedClimateInput;
  season: SeasonRange;
  seasonFrom: SeasonFrom;
  log: TemperatureLog | null;
}

/** Fuel, price and efficiency of one house, with where each came from. */
export interface HouseFuelChoice {
  fuel: FuelPrice;
  heaterEfficiency: number;
  fuelFrom: 'request' | 'house-heater';
  /** 'none': no price yet; the engine gives heat and fuel, and every cost is null */
  priceFrom: 'request' | 'farm-fuel-prices' | 'none';
  heaterEfficiencyFrom: 'request' | 'house-heater';
}

/** Request fields the engine's dotted input paths correspond to. */
const REQUEST_FIELDS: Array<[RegExp, string]> = [
  [/^season\.startDate$/, 'startDate'],
  [/^season\.endDate$/, 'endDate'],
  [/^fuel\.fuelId$/, 'fuelId'],
  [/^fuel\.pricePerUnit$/, 'pricePerUnit'],
  [/^fuel\.priceUnit$/, 'priceUnit'],
  [/^climate\.readings/, 'climateSource'],
];

/** Runs an engine call, renaming the engine's input paths to the request's field names. */
export function withRequestFields<T>(run: () => T): T {
  try {
    return run();
  } catch (error) {
    if (error instanceof EngineInputError) {
      const rename = REQUEST_FIELDS.find(([pattern]) => pattern.test(error.field));
      if (rename) throw new EngineInputError(rename[1], error.message);
    }
    throw error;
  }
}

/** Whole days an hourly log covers (a first or last day logged only in part is left out). */
function wholeDaysOfLog(log: TemperatureLog): SeasonRange {
  const readings = log.readings;
  let { startDate, endDate } = log;
  if (log.resolution === 'hourly' && readings.length > 0) {
    const firstHour = Number(readings[0].at.slice(11, 13));
    const lastHour = Number(readings[readings.length - 1].at.slice(11, 13));
    if (firstHour > 1) startDate = shiftDate(startDate, 1);
    if (lastHour < 22) endDate = shiftDate(endDate, -1);
  }
  // One estimate covers at most 366 days.
  const latestEnd = shiftDate(startDate, 365);
  if (endDate > latestEnd) endDate = latestEnd;
  if (endDate < startDate) endDate = startDate;
  return { startDate, endDate };
}

function shiftDate(isoDate: string, days: number): string {
  const ms = Date.parse(`${isoDate}T00:00:00Z`) + days * 86_400_000;
  return new Date(ms).toISOString().slice(0, 10);
}

/**
 * Turns stored rows and a request's options into engine input, filling what the request leaves
 * out from the farm (site, climate, fuel prices), the house (heaters, calendar) and the date.
 */
@Injectable()
export class SeasonInputsService {
  constructor(
    @InjectModel(Farm) private readonly farms: typeof Farm,
    @InjectModel(FarmFuelPrice) private readonly prices: typeof FarmFuelPrice,
    @InjectModel(HouseCalendar) private readonly calendars: typeof HouseCalendar,
    private readonly climates: ClimateService,
    private readonly logs: TemperatureLogsService,
    private readonly reference: ReferenceDataService,
  ) {}

  async farm(farmId: number): Promise<Farm> {
    const farm = await this.farms.findByPk(farmId);
    if (!farm) throw new NotFoundException('No such farm');
    return farm;
  }

  /** Site, climate and season dates for a farm (access already checked). */
  async farmContext(
    farm: Farm,
    request: { startDate?: string; endDate?: string; climateSource?: ClimateSource },
    today: Date,
  ): Promise<FarmSeasonContext> {
    if ((request.startDate === undefined) !== (request.endDate === undefined)) {
      const missing = request.startDate === undefined ? 'startDate' : 'endDate';
      throw new EngineInputError(
        missing,
        'Give both a first and a last day of the season, or neither for the default heating season',
      );
    }
    const source = request.climateSource ?? 'normals';
    const log =
      source === 'normals'
        ? null
        : await this.logs.findForFarm(farm.id, source.temperatureLogId, 'climateSource.temperatureLogId');

    let season: SeasonRange;
    let seasonFrom: SeasonFrom;
    if (request.startDate !== undefined && request.endDate !== undefined) {
      season = { startDate: request.startDate, endDate: request.endDate };
      seasonFrom = 'request';
    } else if (log) {
      season = wholeDaysOfLog(log);
      seasonFrom = 'temperature-log';
    } else {
      season = defaultHeatingSeason(farm.latitudeDeg, today);
      seasonFrom = 'default-heating-season';
    }

    const site: SeasonSite = {
      latitudeDeg: farm.latitudeDeg,
      longitudeDeg: farm.longitudeDeg,
      elevationM: farm.elevationM,
      utcOffsetHours: standardUtcOffsetHours(
        farm.timeZone,
        Number(season.startDate.slice(0, 4)) || today.getUTCFullYear(),
      ),
    };

    const stored = await this.climates.findForFarm(farm.id);
    const normals: SiteClimate | null = stored
      ? { ...stored, monthly: stored.monthly.map((month) => ({ ...month, clearness: month.clearness ?? undefined })) }
      : null;
    let climate: SiteClimate | LoggedClimateInput;
    if (log) {
      climate = { readings: log.readings, resolution: log.resolution };
      // The farm's own clearness, where entered, also applies to its logged years.
      if (normals) {
        const byMonth = clearnessByMonth(normals, this.reference.data);
        if (byMonth.fromUser.some(Boolean)) climate.clearnessByMonth = byMonth.clearness;
      }
    } else if (normals) {
      climate = normals;
    } else {
      throw new EngineInputError(
        'climateSource',
        "This farm has no climate yet: enter its climate (monthly normals) on the farm page, or run the season on one of the farm's temperature logs",
      );
    }
    return { farm, site, climate, season, seasonFrom, log };
  }

  async calendarOf(houseId: number): Promise<ProductionCalendar | null> {
    const row = await this.calendars.findOne({ where: { houseId } });
    if (!row || row.periods.length === 0) return null;
    // The engine needs the periods only; labels are for people.
    return row.periods.map(({ label: _label, ...period }) => period);
  }

  async pricesOf(farmId: number): Promise<Map<string, FarmFuelPrice>> {
    const rows = await this.prices.findAll({ where: { farmId } });
    return new Map(rows.map((row) => [row.fuelId, row]));
  }

  /**
   * Fuel, price and efficiency: from the request, else the house's heaters and the farm's price
   * list. A missing price is no error: the price is null (priced in the user's unit system once
   * entered) and the estimate gives heat and fuel without costs. Throws EngineInputError naming
   * the request field that must be given (a house without heaters).
   */
  fuelChoice(house: HouseSpec, prices: Map<string, FarmFuelPrice>, options: SeasonOptionsDto): HouseFuelChoice {
    const firstHeater = house.heaters[0];
    const fuelId = options.fuelId ?? firstHeater?.fuelId;
    if (!fuelId) {
      throw new EngineInputError(
        'fuelId',
        'This house has no heaters yet: add its heaters on the house page to estimate the fuel it burns',
      );
    }
    fuelRow(this.reference.data, fuelId, 'fuelId');

    const heaterOfFuel = house.heaters.find((heater) => heater.fuelId === fuelId) ?? firstHeater;
    const heaterEfficiency = options.heaterEfficiency ?? heaterOfFuel?.efficiency;
    if (heaterEfficiency === undefined)
      throw new EngineInputError(
        'heaterEfficiency',
        'This house has no heaters yet: add its heaters (with their efficiency) on the house page',
      );

    let pricePerUnit: number | null;
    let priceUnit: PriceUnit;
    let priceFrom: HouseFuelChoice['priceFrom'];
    if (options.pricePerUnit !== undefined) {
      pricePerUnit = options.pricePerUnit;
      priceUnit = options.priceUnit ?? 'si';
      priceFrom = 'request';
    } else {
      const stored = prices.get(fuelId);
      pricePerUnit = stored?.pricePerUnit ?? null;
      priceUnit = stored?.priceUnit ?? options.priceUnit ?? 'si';
      priceFrom = stored ? 'farm-fuel-prices' : 'none';
    }
    return {
      fuel: { fuelId, pricePerUnit, priceUnit },
      heaterEfficiency,
      fuelFrom: options.fuelId !== undefined ? 'request' : 'house-heater',
      priceFrom,
      heaterEfficiencyFrom: options.heaterEfficiency !== undefined ? 'request' : 'house-heater',
    };
  }

  runInputs(context: FarmSeasonContext, choice: HouseFuelChoice): SeasonRunInputsDto {
    return {
      climateSource: context.log ? 'temperature-log' : 'normals',
      temperatureLogId: context.log?.id ?? null,
      temperatureLogName: context.log?.name ?? null,
      fuelId: choice.fuel.fuelId,
      fuelFrom: choice.fuelFrom,
      pricePerUnit: choice.fuel.pricePerUnit,
      priceUnit: choice.fuel.priceUnit,
      priceFrom: choice.priceFrom,
      heaterEfficiency: choice.heaterEfficiency,
      heaterEfficiencyFrom: choice.heaterEfficiencyFrom,
      currency: context.farm.currency,
      timeZone: context.farm.timeZone,
      utcOffsetHours: context.site.utcOffsetHours,
    };
  }
}
