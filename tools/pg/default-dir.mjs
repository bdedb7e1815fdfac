// The folder of the cluster that start-test-postgres.mjs / stop-test-postgres.mjs manage by
// default: one per checkout, under the OS temp folder (TACET_TEST_PG_DIR or --dir overrides it).
import { createHash } from 'node:crypto';
import { tmpdir } from 'node:os';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '..', '..');

export function clusterDir(argv = process.argv.slice(2)) {
  const i = argv.indexOf('--dir');
  if (i >= 0 && argv[i + 1]) return resolve(argv[i + 1]);
  if (process.env.TACET_TEST_PG_DIR) return resolve(process.env.TACET_TEST_PG_DIR);
  const checkout = createHash('sha1').update(root).digest('hex').slice(0, 8);
  return join(tmpdir(), `tacet-test-postgres-${checkout}`);
}
