import { spawn, type ChildProcess } from 'node:child_process';
import { existsSync, mkdtempSync, rmSync } from 'node:fs';
import { createServer } from 'node:net';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';

const root = fileURLToPath(new URL('../..', import.meta.url));

export interface RunningServer {
  baseURL: string;
  dataDir: string;
  stop: () => Promise<void>;
}

export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = createServer();
    srv.listen(0, '127.0.0.1', () => {
      const address = srv.address();
      srv.close(() => (typeof address === 'object' && address ? resolve(address.port) : reject(new Error('no port'))));
    });
  });
}

async function waitForHealth(url: string, child: ChildProcess): Promise<void> {
  const deadline = Date.now() + 60_000;
  while (Date.now() < deadline) {
    if (child.exitCode !== null) throw new Error(`server exited with code ${child.exitCode}`);
    try {
      const res = await fetch(`${url}/api/health`);
      if (res.ok) return;
    } catch {
      // not up yet
    }
    await new Promise((r) => setTimeout(r, 250));
  }
  throw new Error('server did not become healthy within 60 s');
}

/** Starts the built server in demo mode on a free loopback port with a throwaway data folder. */
export async function startServer(env: Record<string, string> = {}): Promise<RunningServer> {
  const main = join(root, 'packages/server/dist/main.js');
  if (!existsSync(main) || !existsSync(join(root, 'packages/web/dist/index.html'))) {
    throw new Error('Build the app first: npm run build');
  }
  const dataDir = mkdtempSync(join(tmpdir(), 'tacet-e2e-'));
  const port = await freePort();
  const child = spawn(process.execPath, [main], {
    cwd: root,
    env: {
      ...process.env,
      NODE_ENV: 'production',
      TACET_DEMO: 'true',
      TACET_DATA_DIR: dataDir,
      PORT: String(port),
      TACET_LOGIN_LIMIT_PER_MINUTE: '1000',
      ...env,
    },
    stdio: ['ignore', 'pipe', 'pipe'],
  });
  let log = '';
  child.stdout?.on('data', (d) => (log += d));
  child.stderr?.on('data', (d) => (log += d));
  const baseURL = `http://127.0.0.1:${port}`;
  const stop = async (): Promise<void> => {
    if (child.exitCode === null) {
      child.kill('SIGTERM');
      await new Promise((r) => setTimeout(r, 500));
      if (child.exitCode === null) child.kill('SIGKILL');
    }
    rmSync(dataDir, { recursive: true, force: true });
  };
  try {
    await waitForHealth(baseURL, child);
  } catch (e) {
    await stop();
    console.error(log);
    throw e;
  }
  return { baseURL, dataDir, stop };
}
