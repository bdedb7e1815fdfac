/**
 * The words of the whole-machine verdict (docs/engineering/selection.md §19–§21): the reason of a
 * candidate the verdict fails (the worst point, then each crossing inside the running range), the
 * notes of one it passes, the band end and the assumed horizontal ratio that governed. reasons.ts
 * places them among the other checks' words.
 */
import { formatHz, formatNumber, formatPctValue, formatRpm } from '../selection-format.js';
import { FAIL } from './checks.js';
import type { CandidateWholeMachine } from '../selection.types.js';
import type { WordingContext } from './reasons.js';

/** The worst whole-machine point against the requirement, then every crossing inside the running range. */
export function wholeMachine({ problem, wholeMachine: w }: WordingContext): string[] {
  if (!w) return [];
  const bandAndRatio = bandWords(w.worst.stiffnessFactor, w.stiffnessTolerancePct) + assumedRatioWords(w.assumedHorizontalRatio);
  return [worstPointWords('Whole machine', w.worst, bandAndRatio, problem.criteria.minIsolationPct), ...w.crossings.map(crossingWords)];
}

/**
 * The sentence of a worst point above the requirement: amplification above T = 1, otherwise the
 * isolation reached. `lead` names the case ("Whole machine", or the second mass case).
 */
export function worstPointWords(
  lead: string,
  worst: CandidateWholeMachine['worst'],
  bandAndRatio: string,
  minIsolationPct: number,
): string {
  const at = atWords(worst);
  const required = `${formatNumber(minIsolationPct, 1)} %`;
  return worst.transmissibility > 1
    ? `${lead}, ${worst.source}: at ${at}${bandAndRatio} the mounts amplify the force (transmissibility ` +
        `${formatNumber(worst.transmissibility, 2)}) instead of isolating it; ${required} isolation is required.`
    : `${lead}, ${worst.source}: isolation ${formatPctValue(worst.efficiencyPct)} at ${at}${bandAndRatio}, below the ${required} required.`;
}

/** Where a worst point lies: "1480 rpm, 24.67 Hz", or the frequency alone without a speed. */
function atWords(worst: CandidateWholeMachine['worst']): string {
  return worst.speedRpm === null ? formatHz(worst.frequencyHz) : `${formatRpm(worst.speedRpm)}, ${formatHz(worst.frequencyHz)}`;
}

function crossingWords(x: { mode: string; modeFrequencyHz: number; source: string; order: number; speedRpm: number }): string {
  return (
    `The ${x.mode} mode at ${formatHz(x.modeFrequencyHz)} is crossed by ${x.source} (${formatNumber(x.order, 2)}× shaft speed) ` +
    `at ${formatRpm(x.speedRpm)}, inside the running range.`
  );
}

/** The verdict's basis for a candidate that passes it, crossings that did not fail it, the fallback to the estimate. */
export function wholeMachineNotes({ store, c, wholeMachine: w, modes }: WordingContext): string[] {
  if (!w) {
    return modes === undefined
      ? []
      : [
          'Whole-machine verdict not computed (the inertia of the machine is unknown or degenerate): the verdict uses the bounce ' +
            'estimate at the disturbing frequencies.',
        ];
  }
  const notes: string[] = [];
  if (!(store.fail[c] & FAIL.wholeMachine)) {
    const { worst } = w;
    notes.push(
      `Whole machine: worst isolation ${formatPctValue(worst.efficiencyPct)}, ${worst.source} at ${atWords(worst)}` +
        `${bandWords(worst.stiffnessFactor, w.stiffnessTolerancePct)}${assumedRatioWords(w.assumedHorizontalRatio)}; ` +
        'the isolation per frequency above is the bounce estimate.',
    );
    for (const x of w.crossings) notes.push(`${crossingWords(x)} Its response stays within the requirement.`);
  }
  if (!w.toleranceFromCriteria && w.stiffnessTolerancePct > 0) {
    notes.push(`Stiffness band ±${formatNumber(w.stiffnessTolerancePct, 1)} % (the usual tolerance of this mount type).`);
  }
  return notes;
}

/** Which end of the assumed horizontal ratio governed, when the catalog gives none (selection.md §14). */
function assumedRatioWords(ratio: number | null): string {
  return ratio === null ? '' : ` (the horizontal stiffness the catalog does not give taken as ${formatNumber(ratio, 1)}× the vertical)`;
}

export function bandWords(factor: number, tolerancePct: number): string {
  if (tolerancePct === 0) return '';
  if (factor === 1) return ' (nominal stiffness)';
  const pct = formatNumber(Math.abs(factor - 1) * 100, 1);
  return factor < 1 ? ` (stiffness ${pct} % below nominal)` : ` (stiffness ${pct} % above nominal)`;
}
