import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { estimateSeason, type EstimateSeasonInput } from '@thermbay/engine/estimate-season';
import { compareMeasures, defaultMeasures, type Measure, type MeasureResult } from '@thermbay/engine/season/measures';
import { nightHeatingDemand } from '@thermbay/engine/season/night-demand';
import type { HouseSpec } from '@thermbay/engine/house.types';
import type { ProductionCalendar } from '@thermbay/engine/season/production-calendar';
import { AlternativesService } from '../alternatives/alternatives.service';
import { houseToSpec } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import type { House } from '../houses/models/house.model';
import type { FarmFuelPrice } from './models/farm-fuel-price.model';
import type { HeatLossBasis } from './dto/heat-loss-basis.dto';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type {
  MeasureDto,
  MeasuresRequestDto,
  NightDemandRequestDto,
  SeasonOptionsDto,
  SeasonRequestDto,
} from './dto/season-request.dto';
import type { MeasureComparisonDto, MeasureResultDto } from './dto/measure-result.dto';
import type { HouseNightDemandDto, HouseSeasonEstimateDto, SeasonInputsUsedDto } from './dto/season-result.dto';
import {
  SeasonInputsService,
  withRequestFields,
  type FarmSeasonContext,
  type HouseFuelChoice,
} from './season-inputs.service';
import { SunCacheService } from './sun-cache.service';
import { HeatLossBasisService } from './heat-loss-basis.service';

function toEngineMeasure(dto: MeasureDto): Measure {
  const { costAmount, ...settings } = dto;
  return { ...settings, costMoney: costAmount ?? null } as Measure;
}

function measureResultToDto(result: MeasureResult): MeasureResultDto {
  const { costMoney, ...rest } = result;
  return { ...rest, costAmount: costMoney };
}

/** Season, one night and measures for a stored house, with defaults from the house and its farm. */
@Injectable()
export class SeasonService {
  constructor(
    private readonly houses: HousesService,
    private readonly alternatives: AlternativesService,
    private readonly inputs: SeasonInputsService,
    private readonly reference: ReferenceDataService,
    private readonly sun: SunCacheService,
    private readonly basis: HeatLossBasisService,
  ) {}

  async season(user: AuthenticatedUser, houseId: number, body: SeasonRequestDto): Promise<HouseSeasonEstimateDto> {
    const run = await this.prepare(user, houseId, body);
    const estimate = withRequestFields(() => estimateSeason(run.input, this.reference.data, this.sun.cache));
    return { ...estimate, houseId, inputsUsed: run.inputsUsed };
  }

  async nightDemand(
    user: AuthenticatedUser,
    houseId: number,
    body: NightDemandRequestDto,
  ): Promise<HouseNightDemandDto> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    const farm = await this.inputs.farm(stored.farmId);
    const house = houseToSpec(stored);
    // The night and the next morning are the "season"; a log must cover both days.
    const nextDay = new Date(Date.parse(`${body.date}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    const context = await this.inputs.farmContext(
      farm,
      { startDate: body.date, endDate: nextDay, climateSource: body.climateSource },
      new Date(),
    );
    const choice = this.inputs.fuelChoice(house, await this.inputs.pricesOf(farm.id), body);
    const night = withRequestFields(() =>
      nightHeatingDemand(
        {
          house,
          site: context.site,
          climate: context.climate,
          date: body.date,
          nightSetpointC: body.nightSetpointC,
          fuel: choice.fuel,
          heaterEfficiency: choice.heaterEfficiency,
        },
        this.reference.data,
        this.sun.cache,
      ),
    );
    return {
      ...night,
      minOutdoorC: Number.isFinite(night.minOutdoorC) ? night.minOutdoorC : null,
      houseId,
      inputsUsed: this.inputs.runInputs(context, choice),
    };
  }

  async measures(user: AuthenticatedUser, houseId: number, body: MeasuresRequestDto): Promise<MeasureComparisonDto> {
    const run = await this.prepare(user, houseId, body);
    const defaultsUsed = body.measures.length === 0;
    const comparison = withRequestFields(() => {
      const measures = defaultsUsed
        ? defaultMeasures(run.input, this.reference.data, this.sun.cache)
        : body.measures.map(toEngineMeasure);
      return compareMeasures(run.input, measures, this.reference.data, this.sun.cache);
    });
    const notes = [...comparison.notes];
    if (defaultsUsed) {
      notes.unshift(
        'No measures were given, so the default measures that apply to this house are compared without costs: enter what each would cost to see its payback.',
      );
    }
    return {
      houseId,
      baseline: comparison.baseline,
      measures: comparison.measures.map(measureResultToDto),
      defaultsUsed,
      notes,
      inputsUsed: run.inputsUsed,
    };
  }

  private async prepare(user: AuthenticatedUser, houseId: number, body: SeasonRequestDto): Promise<PreparedSeasonRun> {
    const run = await this.alternatives.houseForRun(user, houseId, body.alternativeId, 'estimate:run');
    return this.prepareFor(run.stored, run.house, run.calendar, body);
  }

  /**
   * The season input for a house (or an alternative of it) of a stored house's farm, access
   * already checked. `calendar` undefined = the stored house's own production calendar.
   */
  async prepareFor(
    stored: House,
    house: HouseSpec,
    calendarOverride: ProductionCalendar | null | undefined,
    body: SeasonOptionsDto & { startDate?: string; endDate?: string; heatLossBasis?: HeatLossBasis },
    shared?: { context: FarmSeasonContext; prices: Map<string, FarmFuelPrice> },
  ): Promise<PreparedSeasonRun> {
    const houseId = stored.id;
    const farm = shared?.context.farm ?? (await this.inputs.farm(stored.farmId));
    const context = shared?.context ?? (await this.inputs.farmContext(farm, body, new Date()));
    const choice = this.inputs.fuelChoice(house, shared?.prices ?? (await this.inputs.pricesOf(farm.id)), body);
    const calendar = calendarOverride === undefined ? await this.inputs.calendarOf(houseId) : calendarOverride;
    const input: EstimateSeasonInput = {
      house,
      site: context.site,
      climate: context.climate,
      season: context.season,
      calendar,
      fuel: choice.fuel,
      heaterEfficiency: choice.heaterEfficiency,
    };
    const basis = (await this.basis.forFarm(farm.id, body.heatLossBasis)).forHouse(
      houseId,
      stored.name,
      stored.version,
    );
    if (basis.heatLossBasis === 'calibrated') input.heatLossFactor = basis.heatLossFactor;
    const inputsUsed: SeasonInputsUsedDto = {
      ...this.inputs.runInputs(context, choice),
      ...basis,
      startDate: context.season.startDate,
      endDate: context.season.endDate,
      seasonFrom: context.seasonFrom,
      calendarPeriodCount: calendar?.length ?? 0,
    };
    return { input, inputsUsed, context, choice };
  }
}

export interface PreparedSeasonRun {
  input: EstimateSeasonInput;
  inputsUsed: SeasonInputsUsedDto;
  context: FarmSeasonContext;
  choice: HouseFuelChoice;
}
