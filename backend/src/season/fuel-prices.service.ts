import { Injectable } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { EngineInputError } from '@thermbay/engine/errors';
import { fuelRow, priceUnitLabel } from '@thermbay/engine/season/fuel';
import { FarmAccessService } from '../farms/farm-access.service';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import type { FarmFuelPricesDto, FuelPriceDto, PutFuelPricesDto } from './dto/fuel-price.dto';
import { FarmFuelPrice } from './models/farm-fuel-price.model';

/**
 * What a farm pays for each fuel. Anyone who edits houses (owner, grower) sets prices, since the
 * grower usually holds the fuel bills; everyone on the farm reads them.
 */
@Injectable()
export class FuelPricesService {
  constructor(
    @InjectModel(FarmFuelPrice) private readonly prices: typeof FarmFuelPrice,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
    private readonly reference: ReferenceDataService,
  ) {}

  async get(user: AuthenticatedUser, farmId: number): Promise<FarmFuelPricesDto> {
    await this.access.require(user, farmId, 'farm:read');
    return this.list(farmId);
  }

  async put(user: AuthenticatedUser, farmId: number, body: PutFuelPricesDto): Promise<FarmFuelPricesDto> {
    await this.access.require(user, farmId, 'house:write');
    const seen = new Set<string>();
    body.prices.forEach((price, index) => {
      fuelRow(this.reference.data, price.fuelId, `prices.${index}.fuelId`);
      if (seen.has(price.fuelId))
        throw new EngineInputError(
          `prices.${index}.fuelId`,
          `${price.fuelId} is listed twice; give one price per fuel`,
        );
      seen.add(price.fuelId);
    });
    await this.sequelize.transaction(async (transaction) => {
      await this.prices.destroy({ where: { farmId }, transaction });
      for (const price of body.prices) {
        await this.prices.create(
          {
            farmId,
            fuelId: price.fuelId,
            pricePerUnit: price.pricePerUnit,
            priceUnit: price.priceUnit,
            note: price.note ?? null,
          },
          { transaction },
        );
      }
    });
    return this.list(farmId);
  }

  private async list(farmId: number): Promise<FarmFuelPricesDto> {
    const rows = await this.prices.findAll({ where: { farmId }, order: [['fuelId', 'ASC']] });
    const prices: FuelPriceDto[] = rows.map((row) => {
      const fuel = fuelRow(this.reference.data, row.fuelId);
      return {
        fuelId: row.fuelId,
        fuelLabel: fuel.label,
        pricePerUnit: row.pricePerUnit,
        priceUnit: row.priceUnit,
        priceUnitLabel: priceUnitLabel(fuel, row.priceUnit),
        note: row.note ?? null,
      };
    });
    return { farmId, prices };
  }
}
