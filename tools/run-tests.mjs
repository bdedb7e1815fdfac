#!/usr/bin/env node
// Runs every test suite of the project in turn (unit, reference, API, web, browser) and ends
// with one line of totals: "N passed, N failed". Each suite writes a JSON report that we read
// for its counts; a suite that crashes before reporting counts as one failure.
import { spawnSync } from 'node:child_process';
import { mkdtempSync, readFileSync, existsSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, dirname } from 'node:path';
import { fileURLToPath } from 'node:url';

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
  return { passed: j.numPassedTests ?? 0, failed: (j.numFailedTests ?? 0) + failedFiles + (status !== 0 && !j.numFailedTests && !failedFiles ? 1 : 0) };
}

function jestSuite(name, workspace) {
  const out = join(reports, `${name}.json`);
  const status = run('npm', ['test', '-w', workspace, '--', '--json', `--outputFile=${out}`]);
  if (!existsSync(out)) return { passed: 0, failed: 1, note: `no report (exit ${status})` };
  const j = JSON.parse(readFileSync(out, 'utf8'));
  const brokenSuites = j.numRuntimeErrorTestSuites ?? 0;
  return { passed: j.numPassedTests, failed: j.numFailedTests + brokenSuites + (status !== 0 && !j.numFailedTests && !brokenSuites ? 1 : 0) };
}

const suites = [
  // Build (vibration → server → web) and typecheck every package, tests included.
  ['build', () => ({ passed: 0, failed: run('npm', ['run', 'build']) === 0 && run('npm', ['run', 'typecheck']) === 0 ? 0 : 1, silent: true })],
  ['vibration', () => vitestSuite('vibration', 'packages/vibration')],
  ['reference', () => vitestSuite('reference', 'tests/reference')],
  ['server', () => jestSuite('server', '@tacet/server')],
  ['web', () => vitestSuite('web', 'packages/web')],
  ['e2e', () => vitestSuite('e2e', 'tests/e2e')],
];

const results = [];
for (const [name, fn] of suites) {
  if (only.length && name !== 'build' && !only.includes(name)) continue;
  console.log(`\n=== ${name} ===`);
  const r = fn();
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
