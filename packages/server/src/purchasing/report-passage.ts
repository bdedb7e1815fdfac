import { motionMeasure } from '../selection/selection-format.js';
import type { Candidate, CandidatePassage, DesignSnapshot } from '../selection/selection.types.js';

/**
 * The start-up passage lines of the calculation report, printed under the speed chart
 * (docs/engineering/start-up-passage.md): each rigid-body mode passed below the running range with
 * its speed and the steady peak motion at the mounts, against the limit, as frozen at the choice
 * (or from the chosen candidate). Plain text, no Greek letters or math signs (the report fonts lack them);
 * motions as figure marks, which the report writes in the reader's units (common/units/reader-words.ts).
 */
export function passageReportLines(frozen: DesignSnapshot['wholeMachine'] | undefined, candidate: Candidate | null | undefined): string[] {
  const passage: CandidatePassage[] | undefined = frozen?.passage ?? candidate?.passage;
  const limitMm = frozen?.passageLimitMm ?? candidate?.passageLimitMm;
  if (!passage) return [];
  const lines = ['Start-up and coast-down: the modes passed below the lowest running speed, with the unbalance at that speed.'];
  if (passage.length === 0) {
    lines.push('No mode is passed through below the running range by an unbalance source (or no unbalance source is given).');
    return lines;
  }
  for (const p of passage) {
    const over = limitMm !== undefined && !(p.motionMm <= limitMm);
    lines.push(
      `Passage: the ${p.mode} mode at ${p.modeFrequencyHz.toFixed(2)} Hz, passed at ${Math.round(p.speedRpm)} rpm: ` +
        `steady peak motion at the mounts ${motionText(p.motionMm)}${over ? ' - above the limit' : ''}.`,
    );
  }
  if (limitMm !== undefined) {
    lines.push(
      `Largest motion allowed: ${motionText(limitMm)}. The figures are steady motions at each mode, an upper bound for a slow run-up; ` +
        'a quick run-up passes with less. Limit stops or snubbers and flexible connections must take the motion.',
    );
  }
  return lines;
}

/** Two significant digits, at least one decimal, in the reader's units (the report renders the marks). */
function motionText(mm: number): string {
  return Number.isFinite(mm) ? motionMeasure(mm) : 'unbounded (no damping)';
}
