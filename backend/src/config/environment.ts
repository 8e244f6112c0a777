import { Logger } from '@nestjs/common';

/**
 * The environment, checked once at boot. A bad value stops the app with a message that names
 * the variable and says what is expected, rather than failing later in some request.
 */
export interface Environment {
  NODE_ENV: 'development' | 'production' | 'test';
  PORT: number;
  DATABASE_FILE: string;
  JWT_SECRET: string;
  JWT_EXPIRES_IN_SECONDS: number;
  DEMO_SEED: boolean;
  LOGIN_RATE_LIMIT_PER_MINUTE: number;
  FRONTEND_DIST: string | null;
  /** the hourly weather-history service; null = start the local stand-in with invented weather */
  WEATHER_API_URL: string | null;
  /** port of the local stand-in on 127.0.0.1 (0 = any free port) */
  WEATHER_STANDIN_PORT: number;
  WEATHER_TIMEOUT_MS: number;
  WEATHER_ATTEMPTS: number;
}

const DEVELOPMENT_JWT_SECRET = 'thermbay-development-secret-not-for-production';

function parseBoolean(name: string, raw: string | undefined, fallback: boolean): boolean {
  if (raw === undefined || raw === '') return fallback;
  const value = raw.trim().toLowerCase();
  if (['1', 'true', 'yes', 'on'].includes(value)) return true;
  if (['0', 'false', 'no', 'off'].includes(value)) return false;
  throw new Error(`${name} must be true or false (got "${raw}")`);
}

function parseInteger(name: string, raw: string | undefined, fallback: number, min: number, max: number): number {
  if (raw === undefined || raw === '') return fallback;
  const value = Number(raw);
  if (!Number.isInteger(value) || value < min || value > max) {
    throw new Error(`${name} must be a whole number from ${min} to ${max} (got "${raw}")`);
  }
  return value;
}

function parseHttpUrl(name: string, raw: string | undefined): string | null {
  if (raw === undefined || raw.trim() === '') return null;
  let url: URL;
  try {
    url = new URL(raw.trim());
  } catch {
    throw new Error(`${name} must be an http(s) URL (got "${raw}")`);
  }
  if (url.protocol !== 'http:' && url.protocol !== 'https:')
    throw new Error(`${name} must be an http(s) URL (got "${raw}")`);
  return url.toString().replace(/\/$/, '');
}

export function validateEnvironment(raw: Record<string, unknown>): Environment {
  const env = raw as Record<string, string | undefined>;
  const nodeEnv = (env.NODE_ENV ?? 'development') as Environment['NODE_ENV'];
  if (!['development', 'production', 'test'].includes(nodeEnv)) {
    throw new Error(`NODE_ENV must be development, production or test (got "${env.NODE_ENV}")`);
  }
  let jwtSecret = env.JWT_SECRET ?? '';
  if (jwtSecret === '') {
    if (nodeEnv === 'production') {
      throw new Error('JWT_SECRET is required when NODE_ENV=production (use a long random string)');
    }
    jwtSecret = DEVELOPMENT_JWT_SECRET;
    if (nodeEnv === 'development') {
      new Logger('Config').warn('JWT_SECRET is not set: using a development secret. Set it before real use.');
    }
  } else if (jwtSecret.length < 16) {
    throw new Error('JWT_SECRET must be at least 16 characters long');
  }
  const databaseFile = (env.DATABASE_FILE ?? 'data/thermbay.sqlite').trim();
  if (databaseFile === '') throw new Error('DATABASE_FILE must not be empty');
  return {
    NODE_ENV: nodeEnv,
    PORT: parseInteger('PORT', env.PORT, 3000, 1, 65535),
    DATABASE_FILE: databaseFile,
    JWT_SECRET: jwtSecret,
    JWT_EXPIRES_IN_SECONDS: parseInteger(
      'JWT_EXPIRES_IN_SECONDS',
      env.JWT_EXPIRES_IN_SECONDS,
      12 * 3600,
      60,
      30 * 24 * 3600,
    ),
    DEMO_SEED: parseBoolean('DEMO_SEED', env.DEMO_SEED, nodeEnv !== 'production'),
    LOGIN_RATE_LIMIT_PER_MINUTE: parseInteger(
      'LOGIN_RATE_LIMIT_PER_MINUTE',
      env.LOGIN_RATE_LIMIT_PER_MINUTE,
      10,
      1,
      10000,
    ),
    FRONTEND_DIST: env.FRONTEND_DIST === '' ? null : (env.FRONTEND_DIST ?? null),
    WEATHER_API_URL: parseHttpUrl('WEATHER_API_URL', env.WEATHER_API_URL),
    WEATHER_STANDIN_PORT: parseInteger('WEATHER_STANDIN_PORT', env.WEATHER_STANDIN_PORT, 0, 0, 65535),
    WEATHER_TIMEOUT_MS: parseInteger('WEATHER_TIMEOUT_MS', env.WEATHER_TIMEOUT_MS, 30_000, 100, 600_000),
    WEATHER_ATTEMPTS: parseInteger('WEATHER_ATTEMPTS', env.WEATHER_ATTEMPTS, 3, 1, 10),
  };
}
