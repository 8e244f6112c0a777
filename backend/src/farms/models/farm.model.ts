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

  /** ISO 4217 code every amount of the farm is written in, e.g. USD */
  @Column({ type: DataType.STRING(3), allowNull: false, defaultValue: 'USD' })
  declare currency: string;

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;

  /** the version of the farm's fuel prices, a set replaced as a whole (If-Match on PUT fuel-prices) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare fuelPricesVersion: number;

  @HasMany(() => Membership)
  declare memberships: Membership[];
}
