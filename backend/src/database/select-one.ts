import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/** The part of the sqlite3 driver's Database this uses. */
interface SqliteDatabase {
  serialize(queue: () => void): void;
  get(sql: string, parameters: unknown[], callback: (error: Error | null, row: unknown) => void): unknown;
}

/**
 * The first row of a plain SELECT (parameters `$1`, `$2`, … in standard SQL with double-quoted
 * names), or null. For the few reads made on every request: on SQLite it goes to the driver on
 * Sequelize's own connection, skipping what Sequelize adds to each statement (a stack trace
 * captured and formatted, a query object, hooks, retries; for a table name in backquotes a
 * second statement asking for the table's column types). On PostgreSQL it is Sequelize's query.
 * Values come back as the driver gives them: use it for integer and text columns.
 */
export async function selectOne<T extends object>(
  sequelize: Sequelize,
  sql: string,
  parameters: unknown[],
): Promise<T | null> {
  if (sequelize.getDialect() !== 'sqlite') {
    const rows = await sequelize.query<T>(sql, { type: QueryTypes.SELECT, bind: parameters });
    return rows[0] ?? null;
  }
  // The same connection Sequelize reads on outside transactions (with its busy timeout set), and
  // queued as Sequelize queues its statements there: one at a time, rather than several driver
  // threads contending for the connection.
  const manager = sequelize.connectionManager as unknown as { getConnection(options: object): Promise<SqliteDatabase> };
  const database = await manager.getConnection({});
  return new Promise<T | null>((resolve, reject) => {
    database.serialize(() =>
      database.get(sql, parameters, (error, row) => (error ? reject(error) : resolve((row as T | undefined) ?? null))),
    );
  });
}
