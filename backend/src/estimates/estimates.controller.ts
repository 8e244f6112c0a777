import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, HttpCode, Param, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { CoolingEstimateRequestDto, HouseCoolingEstimateRequestDto } from './dto/cooling-request.dto';
import { CoolingEstimateDto, HouseCoolingEstimateDto } from './dto/cooling-result.dto';
import { HeatingEstimateRequestDto, HouseHeatingEstimateRequestDto } from './dto/heating-request.dto';
import { HeatingEstimateDto, HouseHeatingEstimateDto } from './dto/heating-result.dto';
import { EstimatesService } from './estimates.service';

const ENGINE_422 =
  'the engine cannot compute with the input (e.g. ridge below eave, unknown reference id); field named';

/** Estimates compute and store nothing, so they answer 200, not 201. */
@ApiTags('estimates')
@ApiBearerAuth()
@Controller()
export class EstimatesController {
  constructor(private readonly estimates: EstimatesService) {}

  @Post('estimates')
  @HttpCode(200)
  @ApiOperation({ summary: 'Design-night heating estimate for a house described in the body' })
  @ApiOkResponse({ type: HeatingEstimateDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiUnprocessableEntityResponse({ description: ENGINE_422 })
  heating(@Body() body: HeatingEstimateRequestDto): HeatingEstimateDto {
    return this.estimates.heating(body);
  }

  @Post('estimates/cooling')
  @HttpCode(200)
  @ApiOperation({ summary: 'Summer ventilation and cooling estimate for a house and site described in the body' })
  @ApiOkResponse({ type: CoolingEstimateDto })
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiUnprocessableEntityResponse({ description: ENGINE_422 })
  cooling(@Body() body: CoolingEstimateRequestDto): CoolingEstimateDto {
    return this.estimates.cooling(body);
  }

  @Post('houses/:houseId/estimate')
  @HttpCode(200)
  @ApiOperation({
    summary:
      "Heating estimate for a stored house; unstated conditions come from the farm's climate, the farm, the house and reference data",
  })
  @ApiOkResponse({ type: HouseHeatingEstimateDto })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({
    description: `${ENGINE_422}; also when the farm has no climate and no designOutdoorC is given`,
  })
  heatingForHouse(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: HouseHeatingEstimateRequestDto,
  ): Promise<HouseHeatingEstimateDto> {
    return this.estimates.heatingForHouse(me, houseId, body.conditions);
  }

  @Post('houses/:houseId/cooling')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Cooling estimate for a stored house; unstated conditions come from the farm, its climate and reference data',
  })
  @ApiOkResponse({ type: HouseCoolingEstimateDto })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({
    description: `${ENGINE_422}; also when the farm has no climate and the summer design values are not given`,
  })
  coolingForHouse(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: HouseCoolingEstimateRequestDto,
  ): Promise<HouseCoolingEstimateDto> {
    return this.estimates.coolingForHouse(me, houseId, body.conditions);
  }
}
