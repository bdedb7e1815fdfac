#!/usr/bin/env node
// `npm run bench`: runs every benchmark in tools/bench, then prints one table of every figure
// with its target (PRODUCT.md / the issues), the bare baseline measured in the same run and the
// ratio. Each benchmark prints its own detail and one marked line per figure (bench-result.ts);
// each generates its data (the seeded demo generator) in a temporary folder and removes it.
// Pass names to run some:  npm run bench -- vibration selection
// Needs a build first (npm run build): the server benchmarks start packages/server/dist.
import { spawn } from 'node:child_process';
import { readdirSync } from 'node:fs';
import { cpus, loadavg } from 'node:os';
import { dirname, join } from 'node:path';
import { createInterface } from 'node:readline';
import { fileURLToPath } from 'node:url';

const MARK = '@@bench-figure ';
const here = dirname(fileURLToPath(import.meta.url));
const root = join(here, '..', '..');
const wanted = process.argv.slice(2);
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts'))
  .filter((f) => !wanted.length || wanted.some((w) => f.startsWith(w)))
  .sort();

/** Runs one benchmark, echoing its output and collecting its figures. */
function runBench(file) {
  return new Promise((resolve) => {
    const figures = [];
    const child = spawn('npx', ['tsx', join(here, file)], { cwd: root, stdio: ['ignore', 'pipe', 'inherit'] });
    createInterface({ input: child.stdout }).on('line', (line) => {
      if (line.startsWith(MARK)) figures.push({ bench: file.replace('.bench.ts', ''), ...JSON.parse(line.slice(MARK.length)) });
      else console.log(line);
    });
    child.on('close', (status) => resolve({ status, figures }));
  });
}

const load = loadavg()[0];
const started = new Date();
const figures = [];
const failed = [];
for (const file of files) {
  console.log(`\n=== ${file} ===`);
  const result = await runBench(file);
  figures.push(...result.figures);
  if (result.status !== 0) failed.push(file);
}

const num = (v, unit) => (v === undefined ? '' : `${v < 1 ? v.toFixed(3) : v < 100 ? v.toFixed(1) : v.toFixed(0)} ${unit}`);
const rows = figures.map((f) => {
  const ratio = f.bare ? f.value / f.bare : undefined;
  const metTime = f.target === undefined || f.value < f.target;
  const metRatio = f.ratioTarget === undefined || (ratio !== undefined && ratio <= f.ratioTarget);
  return [
    f.figure,
    num(f.value, f.unit),
    f.target === undefined ? '' : `< ${f.target} ${f.unit}`,
    num(f.bare, f.unit),
    ratio === undefined ? '' : `${ratio.toFixed(2)}×`,
    f.ratioTarget === undefined ? '' : `≤ ${f.ratioTarget}×`,
    f.target === undefined && f.ratioTarget === undefined ? '–' : metTime && metRatio ? 'met' : 'NOT met',
  ];
});
const header = ['figure', 'measured', 'target', 'bare baseline', 'ratio', 'ratio target', 'status'];
const widths = header.map((h, i) => Math.max(h.length, ...rows.map((r) => r[i].length)));
const line = (cells) => cells.map((c, i) => (i === 0 ? c.padEnd(widths[i]) : c.padStart(widths[i]))).join('  ');
console.log(`\n=== summary (${started.toISOString()}, ${cpus().length} cores, load average ${load.toFixed(2)} at start) ===`);
console.log(line(header));
console.log(widths.map((w) => '-'.repeat(w)).join('  '));
for (const r of rows) console.log(line(r));
if (failed.length) console.log(`\nbenchmarks that did not finish: ${failed.join(', ')}`);
process.exit(failed.length ? 1 : 0);
