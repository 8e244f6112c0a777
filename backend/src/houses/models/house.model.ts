import { BelongsTo, Column, DataType, ForeignKey, Model, Table } from 'sequelize-typescript';
import type { HouseShape, SurfaceGroup } from '@thermbay/engine/vocabulary';
import type { ExhaustFans, HeaterGroup, Lamps, Setpoints, ShadeCloth } from '@thermbay/engine/house.types';
import { Farm } from '../../farms/models/farm.model';

/** A stored house. Every number is SI; nested groups are JSON columns mapped 1:1 onto HouseSpec. */
@Table({ tableName: 'houses' })
export class House extends Model {
  @ForeignKey(() => Farm)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  @BelongsTo(() => Farm, { onDelete: 'CASCADE' })
  declare farm: Farm;

  @Column({ type: DataType.STRING, allowNull: false })
  declare name: string;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare notes: string | null;

  @Column({ type: DataType.STRING, allowNull: false })
  declare shape: HouseShape;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare spans: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare widthM: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare lengthM: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare eaveHeightM: number;

  @Column({ type: DataType.DOUBLE, allowNull: false })
  declare ridgeHeightM: number;

  @Column({ type: DataType.JSON, allowNull: false })
  declare coverings: Record<SurfaceGroup, string>;

  @Column({ type: DataType.JSON, allowNull: false, defaultValue: {} })
  declare coveringUOverridesWPerM2K: Partial<Record<SurfaceGroup, number>>;

  @Column({ type: DataType.STRING, allowNull: false })
  declare airLeakageClassId: string;

  @Column({ type: DataType.DOUBLE, allowNull: true })
  declare airChangesPerHourOverride: number | null;

  @Column({ type: DataType.BOOLEAN, allowNull: false, defaultValue: false })
  declare perimeterInsulated: boolean;

  @Column({ type: DataType.STRING, allowNull: true })
  declare curtainId: string | null;

  @Column({ type: DataType.DOUBLE, allowNull: true })
  declare kneewallHeightM: number | null;

  @Column({ type: DataType.STRING, allowNull: true })
  declare kneewallId: string | null;

  /** { solarTransmittance, months }, or null for no shade cloth (migration 0014) */
  @Column({ type: DataType.JSON, allowNull: true, defaultValue: null })
  declare shadeCloth: ShadeCloth | null;

  @Column({ type: DataType.JSON, allowNull: false, defaultValue: [] })
  declare heaters: HeaterGroup[];

  @Column({ type: DataType.JSON, allowNull: false })
  declare exhaustFans: ExhaustFans;

  @Column({ type: DataType.DOUBLE, allowNull: false, defaultValue: 0 })
  declare inletAreaM2: number;

  @Column({ type: DataType.JSON, allowNull: false })
  declare setpoints: Setpoints;

  /** supplemental lamps, or null for none (migration 0015) */
  @Column({ type: DataType.JSON, allowNull: true })
  declare lamps: Lamps | null;

  /** raised by one on every save; a write names the version it was based on (If-Match) */
  @Column({ type: DataType.INTEGER, allowNull: false, defaultValue: 1 })
  declare version: number;
}
