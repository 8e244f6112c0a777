import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { FarmRole } from '../../common/permissions';
import { User } from '../../users/models/user.model';
import { Farm } from './farm.model';

@Table({ tableName: 'memberships' })
export class Membership extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare userId: number;

  @Column({ type: DataType.STRING, allowNull: false })
  declare role: FarmRole;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @BelongsTo(() => User, { onDelete: 'CASCADE' })
  declare user: User;
}
