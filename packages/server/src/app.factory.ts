import { Logger, type INestApplication } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule, type OpenAPIObject } from '@nestjs/swagger';
import compression from 'compression';
import helmet from 'helmet';
import responseTime from 'response-time';
import { ApiErrorDto } from './common/dto/api-error.dto.js';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter.js';
import { BodyShapePipe } from './common/pipes/body-shape.pipe.js';
import { IdParamPipe } from './common/pipes/id-param.pipe.js';
import { createValidationPipe } from './common/pipes/validation.pipe.js';
import { ReaderUnitsInterceptor } from './common/units/reader-units.interceptor.js';
import { AppConfig } from './config/app-config.js';
import { hasWebClient } from './web-client.js';

export const API_PREFIX = 'api';

/** Largest JSON body accepted; larger → 413. */
export const JSON_BODY_LIMIT = '1mb';

/**
 * The API contract: the OpenAPI document of every controller of `app` (global prefix already
 * set by `configureApp`). Served at /api/docs; `tools/api-types` generates the web's types from it.
 */
export function createOpenApiDocument(app: INestApplication): OpenAPIObject {
  return SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Tacet API')
      .setDescription(
        'Selection and sizing of resilient isolation mounts. Figures in SI units throughout; the words of reasons and notes ' +
          "name their figures in the signed-in user's unit system (`unitSystem`). " +
          'Errors are `{statusCode, message, errors?}` (schema `ApiErrorDto`).',
      )
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
    { extraModels: [ApiErrorDto] },
  );
}

function setupOpenApi(app: NestExpressApplication): void {
  const document = createOpenApiDocument(app);
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, { jsonDocumentUrl: `${API_PREFIX}/docs-json` });
}

/**
 * Everything the application needs besides its modules; used by main.ts and by the tests so
 * both run the same stack. Call before `init()` / `listen()`.
 */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix(API_PREFIX);
  // Server-Timing: app;dur=<ms> — the time spent in the server, shown by browsers' developer
  // tools and read by the benchmarks (tools/bench) to tell it from the network.
  app.use(responseTime((_req, res, ms) => res.setHeader('Server-Timing', `app;dur=${ms.toFixed(2)}`)));
  app.use(helmet());
  app.use(compression());
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT });
  // The shape checks first: class-transformer and class-validator recurse into whatever they get,
  // and an id beyond a 32-bit integer must not reach PostgreSQL.
  app.useGlobalPipes(new BodyShapePipe(), new IdParamPipe(), createValidationPipe());
  app.useGlobalFilters(new AllExceptionsFilter());
  // Figures inside words (reasons, notes) in the reader's unit system (common/units/reader-words.ts).
  app.useGlobalInterceptors(new ReaderUnitsInterceptor());
  app.enableShutdownHooks();
  setupOpenApi(app);

  const { webDist, trustProxyHops } = app.get(AppConfig);
  // Behind load balancers: the client address (sign-in limit) from their X-Forwarded-For.
  if (trustProxyHops > 0) app.set('trust proxy', trustProxyHops);
  if (!hasWebClient(webDist)) {
    new Logger('WebClient').log(`No built web client in ${webDist}; serving the API only (build it with: npm run build -w @tacet/web)`);
  }
  return app;
}
