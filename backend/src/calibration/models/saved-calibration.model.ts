import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import { Farm } from '../../farms/models/farm.model';
import type { CalibrationInputsSnapshot, StoredCalibrationResult } from '../calibration-types';

/** A calibration of a farm's houses against its fuel records, kept with the inputs it ran on. */
@Table({ tableName: 'saved_calibrations' })
export class SavedCalibration extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @Column({ type: DataType.JSON, allowNull: false }) declare inputs: CalibrationInputsSnapshot;
  @Column({ type: DataType.JSON, allowNull: false }) declare result: StoredCalibrationResult;
}
