#!/usr/bin/env node
// Stops the throwaway PostgreSQL cluster started by start-test-postgres.mjs and deletes its
// folder (nothing to do when it is not there). Options: --dir DIR.
import { clusterDir } from './default-dir.mjs';
import { stopTestPostgres } from './test-postgres.mjs';

const dir = clusterDir();
stopTestPostgres(dir);
console.error(`test PostgreSQL stopped (folder ${dir} removed)`);
