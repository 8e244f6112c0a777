import { Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { NOT_PATCHABLE_FIELDS } from '@thermbay/engine/alternatives/house-patch';
import type { FieldProblem } from '../common/filters/all-exceptions.filter';
import { flatten } from '../common/validation';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import type { Permission } from '../common/permissions';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { EngineInputError } from '@thermbay/engine/errors';
import { validateHouseDimensions } from '@thermbay/engine/geometry/house-geometry';
import { validateShadeCloth } from '@thermbay/engine/solar/shade-cloth';
import { validateLamps } from '@thermbay/engine/lamps/lamps';
import { FarmAccessService } from '../farms/farm-access.service';
import { ReferenceDataService } from '../reference-data/reference-data.service';
import { CreateHouseDto, type HouseDto, type UpdateHouseDto } from './dto/house.dto';
import { houseToDto, houseToSpec } from './house.mapper';
import { House } from './models/house.model';

@Injectable()
export class HousesService {
  constructor(
    @InjectModel(House) private readonly houses: typeof House,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
    private readonly reference: ReferenceDataService,
  ) {}

  async list(user: AuthenticatedUser, farmId: number): Promise<HouseDto[]> {
    await this.access.require(user, farmId, 'house:read');
    const rows = await this.houses.findAll({
      where: { farmId },
      order: [
        ['name', 'ASC'],
        ['id', 'ASC'],
      ],
    });
    return rows.map(houseToDto);
  }

  async create(user: AuthenticatedUser, farmId: number, body: CreateHouseDto): Promise<HouseDto> {
    await this.access.require(user, farmId, 'house:write');
    const candidate = withSortedShadeMonths({
      ...body,
      coveringUOverridesWPerM2K: body.coveringUOverridesWPerM2K ?? {},
    });
    this.assertComputable(candidate);
    const house = await this.houses.create({ ...candidate, farmId });
    return houseToDto(house);
  }

  async get(user: AuthenticatedUser, houseId: number): Promise<HouseDto> {
    return houseToDto(await this.loadFor(user, houseId, 'house:read'));
  }

  /**
   * Applies the changes to the stored row as it is inside the transaction (locked on PostgreSQL,
   * the one writer on SQLite), so two PATCHes can never combine into a house validation forbids.
   */
  async update(user: AuthenticatedUser, houseId: number, body: UpdateHouseDto, ifMatch?: string): Promise<HouseDto> {
    await this.loadFor(user, houseId, 'house:write');
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      const house = await this.houses.findByPk(houseId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!house) throw new NotFoundException('No such house');
      const current = houseToDto(house);
      const changes = withSortedShadeMonths({ ...body });
      if (changesNothing(current as unknown as Record<string, unknown>, changes)) return current;
      assertVersion(house.version, expected, () => current);
      const merged = { ...current, ...changes };
      this.assertComputable(merged);
      await house.update({ ...changes, version: house.version + 1 }, { transaction });
      return houseToDto(house);
    });
  }

  async remove(user: AuthenticatedUser, houseId: number): Promise<void> {
    const house = await this.loadFor(user, houseId, 'house:write');
    await house.destroy();
  }

  /** Loads a house the caller may act on; another farm's house is a 404, never data. */
  async loadFor(user: AuthenticatedUser, houseId: number, permission: Permission): Promise<House> {
    const house = await this.houses.findByPk(houseId);
    if (!house) throw new NotFoundException('No such house');
    await this.requireOn(user, house, permission);
    return house;
  }

  /**
   * The check `loadFor` makes, for a house the caller has loaded already: not a member of its farm
   * → 404 "No such house", a role without the permission → 403.
   */
  async requireOn(user: AuthenticatedUser, house: House, permission: Permission): Promise<void> {
    try {
      await this.access.require(user, house.farmId, permission);
    } catch (error) {
      if (error instanceof NotFoundException) throw new NotFoundException('No such house');
      throw error;
    }
  }

  /**
   * Runs a candidate house (e.g. the house with an alternative's patch merged on) through the same
   * checks a saved house passes: the request validation of a house body, then the engine's. Returns
   * the first problem, naming the field, or null when the house is valid.
   */
  checkHouse(candidate: object): FieldProblem | null {
    const body: Record<string, unknown> = { ...candidate };
    for (const key of NOT_PATCHABLE_FIELDS) if (key !== 'name' && key !== 'notes') delete body[key];
    const errors = validateSync(plainToInstance(CreateHouseDto, body), {
      whitelist: true,
      forbidNonWhitelisted: true,
    });
    if (errors.length > 0) return flatten(errors)[0];
    try {
      this.assertComputable(body as unknown as CreateHouseDto);
    } catch (error) {
      if (error instanceof EngineInputError) return { field: error.field, message: error.message };
      throw error;
    }
    return null;
  }

  /** A house is saved only if the engine can compute with it (ridge above eave, known ids, a valid cloth …). */
  private assertComputable(house: CreateHouseDto | HouseDto): void {
    this.reference.assertHouseReferences(house);
    try {
      const spec = houseToSpec(house as HouseDto);
      validateHouseDimensions(spec, 'house');
      validateShadeCloth(house);
      validateLamps(spec.lamps, 'house.lamps');
    } catch (error) {
      if (error instanceof EngineInputError) {
        const field = error.field.replace(/^house\./, '');
        throw new EngineInputError(field, error.message.replace(/house\./g, ''));
      }
      throw error;
    }
  }
}

/** The cloth's months in calendar order, so the same months always store (and compare) the same. */
function withSortedShadeMonths<T extends { shadeCloth?: { solarTransmittance: number; months: number[] } | null }>(
  body: T,
): T {
  const cloth = body.shadeCloth;
  if (!cloth || !Array.isArray(cloth.months)) return body;
  return { ...body, shadeCloth: { ...cloth, months: [...cloth.months].sort((a, b) => a - b) } };
}
