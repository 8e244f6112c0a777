import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { EngineInputError } from '@thermbay/engine/errors';
import { fuelRow, priceUnitLabel } from '@thermbay/engine/season/fuel';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { FarmAccessService } from '../farms/farm-access.service';
import { Farm } from '../farms/models/farm.model';
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

  /** Replaces the set; If-Match names the set's version as loaded (the farm's fuelPricesVersion). */
  async put(
    user: AuthenticatedUser,
    farmId: number,
    body: PutFuelPricesDto,
    ifMatch?: string,
  ): Promise<FarmFuelPricesDto> {
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
    // Body errors first (they do not depend on what is stored), then the version.
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      const farm = await Farm.findByPk(farmId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!farm) throw new NotFoundException('No such farm');
      const current = await this.list(farmId, transaction, farm.fuelPricesVersion);
      const wanted = body.prices.map((p) => ({ ...p, note: p.note ?? null }));
      const stored = current.prices.map(({ fuelId, pricePerUnit, priceUnit, note }) => ({
        fuelId,
        pricePerUnit,
        priceUnit,
        note,
      }));
      const byFuel = (a: { fuelId: string }, b: { fuelId: string }) => a.fuelId.localeCompare(b.fuelId);
      if (changesNothing({ prices: stored }, { prices: [...wanted].sort(byFuel) })) return current;
      assertVersion(farm.fuelPricesVersion, expected, () => current);
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
      // silent: the farm's own updatedAt and version stay as they are.
      await farm.update({ fuelPricesVersion: farm.fuelPricesVersion + 1 }, { transaction, silent: true });
      return this.list(farmId, transaction, farm.fuelPricesVersion);
    });
  }

  private async list(farmId: number, transaction?: Transaction, version?: number): Promise<FarmFuelPricesDto> {
    const rows = await this.prices.findAll({ where: { farmId }, order: [['fuelId', 'ASC']], transaction });
    const fuelPricesVersion =
      version ?? (await Farm.findByPk(farmId, { attributes: ['fuelPricesVersion'] }))?.fuelPricesVersion ?? 0;
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
    return { farmId, prices, version: fuelPricesVersion };
  }
}
