import { bearer, createTestApp, signIn, type TestApp, ifMatch, versionOf } from './test-app';

/**
 * Inputs that SQLite takes in its stride but PostgreSQL refuses at the column (integer range,
 * NUL characters): the API must answer the same way on both, never 500.
 */
describe('the same answers on SQLite and PostgreSQL (e2e)', () => {
  let t: TestApp;
  let owner: string;
  let farmId: number;
  beforeAll(async () => {
    t = await createTestApp();
    owner = await signIn(t, 'owner@example.com');
    farmId = (await t.http.get('/api/farms').set(bearer(owner)).expect(200)).body[0].id;
  });
  afterAll(() => t.close());

  it.each(['/api/houses/2147483648', '/api/houses/99999999999999', '/api/farms/2147483648'])(
    'an id beyond the integer column range is simply not found: %s',
    async (path) => {
      const res = await t.http.get(path).set(bearer(owner));
      expect(res.status).toBe(404);
      expect(res.body).toMatchObject({ statusCode: 404, error: 'Not Found' });
    },
  );

  it('writes to an id beyond the integer column range are not found either', async () => {
    await t.http.patch('/api/houses/2147483648').set(bearer(owner)).send({ name: 'X' }).expect(404);
    await t.http.patch('/api/farms/2147483648').set(bearer(owner)).send({ name: 'X' }).expect(404);
    await t.http.delete('/api/farms/2147483648').set(bearer(owner)).expect(404);
    await t.http.post('/api/houses/2147483648/estimate').set(bearer(owner)).send({}).expect(404);
  });

  it('a NUL character in a text field is refused with 400 naming the field', async () => {
    const res = await t.http
      .patch(`/api/farms/${farmId}`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/farms/${farmId}`)))
      .send({ name: 'North\u0000Ridge' });
    expect(res.status).toBe(400);
    expect(res.body).toMatchObject({ statusCode: 400, field: 'name' });
    const nested = await t.http.patch('/api/users/me').set(bearer(owner)).send({ name: 'Own\u0000er' });
    expect(nested.status).toBe(400);
  });

  it('text is stored and read back exactly, accents and symbols included', async () => {
    const name = 'Serre nº 2 — “Été” 温室 m³';
    await t.http
      .patch(`/api/farms/${farmId}`)
      .set(bearer(owner))
      .set(ifMatch(await versionOf(t, owner, `/api/farms/${farmId}`)))
      .send({ name })
      .expect(200);
    expect((await t.http.get(`/api/farms/${farmId}`).set(bearer(owner)).expect(200)).body.name).toBe(name);
  });
});
