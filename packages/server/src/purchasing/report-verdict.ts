import type { Candidate } from '../selection/selection.types.js';

/**
 * The verdict section of the calculation report: whether the chosen candidate meets every check,
 * the reasons it does not, the notes, and every value assumed for want of catalog or input data
 * (docs/engineering/selection.md §14). Plain text lines; the report lays them out.
 */
export interface VerdictReportLines {
  heading: string;
  paragraphs: string[];
}

/** The report fonts lack a few signs the selection's words may use: spelled out. */
export function reportSafe(text: string): string {
  return text.replace(/√/g, 'sqrt ').replace(/≥/g, '>=').replace(/≤/g, '<=').replace(/ζ/g, 'zeta').replace(/η/g, 'eta');
}

export function verdictReportLines(candidate: Candidate): VerdictReportLines {
  const paragraphs: string[] = [];
  const assumptions = candidate.assumptions;
  const reasons = candidate.reasons ?? [];
  const notes = candidate.notes ?? [];
  paragraphs.push(
    candidate.passes
      ? 'Verdict: the chosen mounts meet every check of the selection.'
      : `Verdict: the chosen mounts do NOT meet ${reasons.length === 1 ? 'one check' : `${reasons.length} checks`} of the selection:`,
  );
  for (const reason of reasons) paragraphs.push(`• ${reportSafe(reason)}`);
  if (notes.length) {
    paragraphs.push('Notes:');
    for (const note of notes) paragraphs.push(`• ${reportSafe(note)}`);
  }
  if (assumptions === undefined) {
    paragraphs.push('Assumptions: not recorded (the mounts were chosen before the selection listed them; run it again to see them).');
  } else if (assumptions.length === 0) {
    paragraphs.push('Assumptions: none; every figure comes from the catalog and the design input.');
  } else {
    paragraphs.push('Assumptions (values not given by the catalog or the input, taken on the unfavourable side):');
    for (const assumption of assumptions) paragraphs.push(`• ${reportSafe(assumption)}`);
  }
  return { heading: 'Verdict, notes and assumptions', paragraphs };
}
