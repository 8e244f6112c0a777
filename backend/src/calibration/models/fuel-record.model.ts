import { BelongsTo, BelongsToMany, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Farm } from '../../farms/models/farm.model';
import { House } from '../../houses/models/house.model';

/** A fuel bill or tank delivery: how much of a fuel the farm bought for which houses over which days. */
@Table({ tableName: 'fuel_records' })
export class FuelRecord extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @Column({ type: DataType.STRING, allowNull: false }) declare fuelId: string;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare quantity: number;
  /** one of the fuel's purchase units (reference-data/fuels.json unitSi or unitUs) */
  @Column({ type: DataType.STRING, allowNull: false }) declare quantityUnit: string;
  @Column({ type: DataType.DOUBLE, allowNull: true }) declare cost: number | null;
  @Column({ type: DataType.STRING(10), allowNull: false }) declare startDate: string;
  @Column({ type: DataType.STRING(10), allowNull: false }) declare endDate: string;
  /** in quantityUnit per day */
  @Column({ type: DataType.DOUBLE, allowNull: true }) declare nonHeatingPerDay: number | null;
  @Column({ type: DataType.TEXT, allowNull: true }) declare note: string | null;

  @BelongsToMany(() => House, () => FuelRecordHouse)
  declare houses: House[];

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;
}

/** Which houses a fuel record's meter or tank serves. */
@Table({ tableName: 'fuel_record_houses', timestamps: false })
export class FuelRecordHouse extends Model {
  @ForeignKey(() => FuelRecord)
  @Column({ type: DataType.INTEGER, allowNull: false, primaryKey: true })
  declare fuelRecordId: number;

  @ForeignKey(() => House)
  @Column({ type: DataType.INTEGER, allowNull: false, primaryKey: true })
  declare houseId: number;
}
