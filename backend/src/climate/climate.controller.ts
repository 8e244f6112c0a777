import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Get, Headers, Param, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import { ClimateService } from './climate.service';
import { FarmClimateDto, SiteClimateDto } from './dto/climate.dto';

@ApiTags('climate')
@ApiBearerAuth()
@Controller('farms/:farmId/climate')
export class ClimateController {
  constructor(private readonly climate: ClimateService) {}

  @Get()
  @ApiOkResponse({ type: FarmClimateDto })
  get(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<FarmClimateDto> {
    return this.climate.get(me, farmId);
  }

  @Put()
  @ApiOkResponse({ type: FarmClimateDto })
  @ApiVersionedWrite('climate')
  @ApiUnprocessableEntityResponse({
    description: 'physically impossible climate (e.g. minimum above maximum), field named',
  })
  put(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: SiteClimateDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<FarmClimateDto> {
    return this.climate.put(me, farmId, body, ifMatch);
  }
}
