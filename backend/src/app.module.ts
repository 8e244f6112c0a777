import { Module } from '@nestjs/common';
import { ConfigModule } from '@nestjs/config';
import { APP_GUARD } from '@nestjs/core';
import { ServeStaticModule } from '@nestjs/serve-static';
import { existsSync } from 'node:fs';
import { resolve } from 'node:path';
import { AlternativesModule } from './alternatives/alternatives.module';
import { AuthModule } from './auth/auth.module';
import { ClimateModule } from './climate/climate.module';
import { JwtAuthGuard } from './common/guards/jwt-auth.guard';
import { SiteRolesGuard } from './common/guards/site-roles.guard';
import { validateEnvironment } from './config/environment';
import { DatabaseModule } from './database/database.module';
import { EstimatesModule } from './estimates/estimates.module';
import { FarmsModule } from './farms/farms.module';
import { HealthController } from './health/health.controller';
import { HousesModule } from './houses/houses.module';
import { ReferenceDataModule } from './reference-data/reference-data.module';
import { SeasonModule } from './season/season.module';
import { SeedModule } from './seed/seed.module';
import { SideBySideModule } from './side-by-side/side-by-side.module';
import { UsersModule } from './users/users.module';

/** The built frontend, served at / by the same process as the API. */
function frontendDist(): string {
  return resolve(process.env.FRONTEND_DIST || resolve(__dirname, '..', '..', 'frontend', 'dist'));
}

const staticFrontend = existsSync(frontendDist())
  ? [ServeStaticModule.forRoot({ rootPath: frontendDist(), exclude: ['/api/{*path}'] })]
  : [];

@Module({
  imports: [
    ConfigModule.forRoot({ isGlobal: true, ignoreEnvFile: true, validate: validateEnvironment }),
    DatabaseModule,
    ReferenceDataModule,
    UsersModule,
    AuthModule,
    FarmsModule,
    HousesModule,
    ClimateModule,
    EstimatesModule,
    SeasonModule,
    AlternativesModule,
    SideBySideModule,
    SeedModule,
    ...staticFrontend,
  ],
  controllers: [HealthController],
  providers: [
    { provide: APP_GUARD, useClass: JwtAuthGuard },
    { provide: APP_GUARD, useClass: SiteRolesGuard },
  ],
})
export class AppModule {}
