import { resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository's `catalog/` folder, relative to this file (same depth in `src/catalog` and `dist/catalog`). */
const REPO_CATALOG_DIR = fileURLToPath(new URL('../../../../catalog', import.meta.url));

/**
 * The folder holding demo-suppliers.csv and demo-mounts.csv: TACET_DEMO_CATALOG_DIR when set
 * (read when the demo seed runs), otherwise the repository's `catalog/` folder.
 */
export function demoCatalogDir(env: Record<string, string | undefined> = process.env): string {
  return env.TACET_DEMO_CATALOG_DIR ? resolve(env.TACET_DEMO_CATALOG_DIR) : REPO_CATALOG_DIR;
}

export const DEMO_SUPPLIERS_FILE = 'demo-suppliers.csv';
export const DEMO_MOUNTS_FILE = 'demo-mounts.csv';

/** Who the demo import is recorded as. */
export const DEMO_IMPORT_USER_EMAIL = 'admin@tacet.test';
