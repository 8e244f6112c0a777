import { Sequelize } from 'sequelize-typescript';
import { SequelizeStorage, Umzug } from 'umzug';
import { MIGRATIONS } from './migrations';

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'migrations' }),
    logger: undefined,
  });
}

/** SQLite settings for a file shared by a web server: write-ahead log and waiting on locks. */
export async function prepareSqlite(sequelize: Sequelize): Promise<void> {
  await sequelize.query('PRAGMA journal_mode = WAL');
  await sequelize.query('PRAGMA busy_timeout = 5000');
  await sequelize.query('PRAGMA foreign_keys = ON');
}

/** Any number, the same in every instance: the advisory lock that serialises migrations. */
const MIGRATION_LOCK_KEY = 7_244_231_001;

/**
 * Brings the schema up to date and returns the names of the migrations applied. On SQLite the
 * connection gets its pragmas first. On PostgreSQL several API instances may start at once
 * against one database, so the migrations run while holding a transaction-scoped advisory lock:
 * a second instance waits, then finds nothing left to apply.
 */
export async function migrateToLatest(sequelize: Sequelize): Promise<string[]> {
  const migrate = async () => (await createMigrator(sequelize).up()).map((m) => m.name);
  if (sequelize.getDialect() === 'sqlite') {
    await prepareSqlite(sequelize);
    return migrate();
  }
  if (sequelize.getDialect() === 'postgres') {
    return sequelize.transaction(async (transaction) => {
      await sequelize.query('SELECT pg_advisory_xact_lock(:key)', {
        replacements: { key: MIGRATION_LOCK_KEY },
        transaction,
      });
      return migrate();
    });
  }
  return migrate();
}
