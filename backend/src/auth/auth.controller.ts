import { Body, Controller, Get, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { Request, Response } from 'express';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiOperation,
  ApiTags,
  ApiTooManyRequestsResponse,
} from '@nestjs/swagger';
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
import { clientAddress, withRetryAfter } from './login-limiter/limited-request';
import { LoginLimiterService } from './login-limiter/login-limiter.service';

@ApiTags('auth')
@Controller('auth')
export class AuthController {
  constructor(
    private readonly auth: AuthService,
    private readonly users: UsersService,
    private readonly config: ConfigService<Environment, true>,
    private readonly limiter: LoginLimiterService,
  ) {}

  @Public()
  @Post('register')
  @ApiCreatedResponse({ type: SessionDto })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address' })
  register(
    @Body() body: RegisterDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admit(clientAddress(request));
      return this.auth.register(body);
    });
  }

  @Public()
  @Post('login')
  @HttpCode(200)
  @ApiOkResponse({ type: SessionDto })
  @ApiTooManyRequestsResponse({ description: 'Too many sign-in attempts from this address or on this account' })
  login(
    @Body() body: LoginDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admit(clientAddress(request), body.email);
      const session = await this.auth.login(body);
      await this.limiter.succeeded(body.email);
      return session;
    });
  }

  @Post('logout')
  @HttpCode(204)
  @ApiBearerAuth()
  async logout(@CurrentUser() me: AuthenticatedUser): Promise<void> {
    await this.auth.logout(me.id);
  }

  @Post('password')
  @HttpCode(200)
  @ApiBearerAuth()
  @ApiOperation({ summary: 'Change the password, knowing the current one; every other session is signed out' })
  @ApiOkResponse({ type: SessionDto, description: 'a new session for this browser' })
  @ApiBadRequestResponse({ description: 'current password wrong, or the new one refused (the reason is given)' })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address or on this account' })
  changePassword(
    @CurrentUser() me: AuthenticatedUser,
    @Body() body: ChangePasswordDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admitAction('password-change', clientAddress(request), me.email);
      return this.auth.changePassword(me.id, body);
    });
  }

  @Public()
  @Post('password-reset/request')
  @HttpCode(202)
  @ApiOperation({
    summary: 'E-mail a one-hour, single-use reset link; the same answer whether or not the account exists',
  })
  @ApiOkResponse({ type: MessageDto })
  @ApiTooManyRequestsResponse({ description: 'Too many requests from this address or for this e-mail address' })
  requestPasswordReset(
    @Body() body: PasswordResetRequestDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<MessageDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admitAction('password-reset-request', clientAddress(request), body.email);
      return this.auth.requestPasswordReset(body);
    });
  }

  @Public()
  @Post('password-reset')
  @HttpCode(200)
  @ApiOperation({ summary: 'Set a new password with a reset token; every session of the account is signed out' })
  @ApiOkResponse({ type: SessionDto, description: 'signed in with the new password' })
  @ApiBadRequestResponse({ description: 'link used, expired or unknown; or the new password refused' })
  @ApiTooManyRequestsResponse({ description: 'Too many attempts from this address' })
  resetPassword(
    @Body() body: PasswordResetDto,
    @Req() request: Request,
    @Res({ passthrough: true }) response: Response,
  ): Promise<SessionDto> {
    return withRetryAfter(response, async () => {
      await this.limiter.admitAction('password-reset', clientAddress(request));
      return this.auth.resetPassword(body);
    });
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
