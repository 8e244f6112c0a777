import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { ProductionPeriod } from '@thermbay/engine/season/production-calendar';
import { House } from '../../houses/models/house.model';

/** A period of a house's production calendar, with the user's own name for it. */
export interface StoredProductionPeriod extends ProductionPeriod {
  label?: string;
}

/** A house's production calendar; no row (or no periods) = heated all season at the house setpoints. */
@Table({ tableName: 'house_calendars' })
export class HouseCalendar extends Model {
  @ForeignKey(() => House)
  @Column({ type: DataType.INTEGER, allowNull: false, unique: true })
  declare houseId: number;

  @BelongsTo(() => House, { onDelete: 'CASCADE' })
  declare house: House;

  @Column({ type: DataType.JSON, allowNull: false }) declare periods: StoredProductionPeriod[];

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;
}
