import { Logger } from '@nestjs/common';
import { randomBytes } from 'node:crypto';
import { chmodSync, mkdirSync, readFileSync, writeFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';

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
}

/** Where the generated signing secret is kept: beside the database file, readable by its owner only. */
export function jwtSecretFileFor(databaseFile: string): string {
  return `${resolve(databaseFile)}.jwt-secret`;
}

/**
 * The signing secret when JWT_SECRET is not set (outside production): generated at random on
 * the first start and kept beside the database file (mode 600), so that tokens outlive a restart
 * but nobody can sign one from a value written in the source. An in-memory database gets a
 * secret for the life of the process.
 */
function generatedJwtSecret(databaseFile: string): string {
  if (databaseFile === ':memory:') return randomBytes(48).toString('base64url');
  const file = jwtSecretFileFor(databaseFile);
  mkdirSync(dirname(file), { recursive: true });
  try {
    writeFileSync(file, randomBytes(48).toString('base64url') + '\n', { mode: 0o600, flag: 'wx' });
    new Logger('Config').warn(
      `JWT_SECRET is not set: generated a signing secret in ${file}. Set JWT_SECRET before real use.`,
    );
  } catch (error) {
    if ((error as NodeJS.ErrnoException).code !== 'EEXIST') throw error;
  }
  chmodSync(file, 0o600);
  const secret = readFileSync(file, 'utf8').trim();
  if (secret.length < 32) throw new Error(`${file} holds no usable secret; delete it to have a new one generated`);
  return secret;
}

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

export function validateEnvironment(raw: Record<string, unknown>): Environment {
  const env = raw as Record<string, string | undefined>;
  const nodeEnv = (env.NODE_ENV ?? 'development') as Environment['NODE_ENV'];
  if (!['development', 'production', 'test'].includes(nodeEnv)) {
    throw new Error(`NODE_ENV must be development, production or test (got "${env.NODE_ENV}")`);
  }
  const databaseFile = (env.DATABASE_FILE ?? 'data/thermbay.sqlite').trim();
  if (databaseFile === '') throw new Error('DATABASE_FILE must not be empty');
  const port = parseInteger('PORT', env.PORT, 3000, 1, 65535);
  const jwtExpiresInSeconds = parseInteger(
    'JWT_EXPIRES_IN_SECONDS',
    env.JWT_EXPIRES_IN_SECONDS,
    12 * 3600,
    60,
    30 * 24 * 3600,
  );
  const demoSeed = parseBoolean('DEMO_SEED', env.DEMO_SEED, nodeEnv !== 'production');
  const loginRateLimit = parseInteger('LOGIN_RATE_LIMIT_PER_MINUTE', env.LOGIN_RATE_LIMIT_PER_MINUTE, 10, 1, 10000);
  // Last, once everything else is valid: a bad setting must not leave a secret file behind.
  let jwtSecret = env.JWT_SECRET ?? '';
  if (jwtSecret === '') {
    if (nodeEnv === 'production') {
      throw new Error('JWT_SECRET is required when NODE_ENV=production (use a long random string)');
    }
    jwtSecret = generatedJwtSecret(databaseFile);
  } else if (jwtSecret.length < 16) {
    throw new Error('JWT_SECRET must be at least 16 characters long');
  }
  return {
    NODE_ENV: nodeEnv,
    PORT: port,
    DATABASE_FILE: databaseFile,
    JWT_SECRET: jwtSecret,
    JWT_EXPIRES_IN_SECONDS: jwtExpiresInSeconds,
    DEMO_SEED: demoSeed,
    LOGIN_RATE_LIMIT_PER_MINUTE: loginRateLimit,
    FRONTEND_DIST: env.FRONTEND_DIST === '' ? null : (env.FRONTEND_DIST ?? null),
  };
}
