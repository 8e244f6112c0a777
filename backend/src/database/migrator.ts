import { Sequelize } from 'sequelize-typescript';
import { SequelizeStorage, Umzug } from 'umzug';
import { MIGRATIONS } from './migrations';
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
 * every connection (see sqlite-writer.ts), and the write-ahead log so readers never wait.
 */
export async function prepareSqlite(sequelize: Sequelize): Promise<void> {
  installSqliteWriter(sequelize);
  await sequelize.query('PRAGMA journal_mode = WAL');
  await sequelize.query(`PRAGMA busy_timeout = ${SQLITE_BUSY_TIMEOUT_MS}`);
  await sequelize.query('PRAGMA foreign_keys = ON');
}
