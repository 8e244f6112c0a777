import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Delete, Get, Headers, HttpCode, Param, Patch, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ROLE_PERMISSIONS } from '../common/permissions';
import { ApiVersionedWrite, IF_MATCH_HEADER } from '../common/versioning';
import { CreateFarmDto, FarmDto, MemberDto, PermissionsDto, UpdateFarmDto, UpdateMemberDto } from './dto/farm.dto';
import { FarmsService } from './farms.service';

@ApiTags('farms')
@ApiBearerAuth()
@Controller()
export class FarmsController {
  constructor(private readonly farms: FarmsService) {}

  @Get('permissions')
  @ApiOkResponse({ type: PermissionsDto })
  permissions(): PermissionsDto {
    return {
      roles: {
        owner: [...ROLE_PERMISSIONS.owner],
        grower: [...ROLE_PERMISSIONS.grower],
        adviser: [...ROLE_PERMISSIONS.adviser],
        viewer: [...ROLE_PERMISSIONS.viewer],
      },
    };
  }

  @Get('farms')
  @ApiOkResponse({ type: FarmDto, isArray: true })
  list(@CurrentUser() me: AuthenticatedUser): Promise<FarmDto[]> {
    return this.farms.list(me);
  }

  @Post('farms')
  @ApiCreatedResponse({ type: FarmDto })
  create(@CurrentUser() me: AuthenticatedUser, @Body() body: CreateFarmDto): Promise<FarmDto> {
    return this.farms.create(me, body);
  }

  @Get('farms/:farmId')
  @ApiOkResponse({ type: FarmDto })
  get(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<FarmDto> {
    return this.farms.get(me, farmId);
  }

  @Patch('farms/:farmId')
  @ApiOkResponse({ type: FarmDto })
  @ApiVersionedWrite('farm')
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Body() body: UpdateFarmDto,
    @Headers(IF_MATCH_HEADER) ifMatch?: string,
  ): Promise<FarmDto> {
    return this.farms.update(me, farmId, body, ifMatch);
  }

  @Delete('farms/:farmId')
  @HttpCode(204)
  @ApiNoContentResponse()
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<void> {
    await this.farms.remove(me, farmId);
  }

  @Get('farms/:farmId/members')
  @ApiOkResponse({ type: MemberDto, isArray: true })
  members(@CurrentUser() me: AuthenticatedUser, @Param('farmId', ParseIdPipe) farmId: number): Promise<MemberDto[]> {
    return this.farms.members(me, farmId);
  }

  @Patch('farms/:farmId/members/:userId')
  @ApiOkResponse({ type: MemberDto })
  @ApiConflictResponse({ description: 'the member is the farm’s last owner' })
  updateMember(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Param('userId', ParseIdPipe) userId: number,
    @Body() body: UpdateMemberDto,
  ): Promise<MemberDto> {
    return this.farms.updateMember(me, farmId, userId, body);
  }

  @Delete('farms/:farmId/members/:userId')
  @HttpCode(204)
  @ApiNoContentResponse()
  @ApiConflictResponse({ description: 'the member is the farm’s last owner' })
  async removeMember(
    @CurrentUser() me: AuthenticatedUser,
    @Param('farmId', ParseIdPipe) farmId: number,
    @Param('userId', ParseIdPipe) userId: number,
  ): Promise<void> {
    await this.farms.removeMember(me, farmId, userId);
  }
}
