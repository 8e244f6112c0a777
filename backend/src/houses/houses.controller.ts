import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Delete, Get, Headers, HttpCode, Param, Patch, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import { CreateHouseDto, HouseDto, UpdateHouseDto } from './dto/house.dto';
import { HousesService } from './houses.service';

@ApiTags('houses')
@ApiBearerAuth()
@Controller()
export class HousesController {
  constructor(private readonly houses: HousesService) {}

  @Get('farms/:farmId/houses')
  @ApiOkResponse({ type: HouseDto, isArray: true })
  list(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<HouseDto[]> {
    return this.houses.list(me, farmId);
  }

  @Post('farms/:farmId/houses')
  @ApiCreatedResponse({ type: HouseDto })
  @ApiUnprocessableEntityResponse({
    description: 'dimensions the engine cannot compute with, or an unknown reference id',
  })
  create(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: CreateHouseDto,
  ): Promise<HouseDto> {
    return this.houses.create(me, farmId, body);
  }

  @Get('houses/:houseId')
  @ApiOkResponse({ type: HouseDto })
  get(@CurrentUser() me: AuthenticatedUser, @Param('houseId', ParseIdPipe) houseId: number): Promise<HouseDto> {
    return this.houses.get(me, houseId);
  }

  @Patch('houses/:houseId')
  @ApiOkResponse({ type: HouseDto })
  @ApiVersionedWrite('house')
  @ApiUnprocessableEntityResponse({
    description: 'the house as it would be after the change is one the engine cannot compute with',
  })
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: UpdateHouseDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<HouseDto> {
    return this.houses.update(me, houseId, body, ifMatch);
  }

  @Delete('houses/:houseId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('houseId', ParseIdPipe) houseId: number): Promise<void> {
    await this.houses.remove(me, houseId);
  }
}
