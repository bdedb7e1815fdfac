/**
 * Evaluation of the uniform candidates: one catalog row at every point. With identical mounts
 * the rigid-frame loads equal the equal-stiffness loads (`problem.equalLoadsN`), so they are
 * reused for every row. Fills, per candidate: the load checks (utilisation window, static
 * deflection, CG inside the polygon), the figures the score reads, the natural frequency and
 * damping for the isolation kernel, price and lead time (docs/engineering/selection.md §3, §5, §6, §8).
 * One pass over typed arrays; allocates nothing.
 */
import { naturalFrequencyHz } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL, machineChecks } from './checks.js';

export function evaluateUniform(store: CandidateStore, problem: SelectionProblem): void {
  const { minUtilization, maxUtilization } = problem.criteria;
  const n = problem.pointCount;
  const loads = problem.equalLoadsN;
  const margin = problem.marginFactor;
  const massKg = problem.massKg;
  const baseFail = machineChecks(problem);
  // the bits as locals: read per point, an imported object's field costs a load each time
  const failUtilization = FAIL.utilization;
  const failDeflection = FAIL.deflection;
  const spread = problem.maxLoadN - problem.minLoadN;
  const { kv, rated, maxDeflectionM, rowFail, nd, rowDamping, rowHysteretic, unitPrice, leadDays, currencyIndex, id } = store;
  const { fail, meanUtilization, levelErrorM, meanDeflectionM, fnHz, damping, hysteretic, price, lead, candidateCurrency, tieKey } = store;
  for (let r = 0; r < store.rowCount; r++) {
    const k = kv[r];
    const ratedN = rated[r];
    const maxDefl = maxDeflectionM[r];
    let f = baseFail | rowFail[r];
    let sumU = 0;
    for (let i = 0; i < n; i++) {
      const u = loads[i] / ratedN;
      sumU += u;
      if (u * margin > maxUtilization || u < minUtilization) f |= failUtilization;
      if ((loads[i] / k) * margin > maxDefl) f |= failDeflection;
    }
    fail[r] = f;
    meanUtilization[r] = sumU / n;
    levelErrorM[r] = spread / k;
    meanDeflectionM[r] = problem.weightN / (n * k);
    fnHz[r] = naturalFrequencyHz(nd[r] * n * k, massKg);
    damping[r] = rowDamping[r];
    hysteretic[r] = rowHysteretic[r];
    price[r] = unitPrice[r] * n;
    lead[r] = leadDays[r];
    candidateCurrency[r] = currencyIndex[r];
    tieKey[r] = id[r];
  }
}
