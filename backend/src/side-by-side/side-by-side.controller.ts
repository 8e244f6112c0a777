import { Body, Controller, HttpCode, Param, ParseIntPipe, Post } from '@nestjs/common';
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
import { SideBySideDto, SideBySideRequestDto } from './dto/side-by-side.dto';
import { SideBySideService } from './side-by-side.service';

@ApiTags('alternatives')
@ApiBearerAuth()
@Controller()
export class SideBySideController {
  constructor(private readonly sideBySide: SideBySideService) {}

  @Post('houses/:houseId/side-by-side')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'The house and up to four of its alternatives, each with its design night, summer cooling, season, light and (for an alternative) saving and payback against the house (estimate:run)',
  })
  @ApiOkResponse({ type: SideBySideDto })
  @ApiBadRequestResponse({ description: 'body fails validation (e.g. more than four alternatives); details per field' })
  @ApiForbiddenResponse({ description: 'role lacks estimate:run' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({
    description:
      "the house's own column cannot be computed (no climate, no fuel price …) or an id is not one of the house's alternatives; field named. An alternative that is not valid now is a column with `invalid`, not an error",
  })
  compare(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
    @Body() body: SideBySideRequestDto,
  ): Promise<SideBySideDto> {
    return this.sideBySide.compare(me, houseId, body);
  }
}
