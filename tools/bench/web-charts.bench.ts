/**
 * Benchmark of one redraw of the candidate transmissibility chart (1,000-point curve, four
 * disturbing-frequency lines, isolation region, target line), beside a bare baseline that
 * computes the same 1,000 transmissibilities inline and writes them into one SVG path string.
 * Run from the repository root (`npm run bench -- web-charts`, or directly):
 *
 *   npx tsx tools/bench/web-charts.bench.ts
 *
 * It re-runs itself with the web package's tsconfig (JSX) and NODE_ENV=production (React's
 * production build, as in the browser bundle).
 * The chart is rendered to static SVG markup with react-dom/server, i.e. everything a redraw
 * does except the browser's own layout and paint. Target (PRODUCT.md "Targets"): a redraw of a
 * 1,000-point chart under 50 ms. Prints medians and the ratio chart / baseline.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import { reportFigure } from './bench-result.js';

const RUNS = 30;
const SAMPLES = 1000;
const MARKERS = [
  { frequencyHz: 24.667, label: '1× shaft', governing: true },
  { frequencyHz: 49.333, label: '2× shaft' },
  { frequencyHz: 100, label: '2× line' },
  { frequencyHz: 148, label: 'vane pass' },
];

function median(values: number[]): number {
  const sorted = [...values].sort((a, b) => a - b);
  return sorted[Math.floor(sorted.length / 2)]!;
}

/** Bare baseline: viscous T over a log grid, inline, into one path string. */
function bare(fn: number, zeta: number): string {
  const fMin = 0.1;
  const fMax = 1000;
  const step = Math.log(fMax / fMin) / (SAMPLES - 1);
  let d = '';
  for (let i = 0; i < SAMPLES; i++) {
    const f = fMin * Math.exp(step * i);
    const r = f / fn;
    const a = 1 - r * r;
    const b = 2 * zeta * r;
    const t = Math.sqrt((1 + b * b) / (a * a + b * b));
    d += `${i === 0 ? 'M' : 'L'}${(Math.log10(f) * 100).toFixed(2)},${(-Math.log10(t) * 100).toFixed(2)}`;
  }
  return `<svg><path d="${d}"/></svg>`;
}

type Render = (fn: number, zeta: number) => string;

async function loadChart(): Promise<Render> {
  const { createElement } = await import('react');
  const { renderToStaticMarkup } = await import('react-dom/server');
  const { viscousDamping } = await import('../../packages/vibration/src/index.js');
  const { TransmissibilityChart } = await import('../../packages/web/src/components/charts/transmissibility-chart.js');
  return (fn, zeta) =>
    renderToStaticMarkup(
      createElement(TransmissibilityChart, {
        naturalFrequencyHz: fn,
        damping: viscousDamping(zeta),
        markers: MARKERS,
        targetTransmissibility: 0.1,
        samples: SAMPLES,
      }),
    );
}

function time(run: (i: number) => string): number[] {
  const out: number[] = [];
  let sink = 0;
  for (let i = 0; i < RUNS + 5; i++) {
    const start = performance.now();
    sink += run(i).length;
    const elapsed = performance.now() - start;
    if (i >= 5) out.push(elapsed); // the first runs warm the JIT up
  }
  if (sink === 0) throw new Error('nothing rendered');
  return out;
}

if (process.env.TACET_WEB_BENCH !== 'child') {
  const self = fileURLToPath(import.meta.url);
  const child = spawnSync('npx', ['tsx', '--tsconfig', 'packages/web/tsconfig.json', self], {
    stdio: 'inherit',
    env: { ...process.env, NODE_ENV: 'production', TACET_WEB_BENCH: 'child' },
  });
  process.exit(child.status ?? 1);
}

const chart = await loadChart();
// A different fn each run, as when the mass is being edited (no memoized data reused).
const chartMs = median(time((i) => chart(2.5 + i * 0.01, 0.05)));
const bareMs = median(time((i) => bare(2.5 + i * 0.01, 0.05)));

console.log(`transmissibility chart, ${SAMPLES} points, one redraw (median of ${RUNS})`);
console.log(`  chart (React + Victory → SVG markup): ${chartMs.toFixed(2)} ms   target < 50 ms`);
console.log(`  bare loop (same curve → one path):    ${bareMs.toFixed(3)} ms`);
console.log(`  ratio chart / bare: ${(chartMs / bareMs).toFixed(0)}×`);
reportFigure({ figure: `transmissibility chart redraw, ${SAMPLES} points`, value: chartMs, unit: 'ms', target: 50, bare: bareMs });
