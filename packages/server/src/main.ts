import 'reflect-metadata';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import { configureApp } from './app.factory.js';
import { AppModule } from './app.module.js';
import { ConfigError } from './config/environment.js';
import { loadConfig, type AppConfig } from './config/app-config.js';

async function bootstrap(): Promise<void> {
  let config: AppConfig;
  try {
    config = loadConfig(process.env);
  } catch (error) {
    if (!(error instanceof ConfigError)) throw error;
    console.error(error.message);
    process.exit(1);
  }
  const app = await NestFactory.create<NestExpressApplication>(AppModule.forRoot(config), {
    logger: ['fatal', 'error', 'warn', 'log'],
  });
  configureApp(app);
  await app.listen(config.port);
  console.log(`Tacet is running at http://localhost:${config.port}/ (API documentation: /api/docs)`);
}

bootstrap().catch((error: unknown) => {
  // A configuration problem found while starting (e.g. no admin) needs no stack trace.
  console.error(error instanceof ConfigError ? error.message : error);
  process.exit(1);
});
