import { Body, Controller, Get, HttpCode, Post, UseGuards } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
import { ThrottlerGuard } from '@nestjs/throttler';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import type { Environment } from '../config/environment';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../seed/demo-scenario';
import { UserDto } from '../users/dto/user.dto';
import { toUserDto, UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import {
  ChangePasswordDto,
  DemoAccountsDto,
  LoginDto,
  MessageDto,
  PasswordResetDto,
  PasswordResetRequestDto,
  RegisterDto,
  SessionDto,
} from './dto/auth.dto';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly config: ConfigService<Environment, true>,
  ) {}

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('register')
  @ApiCreatedResponse({ type: SessionDto })
  register(@Body() body: RegisterDto): Promise<SessionDto> {
    return this.auth.register(body);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('login')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionDto })
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address' })
  login(@Body() body: LoginDto): Promise<SessionDto> {
    return this.auth.login(body);
  }

  @Post('logout')
  @HttpCode(204)
  @ApiBearerAuth()
  async logout(@CurrentUser() me: AuthenticatedUser): Promise<void> {
    await this.auth.logout(me.id);
  }

  @Post('password')
  @UseGuards(ThrottlerGuard)
  @HttpCode(200)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Change the password, knowing the current one; every other session is signed out' })
  @ApiOkResponse({ type: SessionDto, description: 'a new session for this browser' })
  @ApiBadRequestResponse({ description: 'current password wrong, or the new one refused (the reason is given)' })
  changePassword(@CurrentUser() me: AuthenticatedUser, @Body() body: ChangePasswordDto): Promise<SessionDto> {
    return this.auth.changePassword(me.id, body);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('password-reset/request')
  @HttpCode(202)
  @ApiOperation({
    summary: 'E-mail a one-hour, single-use reset link; the same answer whether or not the account exists',
  })
  @ApiOkResponse({ type: MessageDto })
  requestPasswordReset(@Body() body: PasswordResetRequestDto): Promise<MessageDto> {
    return this.auth.requestPasswordReset(body);
  }

  @Public()
  @UseGuards(ThrottlerGuard)
  @Post('password-reset')
  @HttpCode(200)
  @ApiOperation({ summary: 'Set a new password with a reset token; every session of the account is signed out' })
  @ApiOkResponse({ type: SessionDto, description: 'signed in with the new password' })
  @ApiBadRequestResponse({ description: 'link used, expired or unknown; or the new password refused' })
  resetPassword(@Body() body: PasswordResetDto): Promise<SessionDto> {
    return this.auth.resetPassword(body);
  }

  @Get('me')
  @ApiBearerAuth()
  @ApiOkResponse({ type: UserDto })
  async me(@CurrentUser() me: AuthenticatedUser): Promise<UserDto> {
    return toUserDto(await this.users.findById(me.id));
  }

  @Public()
  @Get('demo-accounts')
  @ApiOkResponse({ type: DemoAccountsDto })
  demoAccounts(): DemoAccountsDto {
    const enabled = this.config.get('DEMO_SEED', { infer: true });
    return {
      enabled,
      password: enabled ? DEMO_PASSWORD : null,
      accounts: enabled ? DEMO_ACCOUNTS.map(({ email, name, description }) => ({ email, name, description })) : [],
    };
  }
}
