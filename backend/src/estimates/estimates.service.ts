import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { ClimateService } from '../climate/climate.service';
import type { SiteClimateDto } from '../climate/dto/climate.dto';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { estimateCooling, type CoolingConditions, type CoolingInput } from '@thermbay/engine/estimate-cooling';
import { estimateHeating, type HeatingConditions, type HeatingEstimateInput } from '@thermbay/engine/estimate-heating';
import { EngineInputError } from '@thermbay/engine/errors';
import type { HouseSpec } from '@thermbay/engine/house.types';
import { referenceRow, type ReferenceRow } from '@thermbay/engine/reference-data.types';
import { Farm } from '../farms/models/farm.model';
import { houseToSpec } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import { defaultCoolingDesignDate } from './design-date';
import type { CoolingEstimateRequestDto, PartialCoolingConditionsDto } from './dto/cooling-request.dto';
import type { CoolingConditionsSourceDto, CoolingEstimateDto, HouseCoolingEstimateDto } from './dto/cooling-result.dto';
import type { HeatingEstimateRequestDto, PartialHeatingConditionsDto } from './dto/heating-request.dto';
import type {
  HeatingConditionsSourceDto,
  HeatingConditionsUsedDto,
  HeatingEstimateDto,
  HouseHeatingEstimateDto,
} from './dto/heating-result.dto';

interface InsideHumidityRow extends ReferenceRow {
  valuePct: number;
}

const ENTER_CLIMATE =
  "this farm has no climate yet: enter the farm's climate (design temperatures) on the farm page, or give";

/**
 * Runs the heating and cooling engines over HTTP. Stateless routes take the house in the body;
 * per-house routes load it (with the access check) and fill unstated conditions from the farm,
 * its climate, the house and reference data, reporting where each value came from.
 */
@Injectable()
export class EstimatesService {
  constructor(
    @InjectModel(Farm) private readonly farms: typeof Farm,
    private readonly houses: HousesService,
    private readonly climate: ClimateService,
    private readonly reference: ReferenceDataService,
  ) {}

  heating(body: HeatingEstimateRequestDto): HeatingEstimateDto {
    const house: HouseSpec = body.house;
    this.reference.assertHouseReferences(house, 'house.');
    return estimateHeating({ house, conditions: body.conditions }, this.reference.data);
  }

  cooling(body: CoolingEstimateRequestDto): CoolingEstimateDto {
    const house: HouseSpec = body.house;
    this.reference.assertHouseReferences(house, 'house.');
    return estimateCooling({ house, site: body.site, conditions: body.conditions }, this.reference.data);
  }

  async heatingForHouse(
    user: AuthenticatedUser,
    houseId: number,
    given: PartialHeatingConditionsDto = {},
  ): Promise<HouseHeatingEstimateDto> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    const setup = await this.heatingSetup(stored.farmId, houseToSpec(stored), given);
    const estimate = estimateHeating(setup.input, this.reference.data);
    return { ...estimate, houseId, conditionsUsed: setup.conditionsUsed, conditionsSource: setup.conditionsSource };
  }

  /** The design-night input for a house of a farm (access already checked), with where each value came from. */
  async heatingSetup(
    farmId: number,
    house: HouseSpec,
    given: PartialHeatingConditionsDto = {},
  ): Promise<{
    input: HeatingEstimateInput;
    conditionsUsed: HeatingConditionsUsedDto;
    conditionsSource: HeatingConditionsSourceDto;
  }> {
    const farm = await this.farmOf(farmId);
    const climate = await this.climate.findForFarm(farmId);

    const designOutdoorC = given.designOutdoorC ?? climate?.winterDesignC;
    if (designOutdoorC === undefined) {
      throw new EngineInputError('conditions.designOutdoorC', `${ENTER_CLIMATE} conditions.designOutdoorC`);
    }
    const conditionsUsed: HeatingConditionsUsedDto = {
      designOutdoorC,
      elevationM: given.elevationM ?? farm.elevationM,
      insideRelativeHumidityPct: given.insideRelativeHumidityPct ?? this.defaultInsideHumidityPct(),
      insideC: given.insideC ?? house.setpoints.nightHeatingC,
      curtainClosed: given.curtainClosed ?? false,
      designWindSpeedMPerS:
        given.designWindSpeedMPerS ?? climate?.designWindSpeedMPerS ?? this.defaultDesignWindMPerS(),
      clearSky: given.clearSky ?? false,
    };
    const conditionsSource: HeatingConditionsSourceDto = {
      designOutdoorC: given.designOutdoorC === undefined ? 'farm climate' : 'request',
      elevationM: given.elevationM === undefined ? 'farm' : 'request',
      insideRelativeHumidityPct: given.insideRelativeHumidityPct === undefined ? 'reference data' : 'request',
      insideC: given.insideC === undefined ? 'house night setpoint' : 'request',
      curtainClosed: given.curtainClosed === undefined ? 'default' : 'request',
      designWindSpeedMPerS:
        given.designWindSpeedMPerS !== undefined
          ? 'request'
          : climate?.designWindSpeedMPerS !== undefined && climate?.designWindSpeedMPerS !== null
            ? 'farm climate'
            : 'reference data',
      clearSky: given.clearSky === undefined ? 'default' : 'request',
    };
    const conditions: HeatingConditions = {
      ...conditionsUsed,
      ...(given.outdoorDewPointC === undefined ? {} : { outdoorDewPointC: given.outdoorDewPointC }),
    };
    return { input: { house, conditions }, conditionsUsed, conditionsSource };
  }

  async coolingForHouse(
    user: AuthenticatedUser,
    houseId: number,
    given: PartialCoolingConditionsDto = {},
    now: Date = new Date(),
  ): Promise<HouseCoolingEstimateDto> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    const setup = await this.coolingSetup(stored.farmId, houseToSpec(stored), given, now);
    const estimate = estimateCooling(setup.input, this.reference.data);
    return {
      ...estimate,
      houseId,
      siteUsed: setup.input.site,
      conditionsUsed: setup.input.conditions,
      conditionsSource: setup.conditionsSource,
    };
  }

  /** The summer input for a house of a farm (access already checked), with where each value came from. */
  async coolingSetup(
    farmId: number,
    house: HouseSpec,
    given: PartialCoolingConditionsDto = {},
    now: Date = new Date(),
  ): Promise<{ input: CoolingInput; conditionsSource: CoolingConditionsSourceDto }> {
    const farm = await this.farmOf(farmId);
    const climate = await this.climate.findForFarm(farmId);
    const siteUsed = { latitudeDeg: farm.latitudeDeg, longitudeDeg: farm.longitudeDeg, elevationM: farm.elevationM };

    const fromClimate = (
      field: 'summerDesignC' | 'dailyRangeK' | 'summerDesignWetBulbC',
      climateKey: keyof SiteClimateDto,
    ): number => {
      const value = given[field] ?? (climate?.[climateKey] as number | undefined);
      if (value === undefined)
        throw new EngineInputError(`conditions.${field}`, `${ENTER_CLIMATE} conditions.${field}`);
      return value;
    };
    const conditionsUsed: CoolingConditions = {
      designDate:
        given.designDate ?? defaultCoolingDesignDate(farm.latitudeDeg, now, farm.timeZone, this.reference.data),
      summerDesignC: fromClimate('summerDesignC', 'summerDesignC'),
      dailyRangeK: fromClimate('dailyRangeK', 'summerDailyRangeK'),
      summerDesignWetBulbC: fromClimate('summerDesignWetBulbC', 'summerDesignWetBulbC'),
    };
    // optional conditions: passed on only when stated, so the engine's sourced defaults apply otherwise
    for (const key of [
      'allowedTemperatureRiseK',
      'peakInteriorLightLux',
      'padToFanDistanceM',
      'transpirationFraction',
    ] as const) {
      if (given[key] !== undefined) conditionsUsed[key] = given[key];
    }
    if (given.evaporativePad !== undefined) conditionsUsed.evaporativePad = given.evaporativePad;
    const winterDesignC = given.winterDesignC ?? climate?.winterDesignC;
    if (winterDesignC !== undefined) conditionsUsed.winterDesignC = winterDesignC;

    const stated = (key: keyof PartialCoolingConditionsDto) => given[key] !== undefined;
    const conditionsSource: CoolingConditionsSourceDto = {
      designDate: stated('designDate') ? 'request' : 'calendar default',
      summerDesignC: stated('summerDesignC') ? 'request' : 'farm climate',
      dailyRangeK: stated('dailyRangeK') ? 'request' : 'farm climate',
      summerDesignWetBulbC: stated('summerDesignWetBulbC') ? 'request' : 'farm climate',
      allowedTemperatureRiseK: stated('allowedTemperatureRiseK') ? 'request' : 'reference data',
      peakInteriorLightLux: stated('peakInteriorLightLux') ? 'request' : 'design day',
      padToFanDistanceM: stated('padToFanDistanceM') ? 'request' : 'house length',
      transpirationFraction: stated('transpirationFraction') ? 'request' : 'reference data',
      evaporativePad: given.evaporativePad ? 'request' : 'none',
      winterDesignC: stated('winterDesignC') ? 'request' : climate ? 'farm climate' : 'reference data',
    };
    return { input: { house, site: siteUsed, conditions: conditionsUsed }, conditionsSource };
  }

  private async farmOf(farmId: number): Promise<Farm> {
    const farm = await this.farms.findByPk(farmId);
    if (!farm) throw new NotFoundException('No such farm');
    return farm;
  }

  /** The wind the U tables assume (reference-data/wind.json), used when the farm gives none. */
  private defaultDesignWindMPerS(): number {
    const row = referenceRow<ReferenceRow & { valueMPerS?: number }>(
      this.reference.data,
      'wind',
      'design-wind-default',
    );
    if (!row || typeof row.valueMPerS !== 'number') {
      throw new Error('reference-data/wind.json needs a row design-wind-default with valueMPerS');
    }
    return row.valueMPerS;
  }

  private defaultInsideHumidityPct(): number {
    const row = referenceRow<InsideHumidityRow>(this.reference.data, 'estimate-defaults', 'design-night-inside-rh');
    if (!row || typeof row.valuePct !== 'number') {
      throw new Error('reference-data/estimate-defaults.json needs a row design-night-inside-rh with valuePct');
    }
    return row.valuePct;
  }
}
