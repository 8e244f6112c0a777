import { Controller, Get, Param, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { CalibrationService } from './calibration.service';
import { CalibrationDto } from './dto/calibration.dto';

@ApiTags('calibrations')
@ApiBearerAuth()
@Controller()
export class CalibrationController {
  constructor(private readonly calibration: CalibrationService) {}

  @Post('farms/:farmId/calibrations')
  @ApiOperation({
    summary:
      "Fit each meter's heat-loss factor to the farm's fuel records and save it with its inputs (house:write); run again when new bills arrive",
  })
  @ApiCreatedResponse({ type: CalibrationDto })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  @ApiUnprocessableEntityResponse({
    description:
      'no factor could be fitted (fewer than three bills with heating per meter, no climate for a bill …); the message says why',
  })
  run(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<CalibrationDto> {
    return this.calibration.run(me, farmId);
  }

  @Get('farms/:farmId/calibrations')
  @ApiOperation({
    summary: "The farm's saved calibrations, newest first (the first is the one estimates use) (farm:read)",
  })
  @ApiOkResponse({ type: CalibrationDto, isArray: true })
  @ApiNotFoundResponse({ description: 'no such farm, or not a member' })
  list(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<CalibrationDto[]> {
    return this.calibration.list(me, farmId);
  }

  @Get('calibrations/:calibrationId')
  @ApiOperation({ summary: 'One saved calibration (farm:read)' })
  @ApiOkResponse({ type: CalibrationDto })
  @ApiNotFoundResponse({ description: 'no such calibration, or not a member of its farm' })
  get(
    @CurrentUser() me: AuthenticatedUser,
    @Param('calibrationId', ParseIdPipe) calibrationId: number,
  ): Promise<CalibrationDto> {
    return this.calibration.get(me, calibrationId);
  }
}
