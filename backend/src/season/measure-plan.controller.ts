import { Body, Controller, Get, Headers, Param, Put } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import { MeasurePlanDto, PutMeasurePlanDto } from './dto/measure-plan.dto';
import { MeasurePlanService } from './measure-plan.service';

@ApiTags('season')
@ApiBearerAuth()
@Controller('houses/:houseId/measure-plan')
export class MeasurePlanController {
  constructor(private readonly plans: MeasurePlanService) {}

  @Get()
  @ApiOperation({ summary: 'The measures kept with the house, with their costs (house:read)' })
  @ApiOkResponse({ type: MeasurePlanDto })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  get(@CurrentUser() me: AuthenticatedUser, @Param('houseId', ParseIdPipe) houseId: number): Promise<MeasurePlanDto> {
    return this.plans.get(me, houseId);
  }

  @Put()
  @ApiOperation({ summary: 'Keep these measures and costs with the house (house:write)' })
  @ApiOkResponse({ type: MeasurePlanDto })
  @ApiVersionedWrite('measure plan')
  @ApiBadRequestResponse({ description: 'body fails validation; details per field' })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  put(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: PutMeasurePlanDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<MeasurePlanDto> {
    return this.plans.put(me, houseId, body, ifMatch);
  }
}
