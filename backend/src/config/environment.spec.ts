import { validateEnvironment } from './environment';

describe('validateEnvironment', () => {
  it('fills the documented defaults', () => {
    const env = validateEnvironment({ NODE_ENV: 'test' });
    expect(env.PORT).toBe(3000);
    expect(env.DATABASE_FILE).toBe('data/thermbay.sqlite');
    expect(env.DEMO_SEED).toBe(true);
    expect(env.JWT_SECRET.length).toBeGreaterThanOrEqual(16);
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
