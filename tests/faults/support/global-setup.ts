import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import type { TestProject } from 'vitest/node';
import { SERVER_MAIN, startServer } from './server';

declare module 'vitest' {
  export interface ProvidedContext {
    /** A data folder with the seeded demo database, cleanly closed; copy it, never change it. */
    templateDir: string;
  }
}

/** Seeds the demo data once (the slow part of a first start) for every test to copy. */
export default async function setup(project: TestProject): Promise<() => void> {
  if (!existsSync(SERVER_MAIN)) throw new Error('The fault tests start the built server: run npm run build first');
  const templateDir = mkdtempSync(join(tmpdir(), 'tacet-faults-template-'));
  const server = await startServer(templateDir);
  const exit = await server.stop();
  if (existsSync(join(templateDir, 'tacet.sqlite-wal'))) {
    throw new Error(`The seeding server did not close its database cleanly (exit ${JSON.stringify(exit)})`);
  }
  project.provide('templateDir', templateDir);
  return () => rmSync(templateDir, { recursive: true, force: true });
}
