import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { tmpdir } from 'node:os';
import { rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { AppModule } from '../app.module';
import { buildOpenApiDocument, configureApp } from '../app.setup';

/** Writes backend/openapi.json, the contract the frontend's types are generated from. */
async function main(): Promise<void> {
  // Always a throwaway SQLite file, whatever database this shell points at.
  const databaseFile = join(tmpdir(), `thermbay-openapi-${process.pid}.sqlite`);
  const env = { ...process.env, DATABASE_FILE: databaseFile, DATABASE_URL: '', DEMO_SEED: 'false', NODE_ENV: 'test' };
  // the local SMTP server starts with the app: any free port, never a fixed one
  Object.assign(env, { SMTP_LOCAL_PORT: '0', SMTP_URL: '' });
  const app = await NestFactory.create(AppModule.forRoot(env), { logger: false });
  configureApp(app);
  await app.init();
  const document = buildOpenApiDocument(app);
  const target = resolve(__dirname, '..', '..', 'openapi.json');
  writeFileSync(target, `${JSON.stringify(document, null, 2)}\n`);
  await app.close();
  for (const suffix of ['', '-wal', '-shm', '.jwt-secret']) rmSync(databaseFile + suffix, { force: true });
  console.log(`wrote ${target}`);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
