// @ts-check
// The one way tests and tools start the built Tacet server (packages/server/dist/main.js) as a
// child process: a free loopback port, a data folder (a new temporary one unless the caller
// brings its own), demo mode unless told otherwise, the API only unless the web client is
// wanted; resolves once GET /api/health answers. It builds nothing: run `npm run build` first.
//
// Plain JavaScript with JSDoc types (checked by `tsc -p tools`), so that `node` scripts (.mjs),
// tsx scripts and vitest suites all import this same file; TypeScript consumers read the types
// from the JSDoc (their tsconfig has `allowJs`).
//
// Used by tests/e2e, tests/faults, tools/bench, tools/load. See DEVELOPERS.md "Test harness".
import { spawn } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

/** The repository root. */
export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
/** The built server's entry point. */
export const SERVER_MAIN = join(ROOT, 'packages/server/dist/main.js');
/** The built web client's page; the server serves it when `web: true`. */
export const WEB_INDEX = join(ROOT, 'packages/web/dist/index.html');

/**
 * How a server process ended.
 * @typedef {{ code: number | null, signal: NodeJS.Signals | null }} Exit
 */

/**
 * @typedef {object} StartOptions
 * @property {string} [dataDir] the data folder (`TACET_DATA_DIR`): the caller's, never removed
 *   here. Without it the harness makes a temporary one and removes it once the process has
 *   exited through `stop()` or `kill()` (or in `cleanUp()`).
 * @property {string} [label] names the temporary data folder (`tacet-<label>-…`); default `server`
 * @property {boolean} [demo] demo mode with its accounts and data (`TACET_DEMO`); default true
 * @property {boolean} [web] serve the built web client too; default false (API only)
 * @property {Record<string, string>} [env] more environment, applied last (overrides the defaults)
 * @property {{ name: string, group: string }} [user] run as this unprivileged user through
 *   `setpriv` (needs root)
 * @property {string[]} [nodeArgs] arguments for node before the script, e.g. `['--cpu-prof']`
 * @property {boolean} [echoErrors] also print the server's stderr on ours as it comes
 * @property {number} [startTimeoutMs] how long to wait for /api/health; default 120 s
 * @property {number} [stopTimeoutMs] how long `stop()` waits after SIGTERM before SIGKILL; default 20 s
 */

/**
 * A running server.
 * @typedef {object} TacetServer
 * @property {string} baseURL e.g. `http://127.0.0.1:41234`
 * @property {number} port
 * @property {string} dataDir
 * @property {number} pid
 * @property {() => string} log what the server printed so far (stdout and stderr, the last 200 kB)
 * @property {() => Promise<Exit>} stop SIGTERM, then waits for the exit (SIGKILL after `stopTimeoutMs`)
 * @property {() => Promise<Exit>} kill SIGKILL, then waits for the exit
 * @property {Promise<Exit>} exited resolves when the process has ended
 */

/** @type {Set<import('node:child_process').ChildProcess>} */
const children = new Set();
/** @type {Set<string>} */
const folders = new Set();

// Never leave a server behind, even when the caller dies half-way.
process.once('exit', () => {
  for (const child of children) child.kill('SIGKILL');
});

/**
 * A TCP port on 127.0.0.1 that was free a moment ago.
 * @returns {Promise<number>}
 */
export function freePort() {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.unref();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/**
 * A new empty folder under the OS temp folder, removed by `cleanUp()`.
 * @param {string} [prefix]
 */
export function tempFolder(prefix = 'tacet-') {
  const folder = mkdtempSync(join(tmpdir(), prefix));
  folders.add(folder);
  return folder;
}

/**
 * Removes a folder made by `tempFolder()` now instead of in `cleanUp()`.
 * @param {string} folder
 */
export function removeFolder(folder) {
  rmSync(folder, { recursive: true, force: true });
  folders.delete(folder);
}

/**
 * Node arguments from a space-separated environment variable, e.g.
 * `TACET_BENCH_SERVER_NODE_ARGS='--cpu-prof --cpu-prof-dir=/tmp/prof'`.
 * @param {string | undefined} value
 * @returns {string[]}
 */
export function nodeArgsFrom(value) {
  return (value ?? '').split(' ').filter(Boolean);
}

/** @param {number} ms */
const wait = (ms) => new Promise((resolve) => setTimeout(resolve, ms));

/**
 * Starts the built server; resolves once `GET /api/health` answers 200.
 * @param {StartOptions} [options]
 * @returns {Promise<TacetServer>}
 */
export async function startServer(options = {}) {
  const { demo = true, web = false, startTimeoutMs = 120_000, stopTimeoutMs = 20_000 } = options;
  if (!existsSync(SERVER_MAIN)) throw new Error('The server is not built: run npm run build first');
  if (web && !existsSync(WEB_INDEX)) throw new Error('The web client is not built: run npm run build first');
  const ownFolder = options.dataDir === undefined;
  const dataDir = options.dataDir ?? tempFolder(`tacet-${options.label ?? 'server'}-`);
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    TACET_DEMO: demo ? 'true' : 'false',
    TACET_DATA_DIR: dataDir,
    PORT: String(port),
    // Tests sign in far more often than people do; the rate-limit test and the load tool set their own.
    TACET_LOGIN_LIMIT_PER_MINUTE: '1000',
    // API only: a folder that does not exist, so the server serves no web client.
    ...(web ? {} : { TACET_WEB_DIST: join(dataDir, 'no-web-client') }),
    ...options.env,
  };
  const nodeCommand = [...(options.nodeArgs ?? []), SERVER_MAIN];
  /** @type {[string, string[]]} */
  const [command, args] = options.user
    ? ['setpriv', ['--reuid', options.user.name, '--regid', options.user.group, '--clear-groups', process.execPath, ...nodeCommand]]
    : [process.execPath, nodeCommand];
  // Output goes to pipes, never to a file: a file-size limit on the server (the fault tests)
  // would stop writes to a log file too.
  const child = spawn(command, args, { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
  children.add(child);
  let output = '';
  /** @param {Buffer} chunk */
  const collect = (chunk) => {
    output = (output + chunk.toString()).slice(-200_000);
  };
  child.stdout.on('data', collect);
  child.stderr.on('data', collect);
  if (options.echoErrors) child.stderr.on('data', (chunk) => process.stderr.write(chunk));
  /** @type {Promise<Exit>} */
  const exited = new Promise((resolve) => {
    child.once('exit', (code, signal) => {
      children.delete(child);
      if (ownFolder) removeFolder(dataDir);
      resolve({ code, signal });
    });
  });
  /** @param {NodeJS.Signals} signal */
  const end = async (signal) => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    const timer = setTimeout(() => child.kill('SIGKILL'), stopTimeoutMs);
    const exit = await exited;
    clearTimeout(timer);
    return exit;
  };
  /** @type {TacetServer} */
  const server = {
    baseURL: `http://127.0.0.1:${port}`,
    port,
    dataDir,
    pid: child.pid ?? -1,
    log: () => output,
    stop: () => end('SIGTERM'),
    kill: () => end('SIGKILL'),
    exited,
  };
  const deadline = Date.now() + startTimeoutMs;
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) {
      await exited;
      throw new Error(`The server exited while starting (${child.exitCode ?? child.signalCode}):\n${output.slice(-5000)}`);
    }
    try {
      const res = await fetch(`${server.baseURL}/api/health`, { signal: AbortSignal.timeout(2000) });
      if (res.ok) return server;
    } catch {
      // not listening yet
    }
    if (Date.now() > deadline) {
      await server.kill();
      throw new Error(`The server did not answer /api/health within ${startTimeoutMs / 1000} s:\n${output.slice(-5000)}`);
    }
    await wait(100);
  }
}

/**
 * Runs a command from the repository root to its end (killed by `cleanUp()` if still running).
 * @param {string} command
 * @param {string[]} args
 * @param {Record<string, string>} [env] added to ours
 * @returns {Promise<{ code: number | null, stdout: string, stderr: string }>}
 */
export function runToEnd(command, args, env = {}) {
  return new Promise((resolve, reject) => {
    const child = spawn(command, args, { cwd: ROOT, env: { ...process.env, ...env }, stdio: ['ignore', 'pipe', 'pipe'] });
    children.add(child);
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    child.stderr.on('data', (d) => (stderr += d));
    child.once('error', reject);
    child.once('exit', (code) => {
      children.delete(child);
      resolve({ code, stdout, stderr });
    });
  });
}

/**
 * Kills (SIGKILL) every process started here that still runs, waits for them, and removes every
 * temporary folder. For `afterAll` and for the end of a tool.
 */
export async function cleanUp() {
  const exits = [...children].map((child) => new Promise((resolve) => child.once('exit', resolve)));
  for (const child of children) child.kill('SIGKILL');
  await Promise.all(exits);
  for (const folder of folders) rmSync(folder, { recursive: true, force: true });
  folders.clear();
}
