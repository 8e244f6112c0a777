import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
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
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('houseId', ParseIdPipe) houseId: number,
    @Body() body: UpdateHouseDto,
  ): Promise<HouseDto> {
    return this.houses.update(me, houseId, body);
  }

  @Delete('houses/:houseId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('houseId', ParseIdPipe) houseId: number): Promise<void> {
    await this.houses.remove(me, houseId);
  }
}
