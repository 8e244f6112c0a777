import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { Database, OPEN_READONLY } from 'sqlite3';
import { SQLITE_BUSY_TIMEOUT_MS } from './sqlite-writer';

/** The read-only connection of a SQLite database, opened with the first read, refused once Sequelize closes. */
interface SqliteReader {
  connection: Promise<Database> | null;
  closed: boolean;
}

const readers = new WeakMap<Sequelize, SqliteReader>();

/**
 * Gives a Sequelize instance on a SQLite file a read-only connection of its own for selectOne,
 * closed when Sequelize closes. Statements on it run side by side (WAL lets readers in beside the
 * one writer). On Sequelize's own connection they would queue behind one another and behind
 * Sequelize's statements, each waiting for its prepare, step and finalize to come back from a
 * driver thread in turn: under load, requests waited on one another there while the CPU idled.
 */
export function installSqliteReader(sequelize: Sequelize): void {
  const storage = (sequelize.options as { storage?: string }).storage;
  if (sequelize.getDialect() !== 'sqlite' || !storage || storage === ':memory:' || readers.has(sequelize)) return;
  const reader: SqliteReader = { connection: null, closed: false };
  readers.set(sequelize, reader);
  const close = sequelize.close.bind(sequelize);
  sequelize.close = async () => {
    reader.closed = true;
    const connection = await reader.connection?.catch(() => null);
    if (connection) await new Promise<void>((done) => connection.close(() => done()));
    return close();
  };
}

function readerConnection(reader: SqliteReader, storage: string): Promise<Database> {
  if (reader.closed) return Promise.reject(new Error('the database connection is closed'));
  reader.connection ??= new Promise<Database>((resolve, reject) => {
    const connection = new Database(storage, OPEN_READONLY, (error) => {
      if (error) {
        reader.connection = null; // the next read tries again
        return reject(error);
      }
      connection.configure('busyTimeout', SQLITE_BUSY_TIMEOUT_MS);
      resolve(connection);
    });
  });
  return reader.connection;
}

/**
 * The first row of a plain SELECT (parameters `$1`, `$2`, … in standard SQL with double-quoted
 * names), or null. For the few reads made on every request: on SQLite it goes to the driver on
 * the reader's connection (see installSqliteReader), skipping what Sequelize adds to each
 * statement (a stack trace captured and formatted, a query object, hooks, retries; for a table
 * name in backquotes a second statement asking for the table's column types). Elsewhere (and on
 * a SQLite database without a reader) it is Sequelize's query. Values come back as the driver
 * gives them: use it for integer and text columns.
 */
export async function selectOne<T extends object>(
  sequelize: Sequelize,
  sql: string,
  parameters: unknown[],
): Promise<T | null> {
  const reader = readers.get(sequelize);
  if (!reader) {
    const rows = await sequelize.query<T>(sql, { type: QueryTypes.SELECT, bind: parameters });
    return rows[0] ?? null;
  }
  const connection = await readerConnection(reader, (sequelize.options as { storage: string }).storage);
  return new Promise<T | null>((resolve, reject) => {
    connection.get(sql, parameters, (error: Error | null, row: T | undefined) =>
      error ? reject(error) : resolve(row ?? null),
    );
  });
}
