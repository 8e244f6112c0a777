import { DataTypes, QueryInterface } from 'sequelize';

/**
 * Sign-in attempts counted in the database, so that several API instances on one database share
 * one sign-in limiter (LOGIN_LIMITER_STORE=database). One row per attempt; `key` is a SHA-256 of
 * "address:…" or "account:…", so no address or e-mail is stored in clear. Rows older than the
 * window are deleted as the limiter goes.
 */
export async function up({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.createTable('login_attempts', {
    id: { type: DataTypes.INTEGER, primaryKey: true, autoIncrement: true },
    key: { type: DataTypes.STRING(64), allowNull: false },
    at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('login_attempts', ['key', 'at'], { name: 'login_attempts_key_at' });
  await qi.addIndex('login_attempts', ['at'], { name: 'login_attempts_at' });
}

export async function down({ context: qi }: { context: QueryInterface }): Promise<void> {
  await qi.dropTable('login_attempts');
}
