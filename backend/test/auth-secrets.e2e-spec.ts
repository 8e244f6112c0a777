import { JwtService } from '@nestjs/jwt';
import { statSync } from 'node:fs';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

// The module object itself: the app's `import * as bcrypt` reads its functions through it, so a
// spy set here sees the app's calls.
// eslint-disable-next-line @typescript-eslint/no-require-imports
const bcryptModule = require('bcryptjs') as typeof import('bcryptjs');

/** The signing secret and the sign-in check, as an attacker would probe them. */
describe('auth secrets (e2e)', () => {
  let t: TestApp;

  beforeAll(async () => {
    // No JWT_SECRET: the app generates one beside its database file.
    t = await createTestApp({ JWT_SECRET: '' });
  });
  afterAll(() => t.close());
  afterEach(() => jest.restoreAllMocks());

  // Only a SQLite file has a folder to keep the secret in (on PostgreSQL set JWT_SECRET).
  (process.env.DATABASE_URL ? it.skip : it)('keeps a generated secret beside the database file with mode 600', () => {
    expect(statSync(`${t.databaseFile}.jwt-secret`).mode & 0o777).toBe(0o600);
  });

  it('refuses a token signed with the development secret that used to be written in the source', async () => {
    const admin = await signIn(t, 'admin@example.com');
    const me = (await t.http.get('/api/auth/me').set(bearer(admin)).expect(200)).body;
    const forged = new JwtService({ secret: 'thermbay-development-secret-not-for-production' }).sign({
      sub: me.id,
      tv: 0,
    });
    await t.http.get('/api/auth/me').set(bearer(forged)).expect(401);
    await t.http.get('/api/users').set(bearer(forged)).expect(401);
  });

  it('checks a password against a bcrypt hash of the same cost for an unknown e-mail as for a known one', async () => {
    const compare = jest.spyOn(bcryptModule, 'compare');
    await t.http.post('/api/auth/login').send({ email: 'nobody@example.com', password: 'guess-1234' }).expect(401);
    await t.http.post('/api/auth/login').send({ email: 'owner@example.com', password: 'guess-1234' }).expect(401);
    expect(compare).toHaveBeenCalledTimes(2);
    const [unknownHash, knownHash] = compare.mock.calls.map((call) => call[1] as string);
    expect(unknownHash).toMatch(/^\$2[aby]\$\d\d\$/);
    // Same algorithm and cost: the same work either way.
    expect(unknownHash.slice(0, 7)).toBe(knownHash.slice(0, 7));
    expect(compare.mock.calls.map((call) => call[0])).toEqual(['guess-1234', 'guess-1234']);
  });
});
