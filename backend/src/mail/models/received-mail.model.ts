import { BelongsTo, Column, DataType, ForeignKey, HasMany, Model, Table } from 'sequelize-typescript';

/** A message as the in-process SMTP server received it, parsed from its raw MIME. */
@Table({ tableName: 'received_mails' })
export class ReceivedMail extends Model {
  @Column({ type: DataType.STRING, allowNull: true })
  declare envelopeFrom: string | null;

  /** envelope recipients in lower case */
  @Column({ type: DataType.JSON, allowNull: false })
  declare recipients: string[];

  @Column({ type: DataType.STRING(1000), allowNull: true })
  declare fromHeader: string | null;

  @Column({ type: DataType.STRING(2000), allowNull: true })
  declare toHeader: string | null;

  @Column({ type: DataType.STRING(1000), allowNull: true })
  declare subject: string | null;

  @Column({ type: DataType.TEXT, allowNull: true })
  declare text: string | null;

  @Column({ type: DataType.STRING, allowNull: true })
  declare messageId: string | null;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare sizeBytes: number;

  @HasMany(() => ReceivedMailAttachment)
  declare attachments: ReceivedMailAttachment[];

  declare createdAt: Date;
}

@Table({ tableName: 'received_mail_attachments' })
export class ReceivedMailAttachment extends Model {
  @ForeignKey(() => ReceivedMail)
  @Column({ type: DataType.INTEGER, allowNull: false })
  declare receivedMailId: number;

  @Column({ type: DataType.STRING(500), allowNull: false })
  declare fileName: string;

  @Column({ type: DataType.STRING(200), allowNull: false })
  declare contentType: string;

  @Column({ type: DataType.INTEGER, allowNull: false })
  declare sizeBytes: number;

  @Column({ type: DataType.BLOB, allowNull: false })
  declare content: Buffer;

  @BelongsTo(() => ReceivedMail, { onDelete: 'CASCADE' })
  declare receivedMail: ReceivedMail;
}
