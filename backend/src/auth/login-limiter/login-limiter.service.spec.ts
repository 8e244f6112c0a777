import type { ConfigService } from '@nestjs/config';
import type { Environment } from '../../config/environment';
import { MemoryLoginAttemptStore } from './login-attempt-store';
import { LoginLimiterService, TooManyAttemptsException } from './login-limiter.service';

const at = (seconds: number) => new Date(Date.UTC(2026, 0, 15, 8, 0, 0) + seconds * 1000);

function limiter(perAddress: number, perAccount: number) {
  const values: Partial<Environment> = {
    LOGIN_RATE_LIMIT_PER_MINUTE: perAddress,
    LOGIN_RATE_LIMIT_PER_ACCOUNT_PER_MINUTE: perAccount,
  };
  const config = { get: (key: keyof Environment) => values[key] } as unknown as ConfigService<Environment, true>;
  return new LoginLimiterService(new MemoryLoginAttemptStore(60_000), config);
}

/** Runs n attempts and returns how many were admitted. */
async function admitted(n: number, attempt: (i: number) => Promise<void>): Promise<number> {
  let count = 0;
  for (let i = 0; i < n; i += 1) {
    try {
      await attempt(i);
      count += 1;
    } catch (error) {
      if (!(error instanceof TooManyAttemptsException)) throw error;
    }
  }
  return count;
}

describe('LoginLimiterService', () => {
  it('admits the per-address limit from one address, then refuses with 429', async () => {
    const l = limiter(3, 100);
    expect(await admitted(5, (i) => l.admit('10.0.0.1', `user${i}@example.com`, at(i)))).toBe(3);
    await expect(l.admit('10.0.0.1', 'someone@example.com', at(6))).rejects.toMatchObject({ status: 429 });
    // A minute after the first attempts, the address may try again.
    await expect(l.admit('10.0.0.1', 'someone@example.com', at(61))).resolves.toBeUndefined();
  });

  it('a locked address does not lock the account for its owner elsewhere', async () => {
    const l = limiter(3, 9);
    expect(await admitted(10, (i) => l.admit('203.0.113.7', 'grower@example.com', at(i)))).toBe(3);
    await expect(l.admit('198.51.100.20', 'grower@example.com', at(11))).resolves.toBeUndefined();
  });

  it('stops many addresses guessing at one account, and only that account', async () => {
    const l = limiter(3, 5);
    const fromManyAddresses = await admitted(20, (i) => l.admit(`203.0.113.${i}`, 'grower@example.com', at(i)));
    expect(fromManyAddresses).toBe(5);
    await expect(l.admit('198.51.100.20', 'Grower@Example.com ', at(21))).rejects.toThrow(/this account/);
    await expect(l.admit('198.51.100.20', 'owner@example.com', at(21))).resolves.toBeUndefined();
  });

  it('a successful sign-in clears the account count', async () => {
    const l = limiter(100, 3);
    expect(await admitted(3, (i) => l.admit(`203.0.113.${i}`, 'grower@example.com', at(i)))).toBe(3);
    await l.succeeded('grower@example.com');
    expect(await admitted(3, (i) => l.admit(`198.51.100.${i}`, 'grower@example.com', at(10 + i)))).toBe(3);
  });

  it('counts registrations per address only', async () => {
    const l = limiter(2, 1);
    expect(await admitted(4, (i) => l.admit('10.0.0.9', undefined, at(i)))).toBe(2);
  });

  it('counts each guarded action apart from sign-in and from the other actions', async () => {
    const l = limiter(2, 100);
    expect(await admitted(3, (i) => l.admitAction('password-reset-request', '10.0.0.5', undefined, at(i)))).toBe(2);
    await expect(l.admitAction('password-reset', '10.0.0.5', undefined, at(4))).resolves.toBeUndefined();
    await expect(l.admitAction('invitation-sign-up', '10.0.0.5', undefined, at(4))).resolves.toBeUndefined();
    await expect(l.admit('10.0.0.5', 'grower@example.com', at(4))).resolves.toBeUndefined();
  });

  it('counts a reset request against the address it would mail, from any client address', async () => {
    const l = limiter(100, 3);
    const requests = (i: number) =>
      l.admitAction('password-reset-request', `203.0.113.${i}`, 'grower@example.com', at(i));
    expect(await admitted(5, requests)).toBe(3);
    await expect(l.admitAction('password-reset-request', '198.51.100.1', ' GROWER@example.com', at(6))).rejects.toThrow(
      /this account/,
    );
    // signing in to that account is another count
    await expect(l.admit('198.51.100.1', 'grower@example.com', at(6))).resolves.toBeUndefined();
  });
});
