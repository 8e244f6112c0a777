import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { MonthlyClimate } from '@thermbay/engine/climate/site-climate';
import { Farm } from '../../farms/models/farm.model';

@Table({ tableName: 'farm_climates' })
export class FarmClimate extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false, unique: true })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @Column({ type: DataType.DOUBLE, allowNull: false }) declare winterDesignC: number;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare summerDesignC: number;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare summerDesignWetBulbC: number;
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare summerDailyRangeK: number;
  @Column({ type: DataType.JSON, allowNull: false }) declare monthly: MonthlyClimate[];
  @Column({ type: DataType.TEXT, allowNull: true }) declare sourceNote: string | null;

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;
  @Column({ type: DataType.DOUBLE, allowNull: true }) declare designWindSpeedMPerS: number | null;
}
