import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import type { AuthenticatedUser } from '../common/decorators/current-user.decorator';
import { ROLE_PERMISSIONS } from '../common/permissions';
import { assertVersion, changesNothing, expectedVersion } from '../common/versioning';
import { House } from '../houses/models/house.model';
import { User } from '../users/models/user.model';
import type { CreateFarmDto, FarmDto, MemberDto, UpdateFarmDto, UpdateMemberDto } from './dto/farm.dto';
import { FarmAccessService } from './farm-access.service';
import { Farm } from './models/farm.model';
import { Membership } from './models/membership.model';

@Injectable()
export class FarmsService {
  constructor(
    @InjectModel(Farm) private readonly farms: typeof Farm,
    @InjectModel(Membership) private readonly memberships: typeof Membership,
    @InjectModel(House) private readonly houses: typeof House,
    @InjectConnection() private readonly sequelize: Sequelize,
    private readonly access: FarmAccessService,
  ) {}

  async list(user: AuthenticatedUser): Promise<FarmDto[]> {
    const memberships = await this.memberships.findAll({
      where: { userId: user.id },
      include: [Farm],
      order: [
        [{ model: Farm, as: 'farm' }, 'name', 'ASC'],
        [{ model: Farm, as: 'farm' }, 'id', 'ASC'],
      ],
    });
    return Promise.all(memberships.map((m) => this.toDto(m.farm, m)));
  }

  async get(user: AuthenticatedUser, farmId: number): Promise<FarmDto> {
    const membership = await this.access.require(user, farmId, 'farm:read');
    return this.toDto(await this.load(farmId), membership);
  }

  async create(user: AuthenticatedUser, body: CreateFarmDto): Promise<FarmDto> {
    return this.sequelize.transaction(async (transaction) => {
      const farm = await this.farms.create({ ...body }, { transaction });
      const membership = await this.memberships.create(
        { farmId: farm.id, userId: user.id, role: 'owner' },
        { transaction },
      );
      return this.toDto(farm, membership, 0);
    });
  }

  async update(user: AuthenticatedUser, farmId: number, body: UpdateFarmDto, ifMatch?: string): Promise<FarmDto> {
    const membership = await this.access.require(user, farmId, 'farm:update');
    const expected = expectedVersion(ifMatch);
    return this.sequelize.transaction(async (transaction) => {
      const farm = await this.load(farmId, transaction);
      const current = await this.toDto(farm, membership, undefined, transaction);
      if (changesNothing(current as unknown as Record<string, unknown>, { ...body })) return current;
      assertVersion(farm.version, expected, () => current);
      await farm.update({ ...body, version: farm.version + 1 }, { transaction });
      return this.toDto(farm, membership, current.houseCount);
    });
  }

  async remove(user: AuthenticatedUser, farmId: number): Promise<void> {
    await this.access.require(user, farmId, 'farm:delete');
    await this.sequelize.transaction(async (transaction) => {
      await this.houses.destroy({ where: { farmId }, transaction });
      await this.memberships.destroy({ where: { farmId }, transaction });
      await this.farms.destroy({ where: { id: farmId }, transaction });
    });
  }

  async members(user: AuthenticatedUser, farmId: number): Promise<MemberDto[]> {
    await this.access.require(user, farmId, 'farm:read');
    const rows = await this.memberships.findAll({ where: { farmId }, include: [User], order: [['id', 'ASC']] });
    return rows.map((m) => ({ userId: m.userId, email: m.user.email, name: m.user.name, role: m.role }));
  }

  async updateMember(
    user: AuthenticatedUser,
    farmId: number,
    userId: number,
    body: UpdateMemberDto,
  ): Promise<MemberDto> {
    await this.access.require(user, farmId, 'members:manage');
    return this.sequelize.transaction(async (transaction) => {
      await this.load(farmId, transaction);
      const membership = await this.memberships.findOne({ where: { farmId, userId }, include: [User], transaction });
      if (!membership) throw new NotFoundException('No such member');
      if (membership.role === 'owner' && body.role !== 'owner') await this.keepAnOwner(farmId, transaction);
      await membership.update({ role: body.role }, { transaction });
      return { userId, email: membership.user.email, name: membership.user.name, role: membership.role };
    });
  }

  async removeMember(user: AuthenticatedUser, farmId: number, userId: number): Promise<void> {
    await this.access.require(user, farmId, 'members:manage');
    await this.sequelize.transaction(async (transaction) => {
      await this.load(farmId, transaction);
      const membership = await this.memberships.findOne({ where: { farmId, userId }, transaction });
      if (!membership) throw new NotFoundException('No such member');
      if (membership.role === 'owner') await this.keepAnOwner(farmId, transaction);
      await membership.destroy({ transaction });
    });
  }

  /**
   * A farm must always keep at least one owner, or nobody could manage it. Called inside the
   * transaction that changes the membership, after the farm row is locked (PostgreSQL) or with the
   * one writer held (SQLite), so two owners demoting each other at once cannot both succeed.
   */
  private async keepAnOwner(farmId: number, transaction: Transaction): Promise<void> {
    const owners = await this.memberships.count({ where: { farmId, role: 'owner' }, transaction });
    if (owners <= 1) {
      throw new ConflictException('A farm needs at least one owner; make someone else an owner first');
    }
  }

  /** The farm row; inside a transaction it is locked for the rest of it (PostgreSQL). */
  private async load(farmId: number, transaction?: Transaction): Promise<Farm> {
    const farm = await this.farms.findByPk(
      farmId,
      transaction ? { transaction, lock: transaction.LOCK.UPDATE } : undefined,
    );
    if (!farm) throw new NotFoundException('No such farm');
    return farm;
  }

  private async toDto(
    farm: Farm,
    membership: Membership,
    houseCount?: number,
    transaction?: Transaction,
  ): Promise<FarmDto> {
    return {
      id: farm.id,
      name: farm.name,
      latitudeDeg: farm.latitudeDeg,
      longitudeDeg: farm.longitudeDeg,
      elevationM: farm.elevationM,
      timeZone: farm.timeZone,
      currency: farm.currency,
      myRole: membership.role,
      permissions: [...ROLE_PERMISSIONS[membership.role]],
      houseCount: houseCount ?? (await this.houses.count({ where: { farmId: farm.id }, transaction })),
      version: farm.version,
      createdAt: farm.createdAt.toISOString(),
      updatedAt: farm.updatedAt.toISOString(),
    };
  }
}
