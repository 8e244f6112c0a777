import { Logger } from '@nestjs/common';
import { Database } from 'sqlite3';
import { houseBody } from './fixtures';
import { bearer, createTestApp, ifMatch, signIn, type TestApp, joinByInvitation } from './test-app';

/**
 * Parallel writers, stale writes and races: nothing answers 5xx, nothing stores what validation
 * forbids, no write is silently lost, and no farm is left without an owner.
 */
const FARM = { latitudeDeg: 44.9, longitudeDeg: -93.2, elevationM: 260, timeZone: 'America/Chicago' };
const PRICE = (pricePerUnit: number) => ({
  prices: [{ fuelId: 'propane', pricePerUnit, priceUnit: 'us', note: 'invented test price' }],
});
const PERIODS = (label: string) => ({
  periods: [{ startMonthDay: '10-01', endMonthDay: '04-30', mode: 'heated', label }],
});

interface Reply {
  status: number;
  body: { message?: string; current?: { version: number } } & Record<string, unknown>;
}

describe('concurrent writes (e2e)', () => {
  let t: TestApp;
  let grower: string;
  let admin: string;
  let farmId: number;

  beforeAll(async () => {
    t = await createTestApp();
    grower = await signIn(t, 'grower@example.com');
    admin = await signIn(t, 'admin@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  const newFarm = async (token: string, name: string) =>
    (
      await t.http
        .post('/api/farms')
        .set(bearer(token))
        .send({ name, ...FARM })
        .expect(201)
    ).body as {
      id: number;
      version: number;
    };
  const newHouse = async (name: string, changes: object = {}) =>
    (
      await t.http
        .post(`/api/farms/${farmId}/houses`)
        .set(bearer(grower))
        .send({ ...houseBody(name), ...changes })
        .expect(201)
    ).body as { id: number; version: number };
  const register = async (name: string) => {
    const email = `${name}-${Math.random().toString(36).slice(2)}@example.org`;
    const res = await t.http.post('/api/auth/register').send({ email, password: 'member-pass-8472', name }).expect(201);
    return { id: res.body.user.id as number, email, token: res.body.accessToken as string };
  };

  describe('50 parallel mixed writers', () => {
    it('answers every one without a 5xx and keeps every write', async () => {
      // Distinct targets, each written with the version its writer loaded: every write should succeed.
      const priceFarms = await Promise.all(Array.from({ length: 12 }, (_, i) => newFarm(grower, `Prices ${i}`)));
      const patchHouses = await Promise.all(Array.from({ length: 12 }, (_, i) => newHouse(`Patch ${i}`)));
      const calendarHouses = await Promise.all(Array.from({ length: 11 }, (_, i) => newHouse(`Calendar ${i}`)));
      const writes: Array<() => Promise<Reply>> = [
        ...Array.from(
          { length: 15 },
          (_, i) => () =>
            t.http
              .post('/api/farms')
              .set(bearer(grower))
              .send({ name: `Parallel ${i}`, ...FARM }),
        ),
        ...priceFarms.map(
          (farm, i) => () =>
            t.http
              .put(`/api/farms/${farm.id}/fuel-prices`)
              .set(bearer(grower))
              .set(ifMatch(1))
              .send(PRICE(1 + i / 10)),
        ),
        ...patchHouses.map(
          (house, i) => () =>
            t.http
              .patch(`/api/houses/${house.id}`)
              .set(bearer(grower))
              .set(ifMatch(house.version))
              .send({ notes: `parallel note ${i}`, lengthM: 30 + i }),
        ),
        ...calendarHouses.map(
          (house, i) => () =>
            t.http
              .put(`/api/houses/${house.id}/calendar`)
              .set(bearer(grower))
              .set(ifMatch(0))
              .send(PERIODS(`parallel ${i}`)),
        ),
      ];
      expect(writes).toHaveLength(50);
      // Interleave the kinds so that every kind runs alongside every other.
      const order = writes.map((_, i) => i).sort((a, b) => (a % 7) - (b % 7) || a - b);
      const replies = await Promise.all(order.map((i) => writes[i]()));
      const statuses = replies.map((r) => r.status);
      expect(statuses.filter((s) => s >= 500)).toEqual([]);
      expect(statuses.every((s) => s === 200 || s === 201)).toBe(true);

      const farms = (await t.http.get('/api/farms').set(bearer(grower)).expect(200)).body as Array<{ name: string }>;
      expect(farms.filter((f) => f.name.startsWith('Parallel ')).length).toBe(15);
      for (const [i, house] of patchHouses.entries()) {
        const stored = (await t.http.get(`/api/houses/${house.id}`).set(bearer(grower)).expect(200)).body;
        expect(stored).toMatchObject({ notes: `parallel note ${i}`, lengthM: 30 + i, version: house.version + 1 });
      }
      for (const [i, house] of calendarHouses.entries()) {
        const stored = (await t.http.get(`/api/houses/${house.id}/calendar`).set(bearer(grower)).expect(200)).body;
        expect(stored).toMatchObject({ version: 1, periods: [{ label: `parallel ${i}` }] });
      }
      for (const [i, farm] of priceFarms.entries()) {
        const stored = (await t.http.get(`/api/farms/${farm.id}/fuel-prices`).set(bearer(grower)).expect(200)).body;
        expect(stored).toMatchObject({ version: 2, prices: [{ fuelId: 'propane', pricePerUnit: 1 + i / 10 }] });
      }
    });

    // A locked SQLite file; PostgreSQL has no file lock to hold.
    (process.env.DATABASE_URL ? it.skip : it)(
      'answers 503 with the one error shape, naming SQLITE_BUSY in the log, when the file stays locked',
      async () => {
        // Another process holding the write lock longer than the busy timeout.
        const other = new Database(t.databaseFile);
        const run = (sql: string) => new Promise<void>((ok, fail) => other.run(sql, (e) => (e ? fail(e) : ok())));
        const logged = jest.spyOn(Logger.prototype, 'error').mockImplementation(() => undefined);
        try {
          await run('BEGIN IMMEDIATE');
          const house = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body[0];
          const res = await t.http
            .patch(`/api/houses/${house.id}`)
            .set(bearer(grower))
            .set(ifMatch(house.version))
            .send({ notes: 'while locked' });
          expect(res.status).toBe(503);
          expect(res.headers['retry-after']).toBe('1');
          expect(res.body).toEqual({
            statusCode: 503,
            error: 'Service Unavailable',
            message: expect.stringMatching(/busy/),
          });
          expect(logged.mock.calls.map((call) => String(call[0])).join('\n')).toMatch(/\[SQLITE_BUSY\]/);
        } finally {
          logged.mockRestore();
          await run('ROLLBACK');
          await new Promise<void>((ok) => other.close(() => ok()));
        }
        // and the app writes again once the lock is gone
        const house = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(grower)).expect(200)).body[0];
        await t.http
          .patch(`/api/houses/${house.id}`)
          .set(bearer(grower))
          .set(ifMatch(house.version))
          .send({ notes: 'after the lock' })
          .expect(200);
      },
    );
  });

  describe('versions and stale writes', () => {
    it('refuses a write without If-Match (428) or with a malformed one (400), in the one error shape', async () => {
      const house = await newHouse('Unversioned');
      const missing = await t.http.patch(`/api/houses/${house.id}`).set(bearer(grower)).send({ notes: 'x' });
      expect(missing.status).toBe(428);
      expect(missing.body).toMatchObject({ statusCode: 428, error: 'Precondition Required', field: 'If-Match' });
      const malformed = await t.http
        .patch(`/api/houses/${house.id}`)
        .set(bearer(grower))
        .set('If-Match', 'yesterday')
        .send({ notes: 'x' });
      expect(malformed.status).toBe(400);
      expect(malformed.body.field).toBe('If-Match');
      // the quoted ETag form names the same version
      const quoted = await t.http
        .patch(`/api/houses/${house.id}`)
        .set(bearer(grower))
        .set('If-Match', `"${house.version}"`)
        .send({ notes: 'quoted' })
        .expect(200);
      expect(quoted.body.version).toBe(house.version + 1);
    });

    it('answers a stale save with 409 and the current state, for each versioned resource', async () => {
      const house = await newHouse('Stale');
      const farm = await newFarm(grower, 'Stale farm');
      const first = async (path: string, method: 'patch' | 'put', body: object, version: number) =>
        t.http[method](path).set(bearer(grower)).set(ifMatch(version)).send(body).expect(200);
      const cases: Array<{ path: string; method: 'patch' | 'put'; a: object; b: object; version: number }> = [
        { path: `/api/houses/${house.id}`, method: 'patch', a: { notes: 'a' }, b: { notes: 'b' }, version: 1 },
        { path: `/api/farms/${farm.id}`, method: 'patch', a: { name: 'A farm' }, b: { name: 'B farm' }, version: 1 },
        { path: `/api/houses/${house.id}/calendar`, method: 'put', a: PERIODS('a'), b: PERIODS('b'), version: 0 },
        { path: `/api/farms/${farm.id}/fuel-prices`, method: 'put', a: PRICE(1), b: PRICE(2), version: 1 },
      ];
      const demoClimate = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body;
      cases.push({
        path: `/api/farms/${farm.id}/climate`,
        method: 'put',
        a: { ...demoClimate.climate, sourceNote: 'a' },
        b: { ...demoClimate.climate, sourceNote: 'b' },
        version: 0,
      });
      for (const c of cases) {
        const saved = await first(c.path, c.method, c.a, c.version);
        expect(saved.body.version).toBe(c.version + 1);
        // a second person, still holding the version they loaded before the first save
        const stale = await t.http[c.method](c.path).set(bearer(grower)).set(ifMatch(c.version)).send(c.b);
        expect(stale.status).toBe(409);
        expect(stale.body).toMatchObject({ statusCode: 409, error: 'Conflict', message: /someone else/ });
        const current = (await t.http.get(c.path).set(bearer(grower)).expect(200)).body;
        expect(stale.body.current).toEqual(current);
        // the same save again changes nothing, so it is not a conflict
        await t.http[c.method](c.path).set(bearer(grower)).set(ifMatch(c.version)).send(c.a).expect(200);
        // overwriting with the version from the conflict succeeds
        const overwritten = await t.http[c.method](c.path)
          .set(bearer(grower))
          .set(ifMatch(stale.body.current.version))
          .send(c.b)
          .expect(200);
        expect(overwritten.body.version).toBe(c.version + 2);
      }
    });

    it('never stores a ridge below the eave from two parallel PATCHes (validated inside the transaction)', async () => {
      for (let round = 0; round < 10; round += 1) {
        const house = await newHouse(`Race ${round}`, { eaveHeightM: 3, ridgeHeightM: 5 });
        const patch = (body: object) =>
          t.http.patch(`/api/houses/${house.id}`).set(bearer(grower)).set(ifMatch(house.version)).send(body);
        const replies: Reply[] = await Promise.all([patch({ eaveHeightM: 4.5 }), patch({ ridgeHeightM: 4 })]);
        expect(replies.map((r) => r.status).sort()).toEqual([200, 409]);
        const loser = replies.find((r) => r.status === 409)!;
        const loserBody = replies.indexOf(loser) === 0 ? { eaveHeightM: 4.5 } : { ridgeHeightM: 4 };
        // retried on the winner's version, the combined house is refused, naming the field
        const retry = await t.http
          .patch(`/api/houses/${house.id}`)
          .set(bearer(grower))
          .set(ifMatch(loser.body.current!.version))
          .send(loserBody);
        expect(retry.status).toBe(422);
        const stored = (await t.http.get(`/api/houses/${house.id}`).set(bearer(grower)).expect(200)).body;
        expect(stored.ridgeHeightM).toBeGreaterThan(stored.eaveHeightM);
      }
    });

    it('saves a first calendar and climate from 20 parallel requests without "already exists"', async () => {
      const house = await newHouse('First calendar');
      const farm = await newFarm(grower, 'First climate');
      const climate = (await t.http.get(`/api/farms/${farmId}/climate`).set(bearer(grower)).expect(200)).body.climate;
      const calendarSaves = (label: (i: number) => string) =>
        Promise.all(
          Array.from({ length: 20 }, (_, i) =>
            t.http
              .put(`/api/houses/${house.id}/calendar`)
              .set(bearer(grower))
              .set(ifMatch(0))
              .send(PERIODS(label(i))),
          ),
        );
      const climateSaves = Array.from({ length: 20 }, () =>
        t.http.put(`/api/farms/${farm.id}/climate`).set(bearer(grower)).set(ifMatch(0)).send(climate),
      );
      // the same first save from 20 tabs: every one is answered 200 with the one stored row
      const sameCalendar: Reply[] = await calendarSaves(() => 'first');
      const sameClimate: Reply[] = await Promise.all(climateSaves);
      for (const reply of [...sameCalendar, ...sameClimate]) {
        expect(reply.status).toBe(200);
        expect(reply.body.version).toBe(1);
      }
      // 20 different first saves of another house: one wins, the rest learn what it stored
      const other = await newHouse('Contested calendar');
      const different: Reply[] = await Promise.all(
        Array.from({ length: 20 }, (_, i) =>
          t.http
            .put(`/api/houses/${other.id}/calendar`)
            .set(bearer(grower))
            .set(ifMatch(0))
            .send(PERIODS(`tab ${i}`)),
        ),
      );
      expect(different.filter((r) => r.status === 200)).toHaveLength(1);
      expect(different.filter((r) => r.status === 409)).toHaveLength(19);
      for (const reply of different) expect(reply.body.message ?? '').not.toMatch(/already exists/);
      const stored = (await t.http.get(`/api/houses/${other.id}/calendar`).set(bearer(grower)).expect(200)).body;
      for (const reply of different.filter((r) => r.status === 409)) expect(reply.body.current).toEqual(stored);
    });
  });

  describe('a farm keeps an owner', () => {
    const setUpTwoOwners = async () => {
      const a = await register('owner-a');
      const b = await register('owner-b');
      const farm = await newFarm(a.token, 'Two owners');
      // Invitations name grower, adviser or viewer; a second owner is then promoted.
      await joinByInvitation(t, a.token, farm.id, b.email, 'grower', b.token);
      await t.http
        .patch(`/api/farms/${farm.id}/members/${b.id}`)
        .set(bearer(a.token))
        .send({ role: 'owner' })
        .expect(200);
      return { a, b, farm };
    };
    const ownersOf = async (token: string, id: number) =>
      (
        (await t.http.get(`/api/farms/${id}/members`).set(bearer(token)).expect(200)).body as Array<{ role: string }>
      ).filter((m) => m.role === 'owner');

    it('lets only one of two owners demoting each other at once succeed', async () => {
      for (let round = 0; round < 5; round += 1) {
        const { a, b, farm } = await setUpTwoOwners();
        const replies = await Promise.all([
          t.http.patch(`/api/farms/${farm.id}/members/${b.id}`).set(bearer(a.token)).send({ role: 'grower' }),
          t.http.patch(`/api/farms/${farm.id}/members/${a.id}`).set(bearer(b.token)).send({ role: 'grower' }),
        ]);
        // the loser may lose either to the last-owner rule (409) or by no longer being an owner (403)
        const statuses = replies.map((r) => r.status).sort();
        expect(statuses[0]).toBe(200);
        expect([403, 409]).toContain(statuses[1]);
        const winner = replies[0].status === 200 ? a : b;
        expect(await ownersOf(winner.token, farm.id)).toHaveLength(1);
      }
    });

    it('lets only one of two owners removing each other at once succeed', async () => {
      for (let round = 0; round < 5; round += 1) {
        const { a, b, farm } = await setUpTwoOwners();
        const replies = await Promise.all([
          t.http.delete(`/api/farms/${farm.id}/members/${b.id}`).set(bearer(a.token)),
          t.http.delete(`/api/farms/${farm.id}/members/${a.id}`).set(bearer(b.token)),
        ]);
        const statuses = replies.map((r) => r.status).sort();
        expect(statuses[0]).toBe(204);
        expect([404, 409]).toContain(statuses[1]);
        const winner = replies[0].status === 204 ? a : b;
        expect(await ownersOf(winner.token, farm.id)).toHaveLength(1);
      }
    });

    it('refuses to remove or demote the last owner (409)', async () => {
      const a = await register('lonely-owner');
      const farm = await newFarm(a.token, 'One owner');
      const demote = await t.http
        .patch(`/api/farms/${farm.id}/members/${a.id}`)
        .set(bearer(a.token))
        .send({ role: 'viewer' });
      expect(demote.status).toBe(409);
      expect(demote.body.message).toMatch(/at least one owner/);
      await t.http.delete(`/api/farms/${farm.id}/members/${a.id}`).set(bearer(a.token)).expect(409);
    });

    it('refuses to delete a sole owner, naming the farms, for the admin and for the user themselves', async () => {
      const a = await register('sole-owner');
      await newFarm(a.token, 'Sole farm one');
      await newFarm(a.token, 'Sole farm two');
      const byAdmin = await t.http.delete(`/api/users/${a.id}`).set(bearer(admin));
      expect(byAdmin.status).toBe(409);
      expect(byAdmin.body.message).toMatch(/only owner of “Sole farm one”, “Sole farm two”/);
      expect(byAdmin.body.details.map((d: { message: string }) => d.message)).toEqual([
        'Sole farm one',
        'Sole farm two',
      ]);
      const bySelf = await t.http.delete('/api/users/me').set(bearer(a.token)).send({ password: 'member-pass-8472' });
      expect(bySelf.status).toBe(409);
      expect(bySelf.body.message).toMatch(/You are the only owner of “Sole farm one”, “Sole farm two”/);
      // the account is still there
      await t.http.get('/api/farms').set(bearer(a.token)).expect(200);
    });

    it('deletes a user who shares ownership, and a user closing their account with the right password', async () => {
      const { a, b, farm } = await setUpTwoOwners();
      await t.http.delete(`/api/users/${b.id}`).set(bearer(admin)).expect(204);
      expect(await ownersOf(a.token, farm.id)).toHaveLength(1);
      const c = await register('leaving');
      await t.http.delete('/api/users/me').set(bearer(c.token)).send({ password: 'wrong-password' }).expect(403);
      await t.http.delete('/api/users/me').set(bearer(c.token)).send({ password: 'member-pass-8472' }).expect(204);
      await t.http.get('/api/farms').set(bearer(c.token)).expect(401);
    });

    it('never lets an admin deletion and a demotion together leave a farm ownerless', async () => {
      for (let round = 0; round < 5; round += 1) {
        const { a, b, farm } = await setUpTwoOwners();
        await Promise.all([
          t.http.delete(`/api/users/${b.id}`).set(bearer(admin)),
          t.http.patch(`/api/farms/${farm.id}/members/${a.id}`).set(bearer(b.token)).send({ role: 'grower' }),
        ]);
        // a stays a member either way (an owner, or a grower with b still the owner)
        const remaining = await t.http.get(`/api/farms/${farm.id}/members`).set(bearer(a.token)).expect(200);
        expect(remaining.body.filter((m: { role: string }) => m.role === 'owner').length).toBeGreaterThanOrEqual(1);
      }
    });
  });
});
