import { Sequelize } from 'sequelize-typescript';
import { migrateToLatest } from '../../database/migrator';
import {
  DatabaseLoginAttemptStore,
  hashKey,
  MemoryLoginAttemptStore,
  type LoginAttemptStore,
} from './login-attempt-store';
import { LoginAttempt } from './login-attempt.model';

const WINDOW_MS = 60_000;
const at = (seconds: number) => new Date(Date.UTC(2026, 0, 15, 8, 0, 0) + seconds * 1000);

let sequelize: Sequelize;

beforeAll(async () => {
  // The table as migration 0005 makes it, on a private in-memory SQLite database.
  sequelize = new Sequelize({ dialect: 'sqlite', storage: ':memory:', logging: false, models: [LoginAttempt] });
  await migrateToLatest(sequelize);
});

afterAll(() => sequelize.close());

const stores: Array<[string, () => Promise<LoginAttemptStore>]> = [
  ['memory', async () => new MemoryLoginAttemptStore(WINDOW_MS)],
  [
    'database',
    async () => {
      await LoginAttempt.destroy({ where: {} });
      return new DatabaseLoginAttemptStore(LoginAttempt, WINDOW_MS);
    },
  ],
];

describe.each(stores)('%s login attempt store', (_name, makeStore) => {
  let store: LoginAttemptStore;
  beforeEach(async () => {
    store = await makeStore();
  });

  it('counts the attempts recorded under a key, this one included', async () => {
    expect(await store.count('address:10.0.0.1', at(0))).toBe(0);
    expect(await store.record('address:10.0.0.1', at(0))).toBe(1);
    expect(await store.record('address:10.0.0.1', at(1))).toBe(2);
    expect(await store.record('address:10.0.0.1', at(2))).toBe(3);
    expect(await store.count('address:10.0.0.1', at(3))).toBe(3);
  });

  it('keeps keys apart', async () => {
    await store.record('address:10.0.0.1', at(0));
    await store.record('address:10.0.0.1', at(1));
    expect(await store.record('address:10.0.0.2', at(2))).toBe(1);
    expect(await store.count('account:grower@example.com', at(2))).toBe(0);
  });

  it('forgets attempts once they are a full minute old (a sliding window)', async () => {
    await store.record('k', at(0));
    await store.record('k', at(30));
    expect(await store.count('k', at(59))).toBe(2);
    // 60 s after the first attempt it has left the window; the one at 30 s has not.
    expect(await store.count('k', at(60))).toBe(1);
    expect(await store.count('k', at(90))).toBe(0);
    expect(await store.record('k', at(91))).toBe(1);
  });

  it('clears one key and only that one', async () => {
    await store.record('account:a@example.com', at(0));
    await store.record('account:b@example.com', at(0));
    await store.clear('account:a@example.com');
    expect(await store.count('account:a@example.com', at(1))).toBe(0);
    expect(await store.count('account:b@example.com', at(1))).toBe(1);
  });
});

describe('the stores keep no address or e-mail in clear', () => {
  it('hashes keys to 64 hexadecimal characters', () => {
    expect(hashKey('account:grower@example.com')).toMatch(/^[0-9a-f]{64}$/);
    expect(hashKey('account:grower@example.com')).not.toBe(hashKey('account:owner@example.com'));
  });

  it('the database rows hold only the hash', async () => {
    await LoginAttempt.destroy({ where: {} });
    await new DatabaseLoginAttemptStore(LoginAttempt, WINDOW_MS).record('account:grower@example.com', at(0));
    const rows = await LoginAttempt.findAll({ raw: true });
    expect(rows).toHaveLength(1);
    expect(JSON.stringify(rows)).not.toContain('grower');
  });

  it('the database store deletes rows older than the window as it goes', async () => {
    await LoginAttempt.destroy({ where: {} });
    const store = new DatabaseLoginAttemptStore(LoginAttempt, WINDOW_MS);
    await store.record('a', at(0));
    await store.record('b', at(10));
    expect(await LoginAttempt.count()).toBe(2);
    await store.record('c', at(130));
    expect(await LoginAttempt.count()).toBe(1);
  });

  it('the memory store drops keys with nothing left in the window', async () => {
    const store = new MemoryLoginAttemptStore(WINDOW_MS);
    await store.record('a', at(0));
    await store.record('b', at(10));
    expect(store.size).toBe(2);
    await store.record('c', at(130));
    expect(store.size).toBe(1);
  });
});
