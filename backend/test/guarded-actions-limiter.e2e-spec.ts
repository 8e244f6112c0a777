import { ConfigService } from '@nestjs/config';
import { getModelToken } from '@nestjs/sequelize';
import { DatabaseLoginAttemptStore } from '../src/auth/login-limiter/login-attempt-store';
import { LoginAttempt } from '../src/auth/login-limiter/login-attempt.model';
import { LOGIN_WINDOW_MS, LoginLimiterService } from '../src/auth/login-limiter/login-limiter.service';
import type { Environment } from '../src/config/environment';
import { bearer, createTestApp, signIn, type TestApp } from './test-app';

/** The app trusts the loopback proxy, so each request can say which client address it is from. */
const from = (address: string) => ({ 'X-Forwarded-For': address });

/**
 * Password changes, reset requests, resets with a link and invitation sign-ups go through the same
 * limiter (and store) as sign-in, so with LOGIN_LIMITER_STORE=database every instance counts them.
 */
describe.each(['memory', 'database'] as const)('password and invitation limits, %s store (e2e)', (store) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({
      LOGIN_LIMITER_STORE: store,
      LOGIN_RATE_LIMIT_PER_MINUTE: '3',
      LOGIN_RATE_LIMIT_PER_ACCOUNT_PER_MINUTE: '5',
      TRUST_PROXY: 'loopback',
    });
  });
  afterAll(() => t.close());

  const askReset = (address: string, email: string) =>
    t.http.post('/api/auth/password-reset/request').set(from(address)).send({ email });

  it('limits reset requests per address, the same for addresses with and without an account', async () => {
    const statuses: number[] = [];
    for (const email of ['owner@example.com', 'nobody-1@example.org', 'grower@example.com', 'nobody-2@example.org']) {
      statuses.push((await askReset('203.0.113.7', email)).status);
    }
    expect(statuses).toEqual([202, 202, 202, 429]);
    const refused = await askReset('203.0.113.7', 'admin@example.com');
    expect(refused.body).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Too many attempts from this address; wait a minute and try again',
    });
    expect(refused.headers['retry-after']).toBe(String(LOGIN_WINDOW_MS / 1000));
    // Its own count: the same address may still sign in.
    await t.http
      .post('/api/auth/login')
      .set(from('203.0.113.7'))
      .send({ email: 'owner@example.com', password: 'thermbay-demo' })
      .expect(200);
  });

  it('limits reset mails to one inbox from many addresses, unknown addresses alike', async () => {
    for (const email of ['adviser@example.com', 'nobody-3@example.org']) {
      const statuses: number[] = [];
      for (let i = 1; i <= 6; i += 1) statuses.push((await askReset(`192.0.2.${i}`, email)).status);
      expect(statuses).toEqual([202, 202, 202, 202, 202, 429]);
    }
    const refused = await askReset('192.0.2.60', 'Adviser@Example.com');
    expect(refused.status).toBe(429);
    expect(refused.body.message).toBe('Too many attempts on this account; wait a minute and try again');
    await askReset('192.0.2.60', 'admin@example.com').expect(202);
  });

  it('limits resets with a link and invitation sign-ups per address', async () => {
    const resets: number[] = [];
    for (let i = 0; i < 4; i += 1) {
      const res = await t.http
        .post('/api/auth/password-reset')
        .set(from('198.51.100.30'))
        .send({ token: `not-a-token-${i}`, newPassword: 'a-long-new-password' });
      resets.push(res.status);
    }
    expect(resets).toEqual([400, 400, 400, 429]);

    const signUps: number[] = [];
    for (let i = 0; i < 4; i += 1) {
      const res = await t.http
        .post(`/api/invitations/not-a-token-${i}/sign-up`)
        .set(from('198.51.100.30'))
        .send({ name: 'Guesser', password: 'a-long-new-password' });
      signUps.push(res.status);
    }
    expect(signUps).toEqual([404, 404, 404, 429]);
    // another address is not held back
    await t.http
      .post('/api/invitations/not-a-token/sign-up')
      .set(from('198.51.100.31'))
      .send({ name: 'Someone', password: 'a-long-new-password' })
      .expect(404);
  });

  it('limits password changes per address and per account', async () => {
    const token = await signIn(t, 'admin@example.com');
    const change = (address: string) =>
      t.http
        .post('/api/auth/password')
        .set(bearer(token))
        .set(from(address))
        .send({ currentPassword: 'a-wrong-guess', newPassword: 'a-long-new-password' });
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) statuses.push((await change('198.51.100.40')).status);
    expect(statuses).toEqual([400, 400, 400, 429]);
    // From other addresses: two more wrong guesses reach the account's five, then it is refused.
    expect([(await change('198.51.100.41')).status, (await change('198.51.100.42')).status]).toEqual([400, 400]);
    const refused = await change('198.51.100.43');
    expect(refused.status).toBe(429);
    expect(refused.body.message).toBe('Too many attempts on this account; wait a minute and try again');
  });

  if (store === 'database') {
    it('keeps the counts in the database, where another instance sees them', async () => {
      const config = t.app.get(ConfigService<Environment, true>);
      const model = t.app.get<typeof LoginAttempt>(getModelToken(LoginAttempt));
      const otherInstance = new LoginLimiterService(new DatabaseLoginAttemptStore(model, LOGIN_WINDOW_MS), config);
      await expect(otherInstance.admitAction('password-reset-request', '203.0.113.7')).rejects.toMatchObject({
        status: 429,
      });
      await expect(otherInstance.admitAction('password-reset', '198.51.100.30')).rejects.toMatchObject({
        status: 429,
      });
      await expect(otherInstance.admitAction('invitation-sign-up', '198.51.100.30')).rejects.toMatchObject({
        status: 429,
      });
      await expect(
        otherInstance.admitAction('password-reset-request', '192.0.2.99', 'nobody-3@example.org'),
      ).rejects.toMatchObject({ status: 429 });
      await expect(otherInstance.admitAction('password-reset-request', '192.0.2.99')).resolves.toBeUndefined();
    });
  }
});
