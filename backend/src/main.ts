import 'reflect-metadata';
import { Logger } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import { NestFactory } from '@nestjs/core';
import { AppModule } from './app.module';
import { configureApp, mountOpenApi } from './app.setup';
import type { Environment } from './config/environment';

async function bootstrap(): Promise<void> {
  const app = await NestFactory.create(AppModule.forRoot(), { bufferLogs: false });
  configureApp(app);
  mountOpenApi(app);
  const port = app.get(ConfigService<Environment, true>).get('PORT', { infer: true });
  await app.listen(port);
  new Logger('Thermbay').log(
    `serving app and API on http://localhost:${port} (API docs at /api/docs); ` +
      `listening ${process.uptime().toFixed(1)} s after the process started`,
  );
}

bootstrap().catch((error: Error) => {
  // A bad environment or an unreadable database ends here: say why, without a stack trace wall.
  console.error(`Thermbay could not start: ${error.message}`);
  process.exit(1);
});
