import { Injectable, Logger, OnApplicationBootstrap } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { InjectConnection } from '@nestjs/sequelize';
import * as bcrypt from 'bcryptjs';
import { Sequelize } from 'sequelize-typescript';
import { BCRYPT_ROUNDS } from '../auth/auth.service';
import type { Environment } from '../config/environment';
import { withStartupLock } from '../database/migrator';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import { House } from '../houses/models/house.model';
import { User } from '../users/models/user.model';
import { FarmClimate } from '../climate/models/farm-climate.model';
import { FarmFuelPrice } from '../season/models/farm-fuel-price.model';
import { HouseCalendar } from '../season/models/house-calendar.model';
import {
  DEMO_ACCOUNTS,
  DEMO_CALENDARS,
  DEMO_CLIMATE,
  DEMO_FARM,
  DEMO_FUEL_PRICES,
  DEMO_HOUSES,
  DEMO_PASSWORD,
} from './demo-scenario';

/** Seeds the invented demo scenario once, on a database that has no demo accounts yet. */
@Injectable()
export class DemoSeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger('DemoSeed');

  constructor(
    private readonly config: ConfigService<Environment, true>,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    if (!this.config.get('DEMO_SEED', { infer: true })) return;
    // Several instances may start at once on one PostgreSQL database: one of them seeds.
    await withStartupLock(this.sequelize, async () => {
      if (await User.count({ where: { email: DEMO_ACCOUNTS[0].email } })) return;
      await this.seed();
      this.logger.log(`seeded the demo scenario (sign in as grower@example.com / ${DEMO_PASSWORD})`);
    });
  }

  async seed(): Promise<void> {
    const passwordHash = await bcrypt.hash(DEMO_PASSWORD, BCRYPT_ROUNDS);
    await this.sequelize.transaction(async (transaction) => {
      const farm = await Farm.create({ ...DEMO_FARM }, { transaction });
      await FarmClimate.create({ ...DEMO_CLIMATE, farmId: farm.id }, { transaction });
      for (const account of DEMO_ACCOUNTS) {
        const user = await User.create(
          { email: account.email, name: account.name, passwordHash, siteRole: account.siteRole },
          { transaction },
        );
        if (account.farmRole) {
          await Membership.create({ farmId: farm.id, userId: user.id, role: account.farmRole }, { transaction });
        }
      }
      for (const house of DEMO_HOUSES) {
        const row = await House.create({ ...house, farmId: farm.id }, { transaction });
        const periods = DEMO_CALENDARS[house.name];
        if (periods) await HouseCalendar.create({ houseId: row.id, periods }, { transaction });
      }
      for (const price of DEMO_FUEL_PRICES) {
        await FarmFuelPrice.create({ ...price, farmId: farm.id }, { transaction });
      }
    });
  }
}
