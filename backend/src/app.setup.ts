import type { INestApplication } from '@nestjs/common';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import helmet from 'helmet';
import { bodyParsers } from './common/body-parsing';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter';
import { createValidationPipe } from './common/validation';

/** Everything main.ts and the e2e tests both need, so tests run the app exactly as served. */
export function configureApp(app: INestApplication): void {
  app.setGlobalPrefix('api');
  // Registered before Nest's own parsers would be, and under their names, so they replace them.
  for (const parser of bodyParsers()) app.use(parser);
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          // MUI/emotion inject style tags; Swagger UI needs inline scripts on /api/docs only.
          styleSrc: ["'self'", "'unsafe-inline'"],
          scriptSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:'],
          fontSrc: ["'self'", 'data:'],
        },
      },
    }),
  );
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
