import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { HouseDto } from '../houses/dto/house.dto';
import { AlternativesService } from './alternatives.service';
import {
  AdoptAlternativeResultDto,
  AlternativeDto,
  CreateAlternativeDto,
  DuplicateHouseDto,
  UpdateAlternativeDto,
} from './dto/alternative.dto';

const INVALID_422 =
  'the house with this patch would not be a valid house, or the patch names a field a house does not have (field named: patch.<field>)';

@ApiTags('alternatives')
@ApiBearerAuth()
@Controller()
export class AlternativesController {
  constructor(private readonly alternatives: AlternativesService) {}

  @Get('houses/:houseId/alternatives')
  @ApiOperation({
    summary:
      "A house's alternatives, each read against the house as it is now (house:read); one that no longer makes a valid house is listed with `invalid`",
  })
  @ApiOkResponse({ type: AlternativeDto, isArray: true })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  list(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
  ): Promise<AlternativeDto[]> {
    return this.alternatives.list(me, houseId);
  }

  @Post('houses/:houseId/alternatives')
  @ApiOperation({
    summary:
      'Save an alternative of the house: a patch, or the edited house from which the patch is taken (alternative:write: owners, growers and advisers)',
  })
  @ApiCreatedResponse({ type: AlternativeDto })
  @ApiForbiddenResponse({ description: 'role lacks alternative:write' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: INVALID_422 })
  create(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
    @Body() body: CreateAlternativeDto,
  ): Promise<AlternativeDto> {
    return this.alternatives.create(me, houseId, body);
  }

  @Get('alternatives/:alternativeId')
  @ApiOperation({ summary: 'One alternative, read against its house as it is now (house:read)' })
  @ApiOkResponse({ type: AlternativeDto })
  @ApiNotFoundResponse({ description: 'no such alternative, or not a member of its farm' })
  get(
    @CurrentUser() me: AuthenticatedUser,
    @Param('alternativeId', ParseIntPipe) alternativeId: number,
  ): Promise<AlternativeDto> {
    return this.alternatives.get(me, alternativeId);
  }

  @Patch('alternatives/:alternativeId')
  @ApiOperation({ summary: 'Rename, re-cost or change an alternative (alternative:write)' })
  @ApiOkResponse({ type: AlternativeDto })
  @ApiForbiddenResponse({ description: 'role lacks alternative:write' })
  @ApiNotFoundResponse({ description: 'no such alternative, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: INVALID_422 })
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('alternativeId', ParseIntPipe) alternativeId: number,
    @Body() body: UpdateAlternativeDto,
  ): Promise<AlternativeDto> {
    return this.alternatives.update(me, alternativeId, body);
  }

  @Delete('alternatives/:alternativeId')
  @HttpCode(204)
  @ApiOperation({ summary: 'Delete an alternative (alternative:write)' })
  @ApiNoContentResponse()
  @ApiForbiddenResponse({ description: 'role lacks alternative:write' })
  @ApiNotFoundResponse({ description: 'no such alternative, or not a member of its farm' })
  async remove(
    @CurrentUser() me: AuthenticatedUser,
    @Param('alternativeId', ParseIntPipe) alternativeId: number,
  ): Promise<void> {
    await this.alternatives.remove(me, alternativeId);
  }

  @Post('alternatives/:alternativeId/adopt')
  @HttpCode(200)
  @ApiOperation({
    summary:
      'Make this alternative the house, in one step (house:write: owners and growers); the house as it was is kept as an alternative',
  })
  @ApiOkResponse({ type: AdoptAlternativeResultDto })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such alternative, or not a member of its farm' })
  @ApiUnprocessableEntityResponse({ description: 'the alternative is not a valid house now (field named)' })
  adopt(
    @CurrentUser() me: AuthenticatedUser,
    @Param('alternativeId', ParseIntPipe) alternativeId: number,
  ): Promise<AdoptAlternativeResultDto> {
    return this.alternatives.adopt(me, alternativeId);
  }

  @Post('houses/:houseId/duplicate')
  @ApiOperation({
    summary: 'A copy of the house with its production calendar and alternatives (house:write on its farm)',
  })
  @ApiCreatedResponse({ type: HouseDto })
  @ApiForbiddenResponse({ description: 'role lacks house:write' })
  @ApiNotFoundResponse({ description: 'no such house, or not a member of its farm' })
  duplicate(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIntPipe) houseId: number,
    @Body() body: DuplicateHouseDto,
  ): Promise<HouseDto> {
    return this.alternatives.duplicate(me, houseId, body);
  }
}
