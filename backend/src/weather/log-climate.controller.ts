import { Controller, Get, Param } from '@nestjs/common';
import { ApiBearerAuth, ApiOkResponse, ApiTags, ApiUnprocessableEntityResponse } from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { LogClimateProposalDto } from './dto/log-climate.dto';
import { LogClimateService } from './log-climate.service';

@ApiTags('climate')
@ApiBearerAuth()
@Controller('farms/:farmId/temperature-logs/:logId/climate-proposal')
export class LogClimateController {
  constructor(private readonly proposals: LogClimateService) {}

  @Get()
  @ApiOkResponse({
    type: LogClimateProposalDto,
    description:
      "design temperatures and monthly normals from a year or more of the farm's hourly log (nothing is saved)",
  })
  @ApiUnprocessableEntityResponse({
    description: 'the log is daily, covers less than a year of hours, or has more than 10 % of its hours missing',
  })
  proposal(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Param('logId', ParseIdPipe) logId: number,
  ): Promise<LogClimateProposalDto> {
    return this.proposals.propose(me, farmId, logId);
  }
}
