/**
 * Shared by the server benchmarks (not a benchmark itself): the built server started through the
 * test harness (tools/harness) with a signed-in token, upload, and peak-memory readings from
 * /proc (Linux).
 */
import { openAsBlob, readFileSync } from 'node:fs';
import { signIn } from '../harness/fixtures.mjs';
import { nodeArgsFrom, startServer as startBuiltServer, type StartOptions } from '../harness/server.mjs';

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

export interface BenchServer {
  url: string;
  pid: number;
  dataDir: string;
  token: string;
  stop(): Promise<void>;
}

/**
 * The built server for a benchmark (demo mode, API only, a new data folder unless `dataDir` is
 * given), its errors shown as they come; node arguments from TACET_BENCH_SERVER_NODE_ARGS, e.g.
 * '--cpu-prof --cpu-prof-dir=/tmp/prof' to profile it.
 */
export function startBenchServer(options: Pick<StartOptions, 'dataDir'> = {}) {
  return startBuiltServer({
    ...options,
    label: 'bench',
    echoErrors: true,
    nodeArgs: nodeArgsFrom(process.env.TACET_BENCH_SERVER_NODE_ARGS),
  });
}

/** Starts the built server for a benchmark (see `startBenchServer`) and signs in as `email`. */
export async function startServer(email = 'catalog@tacet.test'): Promise<BenchServer> {
  const server = await startBenchServer();
  const stop = async () => {
    await server.stop();
  };
  try {
    const token = await signIn(server.baseURL, email);
    return { url: server.baseURL, pid: server.pid, dataDir: server.dataDir, token, stop };
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
