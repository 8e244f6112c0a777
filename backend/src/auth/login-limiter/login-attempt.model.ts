import { Column, DataType, Model, Table } from 'sequelize-typescript';

/** One sign-in attempt under a hashed limiter key (migration 0005). */
@Table({ tableName: 'login_attempts', timestamps: false })
export class LoginAttempt extends Model {
  @Column({ type: DataType.STRING(64), allowNull: false }) declare key: string;
  @Column({ type: DataType.DATE, allowNull: false }) declare at: Date;
}
