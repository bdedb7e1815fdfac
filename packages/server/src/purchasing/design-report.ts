import { createRequire } from 'node:module';
import PDFDocument from 'pdfkit';
import type { Design } from '../designs/design.entity.js';
import type { LabelledFrequency } from '../selection/selection.types.js';
import { bomTotals } from './bom-export.js';

/** The caution every report carries (PRODUCT.md, "Cautions the product shows"). */
export const REPORT_CAUTION =
  'The model assumes a rigid machine on linear mounts over a rigid support. Results are for preliminary sizing: ' +
  'seismic and wind restraint, snubbers, flexible pipe and cable connections, flexible floors and guarding follow ' +
  'local codes and need review by a qualified, licensed engineer.';

interface ReportFonts {
  regular: string;
  bold: string;
}

/** Noto Sans (WOFF from @fontsource/noto-sans, which pdfkit's fontkit reads); Helvetica when the files are missing. */
function reportFonts(): ReportFonts {
  try {
    const require = createRequire(import.meta.url);
    return {
      regular: require.resolve('@fontsource/noto-sans/files/noto-sans-latin-400-normal.woff'),
      bold: require.resolve('@fontsource/noto-sans/files/noto-sans-latin-700-normal.woff'),
    };
  } catch {
    // TODO: declare @fontsource/noto-sans in the server's own dependencies so this never happens.
    return { regular: 'Helvetica', bold: 'Helvetica-Bold' };
  }
}

const fmt = (value: number, digits = 1) => value.toFixed(digits);

export interface ReportOptions {
  disturbingFrequencies: LabelledFrequency[];
  releasedAt: Date | null;
  /** Uncompressed content streams (tests read the text back). */
  compress?: boolean;
}

/**
 * The calculation report of one design: identity and sign-off, cautions, equipment, mount
 * points and loads, the chosen mounts' figures at every disturbing frequency, rigid-body modes
 * and the bill of materials. Drafts carry a diagonal DRAFT watermark on every page.
 */
export function designReportPdf(design: Design, options: ReportOptions): Promise<Buffer> {
  const fonts = reportFonts();
  const draft = design.status !== 'released' && design.status !== 'superseded';
  const doc = new PDFDocument({
    size: 'A4',
    margin: 50,
    compress: options.compress ?? true,
    info: { Title: `${design.name} rev ${design.revision} — calculation report`, Author: design.author.name, Creator: 'Tacet' },
  });
  doc.registerFont('body', fonts.regular);
  doc.registerFont('heading', fonts.bold);
  const chunks: Buffer[] = [];
  doc.on('data', (chunk: Buffer) => chunks.push(chunk));
  const done = new Promise<Buffer>((resolve, reject) => {
    doc.on('end', () => resolve(Buffer.concat(chunks)));
    doc.on('error', reject);
  });

  const watermark = () => {
    if (!draft) return;
    const { width, height } = doc.page;
    const { x, y } = doc;
    doc.save();
    doc.rotate(-45, { origin: [width / 2, height / 2] });
    doc.font('heading').fontSize(110).fillColor('#c00000').fillOpacity(0.12);
    doc.text('DRAFT', width / 2 - 190, height / 2 - 60, { lineBreak: false });
    doc.restore();
    doc.fillOpacity(1).fillColor('black');
    doc.x = x;
    doc.y = y;
  };
  doc.on('pageAdded', watermark);
  watermark();

  const heading = (text: string) => doc.moveDown(0.8).font('heading').fontSize(13).fillColor('black').text(text).moveDown(0.3);
  const body = (text: string) => doc.font('body').fontSize(10).fillColor('black').text(text);

  doc.font('heading').fontSize(18).text('Mount selection — calculation report');
  doc.font('body').fontSize(11).text(`Project: ${design.project.name}`);
  doc.text(`Design: ${design.name}, revision ${design.revision} (${design.status.replace('_', ' ')})`);
  doc.text(`Author: ${design.author.name}    Checked and released by: ${design.checker?.name ?? '—'}`);
  if (options.releasedAt) doc.text(`Released: ${options.releasedAt.toISOString().slice(0, 10)}`);
  if (draft) doc.font('heading').fillColor('#c00000').text('DRAFT — not checked or released; not for purchasing or construction.');

  heading('Cautions');
  body(REPORT_CAUTION);

  const snapshot = design.snapshot;
  heading('Equipment');
  for (const component of design.input.components) {
    body(`${component.name}: ${fmt(component.massKg, 1)} kg, centre of gravity (${fmt(component.cg.x, 3)}, ${fmt(component.cg.y, 3)}, ${fmt(component.cg.z, 3)}) m`);
  }
  if (snapshot) {
    const { massKg, cg } = snapshot.massProperties;
    body(`Total: ${fmt(massKg, 1)} kg, centre of gravity (${fmt(cg.x, 3)}, ${fmt(cg.y, 3)}, ${fmt(cg.z, 3)}) m`);
  }

  heading('Disturbing frequencies');
  for (const frequency of options.disturbingFrequencies) body(`${fmt(frequency.frequencyHz, 2)} Hz — ${frequency.label}`);

  const candidate = snapshot?.candidate ?? design.chosen;
  heading('Chosen mounts');
  if (!candidate) {
    body('No mounts chosen yet.');
  } else {
    body(`${candidate.label} (${candidate.supplier.name})`);
    body(`Vertical natural frequency (uncoupled bounce estimate): ${fmt(candidate.verticalNaturalFrequencyHz, 2)} Hz`);
    body(`Transmissibility at resonance: ${fmt(candidate.resonanceAmplification, 1)}; level difference between points: ${fmt(candidate.levelErrorMm, 2)} mm`);
    heading('Mount points');
    for (const point of candidate.perPoint) {
      body(
        `${point.label}: ${point.partNumber}, load ${fmt(point.loadN, 0)} N, utilisation ${fmt(point.utilization * 100, 0)} %, static deflection ${fmt(point.staticDeflectionMm, 2)} mm`,
      );
    }
    heading('Isolation at each disturbing frequency');
    for (const row of candidate.isolation) {
      body(`${fmt(row.frequencyHz, 2)} Hz: transmissibility ${row.transmissibility.toFixed(4)}, isolation ${fmt(row.efficiencyPct, 1)} %, ${fmt(row.dB, 1)} dB`);
    }
    if (candidate.modes?.length) {
      heading('Rigid-body modes');
      for (const mode of candidate.modes) body(`${fmt(mode.frequencyHz, 2)} Hz — mostly ${mode.dominant}${mode.coupled ? ' (coupled)' : ''}`);
    }
    if (candidate.reasons.length) {
      heading('Checks not met');
      for (const reason of candidate.reasons) body(`• ${reason}`);
    }
  }

  doc.addPage();
  doc.font('heading').fontSize(16).fillColor('black').text('Bill of materials');
  const lines = design.bom ?? [];
  if (lines.length === 0) body('No mounts chosen yet.');
  for (const line of lines) {
    body(
      `${line.supplier.name} ${line.partNumber} × ${line.quantity} (points ${line.mountPoints.join(', ')}): ` +
        `${line.unitPrice === null ? 'price on request' : `${line.unitPrice.toFixed(2)} ${line.currency} each, ${line.extendedPrice?.toFixed(2)} ${line.currency}`}` +
        `${line.leadTimeDays === null ? '' : `, lead time ${line.leadTimeDays} days`}`,
    );
  }
  for (const total of bomTotals(lines)) {
    doc.font('heading').fontSize(10).text(`Total: ${total.quantity} mounts, ${total.amount.toFixed(2)} ${total.currency}${total.unpricedLines ? ` (${total.unpricedLines} line(s) without a price)` : ''}`);
  }
  if (snapshot) {
    heading('Data basis');
    body(`Mount data and every figure above were frozen on ${snapshot.takenAt.slice(0, 10)} when the mounts were chosen; later catalog changes do not alter them.`);
  }
  heading('Cautions');
  body(REPORT_CAUTION);

  doc.end();
  return done;
}
