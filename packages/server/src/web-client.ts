import { existsSync } from 'node:fs';
import { join, relative, sep } from 'node:path';
import type { DynamicModule } from '@nestjs/common';
import { AbstractLoader, ExpressLoader, ServeStaticModule } from '@nestjs/serve-static';
import type { Response } from 'express';

/** Whether a built web client (index.html) exists in `webDist`. */
export const hasWebClient = (webDist: string): boolean => existsSync(join(webDist, 'index.html'));

/** Hashed build output may be cached for a year; everything else is revalidated. */
export function cacheControlFor(webDist: string, filePath: string): string {
  const isHashedAsset = relative(webDist, filePath).startsWith(`assets${sep}`);
  return isHashedAsset ? 'public, max-age=31536000, immutable' : 'no-cache';
}

/**
 * Serves the built web client with deep links falling back to index.html; `/api/*` is left to
 * the API (unknown API paths get a JSON 404). Nothing is served when the client is not built.
 */
export function webClientModules(webDist: string): DynamicModule[] {
  if (!hasWebClient(webDist)) return [];
  return [
    ServeStaticModule.forRootAsync({
      useFactory: () => [
        {
          rootPath: webDist,
          exclude: ['/api/{*path}'],
          serveStaticOptions: {
            setHeaders: (res: Response, filePath: string) => {
              res.setHeader('Cache-Control', cacheControlFor(webDist, filePath));
            },
          },
        },
      ],
      // The module picks its loader from the HTTP adapter when it is instantiated, which in
      // Nest's testing module happens before the adapter exists; we always run on Express.
      extraProviders: [{ provide: AbstractLoader, useClass: ExpressLoader }],
    }),
  ];
}
