import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import { EngineInputError } from '@thermbay/engine/errors';
import { designConditionsFromLog } from '@thermbay/engine/climate/log-design-conditions';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ClimateService } from '../climate/climate.service';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import { standardUtcOffsetHours } from '../season/site-time';
import { TemperatureLogsService } from '../temperature-logs/temperature-logs.service';
import type { LogClimateProposalDto } from './dto/log-climate.dto';

const round2 = (value: number) => Math.round(value * 100) / 100;

/** Design temperatures and monthly normals proposed from a year (or more) of a farm's own hourly log. */
@Injectable()
export class LogClimateService {
  constructor(
    @InjectModel(Farm) private readonly farms: typeof Farm,
    private readonly access: FarmAccessService,
    private readonly climate: ClimateService,
    private readonly reference: ReferenceDataService,
    private readonly logs: TemperatureLogsService,
  ) {}

  async propose(user: AuthenticatedUser, farmId: number, logId: number): Promise<LogClimateProposalDto> {
    await this.access.require(user, farmId, 'estimate:run');
    const farm = await this.farms.findByPk(farmId, { rejectOnEmpty: true });
    const log = await this.logs.findForFarm(farmId, logId, 'logId').catch((error: unknown) => {
      if (error instanceof EngineInputError) throw new NotFoundException('This farm has no such temperature log');
      throw error;
    });
    const site = {
      latitudeDeg: farm.latitudeDeg,
      longitudeDeg: farm.longitudeDeg,
      elevationM: farm.elevationM,
      utcOffsetHours: standardUtcOffsetHours(farm.timeZone, Number(log.startDate.slice(0, 4))),
    };
    const result = designConditionsFromLog(
      { readings: log.readings, resolution: log.resolution },
      site,
      this.reference.data,
    );
    const current = await this.climate.findForFarm(farmId);
    const monthly = result.monthly.map((m) => ({
      month: m.month,
      meanDailyMinC: round2(m.meanDailyMinC),
      meanDailyMaxC: round2(m.meanDailyMaxC),
      clearness: null,
      dayCount: m.dayCount,
    }));
    const sourceNote = `the farm's temperature log "${log.name}", ${result.firstHour.slice(0, 10)} to ${result.lastHour.slice(0, 10)} (${result.hoursUsed} hours): 99.6 % heating and 1 % cooling design values`;
    return {
      farmId,
      temperatureLogId: log.id,
      temperatureLogName: log.name,
      firstHour: result.firstHour,
      lastHour: result.lastHour,
      hourCount: result.hourCount,
      hoursUsed: result.hoursUsed,
      winterDesign996C: round2(result.winterDesign996C),
      winterDesign99C: round2(result.winterDesign99C),
      summerDesign04C: round2(result.summerDesign04C),
      summerDesign1C: round2(result.summerDesign1C),
      summerCoincidentWetBulb04C: null,
      summerCoincidentWetBulb1C: null,
      summerDailyRangeK: round2(result.summerDailyRangeK),
      monthly,
      proposedClimate: {
        winterDesignC: round2(result.winterDesign996C),
        summerDesignC: round2(result.summerDesign1C),
        summerDesignWetBulbC: current?.summerDesignWetBulbC ?? null,
        summerDailyRangeK: round2(result.summerDailyRangeK),
        monthly: monthly.map(({ month, meanDailyMinC, meanDailyMaxC }) => {
          const now = current?.monthly.find((row) => row.month === month);
          // A log has no sunshine: the farm's own clearness, where entered, stays.
          return { month, meanDailyMinC, meanDailyMaxC, clearness: now?.clearness ?? null };
        }),
        sourceNote,
      },
      currentClimate: current,
      notes: [
        'Heating design: the temperature that 99.6 % (or 99 %) of the logged hours are at or above; cooling design: the temperature that 1 % (or 0.4 %) of the hours are at or above (ASHRAE Handbook — Fundamentals, climatic design information).',
        'Percentiles are read from the sorted hours without interpolation; readings within one hour are averaged.',
        'Monthly normals are the means of each day’s lowest and highest logged temperature (days with 20 or more hours logged).',
        'A temperature log has no humidity or sunshine: the summer wet bulb and the monthly clearness stay as the farm has them.',
      ],
    };
  }
}
