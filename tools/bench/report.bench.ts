/**
 * Benchmark of the calculation report: GET /api/designs/:id/report.pdf for the demo project's
 * released design, through HTTP on loopback, one request at a time. The bare baseline, in the
 * same run: pdfkit alone writing a document of the same page count, with the same fonts and
 * about as many text lines (no data loading, no charts, no tables). There is no report target
 * in PRODUCT.md; the figure is there to catch regressions. Run from the repository root after
 * `npm run build`:
 *
 *   npx tsx tools/bench/report.bench.ts            (--requests N)
 */
import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import { reportFigure } from './bench-result.js';
import { median, ms, percentile, startServer } from './server-bench-support.js';

const arg = (name: string, fallback: number): number => {
  const i = process.argv.indexOf(`--${name}`);
  return i > 0 ? Number(process.argv[i + 1]) : fallback;
};
const REQUESTS = arg('requests', 40);
const WARMUP = 5;
const require = createRequire(import.meta.url);
const FONT = require.resolve('@fontsource/noto-sans/files/noto-sans-latin-400-normal.woff');
const BOLD = require.resolve('@fontsource/noto-sans/files/noto-sans-latin-700-normal.woff');

/** pdfkit alone: `pages` A4 pages of `linesPerPage` short lines, compressed, to a Buffer. */
function barePdf(pages: number, linesPerPage: number): Promise<Buffer> {
  const doc = new PDFDocument({ size: 'A4', margin: 50, compress: true });
  doc.registerFont('body', FONT);
  doc.registerFont('bold', BOLD);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve) => doc.on('end', () => resolve(Buffer.concat(chunks))));
  for (let p = 0; p < pages; p++) {
    if (p > 0) doc.addPage();
    doc
      .font('bold')
      .fontSize(14)
      .text(`Page ${p + 1}`);
    doc.font('body').fontSize(9);
    for (let l = 0; l < linesPerPage; l++)
      doc.text(`Point P${l} load 2452.4 N, utilisation 0.82, deflection 24.5 mm, T 0.081`, 50, 80 + l * 12);
  }
  doc.end();
  return done;
}

const server = await startServer('buyer@tacet.test');
try {
  const auth = { Authorization: `Bearer ${server.token}` };
  const queue = (await (await fetch(`${server.url}/api/purchasing/designs`, { headers: auth })).json()) as {
    designId: number;
    name: string;
  }[];
  if (!Array.isArray(queue) || queue.length === 0) throw new Error('the demo has no released design');
  const design = queue[0];
  const times: number[] = [];
  let bytes = 0;
  let pdf = Buffer.alloc(0);
  for (let i = 0; i < WARMUP + REQUESTS; i++) {
    const t0 = performance.now();
    const response = await fetch(`${server.url}/api/designs/${design.designId}/report.pdf`, { headers: auth });
    pdf = Buffer.from(await response.arrayBuffer());
    if (response.status !== 200) throw new Error(`report: ${response.status}`);
    if (i >= WARMUP) times.push(performance.now() - t0);
    bytes = pdf.length;
  }
  const pages = (pdf.toString('latin1').match(/\/Type \/Page\b/g) ?? []).length || 1;
  const bare: number[] = [];
  for (let i = 0; i < WARMUP + REQUESTS; i++) {
    const t0 = performance.now();
    await barePdf(pages, 55);
    if (i >= WARMUP) bare.push(performance.now() - t0);
  }
  console.log(`report of "${design.name}": ${pages} pages, ${(bytes / 1024).toFixed(0)} KiB; ${REQUESTS} requests one at a time`);
  console.log(`Tacet GET /api/designs/:id/report.pdf (HTTP): median ${ms(median(times))}, p95 ${ms(percentile(times, 95))}`);
  console.log(`bare pdfkit, ${pages} pages of text, same fonts: median ${ms(median(bare))}, p95 ${ms(percentile(bare, 95))}`);
  reportFigure({
    figure: `calculation report PDF (${pages} pages), HTTP p95`,
    value: percentile(times, 95),
    unit: 'ms',
    bare: percentile(bare, 95),
  });
} finally {
  await server.stop();
}
