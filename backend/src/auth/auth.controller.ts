import { Body, Controller, Get, HttpCode, Post, Req, Res } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { ApiBearerAuth, ApiCreatedResponse, ApiOkResponse, ApiTags, ApiTooManyRequestsResponse } from '@nestjs/swagger';
import type { Request, Response } from 'express';
import { CurrentUser, type AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { Public } from '../common/decorators/public.decorator';
import type { Environment } from '../config/environment';
import { DEMO_ACCOUNTS, DEMO_PASSWORD } from '../seed/demo-scenario';
import { UserDto } from '../users/dto/user.dto';
import { toUserDto, UsersService } from '../users/users.service';
import { AuthService } from './auth.service';
import { DemoAccountsDto, LoginDto, RegisterDto, SessionDto } from './dto/auth.dto';
import { LOGIN_WINDOW_MS, LoginLimiterService, TooManyAttemptsException } from './login-limiter/login-limiter.service';

/** Runs `work`; a limiter refusal also tells the client when to try again. */
async function withRetryAfter<T>(response: Response, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (error) {
    if (error instanceof TooManyAttemptsException) response.setHeader('Retry-After', String(LOGIN_WINDOW_MS / 1000));
    throw error;
  }
}

/** The client's address: behind a reverse proxy, as TRUST_PROXY lets Express read it. */
function clientAddress(request: Request): string {
  return request.ip ?? request.socket.remoteAddress ?? 'unknown';
}

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
