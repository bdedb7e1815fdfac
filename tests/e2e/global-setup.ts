import { spawnSync } from 'node:child_process';
import { existsSync } from 'node:fs';
import type { TestProject } from 'vitest/node';
import { startServer } from '../../tools/harness/server.mjs';

const CHROMIUM = process.env.TACET_CHROMIUM ?? '/usr/bin/chromium';

declare module 'vitest' {
  export interface ProvidedContext {
    baseURL: string;
  }
}

function ensureChromium(): void {
  if (existsSync(CHROMIUM)) return;
  if (process.getuid?.() === 0) {
    console.log("Chromium is missing: installing Debian's chromium with apt-get…");
    spawnSync('apt-get', ['update', '-qq'], { stdio: 'inherit' });
    spawnSync('apt-get', ['install', '-y', '-qq', 'chromium'], { stdio: 'inherit' });
  }
  if (!existsSync(CHROMIUM)) {
    throw new Error(`Browser tests need Debian's Chromium at ${CHROMIUM}: run "sudo apt-get install -y chromium".`);
  }
}

/** One shared demo server for all browser tests. */
export default async function setup(project: TestProject): Promise<() => Promise<void>> {
  ensureChromium();
  const server = await startServer({ web: true, label: 'e2e' });
  project.provide('baseURL', server.baseURL);
  return async () => {
    await server.stop();
  };
}
