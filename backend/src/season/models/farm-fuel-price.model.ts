import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { PriceUnit } from '@thermbay/engine/season/fuel';
import { Farm } from '../../farms/models/farm.model';

/** What a farm pays for one fuel (one row per fuel). */
@Table({ tableName: 'farm_fuel_prices' })
export class FarmFuelPrice extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  /** a reference-data/fuels.json id */
  @Column({ type: DataType.STRING, allowNull: false }) declare fuelId: string;
  /** money per purchase unit; currency is the farm's own */
  @Column({ type: DataType.DOUBLE, allowNull: false }) declare pricePerUnit: number;
  /** 'si': per the fuel's unitSi; 'us': per its unitUs */
  @Column({ type: DataType.STRING(2), allowNull: false }) declare priceUnit: PriceUnit;
  @Column({ type: DataType.TEXT, allowNull: true }) declare note: string | null;
}
