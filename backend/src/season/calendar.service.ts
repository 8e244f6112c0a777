import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { validateCalendar } from '@thermbay/engine/season/production-calendar';
import { HousesService } from '../houses/houses.service';
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
    private readonly houses: HousesService,
  ) {}

  async get(user: AuthenticatedUser, houseId: number): Promise<ProductionCalendarDto> {
    await this.houses.loadFor(user, houseId, 'house:read');
    const row = await this.calendars.findOne({ where: { houseId } });
    return { houseId, periods: (row?.periods ?? []).map(cleanPeriod) };
  }

  async put(user: AuthenticatedUser, houseId: number, body: PutProductionCalendarDto): Promise<ProductionCalendarDto> {
    await this.houses.loadFor(user, houseId, 'house:write');
    const periods = body.periods.map(cleanPeriod);
    // Dates such as 02-30 pass the MM-DD pattern; the engine's check names the period.
    validateCalendar(periods, 'periods');
    const existing = await this.calendars.findOne({ where: { houseId } });
    if (existing) await existing.update({ periods });
    else await this.calendars.create({ houseId, periods });
    return { houseId, periods };
  }
}
