import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { tmpdir } from 'node:os';
import { rmSync, writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { buildOpenApiDocument, configureApp } from '../app.setup';

/** Writes backend/openapi.json, the contract the frontend's types are generated from. */
async function main(): Promise<void> {
  process.env.DATABASE_FILE = join(tmpdir(), `thermbay-openapi-${process.pid}.sqlite`);
  process.env.DEMO_SEED = 'false';
  process.env.NODE_ENV = 'test';
  // the local SMTP server starts with the app: any free port, never a fixed one
  process.env.SMTP_LOCAL_PORT = '0';
  process.env.SMTP_URL = '';
  // Loaded only now: the app module reads the environment when it is first imported.
  const { AppModule } = await import('../app.module');
  const app = await NestFactory.create(AppModule, { logger: false });
  configureApp(app);
  await app.init();
  const document = buildOpenApiDocument(app);
  const target = resolve(__dirname, '..', '..', 'openapi.json');
  writeFileSync(target, `${JSON.stringify(document, null, 2)}\n`);
  await app.close();
  rmSync(process.env.DATABASE_FILE, { force: true });
  console.log(`wrote ${target}`);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
