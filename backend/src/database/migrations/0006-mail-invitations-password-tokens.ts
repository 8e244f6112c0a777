import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Mail: every send attempt (sent or failed, with the reason), the messages the in-process SMTP
 * server received (with their attachments), farm invitations and password-reset tokens. Tokens
 * are stored only as SHA-256 hashes.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  const timestamps = {
    createdAt: { type: DataTypes.DATE, allowNull: false },
    updatedAt: { type: DataTypes.DATE, allowNull: false },
  };
  const userRef = (allowNull: boolean, onDelete: 'CASCADE' | 'SET NULL') => ({
    type: DataTypes.INTEGER,
    allowNull,
    references: { model: 'users', key: 'id' },
    onDelete,
  });

  await qi.createTable('mail_sends', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    kind: { type: DataTypes.STRING(40), allowNull: false },
    senderUserId: userRef(true, 'SET NULL'),
    fromAddress: { type: DataTypes.STRING, allowNull: false },
    recipients: { type: DataTypes.JSON, allowNull: false },
    subject: { type: DataTypes.STRING(500), allowNull: false },
    /** the body, kept so that a failed message is never lost */
    text: { type: DataTypes.TEXT, allowNull: false },
    attachmentNames: { type: DataTypes.JSON, allowNull: false },
    status: { type: DataTypes.STRING(10), allowNull: false },
    error: { type: DataTypes.TEXT, allowNull: true },
    messageId: { type: DataTypes.STRING, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('mail_sends', ['status']);

  await qi.createTable('received_mails', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    envelopeFrom: { type: DataTypes.STRING, allowNull: true },
    /** envelope recipients, lower case: who the message was delivered to */
    recipients: { type: DataTypes.JSON, allowNull: false },
    fromHeader: { type: DataTypes.STRING(1000), allowNull: true },
    toHeader: { type: DataTypes.STRING(2000), allowNull: true },
    subject: { type: DataTypes.STRING(1000), allowNull: true },
    text: { type: DataTypes.TEXT, allowNull: true },
    messageId: { type: DataTypes.STRING, allowNull: true },
    sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
    ...timestamps,
  });

  await qi.createTable('received_mail_attachments', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    receivedMailId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'received_mails', key: 'id' },
      onDelete: 'CASCADE',
    },
    fileName: { type: DataTypes.STRING(500), allowNull: false },
    contentType: { type: DataTypes.STRING(200), allowNull: false },
    sizeBytes: { type: DataTypes.INTEGER, allowNull: false },
    content: { type: DataTypes.BLOB, allowNull: false },
    ...timestamps,
  });
  await qi.addIndex('received_mail_attachments', ['receivedMailId']);

  await qi.createTable('invitations', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    farmId: {
      type: DataTypes.INTEGER,
      allowNull: false,
      references: { model: 'farms', key: 'id' },
      onDelete: 'CASCADE',
    },
    email: { type: DataTypes.STRING, allowNull: false },
    role: { type: DataTypes.STRING(20), allowNull: false },
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    invitedByUserId: userRef(true, 'SET NULL'),
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    acceptedAt: { type: DataTypes.DATE, allowNull: true },
    acceptedByUserId: userRef(true, 'SET NULL'),
    revokedAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('invitations', ['farmId']);

  await qi.createTable('password_reset_tokens', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    userId: userRef(false, 'CASCADE'),
    tokenHash: { type: DataTypes.STRING(64), allowNull: false, unique: true },
    expiresAt: { type: DataTypes.DATE, allowNull: false },
    usedAt: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  await qi.addIndex('password_reset_tokens', ['userId']);
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('password_reset_tokens');
  await qi.dropTable('invitations');
  await qi.dropTable('received_mail_attachments');
  await qi.dropTable('received_mails');
  await qi.dropTable('mail_sends');
}
