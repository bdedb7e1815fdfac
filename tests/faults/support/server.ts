import { spawnSync } from 'node:child_process';
import { copyFileSync } from 'node:fs';
import { join } from 'node:path';
import {
  ROOT,
  startServer as startBuiltServer,
  tempFolder as harnessTempFolder,
  type StartOptions,
} from '../../../tools/harness/server.mjs';
import type { TacetServer } from '../../../tools/harness/server.mjs';

// The fault tests' side of the harness (tools/harness/server.mjs): every server runs on a data
// folder the test owns (a copy of the seeded template), in demo mode, API only.
export { cleanUp, runToEnd, SERVER_MAIN } from '../../../tools/harness/server.mjs';
export type { Exit, TacetServer } from '../../../tools/harness/server.mjs';

export const BACKUP_MAIN = join(ROOT, 'packages/server/dist/backup.js');
/** Files of a data folder as the server leaves it after a clean stop. */
export const DATA_FILES = ['tacet.sqlite', 'jwt-secret'];

/** A new empty folder under the OS temp folder, removed by `cleanUp()`. */
export function tempFolder(): string {
  return harnessTempFolder('tacet-faults-');
}

/** A new data folder holding a copy of the seeded demo database made once by the global setup. */
export function copyOfTemplate(templateDir: string): string {
  const dataDir = tempFolder();
  for (const file of DATA_FILES) copyFileSync(join(templateDir, file), join(dataDir, file));
  return dataDir;
}

/** The built server on `dataDir`, which outlives it; `env` and `user` as in the harness. */
export function startServer(dataDir: string, options: Pick<StartOptions, 'env' | 'user'> = {}): Promise<TacetServer> {
  return startBuiltServer({ ...options, dataDir, startTimeoutMs: 90_000 });
}

/**
 * Sets the soft file-size limit (RLIMIT_FSIZE) of a running process; `null` lifts it. Node
 * ignores SIGXFSZ, so writes beyond it fail with EFBIG as on a full disk.
 */
export function limitFileSize(pid: number, bytes: number | null): void {
  const result = spawnSync('prlimit', ['--pid', String(pid), `--fsize=${bytes ?? 'unlimited'}:unlimited`], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`prlimit failed: ${result.stderr || result.error?.message}`);
}
