import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Get, Header, Headers, HttpCode, Param, Post, Put, Query, Res } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiExtraModels,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiProduces,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import type { Response } from 'express';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import { budgetCsv } from './budget-csv';
import { CalendarService } from './calendar.service';
import { ProductionCalendarDto, PutProductionCalendarDto } from './dto/calendar.dto';
import { FarmFuelPricesDto, PutFuelPricesDto } from './dto/fuel-price.dto';
import { SeasonBudgetDto } from './dto/season-budget.dto';
import {
  MeasuresRequestDto,
  NightDemandRequestDto,
  SeasonBudgetCsvQueryDto,
  SeasonBudgetRequestDto,
  SeasonRequestDto,
  TemperatureLogClimateSourceDto,
} from './dto/season-request.dto';
import { MeasureComparisonDto } from './dto/measure-result.dto';
import { HouseNightDemandDto, HouseSeasonEstimateDto } from './dto/season-result.dto';
import { FuelPricesService } from './fuel-prices.service';
import { SeasonBudgetService } from './season-budget.service';
import { SeasonService } from './season.service';

const SEASON_422 =
  'the engine cannot compute with the input, field named: no climate and no log (climateSource), a house without heaters (fuelId), a log that does not cover the dates (climateSource), a season over 366 days (endDate) …; a missing fuel price is no error (heat and fuel, costs null)';

/** Season calculations compute and store nothing, so they answer 200, not 201. */
@ApiTags('season')
@ApiBearerAuth()
@ApiExtraModels(TemperatureLogClimateSourceDto)
@Controller()
export class SeasonController {
  constructor(
    private readonly season: SeasonService,
    private readonly budgets: SeasonBudgetService,
    private readonly calendars: CalendarService,
    private readonly fuelPrices: FuelPricesService,
  ) {}

  @Post('houses/:houseId/season')
  @HttpCode(200)
  @ApiOperation({
    summary:
      "A house's heating season hour by hour: energy, fuel and cost by month, with a degree-day cross-check (estimate:run)",
  })
  @ApiOkResponse({ type: HouseSeasonEstimateDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: SEASON_422 })
  seasonOfHouse(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: SeasonRequestDto,
  ): Promise<HouseSeasonEstimateDto> {
    return this.season.season(me, houseId, body);
  }

  @Post('houses/:houseId/night-demand')
  @HttpCode(200)
  @ApiOperation({ summary: 'Heat, fuel and cost of one night, sunset to sunrise, hour by hour (estimate:run)' })
  @ApiOkResponse({ type: HouseNightDemandDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: SEASON_422 })
  nightDemand(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: NightDemandRequestDto,
  ): Promise<HouseNightDemandDto> {
    return this.season.nightDemand(me, houseId, body);
  }

  @Post('houses/:houseId/measures')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Energy measures ranked by simple payback, each re-running the season (estimate:run); an empty list compares the defaults',
  })
  @ApiOkResponse({ type: MeasureComparisonDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: `${SEASON_422}; measures[i].field for a measure's settings` })
  measures(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: MeasuresRequestDto,
  ): Promise<MeasureComparisonDto> {
    return this.season.measures(me, houseId, body);
  }

  @Get('houses/:houseId/calendar')
  @ApiOperation({
    summary: "The house's production calendar (house:read); no periods = heated all season at the house setpoints",
  })
  @ApiOkResponse({ type: ProductionCalendarDto })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  getCalendar(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
  ): Promise<ProductionCalendarDto> {
    return this.calendars.get(me, houseId);
  }

  @Put('houses/:houseId/calendar')
  @ApiOperation({ summary: "Replace the house's production calendar (house:write)" })
  @ApiOkResponse({ type: ProductionCalendarDto })
  @ApiVersionedWrite('calendar')
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({
    description: 'an impossible date such as 02-30, field named (periods[i].startMonthDay)',
  })
  putCalendar(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: PutProductionCalendarDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<ProductionCalendarDto> {
    return this.calendars.put(me, houseId, body, ifMatch);
  }

  @Get('farms/:farmId/fuel-prices')
  @ApiOperation({ summary: "The farm's fuel prices, one per fuel (farm:read)" })
  @ApiOkResponse({ type: FarmFuelPricesDto })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  getFuelPrices(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
  ): Promise<FarmFuelPricesDto> {
    return this.fuelPrices.get(me, farmId);
  }

  @Put('farms/:farmId/fuel-prices')
  @ApiOperation({
    summary: "Replace the farm's fuel prices (house:write: owners and growers, who hold the fuel bills)",
  })
  @ApiOkResponse({ type: FarmFuelPricesDto })
  @ApiVersionedWrite('fuel prices')
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiUnprocessableEntityResponse({ description: 'unknown fuel or a fuel listed twice (prices.i.fuelId)' })
  putFuelPrices(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: PutFuelPricesDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<FarmFuelPricesDto> {
    return this.fuelPrices.put(me, farmId, body, ifMatch);
  }

  @Post('farms/:farmId/season-budget')
  @HttpCode(200)
  @ApiOperation({ summary: "The farm's season fuel budget: every house, totals per fuel and per month (farm:read)" })
  @ApiOkResponse({ type: SeasonBudgetDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiUnprocessableEntityResponse({ description: SEASON_422 })
  budget(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: SeasonBudgetRequestDto,
  ): Promise<SeasonBudgetDto> {
    return this.budgets.budget(me, farmId, body);
  }

  @Get('farms/:farmId/season-budget.csv')
  @Header('Content-Type', 'text/csv; charset=utf-8')
  @ApiOperation({
    summary: 'The season budget as CSV: one row per house per month, totals, units named in the header (farm:read)',
  })
  @ApiProduces('text/csv')
  @ApiOkResponse({ description: 'CSV file (attachment)', schema: { type: 'string' } })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiUnprocessableEntityResponse({ description: SEASON_422 })
  async budgetCsv(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Query() query: SeasonBudgetCsvQueryDto,
    @Res({ passthrough: true }) response: Response,
  ): Promise<string> {
    const units = query.units ?? 'si';
    const budget = await this.budgets.budget(me, farmId, {
      startDate: query.startDate,
      endDate: query.endDate,
      climateSource: query.temperatureLogId ? { temperatureLogId: query.temperatureLogId } : undefined,
      heatLossBasis: query.heatLossBasis,
    });
    const basis = budget.heatLossBasis === 'handbook' ? '' : `-as-calibrated`;
    const filename = `season-budget-farm-${farmId}-${budget.startDate}-to-${budget.endDate}${basis}-${units}.csv`;
    response.setHeader('Content-Disposition', `attachment; filename="${filename}"`);
    return budgetCsv(budget, units);
  }
}
