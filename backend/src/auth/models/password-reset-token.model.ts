import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** A single-use password-reset token, stored as its SHA-256 hash. */
@Table({ tableName: 'password_reset_tokens' })
export class PasswordResetToken extends Model {
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare userId: number;

  @Column({ type: DataType.STRING(64), allowNull: false, unique: true })
  declare tokenHash: string;

  @Column({ type: DataType.DATE, allowNull: false })
  declare expiresAt: Date;

  @Column({ type: DataType.DATE, allowNull: true })
  declare usedAt: Date | null;
}
