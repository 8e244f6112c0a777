import { Injectable } from '@nestjs/common';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { estimateSeason, type EstimateSeasonInput } from '../engine/estimate-season';
import type { HouseSpec } from '../engine/house.types';
import { referenceRow, type ReferenceData, type ReferenceRow } from '../engine/reference-data.types';
import { compareMeasures, type Measure, type MeasureResult } from '../engine/season/measures';
import { nightHeatingDemand } from '../engine/season/night-demand';
import { houseToSpec } from '../houses/house.mapper';
import { HousesService } from '../houses/houses.service';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { MeasureDto, MeasuresRequestDto, NightDemandRequestDto, SeasonRequestDto } from './dto/season-request.dto';
import type { HouseNightDemandDto, HouseSeasonEstimateDto, MeasureComparisonDto, MeasureResultDto, SeasonInputsUsedDto } from './dto/season-result.dto';
import { SeasonInputsService, withRequestFields, type FarmSeasonContext, type HouseFuelChoice } from './season-inputs.service';
import { SunCacheService } from './sun-cache.service';

interface MeasureDefaultsRow extends ReferenceRow {
  targetCoveringId?: string;
  defaultCurtainId?: string;
  defaultEfficiency?: number;
}

/**
 * The measures compared when the request lists none: every kind with a default in
 * reference-data/measures.json that would change this house, at cost 0 (costs are the user's).
 * A fuel switch needs a price for the other fuel, so it is never a default.
 */
export function defaultMeasures(house: HouseSpec, heaterEfficiency: number, ref: ReferenceData): MeasureDto[] {
  const row = (id: string) => referenceRow<MeasureDefaultsRow>(ref, 'measures', id);
  const list: MeasureDto[] = [];
  const layer = row('second-poly-layer');
  if (layer?.targetCoveringId && (house.coverings.roof !== layer.targetCoveringId || house.coverings.sidewalls !== layer.targetCoveringId)) {
    const target = referenceRow<ReferenceRow & { uWPerM2K?: number }>(ref, 'coverings', layer.targetCoveringId);
    const roof = referenceRow<ReferenceRow & { uWPerM2K?: number }>(ref, 'coverings', house.coverings.roof);
    // Only where the second layer would be an improvement on the roof as it is.
    if (target?.uWPerM2K !== undefined && roof?.uWPerM2K !== undefined && target.uWPerM2K < roof.uWPerM2K) {
      list.push({ kind: 'second-poly-layer', costAmount: 0 });
    }
  }
  const curtain = row('thermal-curtain');
  if (curtain && !house.curtainId) list.push({ kind: 'thermal-curtain', costAmount: 0 });
  if (row('perimeter-insulation') && !house.perimeterInsulated) list.push({ kind: 'perimeter-insulation', costAmount: 0 });
  if (row('sealing')) list.push({ kind: 'sealing', costAmount: 0 });
  if (row('night-setpoint-lower')) list.push({ kind: 'night-setpoint-lower', costAmount: 0 });
  if (row('later-start')) list.push({ kind: 'later-start', costAmount: 0 });
  const efficiency = row('heater-efficiency');
  if (efficiency?.defaultEfficiency !== undefined && efficiency.defaultEfficiency > heaterEfficiency) {
    list.push({ kind: 'heater-efficiency', costAmount: 0 });
  }
  return list;
}

function toEngineMeasure(dto: MeasureDto): Measure {
  const { costAmount, ...settings } = dto;
  return { ...settings, costMoney: costAmount } as Measure;
}

function measureResultToDto(result: MeasureResult): MeasureResultDto {
  const { costMoney, ...rest } = result;
  return { ...rest, costAmount: costMoney };
}

/** Shortest payback first; equal paybacks (e.g. measures at cost 0) by larger saving; never last. */
function rankMeasures(results: MeasureResultDto[]): MeasureResultDto[] {
  return [...results].sort((a, b) => {
    if (a.paybackYears === null || b.paybackYears === null) {
      if (a.paybackYears === null && b.paybackYears === null) return b.yearlyMoneySaved - a.yearlyMoneySaved;
      return a.paybackYears === null ? 1 : -1;
    }
    return a.paybackYears - b.paybackYears || b.yearlyMoneySaved - a.yearlyMoneySaved;
  });
}

/** Season, one night and measures for a stored house, with defaults from the house and its farm. */
@Injectable()
export class SeasonService {
  constructor(
    private readonly houses: HousesService,
    private readonly inputs: SeasonInputsService,
    private readonly reference: ReferenceDataService,
    private readonly sun: SunCacheService,
  ) {}

  async season(user: AuthenticatedUser, houseId: number, body: SeasonRequestDto): Promise<HouseSeasonEstimateDto> {
    const run = await this.prepare(user, houseId, body);
    const estimate = withRequestFields(() => estimateSeason(run.input, this.reference.data, this.sun.cache));
    return { ...estimate, houseId, inputsUsed: run.inputsUsed };
  }

  async nightDemand(user: AuthenticatedUser, houseId: number, body: NightDemandRequestDto): Promise<HouseNightDemandDto> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    const farm = await this.inputs.farm(stored.farmId);
    const house = houseToSpec(stored);
    // The night and the next morning are the "season"; a log must cover both days.
    const nextDay = new Date(Date.parse(`${body.date}T00:00:00Z`) + 86_400_000).toISOString().slice(0, 10);
    const context = await this.inputs.farmContext(farm, { startDate: body.date, endDate: nextDay, climateSource: body.climateSource }, new Date());
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
    const measures = defaultsUsed ? defaultMeasures(run.input.house, run.input.heaterEfficiency, this.reference.data) : body.measures;
    const comparison = withRequestFields(() =>
      compareMeasures(run.input, measures.map(toEngineMeasure), this.reference.data, this.sun.cache),
    );
    const notes = [...comparison.notes];
    if (defaultsUsed) {
      notes.unshift('No measures were given, so the default measures are compared at cost 0: enter what each would cost to see its payback.');
    }
    const results = comparison.measures.map(measureResultToDto).map((result) =>
      // Cost 0 gives a payback of 0 years; say what that means instead.
      result.costAmount === 0 && result.paybackYears !== null ? { ...result, paybackText: defaultsUsed ? 'enter a cost' : 'immediately' } : result,
    );
    return {
      houseId,
      baseline: comparison.baseline,
      measures: rankMeasures(results),
      defaultsUsed,
      notes,
      inputsUsed: run.inputsUsed,
    };
  }

  private async prepare(
    user: AuthenticatedUser,
    houseId: number,
    body: SeasonRequestDto,
  ): Promise<{ input: EstimateSeasonInput; inputsUsed: SeasonInputsUsedDto; context: FarmSeasonContext; choice: HouseFuelChoice }> {
    const stored = await this.houses.loadFor(user, houseId, 'estimate:run');
    const farm = await this.inputs.farm(stored.farmId);
    const house = houseToSpec(stored);
    const context = await this.inputs.farmContext(farm, body, new Date());
    const choice = this.inputs.fuelChoice(house, await this.inputs.pricesOf(farm.id), body);
    const calendar = await this.inputs.calendarOf(houseId);
    const input: EstimateSeasonInput = {
      house,
      site: context.site,
      climate: context.climate,
      season: context.season,
      calendar,
      fuel: choice.fuel,
      heaterEfficiency: choice.heaterEfficiency,
    };
    const inputsUsed: SeasonInputsUsedDto = {
      ...this.inputs.runInputs(context, choice),
      startDate: context.season.startDate,
      endDate: context.season.endDate,
      seasonFrom: context.seasonFrom,
      calendarPeriodCount: calendar?.length ?? 0,
    };
    return { input, inputsUsed, context, choice };
  }
}
