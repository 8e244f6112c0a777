import { mkdtempSync, readFileSync, rmSync, statSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { jwtSecretFileFor, validateEnvironment } from './environment';

describe('validateEnvironment', () => {
  it('fills the documented defaults', () => {
    const env = validateEnvironment({ NODE_ENV: 'test', JWT_SECRET: 'a-long-enough-secret-value' });
    expect(env.PORT).toBe(3000);
    expect(env.DATABASE_FILE).toBe('data/thermbay.sqlite');
    expect(env.DEMO_SEED).toBe(true);
  });

  describe('without JWT_SECRET outside production', () => {
    const folder = mkdtempSync(join(tmpdir(), 'thermbay-secret-'));
    afterAll(() => rmSync(folder, { recursive: true, force: true }));

    it('generates a random secret beside the database file, readable by its owner only, and reuses it', () => {
      const databaseFile = join(folder, 'nested', 'farm.sqlite');
      const first = validateEnvironment({ NODE_ENV: 'development', DATABASE_FILE: databaseFile }).JWT_SECRET;
      const file = jwtSecretFileFor(databaseFile);
      expect(file).toBe(`${databaseFile}.jwt-secret`);
      expect(statSync(file).mode & 0o777).toBe(0o600);
      expect(readFileSync(file, 'utf8').trim()).toBe(first);
      expect(first.length).toBeGreaterThanOrEqual(32);
      expect(first).not.toBe('thermbay-development-secret-not-for-production');
      const again = validateEnvironment({ NODE_ENV: 'test', DATABASE_FILE: databaseFile }).JWT_SECRET;
      expect(again).toBe(first);
    });

    it('gives each database its own secret', () => {
      const one = validateEnvironment({ NODE_ENV: 'test', DATABASE_FILE: join(folder, 'one.sqlite') }).JWT_SECRET;
      const two = validateEnvironment({ NODE_ENV: 'test', DATABASE_FILE: join(folder, 'two.sqlite') }).JWT_SECRET;
      expect(one).not.toBe(two);
    });
  });

  it('refuses to start in production without a JWT secret', () => {
    expect(() => validateEnvironment({ NODE_ENV: 'production' })).toThrow(/JWT_SECRET is required/);
  });

  it('names the variable that is wrong', () => {
    expect(() => validateEnvironment({ NODE_ENV: 'test', PORT: 'eighty' })).toThrow(/PORT must be a whole number/);
    expect(() => validateEnvironment({ NODE_ENV: 'test', DEMO_SEED: 'maybe' })).toThrow(
      /DEMO_SEED must be true or false/,
    );
    expect(() => validateEnvironment({ NODE_ENV: 'staging' })).toThrow(/NODE_ENV must be/);
    expect(() => validateEnvironment({ NODE_ENV: 'test', JWT_SECRET: 'short' })).toThrow(/at least 16/);
  });

  it('turns the demo seed off by default in production', () => {
    const env = validateEnvironment({ NODE_ENV: 'production', JWT_SECRET: 'a-long-enough-secret-value' });
    expect(env.DEMO_SEED).toBe(false);
  });
});
