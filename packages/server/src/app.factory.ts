import { Logger } from '@nestjs/common';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { DocumentBuilder, SwaggerModule } from '@nestjs/swagger';
import compression from 'compression';
import helmet from 'helmet';
import { AllExceptionsFilter } from './common/filters/all-exceptions.filter.js';
import { createValidationPipe } from './common/pipes/validation.pipe.js';
import { AppConfig } from './config/app-config.js';
import { hasWebClient } from './web-client.js';

export const API_PREFIX = 'api';

/** Largest JSON body accepted; larger → 413. */
export const JSON_BODY_LIMIT = '1mb';

function setupOpenApi(app: NestExpressApplication): void {
  const document = SwaggerModule.createDocument(
    app,
    new DocumentBuilder()
      .setTitle('Tacet API')
      .setDescription(
        'Selection and sizing of resilient isolation mounts. SI units throughout. ' +
          'Errors are `{statusCode, message, errors?}`.',
      )
      .setVersion('0.1.0')
      .addBearerAuth()
      .build(),
  );
  SwaggerModule.setup(`${API_PREFIX}/docs`, app, document, { jsonDocumentUrl: `${API_PREFIX}/docs-json` });
}

/**
 * Everything the application needs besides its modules; used by main.ts and by the tests so
 * both run the same stack. Call before `init()` / `listen()`.
 */
export function configureApp(app: NestExpressApplication): NestExpressApplication {
  app.setGlobalPrefix(API_PREFIX);
  app.use(helmet());
  app.use(compression());
  app.useBodyParser('json', { limit: JSON_BODY_LIMIT });
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new AllExceptionsFilter());
  app.enableShutdownHooks();
  setupOpenApi(app);

  const { webDist } = app.get(AppConfig);
  if (!hasWebClient(webDist)) {
    new Logger('WebClient').log(
      `No built web client in ${webDist}; serving the API only (build it with: npm run build -w @tacet/web)`,
    );
  }
  return app;
}
