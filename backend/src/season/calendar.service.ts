import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { validateCalendar } from '@thermbay/engine/season/production-calendar';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { HousesService } from '../houses/houses.service';
import { House } from '../houses/models/house.model';
import type { ProductionCalendarDto, PutProductionCalendarDto } from './dto/calendar.dto';
import { HouseCalendar, type StoredProductionPeriod } from './models/house-calendar.model';

/** Keeps only the fields a period has (no undefined keys in the stored JSON). */
function cleanPeriod(period: StoredProductionPeriod): StoredProductionPeriod {
  const clean: StoredProductionPeriod = {
    startMonthDay: period.startMonthDay,
    endMonthDay: period.endMonthDay,
    mode: period.mode,
  };
  if (period.dayHeatingC !== undefined && period.dayHeatingC !== null) clean.dayHeatingC = period.dayHeatingC;
  if (period.nightHeatingC !== undefined && period.nightHeatingC !== null) clean.nightHeatingC = period.nightHeatingC;
  if (period.label) clean.label = period.label;
  return clean;
}

/** A house's production calendar: which parts of the year it is heated, and to what setpoints. */
@Injectable()
export class CalendarService {
  constructor(
    @InjectModel(HouseCalendar) private readonly calendars: typeof HouseCalendar,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly houses: HousesService,
  ) {}

  async get(user: AuthenticatedUser, houseId: number): Promise<ProductionCalendarDto> {
    await this.houses.loadFor(user, houseId, 'house:read');
    return toCalendarDto(houseId, await this.calendars.findOne({ where: { houseId } }));
  }

  /**
   * Saves the calendar: creates it on the first save, replaces it after (an upsert inside one
   * transaction that holds the house row, so parallel first saves never collide). If-Match names
   * the version loaded, 0 before the first save.
   */
  async put(
    user: AuthenticatedUser,
    houseId: number,
    body: PutProductionCalendarDto,
    ifMatch?: string,
  ): Promise<ProductionCalendarDto> {
    await this.houses.loadFor(user, houseId, 'house:write');
    const periods = body.periods.map(cleanPeriod);
    // Dates such as 02-30 pass the MM-DD pattern; the engine's check names the period.
    validateCalendar(periods, 'periods');
    // Body errors first (they do not depend on what is stored), then the version.
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      await House.findByPk(houseId, { transaction, lock: transaction.LOCK.UPDATE });
      const existing = await this.calendars.findOne({ where: { houseId }, transaction });
      const current = toCalendarDto(houseId, existing);
      if (existing && changesNothing({ periods: current.periods }, { periods })) return current;
      assertVersion(current.version, expected, () => current);
      const row = existing
        ? await existing.update({ periods, version: existing.version + 1 }, { transaction })
        : await this.calendars.create({ houseId, periods, version: 1 }, { transaction });
      return toCalendarDto(houseId, row);
    });
  }
}

function toCalendarDto(houseId: number, row: HouseCalendar | null): ProductionCalendarDto {
  return { houseId, periods: (row?.periods ?? []).map(cleanPeriod), version: row?.version ?? 0 };
}
