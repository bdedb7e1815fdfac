#!/usr/bin/env node
// `npm run bench`: runs every benchmark in tools/bench (each prints its figures beside a bare
// baseline measured in the same run, with the ratio and the target). Pass names to run some:
//   npm run bench -- vibration selection
import { spawnSync } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const wanted = process.argv.slice(2);
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => !wanted.length || wanted.some((w) => f.startsWith(w)))
  .sort();

let failed = 0;
for (const f of files) {
  console.log(`\n=== ${f} ===`);
  const r = spawnSync('npx', ['tsx', join(here, f)], { cwd: root, stdio: 'inherit' });
  if (r.status !== 0) failed++;
}
process.exit(failed ? 1 : 0);
