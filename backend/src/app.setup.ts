import type { INestApplication } from '@nestjs/common';
import { ConfigService } from '@nestjs/config';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import type { Express, NextFunction, Request, RequestHandler, Response } from 'express';
import helmet from 'helmet';
import { bodyParsers } from './common/body-parsing';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import type { Environment } from './config/environment';
import { createValidationPipe } from './common/validation';

/** The app's policy: scripts only from the app's own files, never inline; nothing framed, no plugins. */
const APP_CSP = {
  defaultSrc: ["'self'"],
  scriptSrc: ["'self'"],
  scriptSrcAttr: ["'none'"],
  // MUI (emotion) writes its styles into <style> tags at run time.
  styleSrc: ["'self'", "'unsafe-inline'"],
  imgSrc: ["'self'", 'data:'],
  fontSrc: ["'self'", 'data:'],
  connectSrc: ["'self'"],
  objectSrc: ["'none'"],
  baseUri: ["'self'"],
  formAction: ["'self'"],
  frameAncestors: ["'none'"],
};

/** The API documentation page (Swagger UI) starts itself with an inline script: allowed there only. */
const DOCS_CSP = { ...APP_CSP, scriptSrc: ["'self'", "'unsafe-inline'"] };

function securityHeaders(): RequestHandler {
  const app = helmet({ contentSecurityPolicy: { directives: APP_CSP } });
  const docs = helmet({ contentSecurityPolicy: { directives: DOCS_CSP } });
  return (request, response, next) =>
    (request.path === '/api/docs' || request.path.startsWith('/api/docs/') ? docs : app)(request, response, next);
}

/** Answers to a signed-in request hold one user's data: no browser or proxy may keep a copy. */
function noStoreForSignedInRequests(request: Request, response: Response, next: NextFunction): void {
  if (request.headers.authorization) response.setHeader('Cache-Control', 'no-store');
  next();
}

/** Everything main.ts and the e2e tests both need, so tests run the app exactly as served. */
export function configureApp(app: INestApplication): void {
  app.setGlobalPrefix('api');
  // No ETag on API answers: every answer is computed afresh, and hashing each body costs a tenth of a
  // millisecond or more (a design estimate is 12 kB). The static frontend keeps its own ETags.
  (app.getHttpAdapter().getInstance() as Express).set('etag', false);
  // Behind a reverse proxy the client's address comes from X-Forwarded-For, trusted only as far
  // as TRUST_PROXY says (the sign-in limiter counts per address).
  const trustProxy = app.get(ConfigService<Environment, true>).get('TRUST_PROXY', { infer: true });
  (app as NestExpressApplication).set('trust proxy', trustProxy);
  // Registered before Nest's own parsers would be, and under their names, so they replace them.
  for (const parser of bodyParsers()) app.use(parser);
  app.use(securityHeaders());
  app.use(noStoreForSignedInRequests);
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new AllExceptionsFilter());
  app.enableShutdownHooks();
}

export function buildOpenApiDocument(app: INestApplication): OpenAPIObject {
  const config = new DocumentBuilder()
    .setTitle('Thermbay API')
    .setDescription(
      'Greenhouse heat loss, heater sizing, cooling and fuel budgets. Every quantity is SI: ' +
        'lengths m, areas m², volumes m³, temperatures °C, temperature differences K, power W, ' +
        'U-values W/(m²·K), air flow m³/s, energy J or kWh where named.',
    )
    .setVersion('0.1.0')
    .addBearerAuth()
    .build();
  return SwaggerModule.createDocument(app, config);
}

export function mountOpenApi(app: INestApplication): void {
  SwaggerModule.setup('api/docs', app, () => buildOpenApiDocument(app), { jsonDocumentUrl: 'api/docs-json' });
}
