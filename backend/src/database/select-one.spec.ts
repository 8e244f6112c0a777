import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Sequelize } from 'sequelize-typescript';
import { prepareSqlite } from './migrator';
import { selectOne } from './select-one';

interface Row {
  id: number;
  tokenVersion: number;
}

const SQL = 'SELECT "id" AS "id", "tokenVersion" AS "tokenVersion" FROM "people" WHERE "id" = $1';

describe('selectOne on SQLite', () => {
  let folder: string;
  let sequelize: Sequelize;

  beforeEach(async () => {
    folder = mkdtempSync(join(tmpdir(), 'thermbay-select-one-'));
    sequelize = new Sequelize({ dialect: 'sqlite', storage: join(folder, 'db.sqlite'), logging: false });
    await prepareSqlite(sequelize);
    await sequelize.query('CREATE TABLE "people" ("id" INTEGER PRIMARY KEY, "tokenVersion" INTEGER NOT NULL)');
    await sequelize.query('INSERT INTO "people" ("id", "tokenVersion") VALUES (1, 0), (2, 5)');
  });

  afterEach(async () => {
    await sequelize.close().catch(() => undefined);
    rmSync(folder, { recursive: true, force: true });
  });

  it('reads one row by its parameters, or null', async () => {
    await expect(selectOne<Row>(sequelize, SQL, [2])).resolves.toEqual({ id: 2, tokenVersion: 5 });
    await expect(selectOne<Row>(sequelize, SQL, [3])).resolves.toBeNull();
  });

  it('sees a write committed through Sequelize at once (a sign-out takes effect on the next request)', async () => {
    await expect(selectOne<Row>(sequelize, SQL, [1])).resolves.toEqual({ id: 1, tokenVersion: 0 });
    await sequelize.query('UPDATE "people" SET "tokenVersion" = "tokenVersion" + 1 WHERE "id" = 1');
    await expect(selectOne<Row>(sequelize, SQL, [1])).resolves.toEqual({ id: 1, tokenVersion: 1 });
    await sequelize.transaction((transaction) =>
      sequelize.query('UPDATE "people" SET "tokenVersion" = 9 WHERE "id" = 1', { transaction }),
    );
    await expect(selectOne<Row>(sequelize, SQL, [1])).resolves.toEqual({ id: 1, tokenVersion: 9 });
  });

  it('answers many reads at once, each its own row', async () => {
    const ids = Array.from({ length: 60 }, (_, index) => 1 + (index % 2));
    const rows = await Promise.all(ids.map((id) => selectOne<Row>(sequelize, SQL, [id])));
    expect(rows.map((row) => row?.tokenVersion)).toEqual(ids.map((id) => (id === 1 ? 0 : 5)));
  });

  it('never answers a read begun after a commit with what was there before, under a steady stream of reads', async () => {
    // Statements overlapping on one SQLite connection share one read transaction: under a steady
    // stream it never ends, and reads go on seeing the rows as they were (a sign-out unseen).
    let committed = 0;
    let stop = false;
    let reads = 0;
    const stale: string[] = [];
    const reader = async () => {
      while (!stop) {
        const before = committed;
        const row = await selectOne<Row>(sequelize, SQL, [1]);
        reads += 1;
        if (row!.tokenVersion < before) stale.push(`saw ${row!.tokenVersion} after ${before} was committed`);
      }
    };
    const readers = Array.from({ length: 50 }, reader);
    for (let version = 1; version <= 10; version++) {
      await new Promise((done) => setTimeout(done, 30));
      await sequelize.query(`UPDATE "people" SET "tokenVersion" = ${version} WHERE "id" = 1`);
      committed = version;
    }
    await new Promise((done) => setTimeout(done, 30));
    stop = true;
    await Promise.all(readers);
    expect(reads).toBeGreaterThan(500);
    expect(stale).toEqual([]);
  });

  it('refuses reads once Sequelize has closed', async () => {
    await selectOne<Row>(sequelize, SQL, [1]);
    await sequelize.close();
    await expect(selectOne<Row>(sequelize, SQL, [1])).rejects.toThrow('closed');
  });

  it('cannot write through the reading connection', async () => {
    await expect(selectOne(sequelize, 'UPDATE "people" SET "tokenVersion" = 7 WHERE "id" = $1', [1])).rejects.toThrow(
      /readonly/,
    );
  });
});
