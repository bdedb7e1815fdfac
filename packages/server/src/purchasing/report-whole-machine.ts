import type { OperatingConditions } from '../selection/dto/design-input.dto.js';
import type { Candidate, DesignSnapshot } from '../selection/selection.types.js';

/**
 * The whole-machine section of the calculation report (docs/engineering/selection.md §19–§22): the
 * sources where the forces act, the speeds and skip bands, the stiffness band, the verdict with its
 * worst point, the crossings, and (drawn by `speedChart`) transmissibility against speed per
 * source as frozen at the choice. Plain text lines; the report lays them out. (The report fonts
 * lack Greek letters and math signs: none are used.)
 */
export interface WholeMachineReportLines {
  heading: string;
  paragraphs: string[];
}

const num = (value: number, digits: number) => value.toFixed(digits);
const rpm = (value: number) => `${Math.round(value)} rpm`;
const hz = (value: number) => `${num(value, 2)} Hz`;
const AXIS_WORDS = { x: 'along the skid (x)', y: 'lateral (y)', z: 'vertical (z)' } as const;

/** One line per source as the engineer gave it, or the default vertical force. */
export function sourceLines(operating: OperatingConditions | undefined): string[] {
  const sources = operating?.sources ?? [];
  if (sources.length === 0) return ['Sources: none given; a vertical force through the centre of gravity at every disturbing frequency.'];
  return sources.map((s) => {
    const where = `at (${num(s.at.x, 3)}, ${num(s.at.y, 3)}, ${num(s.at.z, 3)}) m`;
    const when = s.frequencyHz !== undefined ? `at ${hz(s.frequencyHz)}` : `at ${s.order ?? 1}× shaft speed`;
    if (s.kind === 'unbalance') {
      return (
        `Source ${s.label}: unbalance of a ${num(s.rotorMassKg ?? 0, 1)} kg rotor balanced to G${s.balanceGradeMmPerS ?? 6.3}, ` +
        `turning about an axis ${AXIS_WORDS[s.axis]}, ${where}, ${when}.`
      );
    }
    return `Source ${s.label}: force of ${num(s.amplitudeN ?? 0, 1)} N ${AXIS_WORDS[s.axis]}, ${where}, ${when}.`;
  });
}

/** The section's text: sources, speeds, band, verdict and crossings (from the snapshot when there is one, else the chosen candidate). */
export function wholeMachineReportLines(
  operating: OperatingConditions | undefined,
  frozen: DesignSnapshot['wholeMachine'] | undefined,
  candidate: Candidate | null | undefined,
  minIsolationPct: number | undefined,
): WholeMachineReportLines {
  const paragraphs = sourceLines(operating);
  if (operating?.skipBandsRpm?.length) {
    paragraphs.push(`Skip bands of the drive: ${operating.skipBandsRpm.map((b) => `${rpm(b.min)}–${rpm(b.max)}`).join(', ')}.`);
  }
  if (operating?.motorPoles !== undefined && operating.speedRangeRpm) {
    paragraphs.push(
      `Motor on a drive with ${operating.motorPoles} poles: its magnetic force follows the speed (twice the drive output frequency).`,
    );
  }
  const worst = frozen?.worst ?? candidate?.wholeMachine?.worst;
  const tolerance = frozen?.stiffnessTolerancePct ?? candidate?.wholeMachine?.stiffnessTolerancePct;
  const crossings = frozen?.crossings ?? candidate?.crossings ?? [];
  if (!worst || tolerance === undefined) {
    paragraphs.push(
      candidate
        ? 'Whole-machine verdict not computed (the inertia of the machine is unknown): the verdict uses the bounce estimate.'
        : 'No mounts chosen yet.',
    );
    return { heading: 'Whole machine over the running range', paragraphs };
  }
  const passes = frozen?.passes ?? candidate?.passes ?? false;
  const at = worst.speedRpm === null ? hz(worst.frequencyHz) : `${rpm(worst.speedRpm)} (${hz(worst.frequencyHz)})`;
  const off = Math.abs(worst.stiffnessFactor - 1) * 100;
  const end =
    worst.stiffnessFactor === 1
      ? 'nominal stiffness'
      : Math.abs(off - tolerance) < 1e-9
        ? `${worst.stiffnessFactor < 1 ? 'soft' : 'stiff'} end of the band`
        : `stiffness ${num(off, 1)} % ${worst.stiffnessFactor < 1 ? 'below' : 'above'} nominal`;
  paragraphs.push(
    `Stiffness band: ±${num(tolerance, 1)} % on every mount stiffness; the verdict is the worst over the band, the running speeds ` +
      'outside the skip bands and the sources taken one at a time.',
  );
  paragraphs.push(
    `Worst point: ${worst.source} at ${at}, ${end}: whole-machine transmissibility ${num(worst.transmissibility, 4)}, ` +
      `isolation ${num(worst.efficiencyPct, 1)} %${minIsolationPct === undefined ? '' : ` (required ${num(minIsolationPct, 1)} %)`}.`,
  );
  paragraphs.push(`Verdict: ${passes ? 'meets the requirements' : 'does not meet the requirements (see the checks not met)'}.`);
  if (crossings.length === 0) paragraphs.push('No source order crosses a rigid-body mode inside the running range.');
  for (const x of crossings) {
    paragraphs.push(
      `Crossing: the ${x.mode} mode at ${hz(x.modeFrequencyHz)} is crossed by ${x.source} (${x.order}× shaft speed) at ${rpm(x.speedRpm)}.`,
    );
  }
  paragraphs.push(
    'The isolation per disturbing frequency above is the uncoupled bounce estimate, a quick figure; the verdict is this section.',
  );
  return { heading: 'Whole machine over the running range', paragraphs };
}

const COLOURS = ['#1d4f45', '#2c5aa0', '#8e44ad', '#b9770e', '#566573'];

/**
 * Transmissibility (log) against speed (linear) per source, as frozen: the nominal curve, the
 * stiffness band shaded between its ends, the requirement dashed, the skip bands greyed and the
 * crossings marked. Nothing to draw without a speed range.
 */
export function speedChart(doc: PDFKit.PDFDocument, frozen: NonNullable<DesignSnapshot['wholeMachine']>): void {
  const range = frozen.speedRangeRpm;
  if (!range || range.max <= range.min || frozen.curves.length === 0) return;
  const width = 440;
  const height = 200;
  if (doc.y + height + 60 > doc.page.height - doc.page.margins.bottom) doc.addPage();
  const left = doc.page.margins.left + 40;
  const top = doc.y + 6;
  const all = frozen.curves.flatMap((c) => [...c.transmissibility, ...(c.softEnd ?? []), ...(c.stiffEnd ?? [])]).filter(Number.isFinite);
  const tMax = 10 ** Math.ceil(Math.log10(Math.max(2, ...all)));
  const tMin = 10 ** Math.floor(Math.log10(Math.max(1e-4, Math.min(frozen.requirementTransmissibility / 2, ...all))));
  const x = (n: number) => left + (width * (n - range.min)) / (range.max - range.min);
  const y = (t: number) =>
    top + (height * Math.log10(tMax / Math.min(tMax, Math.max(tMin, Number.isFinite(t) ? t : tMax)))) / Math.log10(tMax / tMin);

  doc.save();
  for (const band of frozen.skipBandsRpm) {
    const a = Math.max(range.min, band.min);
    const b = Math.min(range.max, band.max);
    if (b > a)
      doc
        .rect(x(a), top, x(b) - x(a), height)
        .fillOpacity(0.15)
        .fill('#7f7f7f');
  }
  doc.fillOpacity(1);
  doc.lineWidth(0.5).strokeColor('#999999');
  for (let decade = Math.log10(tMin); decade <= Math.log10(tMax) + 1e-9; decade++) {
    doc
      .moveTo(left, y(10 ** decade))
      .lineTo(left + width, y(10 ** decade))
      .stroke();
    doc
      .font('body')
      .fontSize(7)
      .fillColor('#555555')
      .text(`1e${Math.round(decade)}`, left - 30, y(10 ** decade) - 4, { width: 26, align: 'right', lineBreak: false });
  }
  for (let k = 0; k <= 4; k++) {
    const n = range.min + ((range.max - range.min) * k) / 4;
    doc.text(rpm(n), x(n) - 25, top + height + 3, { width: 50, align: 'center', lineBreak: false });
  }
  doc.rect(left, top, width, height).lineWidth(0.8).strokeColor('#333333').stroke();
  const target = frozen.requirementTransmissibility;
  doc
    .moveTo(left, y(target))
    .lineTo(left + width, y(target))
    .dash(4, { space: 3 })
    .strokeColor('#a05a00')
    .stroke()
    .undash();
  doc
    .fillColor('#a05a00')
    .text(`required T ${target.toPrecision(2)}`, left + width - 90, y(target) - 10, { width: 88, align: 'right', lineBreak: false });
  doc.strokeColor('#c0392b').lineWidth(0.8);
  for (const crossing of frozen.crossings) {
    doc
      .moveTo(x(crossing.speedRpm), top)
      .lineTo(x(crossing.speedRpm), top + height)
      .dash(2, { space: 2 })
      .stroke()
      .undash();
  }
  frozen.curves.forEach((curve, s) => {
    const colour = COLOURS[s % COLOURS.length];
    const n = curve.speedRpm;
    if (curve.softEnd && curve.stiffEnd) {
      const hi = n.map((_, i) => Math.max(curve.softEnd![i], curve.stiffEnd![i], curve.transmissibility[i]));
      const lo = n.map((_, i) => Math.min(curve.softEnd![i], curve.stiffEnd![i], curve.transmissibility[i]));
      doc.moveTo(x(n[0]), y(hi[0]));
      for (let i = 1; i < n.length; i++) doc.lineTo(x(n[i]), y(hi[i]));
      for (let i = n.length - 1; i >= 0; i--) doc.lineTo(x(n[i]), y(lo[i]));
      doc.closePath().fillOpacity(0.15).fill(colour);
      doc.fillOpacity(1);
    }
    doc.lineWidth(1.3).strokeColor(colour);
    n.forEach((speed, i) => {
      // a skip band breaks the line
      if (i === 0 || frozen.skipBandsRpm.some((b) => n[i - 1] <= b.min && speed >= b.max))
        doc.moveTo(x(speed), y(curve.transmissibility[i]));
      else doc.lineTo(x(speed), y(curve.transmissibility[i]));
    });
    doc.stroke();
  });
  doc.restore();
  doc.font('body').fontSize(8).fillColor('black');
  doc.x = doc.page.margins.left;
  doc.y = top + height + 16;
  const legend = frozen.curves.map((c, s) => `${['green', 'blue', 'purple', 'amber', 'grey'][s % COLOURS.length]}: ${c.label}`).join('; ');
  doc.text(
    `Whole-machine transmissibility T (log) against shaft speed; ${legend}. Lines at the nominal stiffness, shaded: the stiffness band; ` +
      'red dashed lines: crossings of a source order with a rigid-body mode; grey: skip bands; amber dashed: the requirement.',
  );
}
