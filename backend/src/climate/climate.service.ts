import { Injectable } from '@nestjs/common';
import { InjectModel } from '@nestjs/sequelize';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { validateSiteClimate } from '@thermbay/engine/climate/site-climate';
import { FarmAccessService } from '../farms/farm-access.service';
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
    private readonly access: FarmAccessService,
  ) {}

  async get(user: AuthenticatedUser, farmId: number): Promise<FarmClimateDto> {
    await this.access.require(user, farmId, 'farm:read');
    return { farmId, climate: await this.findForFarm(farmId) };
  }

  /** For services that already checked access (estimates, season). */
  async findForFarm(farmId: number): Promise<SiteClimateDto | null> {
    const row = await this.climates.findOne({ where: { farmId } });
    return row ? climateToDto(row) : null;
  }

  async put(user: AuthenticatedUser, farmId: number, body: SiteClimateDto): Promise<FarmClimateDto> {
    await this.access.require(user, farmId, 'house:write');
    validateSiteClimate(
      { ...body, monthly: body.monthly.map((m) => ({ ...m, clearness: m.clearness ?? undefined })) },
      'climate',
    );
    const values = { ...body, sourceNote: body.sourceNote ?? null, farmId };
    const existing = await this.climates.findOne({ where: { farmId } });
    const row = existing ? await existing.update(values) : await this.climates.create(values);
    return { farmId, climate: climateToDto(row) };
  }
}
