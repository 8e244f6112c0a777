import { Column, DataType, HasMany, Model, Table } from 'sequelize-typescript';
import type { SiteRole } from '../../common/permissions';
import { Membership } from '../../farms/models/membership.model';

export type UnitSystem = 'si' | 'us';

@Table({ tableName: 'users' })
export class User extends Model {
  @Column({ type: DataType.STRING, allowNull: false, unique: true })
  declare email: string;

  @Column({ type: DataType.STRING, allowNull: false })
  declare name: string;

  @Column({ type: DataType.STRING, allowNull: false })
  declare passwordHash: string;

  @Column({ type: DataType.STRING, allowNull: false, defaultValue: 'user' })
  declare siteRole: SiteRole;

  @Column({ type: DataType.STRING, allowNull: false, defaultValue: 'si' })
  declare unitSystem: UnitSystem;

  /** Raised at sign-out; tokens carrying an older version are refused. */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 0 })
  declare tokenVersion: number;

  @HasMany(() => Membership)
  declare memberships: Membership[];
}
