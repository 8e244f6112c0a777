import { Module } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { JwtModule } from '@nestjs/jwt';
import { PassportModule } from '@nestjs/passport';
import { getModelToken, SequelizeModule } from '@nestjs/sequelize';
import type { Environment } from '../config/environment';
import { MailModule } from '../mail/mail.module';
import { UsersModule } from '../users/users.module';
import { PasswordResetToken } from './models/password-reset-token.model';
import { AuthController } from './auth.controller';
import { AuthService } from './auth.service';
import { JwtStrategy } from './jwt.strategy';
import {
  DatabaseLoginAttemptStore,
  MemoryLoginAttemptStore,
  type LoginAttemptStore,
} from './login-limiter/login-attempt-store';
import { LoginAttempt } from './login-limiter/login-attempt.model';
import { LOGIN_ATTEMPT_STORE, LOGIN_WINDOW_MS, LoginLimiterService } from './login-limiter/login-limiter.service';

@Module({
  imports: [
    UsersModule,
    MailModule,
    SequelizeModule.forFeature([PasswordResetToken]),
    PassportModule,
    JwtModule.registerAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => ({
        secret: config.get('JWT_SECRET', { infer: true }),
        signOptions: { expiresIn: config.get('JWT_EXPIRES_IN_SECONDS', { infer: true }) },
      }),
    }),
    SequelizeModule.forFeature([LoginAttempt]),
  ],
  controllers: [AuthController],
  providers: [
    AuthService,
    JwtStrategy,
    LoginLimiterService,
    {
      // LOGIN_LIMITER_STORE: memory for one instance, database when several share a database.
      provide: LOGIN_ATTEMPT_STORE,
      inject: [ConfigService, getModelToken(LoginAttempt)],
      useFactory: (config: ConfigService<Environment, true>, model: typeof LoginAttempt): LoginAttemptStore =>
        config.get('LOGIN_LIMITER_STORE', { infer: true }) === 'database'
          ? new DatabaseLoginAttemptStore(model, LOGIN_WINDOW_MS)
          : new MemoryLoginAttemptStore(LOGIN_WINDOW_MS),
    },
  ],
  exports: [AuthService, LoginLimiterService],
})
export class AuthModule {}
