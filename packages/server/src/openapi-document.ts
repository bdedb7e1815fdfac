import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import type { OpenAPIObject } from '@nestjs/swagger';
import { configureApp, createOpenApiDocument } from './app.factory.js';
import { AppModule } from './app.module.js';
import type { AppConfig } from './config/app-config.js';

/**
 * The OpenAPI document of the whole application for `config`, built without listening on a
 * port or running the start-up hooks (no seeding, no mail catcher): the modules are created,
 * configured as `main.ts` does, described, and closed. Used by `tools/api-types`.
 */
export async function buildOpenApiDocument(config: AppConfig): Promise<OpenAPIObject> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config), { logger: false });
  try {
    configureApp(app);
    return createOpenApiDocument(app);
  } finally {
    await app.close();
  }
}
