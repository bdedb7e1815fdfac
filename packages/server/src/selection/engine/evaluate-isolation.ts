/**
 * Isolation of every candidate at once, uniform and series alike: the transmissibility at each
 * disturbing frequency through `transmissibilityBatch` (hysteretic for loss-factor rows, viscous
 * for damping-ratio rows), the resonance amplification T(r = 1), the isolation check against the
 * target, and the isolation at the worst frequency in dB (for the score): docs/engineering/selection.md
 * §9, §10.
 */
import { isolationDb, transmissibilityBatch } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';

export function evaluateIsolation(store: CandidateStore, problem: SelectionProblem): void {
  const C = store.candidateCount;
  const nf = problem.frequenciesHz.length;
  const { fnHz, damping, hysteretic, transmissibility, skip, minIsolationDb } = store;
  transmissibilityBatch(fnHz, damping, hysteretic, problem.frequenciesHz, transmissibility);
  // Resonance amplification T(r = 1) through the same kernel: fn = 1 Hz evaluated at f = 1 Hz.
  transmissibilityBatch(new Float64Array(C).fill(1), damping, hysteretic, [1], store.resonance);

  for (let c = 0; c < C; c++) {
    if (skip[c]) continue;
    let worst = 0;
    for (let j = 0; j < nf; j++) {
      const t = transmissibility[c * nf + j];
      if (t > worst) worst = t;
    }
    minIsolationDb[c] = isolationDb(worst);
  }
}
