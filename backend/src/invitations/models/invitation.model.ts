import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { FarmRole } from '../../common/permissions';
import { Farm } from '../../farms/models/farm.model';

/** An invitation to join a farm, by e-mail; the link's token is stored only as its hash. */
@Table({ tableName: 'invitations' })
export class Invitation extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @Column({ type: DataType.STRING, allowNull: false })
  declare email: string;

  @Column({ type: DataType.STRING(20), allowNull: false })
  declare role: FarmRole;

  @Column({ type: DataType.STRING(64), allowNull: false, unique: true })
  declare tokenHash: string;

  @Column({ type: DataType.INTEGER, allowNull: true })
  declare invitedByUserId: number | null;

  @Column({ type: DataType.DATE, allowNull: false })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true })
  declare acceptedAt: Date | null;

  @Column({ type: DataType.INTEGER, allowNull: true })
  declare acceptedByUserId: number | null;

  @Column({ type: DataType.DATE, allowNull: true })
  declare revokedAt: Date | null;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  declare createdAt: Date;
}
