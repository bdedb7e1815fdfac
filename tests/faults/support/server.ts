import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import { copyFileSync, existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../../..', import.meta.url));
export const SERVER_MAIN = join(ROOT, 'packages/server/dist/main.js');
export const BACKUP_MAIN = join(ROOT, 'packages/server/dist/backup.js');
/** Files of a data folder as the server leaves it after a clean stop. */
export const DATA_FILES = ['tacet.sqlite', 'jwt-secret'];

/** How a server process ended. */
export interface Exit {
  code: number | null;
  signal: NodeJS.Signals | null;
}

export interface TacetServer {
  baseURL: string;
  dataDir: string;
  pid: number;
  /** What the server printed so far (stdout and stderr). */
  log(): string;
  /** SIGTERM, then waits for the exit (SIGKILL after 20 s). */
  stop(): Promise<Exit>;
  /** kill -9, then waits for the exit. */
  kill(): Promise<Exit>;
  /** Resolves when the process has ended. */
  exited: Promise<Exit>;
}

export interface StartOptions {
  env?: Record<string, string>;
  /** Run as this unprivileged user (via setpriv; needs root). */
  user?: { name: string; group: string };
}

const children = new Set<ChildProcess>();
const folders = new Set<string>();

// Never leave a server behind, even when a test file dies half-way.
process.once('exit', () => {
  for (const child of children) child.kill('SIGKILL');
});

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const address = server.address();
      server.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

/** A new empty folder under the OS temp folder, removed by `cleanUp()`. */
export function tempFolder(prefix = 'tacet-faults-'): string {
  const folder = mkdtempSync(join(tmpdir(), prefix));
  folders.add(folder);
  return folder;
}

/** A new data folder holding a copy of the seeded demo database made once by the global setup. */
export function copyOfTemplate(templateDir: string): string {
  const dataDir = tempFolder();
  for (const file of DATA_FILES) copyFileSync(join(templateDir, file), join(dataDir, file));
  return dataDir;
}

const wait = (ms: number) => new Promise((resolve) => setTimeout(resolve, ms));

/** Starts the built server (demo mode, API only) on a free loopback port; resolves once /api/health answers. */
export async function startServer(dataDir: string, options: StartOptions = {}): Promise<TacetServer> {
  if (!existsSync(SERVER_MAIN)) throw new Error('Build the server first: npm run build');
  const port = await freePort();
  const env = {
    ...process.env,
    NODE_ENV: 'production',
    TACET_DEMO: 'true',
    TACET_DATA_DIR: dataDir,
    PORT: String(port),
    TACET_LOGIN_LIMIT_PER_MINUTE: '1000',
    // No web client: these tests talk to the API only.
    TACET_WEB_DIST: join(tmpdir(), 'tacet-faults-no-web-client'),
    ...options.env,
  };
  const [command, args] = options.user
    ? ['setpriv', ['--reuid', options.user.name, '--regid', options.user.group, '--clear-groups', process.execPath, SERVER_MAIN]]
    : [process.execPath, [SERVER_MAIN]];
  // Output goes to pipes, never to a file: a file-size limit (see the storage tests) would stop it.
  const child = spawn(command, args, { cwd: ROOT, env, stdio: ['ignore', 'pipe', 'pipe'] });
  children.add(child);
  let output = '';
  const collect = (chunk: Buffer) => {
    output = (output + chunk.toString()).slice(-200_000);
  };
  child.stdout?.on('data', collect);
  child.stderr?.on('data', collect);
  const exited = new Promise<Exit>((resolve) => {
    child.once('exit', (code, signal) => {
      children.delete(child);
      resolve({ code, signal });
    });
  });
  const end = async (signal: NodeJS.Signals): Promise<Exit> => {
    if (child.exitCode === null && child.signalCode === null) child.kill(signal);
    const timer = setTimeout(() => child.kill('SIGKILL'), 20_000);
    const exit = await exited;
    clearTimeout(timer);
    return exit;
  };
  const server: TacetServer = {
    baseURL: `http://127.0.0.1:${port}`,
    dataDir,
    pid: child.pid ?? -1,
    log: () => output,
    stop: () => end('SIGTERM'),
    kill: () => end('SIGKILL'),
    exited,
  };
  const deadline = Date.now() + 90_000;
  for (;;) {
    if (child.exitCode !== null || child.signalCode !== null) {
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
      throw new Error(`The server did not become healthy within 90 s:\n${output.slice(-5000)}`);
    }
    await wait(100);
  }
}

/** Kills every server this file started that still runs, and removes the temp folders. */
export async function cleanUp(): Promise<void> {
  const exits = [...children].map((child) => new Promise((resolve) => child.once('exit', resolve)));
  for (const child of children) child.kill('SIGKILL');
  await Promise.all(exits);
  for (const folder of folders) rmSync(folder, { recursive: true, force: true });
  folders.clear();
}

/** Sets the soft file-size limit (RLIMIT_FSIZE) of a running process; `null` lifts it. */
export function limitFileSize(pid: number, bytes: number | null): void {
  const result = spawnSync('prlimit', ['--pid', String(pid), `--fsize=${bytes ?? 'unlimited'}:unlimited`], { encoding: 'utf8' });
  if (result.status !== 0) throw new Error(`prlimit failed: ${result.stderr || result.error?.message}`);
}

/** Runs a command to its end; resolves with its exit code and output. */
export function runToEnd(
  command: string,
  args: string[],
  env: Record<string, string> = {},
): Promise<{ code: number | null; stdout: string; stderr: string }> {
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
