import { ParseIdPipe } from '../common/pipes/parse-id.pipe';
import { Body, Controller, Delete, Get, HttpCode, Param, Patch } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { SiteRoles } from '../common/decorators/site-roles.decorator';
import { AdminUpdateUserDto, DeleteMeDto, UpdateMeDto, UserDto } from './dto/user.dto';
import { UsersService } from './users.service';

@ApiTags('users')
@ApiBearerAuth()
@Controller('users')
export class UsersController {
  constructor(private readonly users: UsersService) {}

  @Patch('me')
  @ApiOkResponse({ type: UserDto })
  updateMe(@CurrentUser() me: AuthenticatedUser, @Body() body: UpdateMeDto): Promise<UserDto> {
    return this.users.updateMe(me.id, body);
  }

  @Delete('me')
  @HttpCode(204)
  @ApiNoContentResponse({ description: 'the account and its memberships are gone' })
  @ApiForbiddenResponse({ description: 'the password is not right' })
  @ApiConflictResponse({ description: 'the account is the only owner of a farm; the farms are named in details' })
  async removeMe(@CurrentUser() me: AuthenticatedUser, @Body() body: DeleteMeDto): Promise<void> {
    await this.users.removeMe(me.id, body.password);
  }

  @Get()
  @SiteRoles('admin')
  @ApiOkResponse({ type: UserDto, isArray: true })
  list(): Promise<UserDto[]> {
    return this.users.list();
  }

  @Patch(':id')
  @SiteRoles('admin')
  @ApiOkResponse({ type: UserDto })
  update(
    @CurrentUser() me: AuthenticatedUser,
    @Param('id', ParseIdPipe) id: number,
    @Body() body: AdminUpdateUserDto,
  ): Promise<UserDto> {
    return this.users.adminUpdate(me.id, id, body);
  }

  @Delete(':id')
  @HttpCode(204)
  @SiteRoles('admin')
  @ApiNoContentResponse()
  @ApiConflictResponse({ description: 'the account is the only owner of a farm; the farms are named in details' })
  async remove(@CurrentUser() me: AuthenticatedUser, @Param('id', ParseIdPipe) id: number): Promise<void> {
    await this.users.remove(me.id, id);
  }
}
