import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';
import { Database, OPEN_READONLY } from 'sqlite3';
import { SQLITE_BUSY_TIMEOUT_MS } from './sqlite-writer';

/** How many read-only connections a SQLite database may have open for selectOne. */
export const SQLITE_READER_CONNECTIONS = 4;

interface ReaderConnection {
  database: Promise<Database>;
  /** reads sent to it and not yet answered */
  pending: number;
}

/** A SQLite database's read-only connections, opened as reads need them, refused once Sequelize closes. */
interface SqliteReaders {
  storage: string;
  connections: ReaderConnection[];
  closed: boolean;
}

const readers = new WeakMap<Sequelize, SqliteReaders>();

/**
 * Gives a Sequelize instance on a SQLite file read-only connections of its own for selectOne
 * (up to SQLITE_READER_CONNECTIONS), closed when Sequelize closes. On Sequelize's connection
 * each read queued behind the others and behind Sequelize's statements, one at a time, each
 * waiting for its prepare, step and finalize to come back from a driver thread in turn: under
 * load, requests waited there while the CPU idled. Here the connections take reads side by side.
 *
 * Each connection still runs its own statements one after another: statements overlapping on one
 * connection share one read transaction, and under steady load that transaction would never end,
 * so reads would go on seeing the database as it was before a later sign-out (measured: most reads
 * stale). One at a time, every read starts its own transaction, after the request arrived.
 */
export function installSqliteReader(sequelize: Sequelize): void {
  const storage = (sequelize.options as { storage?: string }).storage;
  if (sequelize.getDialect() !== 'sqlite' || !storage || storage === ':memory:' || readers.has(sequelize)) return;
  const state: SqliteReaders = { storage, connections: [], closed: false };
  readers.set(sequelize, state);
  const close = sequelize.close.bind(sequelize);
  sequelize.close = async () => {
    state.closed = true;
    for (const connection of state.connections.splice(0)) {
      const database = await connection.database.catch(() => null);
      // closing waits for the statements still queued on the connection
      if (database) await new Promise<void>((done) => database.close(() => done()));
    }
    return close();
  };
}

function openReader(state: SqliteReaders): ReaderConnection {
  const connection: ReaderConnection = {
    pending: 0,
    database: new Promise<Database>((resolve, reject) => {
      const database = new Database(state.storage, OPEN_READONLY, (error) => {
        if (error) {
          state.connections = state.connections.filter((other) => other !== connection); // the next read tries again
          return reject(error);
        }
        database.configure('busyTimeout', SQLITE_BUSY_TIMEOUT_MS);
        database.serialize(); // one statement at a time on this connection, for good
        resolve(database);
      });
    }),
  };
  state.connections.push(connection);
  return connection;
}

/** The least busy connection; another one is opened while all are busy and there may be more. */
function readerFor(state: SqliteReaders): ReaderConnection {
  let best: ReaderConnection | undefined;
  for (const connection of state.connections) if (!best || connection.pending < best.pending) best = connection;
  if (!best || (best.pending > 0 && state.connections.length < SQLITE_READER_CONNECTIONS)) return openReader(state);
  return best;
}

/**
 * The first row of a plain SELECT (parameters `$1`, `$2`, … in standard SQL with double-quoted
 * names), or null. For the few reads made on every request: on SQLite it goes to the driver on
 * a read-only connection (see installSqliteReader), skipping what Sequelize adds to each
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
  const state = readers.get(sequelize);
  if (!state) {
    const rows = await sequelize.query<T>(sql, { type: QueryTypes.SELECT, bind: parameters });
    return rows[0] ?? null;
  }
  if (state.closed) throw new Error('the database connection is closed');
  const connection = readerFor(state);
  connection.pending += 1;
  try {
    const database = await connection.database;
    return await new Promise<T | null>((resolve, reject) => {
      database.get(sql, parameters, (error: Error | null, row: T | undefined) =>
        error ? reject(error) : resolve(row ?? null),
      );
    });
  } finally {
    connection.pending -= 1;
  }
}
