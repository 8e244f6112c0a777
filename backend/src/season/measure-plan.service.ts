import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { instanceToPlain } from 'class-transformer';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { HousesService } from '../houses/houses.service';
import { House } from '../houses/models/house.model';
import type { MeasureDto } from './dto/season-request.dto';
import type { MeasurePlanDto, PutMeasurePlanDto } from './dto/measure-plan.dto';
import { HouseMeasurePlan } from './models/house-measure-plan.model';

/** The measures a house keeps between visits, with their costs (read: house:read; save: house:write). */
@Injectable()
export class MeasurePlanService {
  constructor(
    @InjectModel(HouseMeasurePlan) private readonly plans: typeof HouseMeasurePlan,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly houses: HousesService,
  ) {}

  async get(user: AuthenticatedUser, houseId: number): Promise<MeasurePlanDto> {
    await this.houses.loadFor(user, houseId, 'house:read');
    return toPlanDto(houseId, await this.plans.findOne({ where: { houseId } }));
  }

  /** Creates the plan on the first save (If-Match: 0), replaces it after; one transaction holding the house row. */
  async put(
    user: AuthenticatedUser,
    houseId: number,
    body: PutMeasurePlanDto,
    ifMatch?: string,
  ): Promise<MeasurePlanDto> {
    await this.houses.loadFor(user, houseId, 'house:write');
    // plain JSON without undefined keys, as it will be read back
    const measures = JSON.parse(JSON.stringify(instanceToPlain(body.measures))) as MeasureDto[];
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      await House.findByPk(houseId, { transaction, lock: transaction.LOCK.UPDATE });
      const existing = await this.plans.findOne({ where: { houseId }, transaction });
      const current = toPlanDto(houseId, existing);
      if (existing && changesNothing({ measures: current.measures }, { measures })) return current;
      assertVersion(current.version, expected, () => current);
      const row = existing
        ? await existing.update({ measures, version: existing.version + 1 }, { transaction })
        : await this.plans.create({ houseId, measures, version: 1 }, { transaction });
      return toPlanDto(houseId, row);
    });
  }
}

function toPlanDto(houseId: number, row: HouseMeasurePlan | null): MeasurePlanDto {
  return { houseId, measures: row?.measures ?? [], version: row?.version ?? 0 };
}
