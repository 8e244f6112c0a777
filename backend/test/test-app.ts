import type { INestApplication } from '@nestjs/common';
import { Test } from '@nestjs/testing';
import { rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import request from 'supertest';

export interface TestApp {
  app: INestApplication;
  http: ReturnType<typeof request>;
  databaseFile: string;
  close(): Promise<void>;
}

/**
 * The real application on a throwaway SQLite file, migrated and (by default) seeded with the
 * demo scenario, exactly as main.ts configures it.
 */
export async function createTestApp(env: Record<string, string> = {}): Promise<TestApp> {
  const databaseFile = join(
    tmpdir(),
    `thermbay-e2e-${process.pid}-${Date.now()}-${Math.random().toString(36).slice(2)}.sqlite`,
  );
  Object.assign(process.env, {
    NODE_ENV: 'test',
    DATABASE_FILE: databaseFile,
    DEMO_SEED: 'true',
    LOGIN_RATE_LIMIT_PER_MINUTE: '1000',
    JWT_SECRET: 'e2e-secret-that-is-long-enough',
    // the in-process SMTP server on any free port; SMTP_URL unset unless a spec sets it
    SMTP_LOCAL_PORT: '0',
    SMTP_URL: '',
    PUBLIC_URL: 'http://thermbay.test',
    ...env,
  });
  // Imported after the environment is set: the config module validates it on import.
  const { AppModule } = await import('../src/app.module');
  const { configureApp, mountOpenApi } = await import('../src/app.setup');
  const moduleRef = await Test.createTestingModule({ imports: [AppModule] }).compile();
  const app = moduleRef.createNestApplication({ logger: ['error'] });
  configureApp(app);
  mountOpenApi(app);
  await app.init();
  return {
    app,
    http: request(app.getHttpServer()),
    databaseFile,
    async close() {
      await app.close();
      for (const suffix of ['', '-wal', '-shm']) rmSync(databaseFile + suffix, { force: true });
    },
  };
}

export async function signIn(t: TestApp, email: string, password = 'thermbay-demo'): Promise<string> {
  const response = await t.http.post('/api/auth/login').send({ email, password }).expect(200);
  return response.body.accessToken as string;
}

export const bearer = (token: string) => ({ Authorization: `Bearer ${token}` });

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
