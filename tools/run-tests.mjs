#!/usr/bin/env node
// Runs every test suite of the project in turn (unit, reference, API, web, browser) and ends
// with one line of totals: "N passed, N failed". Each suite writes a JSON report that we read
// for its counts; a suite that crashes before reporting counts as one failure.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, existsSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';
import { PostgresNotInstalledError, startTestPostgres, stopTestPostgres } from './pg/test-postgres.mjs';

const root = join(dirname(fileURLToPath(import.meta.url)), '..');
const reports = mkdtempSync(join(tmpdir(), 'tacet-test-reports-'));
const only = process.argv.slice(2);

function run(cmd, args, env = {}) {
  const r = spawnSync(cmd, args, { cwd: root, stdio: 'inherit', env: { ...process.env, ...env } });
  return r.status ?? 1;
}

function vitestSuite(name, rootDir) {
  const out = join(reports, `${name}.json`);
  const status = run('npx', ['vitest', 'run', '--root', rootDir, '--reporter=default', '--reporter=json', `--outputFile.json=${out}`]);
  return countVitest(out, status);
}

function countVitest(out, status) {
  if (!existsSync(out)) return { passed: 0, failed: 1, note: `no report (exit ${status})` };
  const j = JSON.parse(readFileSync(out, 'utf8'));
  // Suites that fail to load count as failures too.
  const failedFiles = (j.testResults ?? []).filter((f) => f.status === 'failed' && (f.assertionResults ?? []).length === 0).length;
  return {
    passed: j.numPassedTests ?? 0,
    failed: (j.numFailedTests ?? 0) + failedFiles + (status !== 0 && !j.numFailedTests && !failedFiles ? 1 : 0),
  };
}

function jestSuite(name, workspace, env = {}) {
  const out = join(reports, `${name}.json`);
  const status = run('npm', ['test', '-w', workspace, '--', '--json', `--outputFile=${out}`], env);
  if (!existsSync(out)) return { passed: 0, failed: 1, note: `no report (exit ${status})` };
  const j = JSON.parse(readFileSync(out, 'utf8'));
  const brokenSuites = j.numRuntimeErrorTestSuites ?? 0;
  const skipped = j.numPendingTests ? `${j.numPendingTests} skipped, see their titles` : undefined;
  return {
    passed: j.numPassedTests,
    failed: j.numFailedTests + brokenSuites + (status !== 0 && !j.numFailedTests && !brokenSuites ? 1 : 0),
    note: skipped,
  };
}

/**
 * The server's jest suite again on PostgreSQL: a throwaway cluster (tools/pg), each test app on
 * a database of its own. Without PostgreSQL it is skipped with a note, except in CI, where that
 * is a failure (.ci/run installs it).
 */
async function serverPgSuite() {
  const dir = mkdtempSync(join(tmpdir(), 'tacet-test-postgres-'));
  let cluster;
  try {
    cluster = await startTestPostgres(dir);
  } catch (error) {
    stopTestPostgres(dir);
    console.error(error.message);
    const missing = error instanceof PostgresNotInstalledError;
    if (missing && process.env.CI !== 'true')
      return { passed: 0, failed: 0, note: 'skipped: PostgreSQL is not installed (apt-get install postgresql)' };
    return { passed: 0, failed: 1, note: missing ? 'PostgreSQL is not installed' : 'the test PostgreSQL did not start' };
  }
  try {
    // The API process ahead of UTC, the cluster behind it: no timestamp may depend on either zone.
    return jestSuite('server-pg', '@tacet/server', { TACET_TEST_DATABASE_URL: cluster.url, TZ: 'Asia/Kolkata' });
  } finally {
    stopTestPostgres(dir);
  }
}

const suites = [
  // Build (vibration → server → web) and typecheck every package, tests included.
  [
    'build',
    () => ({ passed: 0, failed: run('npm', ['run', 'build']) === 0 && run('npm', ['run', 'typecheck']) === 0 ? 0 : 1, silent: true }),
  ],
  // Formatting is checked, never rewritten here (npm run format rewrites).
  [
    'format',
    () => (run('npx', ['prettier', '--check', '.', '--log-level', 'warn']) === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 }),
  ],
  // ESLint (eslint.config.js): any error or warning fails it.
  ['lint', () => (run('npm', ['run', 'lint', '--silent']) === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 })],
  // The web's generated API types match the server's OpenAPI document (tools/api-types).
  [
    'api-types',
    () =>
      run('node', ['tools/api-types/generate.mjs', '--check', '--no-build']) === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 },
  ],
  ['vibration', () => vitestSuite('vibration', 'packages/vibration')],
  ['reference', () => vitestSuite('reference', 'tests/reference')],
  ['server', () => jestSuite('server', '@tacet/server', { TACET_TEST_DATABASE_URL: '' })], // on SQLite, whatever the shell says
  // The same server tests on PostgreSQL (a throwaway cluster, tools/pg/).
  ['server-pg', serverPgSuite],
  ['web', () => vitestSuite('web', 'packages/web')],
  ['e2e', () => vitestSuite('e2e', 'tests/e2e')],
  // Kill -9, full and read-only storage, restarts and the online backup, against the built server.
  ['faults', () => vitestSuite('faults', 'tests/faults')],
  // A short load run (the full one: npm run test:load); one test, passed or failed.
  [
    'load',
    () =>
      run('node', ['tools/load/run.mjs', '--duration', '8', '--clients', '10']) === 0 ? { passed: 1, failed: 0 } : { passed: 0, failed: 1 },
  ],
];

const results = [];
for (const [name, fn] of suites) {
  if (only.length && name !== 'build' && !only.includes(name)) continue;
  console.log(`\n=== ${name} ===`);
  const r = await fn();
  results.push([name, r]);
  if (name === 'build' && r.failed) break; // nothing else can run without a build
}
rmSync(reports, { recursive: true, force: true });

let passed = 0;
let failed = 0;
console.log('\n=== totals ===');
for (const [name, r] of results) {
  passed += r.passed;
  failed += r.failed;
  if (!r.silent || r.failed) console.log(`${name.padEnd(10)} ${r.passed} passed, ${r.failed} failed${r.note ? ` (${r.note})` : ''}`);
}
console.log(`${passed} passed, ${failed} failed`);
process.exit(failed === 0 && passed > 0 ? 0 : 1);
