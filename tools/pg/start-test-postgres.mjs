#!/usr/bin/env node
// Starts a throwaway PostgreSQL cluster for the server tests (or finds it running) and prints
// shell lines that export its admin URL:
//
//   eval "$(node tools/pg/start-test-postgres.mjs)"     # → TACET_TEST_DATABASE_URL, TACET_TEST_PG_DIR
//   npm test -w @tacet/server                           # the API tests now run on PostgreSQL
//   node tools/pg/stop-test-postgres.mjs
//
// Options: --dir DIR (default: one folder per checkout under the OS temp folder).
import { clusterDir } from './default-dir.mjs';
import { PostgresNotInstalledError, startTestPostgres } from './test-postgres.mjs';

const dir = clusterDir();
try {
  const { url, port } = await startTestPostgres(dir);
  console.error(`test PostgreSQL running on 127.0.0.1:${port} (folder ${dir})`);
  console.log(`export TACET_TEST_DATABASE_URL='${url}'`);
  console.log(`export TACET_TEST_PG_DIR='${dir}'`);
} catch (error) {
  console.error(error instanceof PostgresNotInstalledError ? `${error.message}; apt-get install -y postgresql` : error.message);
  process.exit(1);
}
