import { Sequelize } from 'sequelize-typescript';
import { SequelizeStorage, Umzug } from 'umzug';
import { MIGRATIONS } from './migrations';
import { installSqliteReader } from './select-one';
import { installSqliteWriter, SQLITE_BUSY_TIMEOUT_MS } from './sqlite-writer';

export function createMigrator(sequelize: Sequelize) {
  return new Umzug({
    migrations: MIGRATIONS.map((m) => ({ name: m.name, up: m.up, down: m.down })),
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'migrations' }),
    logger: undefined,
  });
}

/**
 * SQLite settings for a file shared by a web server: one writer at a time and the busy timeout on
 * every connection (see sqlite-writer.ts), the write-ahead log so readers never wait, and a
 * read-only connection for the reads made on every request (select-one.ts).
 */
export async function prepareSqlite(sequelize: Sequelize): Promise<void> {
  installSqliteWriter(sequelize);
  installSqliteReader(sequelize);
  await sequelize.query('PRAGMA journal_mode = WAL');
  await sequelize.query(`PRAGMA busy_timeout = ${SQLITE_BUSY_TIMEOUT_MS}`);
  await sequelize.query('PRAGMA foreign_keys = ON');
}

/** Any number, the same in every instance: the advisory lock that serialises start-up work. */
const STARTUP_LOCK_KEY = 7_244_231_001;

/**
 * Runs `work` while no other instance on the same database runs start-up work: on PostgreSQL
 * under a transaction-scoped advisory lock (held by one pooled connection while `work` uses
 * others), so several API instances may start at once; on SQLite (one process per file) as is.
 */
export async function withStartupLock<T>(sequelize: Sequelize, work: () => Promise<T>): Promise<T> {
  if (sequelize.getDialect() !== 'postgres') return work();
  return sequelize.transaction(async (transaction) => {
    await sequelize.query('SELECT pg_advisory_xact_lock(:key)', {
      replacements: { key: STARTUP_LOCK_KEY },
      transaction,
    });
    return work();
  });
}

/**
 * Brings the schema up to date and returns the names of the migrations applied. On SQLite the
 * connection gets its pragmas first. On PostgreSQL the migrations run under the start-up lock:
 * a second instance starting at the same time waits, then finds nothing left to apply.
 */
export async function migrateToLatest(sequelize: Sequelize): Promise<string[]> {
  if (sequelize.getDialect() === 'sqlite') await prepareSqlite(sequelize);
  return withStartupLock(sequelize, async () => (await createMigrator(sequelize).up()).map((m) => m.name));
}
