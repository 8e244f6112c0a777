import { Injectable, Logger, Module, OnModuleInit } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectConnection, SequelizeModule } from '@nestjs/sequelize';
import { mkdirSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { Sequelize } from 'sequelize-typescript';
import type { Environment } from '../config/environment';
import { FarmClimate } from '../climate/models/farm-climate.model';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import { HouseAlternative } from '../alternatives/models/house-alternative.model';
import { House } from '../houses/models/house.model';
import { FarmFuelPrice } from '../season/models/farm-fuel-price.model';
import { HouseCalendar } from '../season/models/house-calendar.model';
import { TemperatureLog } from '../temperature-logs/models/temperature-log.model';
import { User } from '../users/models/user.model';
import { createMigrator, prepareSqlite } from './migrator';

export const MODELS = [
  User,
  Farm,
  Membership,
  House,
  FarmClimate,
  TemperatureLog,
  HouseCalendar,
  FarmFuelPrice,
  HouseAlternative,
];

/** Brings the schema up to date before anything else touches the database. */
@Injectable()
class MigrationRunner implements OnModuleInit {
  private readonly logger = new Logger('Database');

  constructor(@InjectConnection() private readonly sequelize: Sequelize) {}

  async onModuleInit(): Promise<void> {
    await prepareSqlite(this.sequelize);
    const applied = await createMigrator(this.sequelize).up();
    if (applied.length > 0) this.logger.log(`applied migrations: ${applied.map((m) => m.name).join(', ')}`);
  }
}

@Module({
  imports: [
    SequelizeModule.forRootAsync({
      inject: [ConfigService],
      useFactory: (config: ConfigService<Environment, true>) => {
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
