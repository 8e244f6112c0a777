import {
  BadRequestException,
  ConflictException,
  ForbiddenException,
  Injectable,
  NotFoundException,
} from '@nestjs/common';
import { InjectConnection, InjectModel } from '@nestjs/sequelize';
import * as bcrypt from 'bcryptjs';
import type { Transaction } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { selectOne } from '../database/select-one';
import { Farm } from '../farms/models/farm.model';
import { Membership } from '../farms/models/membership.model';
import type { SiteRole } from '../common/permissions';
import type { AdminUpdateUserDto, UpdateMeDto, UserDto } from './dto/user.dto';
import { User } from './models/user.model';

export function toUserDto(user: User): UserDto {
  return { id: user.id, email: user.email, name: user.name, siteRole: user.siteRole, unitSystem: user.unitSystem };
}

/** What a signed-in request needs of its user: who, the site role and the token version. */
export interface SessionUser {
  id: number;
  email: string;
  siteRole: SiteRole;
  tokenVersion: number;
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

@Injectable()
export class UsersService {
  /** findSession's statement: standard SQL with double-quoted names, the same on SQLite and PostgreSQL */
  private readonly sessionQuery: string;

  constructor(
    @InjectModel(User) private readonly users: typeof User,
    @InjectConnection() private readonly sequelize: Sequelize,
  ) {
    const attributes = users.getAttributes();
    const column = (name: keyof SessionUser) => `"${attributes[name].field ?? name}" AS "${name}"`;
    const columns = (['id', 'email', 'siteRole', 'tokenVersion'] as const).map(column).join(', ');
    this.sessionQuery = `SELECT ${columns} FROM "${users.getTableName() as string}" WHERE "${attributes.id.field ?? 'id'}" = $1`;
  }

  findByEmail(email: string): Promise<User | null> {
    return this.users.findOne({ where: { email: normaliseEmail(email) } });
  }

  async findById(id: number): Promise<User> {
    const user = await this.users.findByPk(id);
    if (!user) throw new NotFoundException('No such user');
    return user;
  }

  /**
   * The user behind a token, read afresh on every signed-in request (so a sign-out or a role
   * change, on any instance, takes effect at once), or null. One plain row of four columns: the
   * model's findByPk built a full instance and, on SQLite, ran a second statement for the table's
   * column types; that was a sixth of a design estimate's CPU time.
   */
  findSession(id: number): Promise<SessionUser | null> {
    return selectOne<SessionUser>(this.sequelize, this.sessionQuery, [id]);
  }

  async list(): Promise<UserDto[]> {
    return (await this.users.findAll({ order: [['email', 'ASC']] })).map(toUserDto);
  }

  async updateMe(id: number, changes: UpdateMeDto): Promise<UserDto> {
    const user = await this.findById(id);
    await user.update(changes);
    return toUserDto(user);
  }

  async adminUpdate(actorId: number, id: number, changes: AdminUpdateUserDto): Promise<UserDto> {
    const user = await this.findById(id);
    if (actorId === id && changes.siteRole && changes.siteRole !== 'admin') {
      throw new BadRequestException('You cannot remove your own administrator role');
    }
    await user.update(changes);
    return toUserDto(user);
  }

  async remove(actorId: number, id: number): Promise<void> {
    if (actorId === id) throw new BadRequestException('You cannot delete your own account here');
    await this.deleteAccount(id, 'That user');
  }

  /** A user closing their own account, confirmed with their password. */
  async removeMe(id: number, password: string): Promise<void> {
    const user = await this.findById(id);
    if (!(await bcrypt.compare(password, user.passwordHash)))
      throw new ForbiddenException('That password is not right');
    await this.deleteAccount(id, 'You');
  }

  /**
   * Deletes an account and its memberships, unless that would leave a farm without an owner:
   * then 409 naming every such farm. Checked inside the transaction, with the farm rows locked
   * (PostgreSQL) or the one writer held (SQLite), so a parallel demotion cannot slip between.
   */
  private async deleteAccount(id: number, who: 'That user' | 'You'): Promise<void> {
    await this.sequelize.transaction(async (transaction) => {
      const user = await this.users.findByPk(id, { transaction, lock: transaction.LOCK.UPDATE });
      if (!user) throw new NotFoundException('No such user');
      const soleOwned = await this.farmsOnlyOwnedBy(id, transaction);
      if (soleOwned.length > 0) {
        const names = soleOwned.map((farm) => `“${farm.name}”`).join(', ');
        const verb = who === 'You' ? 'are' : 'is';
        throw new ConflictException({
          message:
            `${who} ${verb} the only owner of ${names}; make someone else an owner ` +
            `(or delete ${soleOwned.length === 1 ? 'that farm' : 'those farms'}) first`,
          details: soleOwned.map((farm) => ({ field: `farms.${farm.id}`, message: farm.name })),
        });
      }
      await Membership.destroy({ where: { userId: id }, transaction });
      await user.destroy({ transaction });
    });
  }

  private async farmsOnlyOwnedBy(userId: number, transaction: Transaction): Promise<Farm[]> {
    const owned = await Membership.findAll({
      where: { userId, role: 'owner' },
      order: [['farmId', 'ASC']],
      transaction,
    });
    const sole: Farm[] = [];
    for (const { farmId } of owned) {
      const farm = await Farm.findByPk(farmId, { transaction, lock: transaction.LOCK.UPDATE });
      const owners = await Membership.count({ where: { farmId, role: 'owner' }, transaction });
      if (farm && owners <= 1) sole.push(farm);
    }
    return sole;
  }
}
