import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { LogResolution, TemperatureColumnMapping, TemperatureLogReading } from '../csv/temperature-log-csv';
import { Farm } from '../../farms/models/farm.model';

/** A farm's logged outdoor temperatures, read from an uploaded CSV file (°C). */
@Table({ tableName: 'temperature_logs' })
export class TemperatureLog extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.STRING, allowNull: false }) declare resolution: LogResolution;
  /** 'YYYY-MM-DD' of the first and last reading */
  @Column({ type: DataType.STRING(10), allowNull: false }) declare startDate: string;
  @Column({ type: DataType.STRING(10), allowNull: false }) declare endDate: string;
  /** data rows in the file */
  @Column({ type: DataType.INTEGER, allowNull: false }) declare rowCount: number;
  @Column({ type: DataType.INTEGER, allowNull: false }) declare readingCount: number;
  @Column({ type: DataType.JSON, allowNull: false }) declare mapping: TemperatureColumnMapping;
  @Column({ type: DataType.JSON, allowNull: false }) declare readings: TemperatureLogReading[];
}
