import type { QueryOptions, Transaction, TransactionOptions } from 'sequelize';
import { QueryTypes } from 'sequelize';
import type { Sequelize } from 'sequelize-typescript';

/** How long a SQLite connection waits on a lock held by another process before SQLITE_BUSY. */
export const SQLITE_BUSY_TIMEOUT_MS = 5000;
/** How long a write waits for its turn at the one writer before giving up (answered as 503). */
export const WRITER_QUEUE_TIMEOUT_MS = 15_000;

/** A write that could not get the database in time; the error filter answers 503, never 500. */
export class DatabaseBusyError extends Error {
  readonly code = 'WRITER_QUEUE_TIMEOUT';
  constructor(waitedMs: number) {
    super(`the database stayed busy for ${waitedMs} ms`);
    this.name = 'DatabaseBusyError';
  }
}

/**
 * One writer at a time, first come first served. SQLite allows one writer per file; when several
 * connections race for the lock, a waiting statement holds one of libuv's few worker threads
 * while it sleeps, which can starve the statement that holds the lock (writes then fail with
 * SQLITE_BUSY after the busy timeout). Queuing writes in the process instead means no statement
 * of ours ever waits on a SQLite lock; readers never queue (WAL lets them read alongside).
 */
export class WriterQueue {
  private tail: Promise<void> = Promise.resolve();
  private waiting = 0;

  constructor(private readonly timeoutMs = WRITER_QUEUE_TIMEOUT_MS) {}

  /** Resolves with a release function once every earlier writer has released. */
  acquire(): Promise<() => void> {
    const previous = this.tail;
    let releaseTurn!: () => void;
    const turn = new Promise<void>((resolve) => (releaseTurn = resolve));
    let released = false;
    let gaveUp = false;
    const release = () => {
      if (released) return;
      released = true;
      releaseTurn();
    };
    // The next writer waits for this one whether or not this one gives up waiting.
    this.tail = previous.then(() => turn);
    this.waiting += 1;
    return new Promise<() => void>((resolve, reject) => {
      const timer = setTimeout(() => {
        gaveUp = true;
        this.waiting -= 1;
        reject(new DatabaseBusyError(this.timeoutMs));
      }, this.timeoutMs);
      timer.unref?.();
      void previous.then(() => {
        if (gaveUp) {
          release();
          return;
        }
        clearTimeout(timer);
        this.waiting -= 1;
        resolve(release);
      });
    });
  }

  async run<T>(work: () => Promise<T>): Promise<T> {
    const release = await this.acquire();
    try {
      return await work();
    } finally {
      release();
    }
  }

  /** Writers queued behind the current one (for tests and diagnostics). */
  get queued(): number {
    return this.waiting;
  }
}

const READ_TYPES = new Set<string>([
  QueryTypes.SELECT,
  QueryTypes.SHOWTABLES,
  QueryTypes.SHOWINDEXES,
  QueryTypes.DESCRIBE,
  QueryTypes.FOREIGNKEYS,
  'SHOWCONSTRAINTS', // not in the type declarations
  QueryTypes.VERSION,
]);

function isRead(sql: unknown, options: QueryOptions | undefined): boolean {
  if (options?.type) return READ_TYPES.has(options.type);
  const text = typeof sql === 'string' ? sql : ((sql as { query?: string } | null)?.query ?? '');
  return /^\s*SELECT\b/i.test(text);
}

type TransactionFn = (options?: TransactionOptions, autoCallback?: (t: Transaction) => Promise<unknown>) => unknown;
type QueryFn = (sql: unknown, options?: QueryOptions) => Promise<unknown>;

const INSTALLED = Symbol('thermbay.sqliteWriter');

/**
 * Makes a Sequelize instance on SQLite safe for concurrent requests:
 * - every connection it opens (Sequelize opens a new one for each transaction) gets the busy
 *   timeout, not only the first;
 * - every transaction, and every write outside a transaction, takes its turn at one
 *   `WriterQueue`, and transactions begin IMMEDIATE (they hold the write lock from the start,
 *   so a read-then-write inside one can never fail half-way on a lock).
 * Sequelize's own retry of SQLITE_BUSY is turned off: the busy timeout already waited.
 * WAL is a property of the file (`PRAGMA journal_mode = WAL`, set once in prepareSqlite).
 * Other dialects are left untouched.
 */
export function installSqliteWriter(sequelize: Sequelize, queue = new WriterQueue()): WriterQueue {
  const target = sequelize as unknown as Record<symbol, WriterQueue | undefined>;
  if (sequelize.getDialect() !== 'sqlite') return queue;
  const existing = target[INSTALLED];
  if (existing) return existing;
  target[INSTALLED] = queue;

  // Sequelize retries SQLITE_BUSY five times by default, each after a full busy timeout: a locked
  // file then held a request for 25 s or more. The busy timeout is the wait; then answer (503).
  (sequelize.options as { retry?: object }).retry = { max: 1 };

  type Connection = { configure(option: 'busyTimeout', value: number): void };
  type Manager = { getConnection(options?: unknown): Promise<Connection> };
  const manager = sequelize.connectionManager as unknown as Manager;
  const getConnection = manager.getConnection.bind(manager);
  const configured = new WeakSet<Connection>();
  manager.getConnection = async (options?: unknown) => {
    const connection = await getConnection(options);
    if (!configured.has(connection)) {
      connection.configure('busyTimeout', SQLITE_BUSY_TIMEOUT_MS);
      configured.add(connection);
    }
    return connection;
  };

  const originalQuery = sequelize.query.bind(sequelize) as QueryFn;
  (sequelize as unknown as { query: QueryFn }).query = (sql, options) => {
    if (options?.transaction || isRead(sql, options)) return originalQuery(sql, options);
    return queue.run(() => originalQuery(sql, options));
  };

  const originalTransaction = sequelize.transaction.bind(sequelize) as TransactionFn;
  (sequelize as unknown as { transaction: TransactionFn }).transaction = (async (
    optionsOrCallback?: TransactionOptions | ((t: Transaction) => Promise<unknown>),
    maybeCallback?: (t: Transaction) => Promise<unknown>,
  ) => {
    const callback = typeof optionsOrCallback === 'function' ? optionsOrCallback : maybeCallback;
    const options: TransactionOptions = typeof optionsOrCallback === 'object' ? { ...optionsOrCallback } : {};
    // A savepoint inside a transaction already holds the writer.
    if (options.transaction) return originalTransaction(options, callback);
    options.type ??= 'IMMEDIATE' as TransactionOptions['type'];
    const release = await queue.acquire();
    if (callback) {
      try {
        return await originalTransaction(options, callback);
      } finally {
        release();
      }
    }
    // An unmanaged transaction keeps the writer until it commits or rolls back.
    let transaction: Transaction;
    try {
      transaction = (await originalTransaction(options)) as Transaction;
    } catch (error) {
      release();
      throw error;
    }
    const t = transaction as unknown as Record<'commit' | 'rollback', () => Promise<void>>;
    for (const method of ['commit', 'rollback'] as const) {
      const finish = t[method].bind(transaction);
      t[method] = async () => {
        try {
          await finish();
        } finally {
          release();
        }
      };
    }
    return transaction;
  }) as TransactionFn;

  return queue;
}
