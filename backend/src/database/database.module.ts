import { Injectable, Logger, Module, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectConnection, SequelizeModule } from '@nestjs/sequelize';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { Sequelize } from 'sequelize-typescript';
import { LoginAttempt } from '../auth/login-limiter/login-attempt.model';
import type { Environment } from '../config/environment';
import { PasswordResetToken } from '../auth/models/password-reset-token.model';
import { FarmClimate } from '../climate/models/farm-climate.model';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import { HouseAlternative } from '../alternatives/models/house-alternative.model';
import { House } from '../houses/models/house.model';
import { Invitation } from '../invitations/models/invitation.model';
import { Report } from '../reports/models/report.model';
import { MailSend } from '../mail/models/mail-send.model';
import { ReceivedMail, ReceivedMailAttachment } from '../mail/models/received-mail.model';
import { FarmFuelPrice } from '../season/models/farm-fuel-price.model';
import { HouseCalendar } from '../season/models/house-calendar.model';
import { HouseMeasurePlan } from '../season/models/house-measure-plan.model';
import { TemperatureLog } from '../temperature-logs/models/temperature-log.model';
import { User } from '../users/models/user.model';
import { WeatherYear } from '../weather/models/weather-year.model';
import { migrateToLatest } from './migrator';
import { FuelRecord, FuelRecordHouse } from '../calibration/models/fuel-record.model';
import { SavedCalibration } from '../calibration/models/saved-calibration.model';

export const MODELS = [
  User,
  Farm,
  Membership,
  House,
  FarmClimate,
  TemperatureLog,
  HouseCalendar,
  HouseMeasurePlan,
  FarmFuelPrice,
  WeatherYear,
  FuelRecord,
  FuelRecordHouse,
  SavedCalibration,
  LoginAttempt,
  MailSend,
  ReceivedMail,
  ReceivedMailAttachment,
  PasswordResetToken,
  Invitation,
  Report,
  HouseAlternative,
];

/** Brings the schema up to date before anything else touches the database. */
@Injectable()
class MigrationRunner implements OnModuleInit {
  private readonly logger = new Logger('Database');

  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async onModuleInit(): Promise<void> {
    const applied = await migrateToLatest(this.sequelize);
    if (applied.length > 0) this.logger.log(`applied migrations: ${applied.join(', ')}`);
  }
}

@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => {
        const databaseUrl = config.get('DATABASE_URL', { infer: true });
        if (databaseUrl) {
          return {
            dialect: 'postgres' as const,
            uri: databaseUrl,
            models: MODELS,
            logging: false,
            synchronize: false,
            autoLoadModels: false,
            // An unreachable server fails a request (and /api/health) within seconds, not never.
            dialectOptions: { connectionTimeoutMillis: 5000 },
            pool: { max: 10, acquire: 10_000 },
          };
        }
        const storage = resolve(config.get('DATABASE_FILE', { infer: true }));
        mkdirSync(dirname(storage), { recursive: true });
        return {
          dialect: 'sqlite' as const,
          storage,
          models: MODELS,
          logging: false,
          // The schema comes from migrations only, never from the models.
          synchronize: false,
          autoLoadModels: false,
        };
      },
    }),
  ],
  providers: [MigrationRunner],
})
export class DatabaseModule {}
