/**
 * Evaluation of the uniform candidates: one catalog row at every point. With identical mounts
 * the rigid-frame loads equal the equal-stiffness loads (`problem.equalLoadsN`), so they are
 * reused for every row. Fills, per candidate: the load checks (utilisation window, static
 * deflection, CG inside the polygon; for springs reserve travel and the light case, spring-checks.ts), the figures the score reads, the natural frequency and
 * damping for the isolation kernel (each mount in series with the support under its point,
 * selection.md §15), price and lead time (docs/engineering/selection.md §3, §5, §6, §8, §15, §16).
 * One pass over typed arrays; allocates nothing.
 */
import { naturalFrequencyHz } from '@tacet/vibration';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL, lightFactorOf, machineChecks } from './checks.js';
import { checkUniformAlt } from './mass-case.js';

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
  const failReserve = FAIL.reserveTravel;
  const failLight = FAIL.lightLoad;
  const light = lightFactorOf(problem);
  const spread = problem.maxLoadN - problem.minLoadN;
  const { supportCompliance, hasSupport } = problem;
  const hasAlt = problem.alt !== undefined;
  const { kv, rated, maxDeflectionM, rowFail, nd, rowDamping, rowHysteretic, unitPrice, leadDays, currencyIndex, id } = store;
  const { isSpring, springLimitM, rowAssumed, assumed } = store;
  const { fail, meanUtilization, levelErrorM, meanDeflectionM, fnHz, damping, hysteretic, price, lead, candidateCurrency, tieKey } = store;
  for (let r = 0; r < store.rowCount; r++) {
    const k = kv[r];
    const ratedN = rated[r];
    const maxDefl = maxDeflectionM[r];
    const springLimit = springLimitM[r];
    const spring = isSpring[r] === 1;
    let f = baseFail | rowFail[r];
    let sumU = 0;
    for (let i = 0; i < n; i++) {
      const u = loads[i] / ratedN;
      sumU += u;
      if (u * margin > maxUtilization || u < minUtilization) f |= failUtilization;
      const d = (loads[i] / k) * margin;
      if (d > maxDefl) f |= failDeflection;
      if (d > springLimit) f |= failReserve;
      if (spring && u * light < minUtilization) f |= failLight;
    }
    fail[r] = f;
    if (hasAlt) checkUniformAlt(store, problem, r);
    assumed[r] = rowAssumed[r];
    meanUtilization[r] = sumU / n;
    const kd = nd[r] * k;
    if (hasSupport) {
      // the support under each point in series with the mount: level, deflection and bounce (§15)
      let lo = Number.POSITIVE_INFINITY;
      let hi = Number.NEGATIVE_INFINITY;
      let sumD = 0;
      let sumKd = 0;
      for (let i = 0; i < n; i++) {
        const d = loads[i] * (1 / k + supportCompliance[i]);
        sumD += d;
        if (d < lo) lo = d;
        if (d > hi) hi = d;
        sumKd += 1 / (1 / kd + supportCompliance[i]);
      }
      levelErrorM[r] = hi - lo;
      meanDeflectionM[r] = sumD / n;
      fnHz[r] = naturalFrequencyHz(sumKd, massKg);
    } else {
      levelErrorM[r] = spread / k;
      meanDeflectionM[r] = problem.weightN / (n * k);
      fnHz[r] = naturalFrequencyHz(kd * n, massKg);
    }
    damping[r] = rowDamping[r];
    hysteretic[r] = rowHysteretic[r];
    price[r] = unitPrice[r] * n;
    lead[r] = leadDays[r];
    candidateCurrency[r] = currencyIndex[r];
    tieKey[r] = id[r];
  }
}
