import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { MeasureDto } from '../dto/season-request.dto';
import { House } from '../../houses/models/house.model';

/**
 * The measures kept with a house (each with its settings and what it would cost), so costs typed
 * once on the season page are there the next time. No row = none kept yet.
 */
@Table({ tableName: 'house_measure_plans' })
export class HouseMeasurePlan extends Model {
  @ForeignKey(() => House)
  @Column({ type: DataType.INTEGER, allowNull: false, unique: true })
  declare houseId: number;

  @BelongsTo(() => House, { onDelete: 'CASCADE' })
  declare house: House;

  @Column({ type: DataType.JSON, allowNull: false }) declare measures: MeasureDto[];

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;
}
