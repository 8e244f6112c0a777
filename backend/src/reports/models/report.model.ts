import { Column, DataType, Model, Table } from 'sequelize-typescript';
import type { ReportSnapshot } from '../report-snapshot';

export type ReportStatus = 'draft' | 'issued';

@Table({ tableName: 'reports' })
export class Report extends Model {
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare farmId: number;

  /** null once the house is deleted: the snapshot still holds everything */
  @Column({ type: DataType.INTEGER, allowNull: true })
  declare houseId: number | null;

  @Column({ type: DataType.STRING, allowNull: false })
  declare houseName: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare title: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare notes: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare recommendations: string;

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare status: ReportStatus;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare revision: number;

  @Column({ type: DataType.INTEGER, allowNull: true })
  declare previousReportId: number | null;

  @Column({ type: DataType.INTEGER, allowNull: true })
  declare authorUserId: number | null;

  @Column({ type: DataType.STRING, allowNull: false })
  declare authorName: string;

  @Column({ type: DataType.DATE, allowNull: true })
  declare issuedAt: Date | null;

  @Column({ type: DataType.JSON, allowNull: false })
  declare snapshot: ReportSnapshot;

  declare createdAt: Date;
  declare updatedAt: Date;
}
