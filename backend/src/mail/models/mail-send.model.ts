import { Column, DataType, Model, Table } from 'sequelize-typescript';

export type MailSendStatus = 'sent' | 'failed';

/** One send attempt: kept whether it went out or failed, with the reason when it failed. */
@Table({ tableName: 'mail_sends' })
export class MailSend extends Model {
  /** what the message was: report, invitation, password-reset, password-changed … */
  @Column({ type: DataType.STRING(40), allowNull: false })
  declare kind: string;

  @Column({ type: DataType.INTEGER, allowNull: true })
  declare senderUserId: number | null;

  @Column({ type: DataType.STRING, allowNull: false })
  declare fromAddress: string;

  @Column({ type: DataType.JSON, allowNull: false })
  declare recipients: string[];

  @Column({ type: DataType.STRING(500), allowNull: false })
  declare subject: string;

  @Column({ type: DataType.TEXT, allowNull: false })
  declare text: string;

  @Column({ type: DataType.JSON, allowNull: false })
  declare attachmentNames: string[];

  @Column({ type: DataType.STRING(10), allowNull: false })
  declare status: MailSendStatus;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare error: string | null;

  @Column({ type: DataType.STRING, allowNull: true })
  declare messageId: string | null;

  declare createdAt: Date;
}
