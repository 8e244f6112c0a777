import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import { writeFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import { AppModule } from '../app.module';
import { buildOpenApiDocument, configureApp } from '../app.setup';

/** Writes backend/openapi.json, the contract the frontend's types are generated from. */
async function main(): Promise<void> {
  process.env.DATABASE_FILE ??= join(require('node:os').tmpdir(), `thermbay-openapi-${process.pid}.sqlite`);
  process.env.DEMO_SEED = 'false';
  process.env.NODE_ENV ??= 'test';
  const app = await NestFactory.create(AppModule, { logger: false });
  configureApp(app);
  await app.init();
  const document = buildOpenApiDocument(app);
  const target = resolve(__dirname, '..', '..', 'openapi.json');
  writeFileSync(target, `${JSON.stringify(document, null, 2)}\n`);
  await app.close();
  console.log(`wrote ${target}`);
}

main().catch((error) => {
  console.error(error);
  process.exit(1);
});
