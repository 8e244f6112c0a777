import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { validateSiteClimate } from '@thermbay/engine/climate/site-climate';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
import type { FarmClimateDto, SiteClimateDto } from './dto/climate.dto';
import { FarmClimate } from './models/farm-climate.model';

export function climateToDto(row: FarmClimate): SiteClimateDto {
  return {
    winterDesignC: row.winterDesignC,
    summerDesignC: row.summerDesignC,
    summerDesignWetBulbC: row.summerDesignWetBulbC,
    summerDailyRangeK: row.summerDailyRangeK,
    monthly: [...row.monthly].sort((a, b) => a.month - b.month),
    sourceNote: row.sourceNote ?? null,
    designWindSpeedMPerS: row.designWindSpeedMPerS ?? null,
  };
}

@Injectable()
export class ClimateService {
  constructor(
    @InjectModel(FarmClimate) private readonly climates: typeof FarmClimate,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
  ) {}

  async get(user: AuthenticatedUser, farmId: number): Promise<FarmClimateDto> {
    await this.access.require(user, farmId, 'farm:read');
    const row = await this.climates.findOne({ where: { farmId } });
    return toFarmClimateDto(farmId, row);
  }

  /** For services that already checked access (estimates, season). */
  async findForFarm(farmId: number): Promise<SiteClimateDto | null> {
    const row = await this.climates.findOne({ where: { farmId } });
    return row ? climateToDto(row) : null;
  }

  /**
   * Saves the farm's climate: creates it on the first save, replaces it after (an upsert inside
   * one transaction that holds the farm row, so parallel first saves never collide). If-Match
   * names the version loaded, 0 before the first save.
   */
  async put(user: AuthenticatedUser, farmId: number, body: SiteClimateDto, ifMatch?: string): Promise<FarmClimateDto> {
    await this.access.require(user, farmId, 'house:write');
    validateSiteClimate(
      { ...body, monthly: body.monthly.map((m) => ({ ...m, clearness: m.clearness ?? undefined })) },
      'climate',
    );
    const values = { ...body, sourceNote: body.sourceNote ?? null, farmId };
    // Body errors first (they do not depend on what is stored), then the version.
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      await Farm.findByPk(farmId, { transaction, lock: transaction.LOCK.UPDATE });
      const existing = await this.climates.findOne({ where: { farmId }, transaction });
      const current = toFarmClimateDto(farmId, existing);
      if (current.climate && changesNothing(current.climate as unknown as Record<string, unknown>, sortedMonths(body)))
        return current;
      assertVersion(current.version, expected, () => current);
      const row = existing
        ? await existing.update({ ...values, version: existing.version + 1 }, { transaction })
        : await this.climates.create({ ...values, version: 1 }, { transaction });
      return toFarmClimateDto(farmId, row);
    });
  }
}

function toFarmClimateDto(farmId: number, row: FarmClimate | null): FarmClimateDto {
  return { farmId, climate: row ? climateToDto(row) : null, version: row?.version ?? 0 };
}

function sortedMonths(body: SiteClimateDto): Record<string, unknown> {
  return { ...body, sourceNote: body.sourceNote ?? null, monthly: [...body.monthly].sort((a, b) => a.month - b.month) };
}
