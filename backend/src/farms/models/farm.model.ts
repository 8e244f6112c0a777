import { Column, DataType, HasMany, Model, Table } from 'sequelize-typescript';
import { Membership } from './membership.model';

@Table({ tableName: 'farms' })
export class Farm extends Model {
  @Column({ type: DataType.STRING, allowNull: false })
  declare name: string;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare latitudeDeg: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare longitudeDeg: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare elevationM: number;

  /** IANA zone, e.g. America/Chicago */
  @Column({ type: DataType.STRING, allowNull: false })
  declare timeZone: string;

  @HasMany(() => Membership)
  declare memberships: Membership[];
}
