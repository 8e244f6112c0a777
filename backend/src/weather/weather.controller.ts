import { Controller, Get, Param, Post, Query } from '@nestjs/common';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import {
  ApiBadGatewayResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiGatewayTimeoutResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { TemperatureLogDto } from '../temperature-logs/dto/temperature-log.dto';
import { ClimateProposalDto, ClimateProposalQueryDto, WeatherSourceDto, WeatherYearStatusDto } from './dto/weather.dto';
import { WeatherService } from './weather.service';

@ApiTags('weather')
@ApiBearerAuth()
@Controller('farms/:farmId/weather')
export class WeatherController {
  constructor(private readonly weather: WeatherService) {}

  @Get()
  @ApiOkResponse({ type: WeatherSourceDto, description: 'where weather history comes from (stand-in or service)' })
  source(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
  ): Promise<WeatherSourceDto> {
    return this.weather.sourceForFarm(me, farmId);
  }

  @Post('years/:year')
  @ApiOkResponse({
    type: WeatherYearStatusDto,
    description: "one year of the farm's hourly weather, fetched and cached",
  })
  @ApiBadGatewayResponse({
    description: 'the weather service could not be reached or answered garbage; nothing stored',
  })
  @ApiGatewayTimeoutResponse({ description: 'the weather service did not answer in time; nothing stored' })
  fetchYear(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Param('year', ParseIdPipe) year: number,
  ): Promise<WeatherYearStatusDto> {
    return this.weather.fetchYear(me, farmId, year);
  }

  @Post('years/:year/temperature-log')
  @ApiCreatedResponse({
    type: TemperatureLogDto,
    description: "keeps one year of the history as a temperature log of the farm, for a season on that year's hours",
  })
  @ApiBadGatewayResponse({
    description: 'the weather service could not be reached or answered garbage; nothing stored',
  })
  keepAsLog(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Param('year', ParseIdPipe) year: number,
  ): Promise<TemperatureLogDto> {
    return this.weather.keepYearAsTemperatureLog(me, farmId, year);
  }

  @Get('climate-proposal')
  @ApiOkResponse({
    type: ClimateProposalDto,
    description: 'design temperatures and monthly normals from the years of hourly history (nothing is saved)',
  })
  @ApiBadGatewayResponse({ description: 'the weather service could not be reached or answered garbage' })
  proposal(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Query() query: ClimateProposalQueryDto,
  ): Promise<ClimateProposalDto> {
    return this.weather.proposeClimate(me, farmId, query.fromYear, query.toYear);
  }
}
