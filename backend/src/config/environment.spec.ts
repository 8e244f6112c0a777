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

describe('mail settings', () => {
  it('starts the local SMTP server on 2525 unless SMTP_URL names a real one', () => {
    const env = validateEnvironment({ NODE_ENV: 'test' });
    expect(env.SMTP_URL).toBeNull();
    expect(env.SMTP_LOCAL_PORT).toBe(2525);
    expect(env.MAIL_FROM).toMatch(/<.+@.+>/);
    expect(env.PUBLIC_URL).toBe('http://localhost:3000');
    const real = validateEnvironment({ NODE_ENV: 'test', SMTP_URL: 'smtps://u:p@mail.example.com:465' });
    expect(real.SMTP_URL).toBe('smtps://u:p@mail.example.com:465');
  });

  it('names the mail variable that is wrong', () => {
    expect(() => validateEnvironment({ NODE_ENV: 'test', SMTP_URL: 'http://mail.example.com' })).toThrow(
      /SMTP_URL must start with smtp/,
    );
    expect(() => validateEnvironment({ NODE_ENV: 'test', SMTP_URL: 'not a url' })).toThrow(/SMTP_URL must be a URL/);
    expect(() => validateEnvironment({ NODE_ENV: 'test', SMTP_LOCAL_PORT: '70000' })).toThrow(/SMTP_LOCAL_PORT/);
    expect(() => validateEnvironment({ NODE_ENV: 'test', MAIL_FROM: 'nobody' })).toThrow(/MAIL_FROM must be/);
    expect(() => validateEnvironment({ NODE_ENV: 'test', PUBLIC_URL: 'ftp://x' })).toThrow(/PUBLIC_URL must start/);
    expect(validateEnvironment({ NODE_ENV: 'test', MAIL_FROM: 'Farm Desk <desk@example.org>' }).MAIL_FROM).toBe(
      'Farm Desk <desk@example.org>',
    );
    expect(validateEnvironment({ NODE_ENV: 'test', PUBLIC_URL: 'https://t.example.com/' }).PUBLIC_URL).toBe(
      'https://t.example.com',
    );
  });
});
