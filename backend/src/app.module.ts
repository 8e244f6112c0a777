import { type DynamicModule, Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { AlternativesModule } from './alternatives/alternatives.module';
import { AuthModule } from './auth/auth.module';
import { CalibrationModule } from './calibration/calibration.module';
import { ClimateModule } from './climate/climate.module';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { SiteRolesGuard } from './common/guards/site-roles.guard';
import { validateEnvironment } from './config/environment';
import { DatabaseModule } from './database/database.module';
import { EstimatesModule } from './estimates/estimates.module';
import { FarmsModule } from './farms/farms.module';
import { HealthController } from './health/health.controller';
import { HousesModule } from './houses/houses.module';
import { InvitationsModule } from './invitations/invitations.module';
import { MailModule } from './mail/mail.module';
import { ReportsModule } from './reports/reports.module';
import { ReferenceDataModule } from './reference-data/reference-data.module';
import { SeasonModule } from './season/season.module';
import { SeedModule } from './seed/seed.module';
import { SideBySideModule } from './side-by-side/side-by-side.module';
import { UsersModule } from './users/users.module';
import { WeatherModule } from './weather/weather.module';

/** The built frontend, served at / by the same process as the API. */
function frontendDist(): string {
  return resolve(process.env.FRONTEND_DIST || resolve(__dirname, '..', '..', 'frontend', 'dist'));
}

const staticFrontend = existsSync(frontendDist())
  ? [ServeStaticModule.forRoot({ rootPath: frontendDist(), exclude: ['/api/{*path}'] })]
  : [];

@Module({
  imports: [
    DatabaseModule,
    ReferenceDataModule,
    MailModule,
    UsersModule,
    AuthModule,
    FarmsModule,
    InvitationsModule,
    HousesModule,
    ClimateModule,
    EstimatesModule,
    SeasonModule,
    WeatherModule,
    ReportsModule,
    AlternativesModule,
    SideBySideModule,
    CalibrationModule,
    SeedModule,
    ...staticFrontend,
  ],
  controllers: [HealthController],
  providers: [
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: SiteRolesGuard },
  ],
})
export class AppModule {
  /**
   * The application configured from `env` (the process environment by default), validated now.
   * Each call builds its own configuration, so two apps in one process (the e2e tests) never
   * share one by accident, and nothing is written back into `process.env`.
   */
  static forRoot(env: Record<string, string | undefined> = process.env): DynamicModule {
    const environment = validateEnvironment(env);
    return {
      module: AppModule,
      imports: [
        ConfigModule.forRoot({
          isGlobal: true,
          ignoreEnvFile: true,
          validatePredefined: false,
          skipProcessEnv: true,
          load: [() => ({ ...environment })],
        }),
      ],
    };
  }
}
