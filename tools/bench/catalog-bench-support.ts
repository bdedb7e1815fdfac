/**
 * Shared by the catalog benchmarks (not a benchmark itself): a built Tacet server started as a
 * child process on a free port with a throw-away data folder, sign-in, upload, and peak-memory
 * readings from /proc (Linux).
 */
import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, openAsBlob, readFileSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

export const ROOT = fileURLToPath(new URL('../..', import.meta.url));
export const SERVER_MAIN = join(ROOT, 'packages', 'server', 'dist', 'main.js');

export function median(values: number[]): number {
  return percentile(values, 50);
}

export function percentile(values: number[], p: number): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.min(sorted.length - 1, Math.ceil((p / 100) * sorted.length) - 1)];
}

/** Peak resident set (VmHWM) and current resident set (VmRSS) of a process, in MiB. */
export function memoryOf(pid: number | 'self' = 'self'): { peakMiB: number; rssMiB: number } {
  const status = readFileSync(`/proc/${pid}/status`, 'utf8');
  const kib = (key: string) => Number(new RegExp(`^${key}:\\s+(\\d+) kB`, 'm').exec(status)?.[1] ?? NaN);
  return { peakMiB: kib('VmHWM') / 1024, rssMiB: kib('VmRSS') / 1024 };
}

export const mib = (value: number) => `${value.toFixed(1)} MiB`;
export const ms = (value: number) => `${value.toFixed(1)} ms`;

async function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const server = createServer();
    server.once('error', reject);
    server.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as { port: number };
      server.close(() => resolve(port));
    });
  });
}

export interface BenchServer {
  url: string;
  pid: number;
  dataDir: string;
  token: string;
  stop(): Promise<void>;
}

/** Starts the built server in demo mode on a free port with a new data folder and signs in. */
export async function startServer(email = 'catalog@tacet.test'): Promise<BenchServer> {
  if (!existsSync(SERVER_MAIN)) {
    throw new Error(`${SERVER_MAIN} is missing: build first (npm run build -w @tacet/vibration && npm run build -w @tacet/server)`);
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'tacet-bench-'));
  const port = await freePort();
  // e.g. TACET_BENCH_SERVER_NODE_ARGS='--cpu-prof --cpu-prof-dir=/tmp/prof' to profile the server
  const nodeArgs = (process.env.TACET_BENCH_SERVER_NODE_ARGS ?? '').split(' ').filter(Boolean);
  const child: ChildProcess = spawn(process.execPath, [...nodeArgs, SERVER_MAIN], {
    cwd: ROOT,
    env: { ...process.env, TACET_DEMO: 'true', TACET_DATA_DIR: dataDir, PORT: String(port), TACET_WEB_DIST: join(dataDir, 'none') },
    stdio: ['ignore', 'ignore', 'inherit'],
  });
  const url = `http://127.0.0.1:${port}`;
  const stop = async () => {
    if (child.exitCode === null) {
      const exited = new Promise((resolve) => child.once('exit', resolve));
      child.kill('SIGTERM');
      await exited;
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    const deadline = Date.now() + 60_000;
    for (;;) {
      if (child.exitCode !== null) throw new Error(`the server exited with ${child.exitCode}`);
      try {
        if ((await fetch(`${url}/api/health`)).ok) break;
      } catch {
        // not listening yet
      }
      if (Date.now() > deadline) throw new Error('the server did not start within 60 s');
      await new Promise((resolve) => setTimeout(resolve, 200));
    }
    const login = await fetch(`${url}/api/auth/login`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ email, password: 'tacet-demo' }),
    });
    if (!login.ok) throw new Error(`sign-in failed: ${login.status}`);
    const { accessToken } = (await login.json()) as { accessToken: string };
    return { url, pid: child.pid as number, dataDir, token: accessToken, stop };
  } catch (error) {
    await stop();
    throw error;
  }
}

/** POST /api/mounts/import with the file; returns the status and body. */
export async function uploadCatalog(
  server: BenchServer,
  path: string,
  query = '',
): Promise<{ status: number; body: Record<string, unknown> }> {
  const form = new FormData();
  form.append('file', await openAsBlob(path, { type: 'text/csv' }), 'bench-catalog.csv');
  const response = await fetch(`${server.url}/api/mounts/import${query}`, {
    method: 'POST',
    headers: { Authorization: `Bearer ${server.token}` },
    body: form,
  });
  return { status: response.status, body: (await response.json()) as Record<string, unknown> };
}
