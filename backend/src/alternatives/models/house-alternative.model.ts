import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { HousePatch } from '@thermbay/engine/alternatives/house-patch';
import { House } from '../../houses/models/house.model';
import type { StoredProductionPeriod } from '../../season/models/house-calendar.model';
import { User } from '../../users/models/user.model';

/**
 * A named alternative of a house: the fields it changes (a patch merged onto the house as it is
 * when read), a production calendar in place of the house's own (null = the house's), a cost.
 */
@Table({ tableName: 'house_alternatives' })
export class HouseAlternative extends Model {
  @ForeignKey(() => House)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare houseId: number;

  @BelongsTo(() => House, { onDelete: 'CASCADE' })
  declare house: House;

  @Column({ type: DataType.STRING, allowNull: false }) declare name: string;
  @Column({ type: DataType.TEXT, allowNull: true }) declare notes: string | null;
  @Column({ type: DataType.JSON, allowNull: false }) declare patch: HousePatch;
  @Column({ type: DataType.JSON, allowNull: true }) declare calendar: StoredProductionPeriod[] | null;
  @Column({ type: DataType.DOUBLE, allowNull: true }) declare costAmount: number | null;

  @ForeignKey(() => User)
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare createdById: number | null;

  @BelongsTo(() => User, { onDelete: 'SET NULL' })
  declare createdBy: User | null;
}
