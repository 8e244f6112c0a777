import { ConnectionRefusedError } from 'sequelize';
import { Sequelize } from 'sequelize-typescript';
import { existsSync } from 'node:fs';
import { Client } from 'pg';
import { randomBytes } from 'node:crypto';
import { migrateToLatest, withStartupLock } from '../src/database/migrator';
import { MIGRATIONS } from '../src/database/migrations';
import { createTestApp, type TestApp } from './test-app';

/** Whether a PostgreSQL database of that name exists on the test server. */
async function postgresDatabaseExists(name: string): Promise<boolean> {
  const client = new Client({ connectionString: process.env.DATABASE_URL });
  await client.connect();
  try {
    const result = await client.query('SELECT 1 FROM pg_database WHERE datname = $1', [name]);
    return result.rowCount === 1;
  } finally {
    await client.end();
  }
}

/** Which database the suite runs on: `bash .ci/test-postgres.sh` sets DATABASE_URL. */
const expectedDialect = process.env.DATABASE_URL ? 'postgres' : 'sqlite';

describe('database (e2e)', () => {
  describe('health', () => {
    let t: TestApp;
    beforeAll(async () => {
      t = await createTestApp();
    });
    afterAll(() => t.close());

    it('reports the database reachable and which dialect, without its address or credentials', async () => {
      const res = await t.http.get('/api/health').expect(200);
      expect(res.body).toEqual({
        status: 'ok',
        version: expect.any(String),
        database: { dialect: expectedDialect, reachable: true },
      });
      const text = JSON.stringify(res.body);
      if (t.database.dialect === 'postgres') {
        const url = new URL(t.database.url);
        expect(text).not.toContain(url.hostname);
        expect(text).not.toContain(t.database.name);
        expect(text).not.toContain(url.port);
      } else {
        expect(text).not.toContain(t.database.file);
        expect(text).not.toContain('.sqlite');
      }
    });

    it('answers 503 while the database cannot be reached, and 200 again once it can', async () => {
      // Every query asks the connection manager for a connection; an unreachable server makes
      // that fail with the driver's connection error (here with a host and password in it).
      const sequelize = t.app.get(Sequelize);
      const refused = new ConnectionRefusedError(
        Object.assign(new Error('connect ECONNREFUSED 10.9.8.7:5432 (user thermbay, password hunter2)'), {
          code: 'ECONNREFUSED',
        }),
      );
      const spy = jest.spyOn(sequelize.connectionManager, 'getConnection').mockRejectedValue(refused);
      try {
        const res = await t.http.get('/api/health').expect(503);
        expect(res.body).toEqual({
          status: 'unavailable',
          version: expect.any(String),
          database: { dialect: expectedDialect, reachable: false },
        });
        expect(JSON.stringify(res.body)).not.toMatch(/10\.9\.8\.7|hunter2|ECONNREFUSED/);
        expect(spy).toHaveBeenCalled();
      } finally {
        spy.mockRestore();
      }
      await t.http.get('/api/health').expect(200);
    });
  });

  describe('each test app gets a database of its own', () => {
    it('a second app in the same spec file starts on a new, empty database and the first one is removed', async () => {
      const first = await createTestApp({ DEMO_SEED: 'false' });
      await first.http
        .post('/api/auth/register')
        .send({ email: 'only-in-first@example.com', name: 'First', password: 'first-app-password' })
        .expect(201);
      const firstDatabase = first.database;
      await first.close();

      const second = await createTestApp({ DEMO_SEED: 'false' });
      try {
        expect(second.database).not.toEqual(firstDatabase);
        // The account registered on the first app does not exist here...
        await second.http
          .post('/api/auth/login')
          .send({ email: 'only-in-first@example.com', password: 'first-app-password' })
          .expect(401);
        // ...so registering it again succeeds instead of answering 409.
        await second.http
          .post('/api/auth/register')
          .send({ email: 'only-in-first@example.com', name: 'Second', password: 'second-app-password' })
          .expect(201);
        // The first app's database was removed when it closed, the second one's was not.
        if (firstDatabase.dialect === 'sqlite' && second.database.dialect === 'sqlite') {
          expect(existsSync(firstDatabase.file)).toBe(false);
          expect(existsSync(second.database.file)).toBe(true);
        }
        if (firstDatabase.dialect === 'postgres' && second.database.dialect === 'postgres') {
          expect(await postgresDatabaseExists(firstDatabase.name)).toBe(false);
          expect(await postgresDatabaseExists(second.database.name)).toBe(true);
        }
      } finally {
        await second.close();
      }
      if (second.database.dialect === 'sqlite') expect(existsSync(second.database.file)).toBe(false);
      else expect(await postgresDatabaseExists(second.database.name)).toBe(false);
    });

    it('refuses to open a second app while the first is still open', async () => {
      const first = await createTestApp({ DEMO_SEED: 'false' });
      try {
        await expect(createTestApp({ DEMO_SEED: 'false' })).rejects.toThrow(
          /close the app on .* before creating another/,
        );
      } finally {
        await first.close();
      }
    });
  });

  (expectedDialect === 'postgres' ? describe : describe.skip)('several instances starting at once (PostgreSQL)', () => {
    it('migrate one database exactly once between them', async () => {
      const name = `thermbay_e2e_migrate_${randomBytes(6).toString('hex')}`;
      const server = new Client({ connectionString: process.env.DATABASE_URL });
      await server.connect();
      await server.query(`CREATE DATABASE "${name}"`);
      const url = new URL(process.env.DATABASE_URL!);
      url.pathname = `/${name}`;
      const instances = [1, 2, 3].map(() => new Sequelize(url.toString(), { dialect: 'postgres', logging: false }));
      try {
        const applied = await Promise.all(instances.map((sequelize) => migrateToLatest(sequelize)));
        // One instance applied every migration; the others waited for it and found none left.
        expect(applied.map((names) => names.length).sort()).toEqual([0, 0, MIGRATIONS.length]);
        expect(applied.flat()).toEqual(MIGRATIONS.map((m) => m.name));
      } finally {
        await Promise.all(instances.map((sequelize) => sequelize.close()));
        await server.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`);
        await server.end();
      }
    });

    it('run start-up work (the demo seed) one instance at a time', async () => {
      const a = new Sequelize(process.env.DATABASE_URL!, { dialect: 'postgres', logging: false });
      const b = new Sequelize(process.env.DATABASE_URL!, { dialect: 'postgres', logging: false });
      const watcher = new Client({ connectionString: process.env.DATABASE_URL });
      await watcher.connect();
      const events: string[] = [];
      let releaseA!: () => void;
      const aMayFinish = new Promise<void>((resolve) => (releaseA = resolve));
      let aStarted!: () => void;
      const aIsIn = new Promise<void>((resolve) => (aStarted = resolve));
      try {
        const first = withStartupLock(a, async () => {
          events.push('a starts');
          aStarted();
          await aMayFinish;
          events.push('a ends');
        });
        await aIsIn;
        const second = withStartupLock(b, async () => {
          events.push('b starts');
        });
        // Wait until b is queued on the lock (PostgreSQL shows it as an ungranted advisory lock).
        for (;;) {
          const waiting = await watcher.query("SELECT 1 FROM pg_locks WHERE locktype = 'advisory' AND NOT granted");
          if ((waiting.rowCount ?? 0) > 0) break;
          await new Promise((resolve) => setImmediate(resolve));
        }
        expect(events).toEqual(['a starts']);
        releaseA();
        await Promise.all([first, second]);
        expect(events).toEqual(['a starts', 'a ends', 'b starts']);
      } finally {
        await watcher.end();
        await Promise.all([a.close(), b.close()]);
      }
    });
  });
});
