import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { Test } from '@nestjs/testing';
import { randomBytes } from 'node:crypto';
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Client } from 'pg';
import request from 'supertest';
import { AppModule } from '../src/app.module';
import { configureApp, mountOpenApi } from '../src/app.setup';
import type { Environment } from '../src/config/environment';

export interface TestApp {
  app: INestApplication;
  http: ReturnType<typeof request>;
  /** which database this app runs on: its SQLite file, or its PostgreSQL database's name */
  database: { dialect: 'sqlite'; file: string } | { dialect: 'postgres'; name: string; url: string };
  /** the SQLite file ('' on PostgreSQL) */
  databaseFile: string;
  close(): Promise<void>;
}

/**
 * Set DATABASE_URL (postgres://…, a role allowed to CREATE DATABASE) to run the e2e specs on
 * PostgreSQL: each app then gets a database of its own, created here and dropped at close.
 * Read once, before any app of this spec file could change the environment.
 */
const POSTGRES_SERVER_URL = process.env.DATABASE_URL?.trim() || null;

/** Model classes are bound to one database at a time, so one app is open at a time per spec file. */
let openApp: string | null = null;

async function onServer<T>(work: (client: Client) => Promise<T>): Promise<T> {
  const client = new Client({ connectionString: POSTGRES_SERVER_URL! });
  await client.connect();
  try {
    return await work(client);
  } finally {
    await client.end();
  }
}

async function createPostgresDatabase(): Promise<{ name: string; url: string }> {
  const name = `thermbay_e2e_${process.pid}_${randomBytes(6).toString('hex')}`;
  await onServer((client) => client.query(`CREATE DATABASE "${name}"`));
  const url = new URL(POSTGRES_SERVER_URL!);
  url.pathname = `/${name}`;
  return { name, url: url.toString() };
}

async function dropPostgresDatabase(name: string): Promise<void> {
  await onServer((client) => client.query(`DROP DATABASE IF EXISTS "${name}" WITH (FORCE)`));
}

/**
 * The real application on a throwaway database of its own (a SQLite file, or a fresh PostgreSQL
 * database when DATABASE_URL is set), migrated and (by default) seeded with the demo scenario,
 * exactly as main.ts configures it. The configuration is built from `env` for this app alone.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  if (openApp !== null) {
    throw new Error(
      `createTestApp: close the app on ${openApp} before creating another one in this spec file ` +
        '(the model classes are bound to one database at a time)',
    );
  }
  const database: TestApp['database'] = POSTGRES_SERVER_URL
    ? { dialect: 'postgres', ...(await createPostgresDatabase()) }
    : {
        dialect: 'sqlite',
        file: join(tmpdir(), `thermbay-e2e-${process.pid}-${Date.now()}-${randomBytes(6).toString('hex')}.sqlite`),
      };
  const appEnv: Record<string, string | undefined> = {
    ...process.env,
    NODE_ENV: 'test',
    DATABASE_FILE: database.dialect === 'sqlite' ? database.file : join(tmpdir(), 'thermbay-e2e-unused.sqlite'),
    DATABASE_URL: database.dialect === 'postgres' ? database.url : '',
    DEMO_SEED: 'true',
    LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
    JWT_SECRET: 'e2e-secret-that-is-long-enough',
    // the in-process SMTP server on any free port; SMTP_URL unset unless a spec sets it
    SMTP_LOCAL_PORT: '0',
    SMTP_URL: '',
    PUBLIC_URL: 'http://thermbay.test',
    ...env,
  };
  const removeDatabase = async () => {
    if (database.dialect === 'postgres') await dropPostgresDatabase(database.name);
    else for (const suffix of ['', '-wal', '-shm', '.jwt-secret']) rmSync(database.file + suffix, { force: true });
  };
  let app: INestApplication;
  try {
    const moduleRef = await Test.createTestingModule({ imports: [AppModule.forRoot(appEnv)] }).compile();
    app = moduleRef.createNestApplication({ logger: ['error'] });
    configureApp(app);
    mountOpenApi(app);
    await app.init();
  } catch (error) {
    await removeDatabase();
    throw error;
  }
  // Fail loudly if the app somehow runs on another database than the one made for it.
  const config = app.get(ConfigService<Environment, true>);
  const actual =
    database.dialect === 'postgres'
      ? config.get('DATABASE_URL', { infer: true })
      : config.get('DATABASE_FILE', { infer: true });
  const expected = database.dialect === 'postgres' ? database.url : database.file;
  if (actual !== expected) {
    await app.close();
    await removeDatabase();
    throw new Error(`createTestApp: the app was configured for ${actual}, not its own database ${expected}`);
  }
  const label = database.dialect === 'postgres' ? `database ${database.name}` : database.file;
  openApp = label;
  return {
    app,
    http: request(app.getHttpServer()),
    database,
    databaseFile: database.dialect === 'sqlite' ? database.file : '',
    async close() {
      try {
        await app.close();
        await removeDatabase();
      } finally {
        if (openApp === label) openApp = null;
      }
    },
  };
}

export async function signIn(t: TestApp, email: string, password = 'thermbay-demo'): Promise<string> {
  const response = await t.http.post('/api/auth/login').send({ email, password }).expect(200);
  return response.body.accessToken as string;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

/** The If-Match header naming the version a write is based on. */
export const ifMatch = (version: number) => ({ 'If-Match': String(version) });

/** The version a reader of `path` sees now (what a client sends back in If-Match to save). */
export async function versionOf(t: TestApp, token: string, path: string): Promise<number> {
  const response = await t.http.get(path).set(bearer(token)).expect(200);
  return response.body.version as number;
}
/** The link token in the newest message the local SMTP server kept for `email`, after `path`. */
export async function linkTokenFromMail(t: TestApp, email: string, path: '/invitations/' | '/reset-password/') {
  const { ReceivedMail } = await import('../src/mail/models/received-mail.model');
  const rows = await ReceivedMail.findAll({ order: [['id', 'DESC']] });
  const mail = rows.find((row) => row.recipients.includes(email.toLowerCase()));
  const match = new RegExp(`${path}([A-Za-z0-9_-]+)`).exec(mail?.text ?? '');
  if (!match?.[1]) throw new Error(`no ${path} link in a message to ${email}`);
  void t;
  return match[1];
}

/** Adds an existing account to a farm the way the app does: the owner invites, the person accepts. */
export async function joinByInvitation(
  t: TestApp,
  ownerToken: string,
  farmId: number,
  email: string,
  role: 'grower' | 'adviser' | 'viewer',
  memberToken: string,
): Promise<void> {
  await t.http.post(`/api/farms/${farmId}/invitations`).set(bearer(ownerToken)).send({ email, role }).expect(201);
  const token = await linkTokenFromMail(t, email, '/invitations/');
  await t.http.post(`/api/invitations/${token}/accept`).set(bearer(memberToken)).expect(200);
}
