import { createRequire } from 'node:module';
import {
  DESIGN_SECTIONS,
  INPUT_LABELS,
  RESULT_LABELS,
  cautionsFor,
  describeModeMotion,
  designStateWords,
  formatDecimal,
  formatMeasure,
  formatMoney,
  formatUtilisation,
  hystereticDamping,
  logSpace,
  mountTypeLabel,
  SENTENCE_DECIMALS,
  toDisplay,
  transmissibility,
  unitLabel,
  viscousDamping,
  type Damping,
  type UnitSystem,
} from '@tacet/vibration';
import PDFDocument from 'pdfkit';
import { inReaderUnits } from '../common/units/reader-words.js';
import type { Design } from '../designs/design.entity.js';
import type { CandidateMode, LabelledFrequency, MountSnapshot } from '../selection/selection.types.js';
import type { Verification } from '../verifications/verification.entity.js';
import { bomTotals } from './bom-export.js';
import { passageReportLines } from './report-passage.js';
import { restraintReportLines } from './report-restraint.js';
import { speedChart, wholeMachineReportLines } from './report-whole-machine.js';
import { verdictReportLines } from './report-verdict.js';
import { DEFAULT_WEIGHT_MARGIN_PCT } from '../selection/selection-problem.js';

interface ReportFonts {
  regular: string;
  bold: string;
}

/**
 * Noto Sans (WOFF from @fontsource/noto-sans, which pdfkit's fontkit reads); Helvetica when the files are missing.
 * These are the Latin subsets: report text avoids Greek letters and math signs (no ζ, η, √), which they lack.
 */
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
  /** As-built measurements of the design, newest first (the report lists them when there are any). */
  verifications?: Verification[];
  /** The checker's release notes, printed under the sign-off. */
  releaseNotes?: string | null;
  /**
   * False: the copy for a supplier's quotation — the bill of materials lists part, quantity and
   * mount points without our catalog prices, totals or lead times.
   */
  prices?: boolean;
  /** The supplier's copy: the identical machines the request is for (quantities are per machine). */
  machineCount?: number;
  /** Uncompressed content streams (tests read the text back). */
  compress?: boolean;
  /** The reader's unit system: every figure with a unit, and the reasons, are written in it (SI when not given). */
  units?: UnitSystem;
}

/** A point in the reader's units: "(0.65, 0.05, 0.5) m" / "(25.59, 1.97, 19.69) in". */
function pointText(p: { x: number; y: number; z: number }, units: UnitSystem): string {
  const digits = SENTENCE_DECIMALS[units].position;
  const coordinate = (v: number) => formatDecimal(toDisplay('position', v, units), digits);
  return `(${coordinate(p.x)}, ${coordinate(p.y)}, ${coordinate(p.z)}) ${unitLabel('position', units)}`;
}

/** A point's utilisation as the checks read it: with the weight margin beside the bare figure when there is one. */
export function utilizationText(utilization: number, weightMarginPct: number): string {
  const bare = `${fmt(utilization * 100, 0)} %`;
  if (!(weightMarginPct > 0)) return bare;
  return `${fmt(utilization * (1 + weightMarginPct / 100) * 100, 0)} % with the ${formatDecimal(weightMarginPct, 1)} % weight margin (${bare} without)`;
}

/**
 * The calculation report of one design: identity and sign-off, cautions, equipment, mount
 * points and loads, the chosen mounts' figures at every disturbing frequency, rigid-body modes,
 * the seismic restraint check when the design asks for one, and the bill of materials. Drafts
 * carry a diagonal DRAFT watermark on every page.
 */
export function designReportPdf(design: Design, options: ReportOptions): Promise<Buffer> {
  const fonts = reportFonts();
  const units = options.units ?? 'SI';
  const q = (quantity: Parameters<typeof formatMeasure>[0], si: number) => formatMeasure(quantity, si, units);
  const draft = design.status !== 'released' && design.status !== 'superseded';
  const doc = new PDFDocument({
    size: 'A4',
    margin: 50,
    compress: options.compress ?? true,
    bufferPages: true,
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
  // Drawn on every page at the end (pageFooters): text drawn from a 'pageAdded' handler while a
  // paragraph wraps onto the new page narrowed the rest of that paragraph to a sliver.

  const heading = (text: string) => doc.moveDown(0.8).font('heading').fontSize(13).fillColor('black').text(text).moveDown(0.3);
  const body = (text: string) => doc.font('body').fontSize(10).fillColor('black').text(text);

  doc.font('heading').fontSize(18).text('Mount selection — calculation report');
  doc.font('body').fontSize(11).text(`Project: ${design.project.name}`);
  doc.text(`Design: ${design.name}, revision ${design.revision} (${designStateWords(design.status)})`);
  doc.text(`Author: ${design.author.name}    Checked and released by: ${design.checker?.name ?? '—'}`);
  if (options.releasedAt) doc.text(`Released: ${options.releasedAt.toISOString().slice(0, 10)}`);
  if (options.releaseNotes) doc.text(`Release notes: ${options.releaseNotes}`);
  if (draft) doc.font('heading').fillColor('#c00000').text('DRAFT — not checked or released; not for purchasing or construction.');

  const cautions = cautionsFor('design', { restraint: !!design.input.restraint });
  const cautionSection = () => {
    heading('Cautions');
    for (const caution of cautions) body(`${caution.title}: ${caution.text}`);
  };
  cautionSection();

  const snapshot = design.snapshot;
  heading('Equipment');
  for (const component of design.input.components) {
    body(`${component.name}: ${q('mass', component.massKg)}, centre of gravity ${pointText(component.cg, units)}`);
  }
  if (snapshot) {
    const { massKg, cg } = snapshot.massProperties;
    body(`Total: ${q('mass', massKg)}, centre of gravity ${pointText(cg, units)}`);
  }

  heading('Mount points (positions of the elastic centres)');
  for (const point of design.input.mountPoints ?? []) {
    body(`${point.label}: x ${q('position', point.x)}, y ${q('position', point.y)}, z ${q('position', point.z)}`);
  }

  const operating = design.input.operating;
  if (operating) {
    heading(DESIGN_SECTIONS.running);
    if (operating.speedRangeRpm)
      body(
        `${INPUT_LABELS.speedRange} ${fmt(operating.speedRangeRpm.min, 0)}–${fmt(operating.speedRangeRpm.max, 0)} rpm (the lowest speed governs)`,
      );
    else if (operating.speedRpm !== undefined) body(`${INPUT_LABELS.speed} ${fmt(operating.speedRpm, 0)} rpm`);
    body(`${INPUT_LABELS.orders}: ${(operating.orders ?? []).map((o) => `${o}×`).join(', ') || '—'}`);
    if (operating.vaneCount) body(`${INPUT_LABELS.vaneCount}: ${operating.vaneCount}`);
    if (operating.lineFrequencyHz) body(`${INPUT_LABELS.supplyFrequency}: ${fmt(operating.lineFrequencyHz, 0)} Hz`);
    if (operating.skipBandsRpm?.length)
      body(`Skip bands: ${operating.skipBandsRpm.map((b) => `${fmt(b.min, 0)}–${fmt(b.max, 0)} rpm`).join(', ')}`);
    if (operating.motorPoles !== undefined) body(`Motor poles: ${operating.motorPoles}`);
    if (operating.sources?.length) body(`Sources: ${operating.sources.map((s) => s.label).join(', ')} (see the whole machine below)`);
  }

  const criteria = design.input.criteria;
  if (criteria) {
    heading(DESIGN_SECTIONS.requirements);
    body(`${INPUT_LABELS.minIsolation} ${fmt(criteria.minIsolationPct, 1)} % of the whole machine over the running range`);
    if (criteria.stiffnessTolerancePct !== undefined) body(`Stiffness tolerance ±${fmt(criteria.stiffnessTolerancePct, 1)} %`);
    if (criteria.maxResonantMotionMm !== undefined)
      body(`Largest motion passing a mode on start-up ${q('deflection', criteria.maxResonantMotionMm / 1000)}`);
    body(
      `${INPUT_LABELS.utilisation} between ${formatUtilisation(criteria.minUtilization)} and ${formatUtilisation(criteria.maxUtilization)} of the rated load` +
        `${criteria.weightMarginPct ? `, the upper limit with the ${formatDecimal(criteria.weightMarginPct, 1)} % weight margin on the load` : ''}`,
    );
    const margin = criteria.weightMarginPct;
    body(
      `${INPUT_LABELS.weightMargin} ${fmt(margin ?? DEFAULT_WEIGHT_MARGIN_PCT, 0)} %${margin === undefined ? ' (the default for weights not yet final)' : ''}`,
    );
    if (criteria.ambientTempC !== undefined) body(`${INPUT_LABELS.ambientTemperature} ${q('temperature', criteria.ambientTempC)}`);
    if (criteria.mountTypes?.length)
      body(`${INPUT_LABELS.mountTypes}: ${criteria.mountTypes.map((t) => mountTypeLabel(t).toLowerCase()).join(', ')}`);
  }

  heading(INPUT_LABELS.disturbingFrequencies);
  for (const frequency of options.disturbingFrequencies) body(`${fmt(frequency.frequencyHz, 2)} Hz — ${frequency.label}`);

  const candidate = snapshot?.candidate ?? design.chosen;
  heading(RESULT_LABELS.chosenMounts);
  if (!candidate) {
    body('No mounts chosen yet.');
  } else {
    body(`${candidate.label} (${candidate.supplier.name})`);
    body(`Vertical natural frequency (uncoupled bounce estimate): ${fmt(candidate.verticalNaturalFrequencyHz, 2)} Hz`);
    body(
      `${RESULT_LABELS.resonance}: ${fmt(candidate.resonanceAmplification, 1)}; ${RESULT_LABELS.levelError.toLowerCase()} between points: ${q('deflection', candidate.levelErrorMm / 1000)}`,
    );
    heading('Mount points');
    for (const point of candidate.perPoint) {
      body(
        `${point.label}: ${point.partNumber}, load ${q('force', point.loadN)}, utilisation ${utilizationText(point.utilization, candidate.weightMarginPct ?? 0)}, ` +
          `static deflection ${q('deflection', point.staticDeflectionMm / 1000)}`,
      );
    }
    heading('Isolation at each disturbing frequency (bounce estimate)');
    for (const row of candidate.isolation) {
      body(
        `${fmt(row.frequencyHz, 2)} Hz: transmissibility ${row.transmissibility.toFixed(4)}, isolation ${fmt(row.efficiencyPct, 1)} %, ${fmt(row.dB, 1)} dB`,
      );
    }
    if (candidate.modes?.length) {
      heading('Rigid-body modes');
      for (const mode of candidate.modes) body(`${fmt(mode.frequencyHz, 2)} Hz — ${modeMotionText(mode)}`);
    }
    const whole = wholeMachineReportLines(design.input.operating, snapshot?.wholeMachine, candidate, criteria?.minIsolationPct);
    heading(whole.heading);
    for (const paragraph of whole.paragraphs) body(inReaderUnits(paragraph, units));
    if (snapshot?.wholeMachine) speedChart(doc, snapshot.wholeMachine);
    for (const line of passageReportLines(snapshot?.wholeMachine, candidate)) body(inReaderUnits(line, units));
    const mounts = snapshot?.mounts ?? [];
    if (mounts.length) {
      heading(`${RESULT_LABELS.chosenMounts} — catalog data as frozen`);
      for (const mount of mounts) body(mountLine(mount, units));
    }
    const damping = mounts.length ? dampingOf(mounts[0]) : undefined;
    heading('Transmissibility (bounce estimate)');
    transmissibilityChart(doc, candidate.verticalNaturalFrequencyHz, damping, options.disturbingFrequencies, criteria?.minIsolationPct);
    const verdict = verdictReportLines(candidate);
    heading(verdict.heading);
    for (const paragraph of verdict.paragraphs) body(inReaderUnits(paragraph, units));
  }
  if (design.input.restraint) {
    const section = restraintReportLines(design.input.restraint, candidate?.restraint, units);
    heading(section.heading);
    for (const paragraph of section.paragraphs) body(paragraph);
  }
  if (options.verifications?.length) asBuiltSection(doc, options.verifications, heading, body, units);

  doc.addPage();
  doc.font('heading').fontSize(16).fillColor('black').text(RESULT_LABELS.billOfMaterials);
  const lines = design.bom ?? [];
  if (lines.length === 0) body('No mounts chosen yet.');
  const withPrices = options.prices ?? true;
  if (!withPrices) {
    const machines = options.machineCount ?? 1;
    body(machines > 1 ? `Quantities for one machine; this request is for ${machines} identical machines.` : 'Quantities for one machine.');
    for (const line of lines) body(`${line.supplier.name} ${line.partNumber} × ${line.quantity} (points ${line.mountPoints.join(', ')})`);
  } else {
    for (const line of lines) {
      body(
        `${line.supplier.name} ${line.partNumber} × ${line.quantity} (points ${line.mountPoints.join(', ')}): ` +
          `${line.unitPrice === null ? 'price on request' : `${formatMoney(line.unitPrice, line.currency)} each, ${formatMoney(line.extendedPrice ?? 0, line.currency)}`}` +
          `${line.leadTimeDays === null ? '' : `, lead time ${line.leadTimeDays} days`}`,
      );
    }
    for (const total of bomTotals(lines)) {
      doc
        .font('heading')
        .fontSize(10)
        .text(
          `Total: ${total.quantity} mounts, ${formatMoney(total.amount, total.currency)}${total.unpricedLines ? ` (${total.unpricedLines} line(s) without a price)` : ''}`,
        );
    }
  }
  if (snapshot) {
    heading('Data basis');
    body(
      `Mount data and every figure above were frozen on ${snapshot.takenAt.slice(0, 10)} when the mounts were chosen; later catalog changes do not alter them.`,
    );
  }
  cautionSection();

  pageFooters(doc, `${design.project.name} — ${design.name}, revision ${design.revision}`, watermark);
  doc.end();
  return done;
}

const KIND_WORDS = { frf: 'FRF file', impact: 'raw hammer record' } as const;
const VERDICT_WORDS = { agrees: 'agrees', stiffer: 'stiffer than predicted', softer: 'softer than predicted' } as const;
/** Measurements listed in full; older ones are summed up in one line. */
const REPORT_VERIFICATIONS = 5;

/**
 * The as-built verification: each tap test with who measured it and when, the identified
 * figures beside the predicted ones, the verdict, its likely causes and the warnings.
 */
function asBuiltSection(
  doc: PDFKit.PDFDocument,
  verifications: Verification[],
  heading: (text: string) => unknown,
  body: (text: string) => unknown,
  units: UnitSystem,
): void {
  heading('As-built verification (tap tests)');
  body(
    'Natural frequency and damping identified from measured frequency responses (peak picking and half-power bandwidth), ' +
      'compared with the design mode nearest to the measured one. Newest first.',
  );
  for (const v of verifications.slice(0, REPORT_VERIFICATIONS)) {
    const o = v.outcome;
    const sign = o.deviationPct >= 0 ? '+' : '';
    const processing = o.processing
      ? `, ${o.processing.hitsAveraged} of ${o.processing.hitsFound} hits averaged`
      : `, ${o.measured.quantity}`;
    doc.moveDown(0.4);
    doc
      .font('heading')
      .fontSize(10)
      .text(`${v.createdAt.toISOString().slice(0, 10)} — measured by ${v.user.name} — ${v.fileName} (${KIND_WORDS[v.kind]}${processing})`);
    if (v.note) body(v.note);
    body(
      `Natural frequency ${fmt(o.identified.naturalFrequencyHz, 3)} Hz measured against ${fmt(o.predicted.naturalFrequencyHz, 3)} Hz predicted ` +
        `(${o.predicted.mode} mode${o.predicted.source === 'bounce estimate' ? ', uncoupled estimate' : ''}): ${sign}${fmt(o.deviationPct, 1)} % ` +
        `(tolerance ±${fmt(v.tolerancePct, 0)} %) — ${VERDICT_WORDS[o.verdict]}.`,
    );
    body(
      `Damping ratio ${o.identified.dampingRatio === null ? 'not identified' : o.identified.dampingRatio.toFixed(3)}; ` +
        `apparent stiffness ${formatMeasure('stiffness', o.identified.stiffnessNPerM, units)} against ${formatMeasure('stiffness', o.predicted.stiffnessNPerM, units)} predicted ` +
        `(design mass ${formatMeasure('mass', o.predicted.massKg, units, 0)}, ${sign}${fmt(o.stiffnessDeviationPct, 1)} %).`,
    );
    for (const note of o.notes) body(`• ${note}`);
    for (const warning of o.warnings) body(`• Caution: ${warning}`);
  }
  if (verifications.length > REPORT_VERIFICATIONS) {
    body(`${verifications.length - REPORT_VERIFICATIONS} older measurement(s) are on the design page.`);
  }
}

function dampingOf(mount: MountSnapshot): Damping | undefined {
  if (mount.dampingModel === 'hysteretic' && mount.lossFactor !== null) return hystereticDamping(mount.lossFactor);
  if (mount.dampingRatio !== null) return viscousDamping(mount.dampingRatio);
  return undefined;
}

function mountLine(m: MountSnapshot, units: UnitSystem): string {
  const q = (quantity: Parameters<typeof formatMeasure>[0], si: number) => formatMeasure(quantity, si, units);
  const damping = m.dampingModel === 'hysteretic' ? `loss factor ${m.lossFactor}` : `damping ratio ${m.dampingRatio}`;
  return (
    `${m.supplier.name} ${m.partNumber} (${mountTypeLabel(m.mountType).toLowerCase()}${m.series ? `, series ${m.series}` : ''}): ` +
    `rated load ${q('force', m.ratedLoadN)}, vertical stiffness ${q('stiffness', m.verticalStiffnessNPerM)}` +
    `${m.horizontalStiffnessNPerM === null ? '' : `, horizontal ${q('stiffness', m.horizontalStiffnessNPerM)}`}` +
    `, dynamic-to-static ratio ${m.dynamicStiffnessRatio ?? 'not given'}, ${damping}` +
    `${m.maxDeflectionMm === null ? '' : `, max deflection ${q('deflection', m.maxDeflectionMm / 1000)}`}` +
    `${m.tempMinC === null || m.tempMaxC === null ? '' : `, ${q('temperature', m.tempMinC)} to ${q('temperature', m.tempMaxC)}`}`
  );
}

/**
 * Transmissibility of the chosen mounts against frequency, drawn as vectors (log–log): the curve
 * from @tacet/vibration with the catalog damping, the T = 1 line, the isolation region above
 * √2·fn shaded, the target transmissibility and the disturbing frequencies marked.
 */
function transmissibilityChart(
  doc: PDFKit.PDFDocument,
  fnHz: number,
  damping: Damping | undefined,
  frequencies: LabelledFrequency[],
  minIsolationPct: number | undefined,
): void {
  const width = 440;
  const height = 200;
  if (doc.y + height + 40 > doc.page.height - doc.page.margins.bottom) doc.addPage();
  const left = doc.page.margins.left + 40;
  const top = doc.y + 6;
  const fMin = Math.min(fnHz / 4, ...frequencies.map((f) => f.frequencyHz / 2));
  const fMax = Math.max(fnHz * 20, ...frequencies.map((f) => f.frequencyHz * 2));
  const [tMin, tMax] = [1e-4, 1e2];
  const x = (f: number) => left + (width * Math.log10(f / fMin)) / Math.log10(fMax / fMin);
  const y = (t: number) => top + (height * Math.log10(tMax / Math.min(tMax, Math.max(tMin, t)))) / Math.log10(tMax / tMin);

  doc.save();
  const crossover = Math.SQRT2 * fnHz;
  doc
    .rect(x(crossover), top, left + width - x(crossover), height)
    .fillOpacity(0.12)
    .fill('#2f7d6d');
  doc.fillOpacity(1);
  doc.lineWidth(0.5).strokeColor('#999999');
  for (let decade = -4; decade <= 2; decade++) {
    doc
      .moveTo(left, y(10 ** decade))
      .lineTo(left + width, y(10 ** decade))
      .stroke();
    doc
      .font('body')
      .fontSize(7)
      .fillColor('#555555')
      .text(`1e${decade}`, left - 30, y(10 ** decade) - 4, { width: 26, align: 'right', lineBreak: false });
  }
  for (let decade = Math.ceil(Math.log10(fMin)); 10 ** decade <= fMax; decade++) {
    doc
      .moveTo(x(10 ** decade), top)
      .lineTo(x(10 ** decade), top + height)
      .stroke();
    doc.text(`${10 ** decade} Hz`, x(10 ** decade) - 20, top + height + 3, { width: 40, align: 'center', lineBreak: false });
  }
  doc.rect(left, top, width, height).lineWidth(0.8).strokeColor('#333333').stroke();
  if (minIsolationPct !== undefined && minIsolationPct < 100) {
    const target = 1 - minIsolationPct / 100;
    doc
      .moveTo(left, y(target))
      .lineTo(left + width, y(target))
      .dash(4, { space: 3 })
      .strokeColor('#a05a00')
      .stroke()
      .undash();
    doc
      .fillColor('#a05a00')
      .text(`target T ${target.toPrecision(2)}`, left + width - 80, y(target) - 10, { width: 78, align: 'right', lineBreak: false });
  }
  doc.strokeColor('#c0392b').lineWidth(0.8);
  for (const f of frequencies) {
    doc
      .moveTo(x(f.frequencyHz), top)
      .lineTo(x(f.frequencyHz), top + height)
      .dash(2, { space: 2 })
      .stroke()
      .undash();
  }
  const grid = logSpace(fMin, fMax, 300);
  doc.lineWidth(1.4).strokeColor('#1d4f45');
  grid.forEach((f, i) => {
    const t = transmissibility(f / fnHz, damping);
    if (i === 0) doc.moveTo(x(f), y(t));
    else doc.lineTo(x(f), y(Number.isFinite(t) ? t : tMax));
  });
  doc.stroke();
  doc.restore();
  doc.font('body').fontSize(8).fillColor('black');
  doc.x = doc.page.margins.left;
  doc.y = top + height + 16;
  doc.text(
    `Transmissibility T (log) against frequency (log); natural frequency ${fmt(fnHz, 2)} Hz; shaded: isolation (above 1.414 × natural frequency); ` +
      `red dashed lines: the disturbing frequencies${damping ? '' : '; drawn undamped (no damping data)'}.`,
  );
}

/** "page i of n" and the design's identity at the foot of every page. */
function pageFooters(doc: PDFKit.PDFDocument, identity: string, decorate: () => void): void {
  const range = doc.bufferedPageRange();
  for (let i = range.start; i < range.start + range.count; i++) {
    doc.switchToPage(i);
    decorate();
    const bottom = doc.page.margins.bottom;
    doc.page.margins.bottom = 0; // writing inside the bottom margin must not open a new page
    doc.font('body').fontSize(8).fillColor('#555555');
    doc.text(`${identity} — page ${i + 1} of ${range.count}`, doc.page.margins.left, doc.page.height - 35, {
      width: doc.page.width - doc.page.margins.left - doc.page.margins.right,
      align: 'center',
      lineBreak: false,
    });
    doc.page.margins.bottom = bottom;
  }
}

/**
 * How a mode moves: "bounce", or "yaw + roll (mixed): yaw 55 %, roll 40 %"
 * (docs/engineering/rigid-body-modes.md §6). A candidate stored before the shares were kept
 * names its dominant coordinate.
 */
export function modeMotionText(
  mode: Pick<CandidateMode, 'dominant' | 'coupled'> & Partial<Pick<CandidateMode, 'energyFractions'>>,
): string {
  if (!mode.energyFractions) return `mostly ${mode.dominant}${mode.coupled ? ' (coupled)' : ''}`;
  const motion = describeModeMotion(mode.energyFractions);
  if (!motion.mixed) return motion.name;
  return `${motion.name}: ${motion.participants.map((p) => `${p.dof} ${shareText(p.share)}`).join(', ')}`;
}

/** Whole percent, or one decimal where whole percent would read 90 % for a share below it (a mixed mode). */
function shareText(share: number): string {
  const whole = Math.round(share * 100);
  return whole >= 90 && share < 0.9 ? `${(Math.floor(share * 1000) / 10).toFixed(1)} %` : `${whole} %`;
}
