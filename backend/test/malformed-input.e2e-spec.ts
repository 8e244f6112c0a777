import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

/**
 * Bodies and ids a careless or hostile client sends: each answers a 4xx in the one error shape,
 * naming the field where there is one. The app here serves a (stand-in) built frontend as well,
 * as the built app does, since its static-files handler used to swallow body errors.
 */
describe('malformed input (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let farmId: number;
  let houseId: number;
  const frontend = mkdtempSync(join(tmpdir(), 'thermbay-frontend-'));

  beforeAll(async () => {
    writeFileSync(join(frontend, 'index.html'), '<!doctype html><title>Thermbay</title>');
    t = await createTestApp({ FRONTEND_DIST: frontend });
    owner = await signIn(t, 'grower@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
    houseId = (await t.http.get(`/api/farms/${farmId}/houses`).set(bearer(owner)).expect(200)).body[0].id;
  });
  afterAll(async () => {
    await t.close();
    rmSync(frontend, { recursive: true, force: true });
  });

  const expectErrorShape = (body: Record<string, unknown>, statusCode: number) => {
    expect(body).toMatchObject({ statusCode, error: expect.any(String), message: expect.any(String) });
    expect(Object.keys(body).every((key) => ['statusCode', 'error', 'message', 'field', 'details'].includes(key))).toBe(
      true,
    );
  };

  it('runs with the static-files module of the built app mounted', () => {
    const names = (
      t.app.getHttpAdapter().getInstance() as { router: { stack: Array<{ name: string }> } }
    ).router.stack.map((layer) => layer.name);
    expect(names).toContain('serveStatic');
  });

  it('answers malformed JSON 400, an oversized body 413 and a bad charset 415, never 404 "Cannot POST"', async () => {
    const malformed = await t.http
      .post('/api/auth/login')
      .set('Content-Type', 'application/json')
      .send('{"email": "a@b.c",')
      .expect(400);
    expectErrorShape(malformed.body, 400);
    expect(malformed.body.message).toMatch(/not valid JSON/);

    const huge = await t.http
      .post(`/api/farms/${farmId}/houses`)
      .set(bearer(owner))
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ name: 'x'.repeat(300_000) }))
      .expect(413);
    expectErrorShape(huge.body, 413);

    const latin1 = await t.http
      .post('/api/auth/login')
      .set('Content-Type', 'application/json; charset=latin1')
      .send(Buffer.from('{"email":"caf\xe9@example.com","password":"x"}', 'latin1'))
      .expect(415);
    expectErrorShape(latin1.body, 415);
  });

  it('refuses JSON nested 1,300 levels deep with 400 before validation, even on sign-in', async () => {
    const deep = '['.repeat(1300) + ']'.repeat(1300);
    for (const [path, token] of [
      ['/api/auth/login', null],
      [`/api/houses/${houseId}/estimate`, owner],
    ] as const) {
      const request = t.http.post(path).set('Content-Type', 'application/json');
      if (token) request.set(bearer(token));
      const res = await request.send(`{"email":${deep},"conditions":${deep}}`).expect(400);
      expectErrorShape(res.body, 400);
      expect(res.body.message).toMatch(/more than 32 levels deep/);
    }
    // A string holding brackets is not nesting.
    const res = await t.http
      .post('/api/auth/login')
      .send({ email: '['.repeat(2000) + '@example.com', password: 'x' })
      .expect((r) => expect([400, 401]).toContain(r.status));
    expect(res.body.message).not.toMatch(/levels deep/);
  });

  it('refuses a prototype key anywhere in a body (a patch or merge must never follow one), 400 before validation', async () => {
    const bodies = [
      '{"constructor":[]}',
      '{"__proto__":{"siteRole":"admin"}}',
      '{"name":"Gus","setpoints":{"prototype":{"x":1}}}',
      '[{"a":[{"__proto__":null}]}]',
    ];
    for (const body of bodies) {
      const res = await t.http
        .patch('/api/users/me')
        .set(bearer(owner))
        .set('Content-Type', 'application/json')
        .send(body)
        .expect(400);
      expectErrorShape(res.body, 400);
      expect(res.body.message).toMatch(/field name that is not allowed \((__proto__|constructor|prototype)\)/);
    }
    // the word as a value is just text
    await t.http.patch('/api/users/me').set(bearer(owner)).send({ name: 'constructor' }).expect(200);
    expect(({} as Record<string, unknown>).siteRole).toBeUndefined();
  });

  it('refuses null where null means nothing, naming the field', async () => {
    const cases: Array<[string, string, object, string]> = [
      ['patch', '/api/users/me', { name: null }, 'name'],
      ['patch', `/api/farms/${farmId}`, { name: null }, 'name'],
      ['patch', `/api/houses/${houseId}`, { name: null }, 'name'],
      ['patch', `/api/houses/${houseId}`, { widthM: null }, 'widthM'],
      ['post', `/api/houses/${houseId}/estimate`, { conditions: null }, 'conditions'],
      ['post', `/api/houses/${houseId}/cooling`, { conditions: null }, 'conditions'],
      ['post', `/api/houses/${houseId}/season`, { startDate: null }, 'startDate'],
      ['post', `/api/houses/${houseId}/measures`, { startDate: null, measures: [] }, 'startDate'],
      ['post', `/api/farms/${farmId}/season-budget`, { startDate: null }, 'startDate'],
    ];
    for (const [method, path, body, field] of cases) {
      const res = await t.http[method as 'post'](path).set(bearer(owner)).send(body);
      expect({ path, body, status: res.status }).toEqual({ path, body, status: 400 });
      expectErrorShape(res.body, 400);
      expect(res.body.details.map((d: { field: string }) => d.field)).toContain(field);
    }
  });

  it('refuses a date that is not on the calendar (2027-13-45, 2027-02-29) naming the field', async () => {
    for (const date of ['2027-13-45', '2027-02-29']) {
      const res = await t.http.post(`/api/houses/${houseId}/night-demand`).set(bearer(owner)).send({ date });
      expect(res.status).toBe(400);
      expect(res.body.field).toBe('date');
    }
  });

  it('refuses arrays inside arrays where objects are expected ("heaters":[[]]) and stores nothing', async () => {
    const before = (await t.http.get(`/api/houses/${houseId}`).set(bearer(owner)).expect(200)).body;
    const res = await t.http
      .patch(`/api/houses/${houseId}`)
      .set(bearer(owner))
      .send({ heaters: [[]] })
      .expect(400);
    expect(res.body.details.map((d: { field: string }) => d.field)).toContain('heaters');
    const after = (await t.http.get(`/api/houses/${houseId}`).set(bearer(owner)).expect(200)).body;
    expect(after.heaters).toEqual(before.heaters);
    await t.http
      .put(`/api/farms/${farmId}/fuel-prices`)
      .set(bearer(owner))
      .send({ prices: [[]] })
      .expect(400);
  });

  it('takes only canonical whole-number ids: 0x1, 1e0, 1.0, 01, +1 and " 1" never reach row 1', async () => {
    await t.http.get(`/api/houses/${houseId}`).set(bearer(owner)).expect(200);
    for (const id of ['0x1', '1e0', '1.0', '01', '+1', '%201', '0', '-1', String(houseId) + '.0']) {
      const res = await t.http.get(`/api/houses/${id}`).set(bearer(owner));
      expect({ id, status: res.status }).toEqual({ id, status: 400 });
      expect(res.body.field).toBe('houseId');
    }
    // a well-formed id beyond every row's range is not found, as on any database
    await t.http.get('/api/houses/99999999999').set(bearer(owner)).expect(404);
  });
});
