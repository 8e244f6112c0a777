import { bearer, createTestApp, type TestApp } from './test-app';

describe('auth (e2e)', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({ LOGIN_RATE_LIMIT_PER_MINUTE: '5' });
  });
  afterAll(() => t.close());

  it('answers health without a token', async () => {
    const res = await t.http.get('/api/health').expect(200);
    expect(res.body.status).toBe('ok');
  });

  it('signs the demo grower in and returns the token and the user, never the hash', async () => {
    const res = await t.http
      .post('/api/auth/login')
      .send({ email: 'Grower@Example.com', password: 'thermbay-demo' })
      .expect(200);
    expect(res.body.accessToken).toEqual(expect.any(String));
    expect(res.body.user).toMatchObject({ email: 'grower@example.com', siteRole: 'user', unitSystem: 'si' });
    expect(JSON.stringify(res.body)).not.toMatch(/passwordHash|\$2[aby]\$/);
  });

  it('refuses a wrong password with one error shape and no stack trace', async () => {
    const res = await t.http
      .post('/api/auth/login')
      .send({ email: 'grower@example.com', password: 'nope' })
      .expect(401);
    expect(res.body).toEqual({ statusCode: 401, error: 'Unauthorized', message: 'E-mail or password is not right' });
  });

  it('rejects unknown fields and bad e-mails naming the field', async () => {
    const res = await t.http
      .post('/api/auth/register')
      .send({ email: 'not-an-email', password: 'longenough', name: 'X', admin: true })
      .expect(400);
    expect(res.body.statusCode).toBe(400);
    const fields = res.body.details.map((d: { field: string }) => d.field);
    expect(fields).toEqual(expect.arrayContaining(['email', 'admin']));
  });

  it('registers, reads itself, changes the unit preference and signs out for good', async () => {
    const reg = await t.http
      .post('/api/auth/register')
      .send({ email: 'new@example.com', password: 'a-good-password', name: 'New Grower' })
      .expect(201);
    const token = reg.body.accessToken;
    await t.http
      .post('/api/auth/register')
      .send({ email: 'NEW@example.com', password: 'a-good-password', name: 'Again' })
      .expect(409);
    const me = await t.http.get('/api/auth/me').set(bearer(token)).expect(200);
    expect(me.body).toMatchObject({ email: 'new@example.com', unitSystem: 'si' });
    const patched = await t.http.patch('/api/users/me').set(bearer(token)).send({ unitSystem: 'us' }).expect(200);
    expect(patched.body.unitSystem).toBe('us');
    await t.http.patch('/api/users/me').set(bearer(token)).send({ unitSystem: 'imperial' }).expect(400);
    await t.http.post('/api/auth/logout').set(bearer(token)).expect(204);
    await t.http.get('/api/auth/me').set(bearer(token)).expect(401);
  });

  it('lists the demo accounts while the demo seed is on', async () => {
    const res = await t.http.get('/api/auth/demo-accounts').expect(200);
    expect(res.body.enabled).toBe(true);
    expect(res.body.accounts.map((a: { email: string }) => a.email)).toEqual(
      expect.arrayContaining(['owner@example.com', 'grower@example.com', 'adviser@example.com', 'admin@example.com']),
    );
  });

  it('needs a token everywhere else', async () => {
    await t.http.get('/api/farms').expect(401);
    await t.http.get('/api/farms').set(bearer('garbage')).expect(401);
  });

  it('rate-limits sign-in attempts', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 8; i += 1) {
      statuses.push(
        (await t.http.post('/api/auth/login').send({ email: 'owner@example.com', password: 'wrong' })).status,
      );
    }
    expect(statuses).toContain(429);
    const limited = await t.http.post('/api/auth/login').send({ email: 'owner@example.com', password: 'wrong' });
    expect(limited.body).toMatchObject({ statusCode: 429, error: 'Too Many Requests' });
  });
});
