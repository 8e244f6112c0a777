import { ConfigService } from '@nestjs/config';
import { getModelToken } from '@nestjs/sequelize';
import { Sequelize } from 'sequelize-typescript';
import { DatabaseLoginAttemptStore } from '../src/auth/login-limiter/login-attempt-store';
import { LoginAttempt } from '../src/auth/login-limiter/login-attempt.model';
import { LoginLimiterService, LOGIN_WINDOW_MS } from '../src/auth/login-limiter/login-limiter.service';
import type { Environment } from '../src/config/environment';
import { createTestApp, type TestApp } from './test-app';

/** The app trusts the loopback proxy, so each request can say which client address it is from. */
const from = (address: string) => ({ 'X-Forwarded-For': address });

describe.each(['memory', 'database'] as const)('sign-in limiter, %s store (e2e)', (store) => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp({
      LOGIN_LIMITER_STORE: store,
      LOGIN_RATE_LIMIT_PER_MINUTE: '3',
      LOGIN_RATE_LIMIT_PER_ACCOUNT_PER_MINUTE: '6',
      TRUST_PROXY: 'loopback',
    });
  });
  afterAll(() => t.close());

  const login = (address: string, email: string, password: string) =>
    t.http.post('/api/auth/login').set(from(address)).send({ email, password });

  it('locks an address after its allowance, with Retry-After, but not the account from elsewhere', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 5; i += 1) statuses.push((await login('203.0.113.7', 'owner@example.com', 'wrong')).status);
    expect(statuses).toEqual([401, 401, 401, 429, 429]);
    const locked = await login('203.0.113.7', 'owner@example.com', 'thermbay-demo');
    expect(locked.status).toBe(429);
    expect(locked.body).toEqual({
      statusCode: 429,
      error: 'Too Many Requests',
      message: 'Too many attempts from this address; wait a minute and try again',
    });
    expect(locked.headers['retry-after']).toBe(String(LOGIN_WINDOW_MS / 1000));
    // The owner, signing in from another address, is not locked out.
    await login('198.51.100.20', 'owner@example.com', 'thermbay-demo').expect(200);
  });

  it('stops guesses at one account spread over many addresses, unknown accounts alike', async () => {
    const guesses: number[] = [];
    for (let i = 1; i <= 8; i += 1) guesses.push((await login(`192.0.2.${i}`, 'grower@example.com', 'guess')).status);
    expect(guesses).toEqual([401, 401, 401, 401, 401, 401, 429, 429]);
    const refused = await login('192.0.2.50', 'grower@example.com', 'thermbay-demo');
    expect(refused.status).toBe(429);
    expect(refused.body.message).toBe('Too many attempts on this account; wait a minute and try again');
    // Another account from the same addresses is unaffected...
    await login('192.0.2.1', 'adviser@example.com', 'thermbay-demo').expect(200);
    // ...and an e-mail with no account is limited exactly like one with an account.
    const unknown: number[] = [];
    for (let i = 1; i <= 7; i += 1) unknown.push((await login(`192.0.2.${100 + i}`, 'nobody@example.com', 'x')).status);
    expect(unknown).toEqual([401, 401, 401, 401, 401, 401, 429]);
  });

  it('limits registrations per address', async () => {
    const statuses: number[] = [];
    for (let i = 0; i < 4; i += 1) {
      const res = await t.http
        .post('/api/auth/register')
        .set(from('203.0.113.99'))
        .send({ email: `new${i}@example.com`, name: 'New', password: 'a-good-password' });
      statuses.push(res.status);
    }
    expect(statuses).toEqual([201, 201, 201, 429]);
  });

  if (store === 'database') {
    it('keeps the attempts in the database, where another instance counts them too', async () => {
      const sequelize = t.app.get(Sequelize);
      const [rows] = await sequelize.query('SELECT COUNT(*) AS n FROM login_attempts');
      expect(Number((rows as Array<{ n: number | string }>)[0].n)).toBeGreaterThan(0);
      // A second instance: its own limiter and store objects, the same database.
      const config = t.app.get(ConfigService<Environment, true>);
      const model = t.app.get<typeof LoginAttempt>(getModelToken(LoginAttempt));
      const otherInstance = new LoginLimiterService(new DatabaseLoginAttemptStore(model, LOGIN_WINDOW_MS), config);
      await expect(otherInstance.admit('203.0.113.7', 'someone@example.com')).rejects.toMatchObject({ status: 429 });
      await expect(otherInstance.admit('198.51.100.77', 'grower@example.com')).rejects.toMatchObject({ status: 429 });
      await expect(otherInstance.admit('198.51.100.77', 'someone@example.com')).resolves.toBeUndefined();
    });
  } else {
    it('keeps nothing in the database', async () => {
      const [rows] = await t.app.get(Sequelize).query('SELECT COUNT(*) AS n FROM login_attempts');
      expect(Number((rows as Array<{ n: number | string }>)[0].n)).toBe(0);
    });
  }
});
