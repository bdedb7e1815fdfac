/**
 * Evaluation of the series candidates: one supplier's series with the size picked per point for
 * a level skid. Per series, `selectSizesForLevellingInto` picks a size at each point for a common
 * deflection δ₀ = u*·mean(P_r/k) (u* = PREFERRED_UTILIZATION kept inside the utilisation window)
 * and re-solves the loads with those sizes; then the same checks and figures as a uniform
 * candidate. A series is offered only when its level error beats ΔF/k of its stiffest picked size
 * alone (otherwise it duplicates a uniform candidate): docs/engineering/selection.md §3. One workspace
 * per request; the loop allocates nothing.
 */
import { createLevellingWorkspace, naturalFrequencyHz, selectSizesForLevellingInto } from '@tacet/vibration';
import { PREFERRED_UTILIZATION } from '../scoring.js';
import type { SelectionProblem } from '../selection-problem.js';
import type { CandidateStore } from './candidate-store.js';
import { FAIL, lightFactorOf, machineChecks } from './checks.js';
import { checkSeriesAlt, seriesAltBuffers } from './mass-case.js';

/**
 * Evaluates every series group; `everySeries` keeps the series that would be dropped (a choice
 * made outside the list). Returns how many series were dropped (marked in `skip`).
 */
export function evaluateSeries(store: CandidateStore, problem: SelectionProblem, everySeries: boolean): number {
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
  const { supportCompliance, hasSupport } = problem;
  const altBuffers = problem.alt ? seriesAltBuffers(problem) : undefined;
  const { isSpring, springLimitM, rowAssumed } = store;
  const spread = problem.maxLoadN - problem.minLoadN;
  const R = store.rowCount;
  const G = store.groupCount;
  const { groupRows, groupStart, seriesRow, seriesLoad, rated, kv, nd, maxDeflectionM, rowFail, rowDamping, rowHysteretic } = store;
  const { unitPrice, leadDays, currencyIndex, id, skip } = store;
  // rated load and stiffness of each group position, back to back as the size pick reads them
  const groupRated = new Float64Array(groupRows.length);
  const groupK = new Float64Array(groupRows.length);
  for (let p = 0; p < groupRows.length; p++) {
    groupRated[p] = rated[groupRows[p]];
    groupK[p] = kv[groupRows[p]];
  }
  const workspace = createLevellingWorkspace(problem.layout);
  const preferredU = Math.min(Math.max(PREFERRED_UTILIZATION, minUtilization), maxUtilization);
  let skipped = 0;
  for (let g = 0; g < G; g++) {
    const c = R + g;
    const from = groupStart[g];
    const to = groupStart[g + 1];
    store.fnHz[c] = 1; // placeholder for skipped entries (the kernels need fn > 0)
    if (to - from < 2 && !everySeries) {
      skip[c] = 1;
      skipped++;
      continue;
    }
    let sumDeflectionAtRated = 0;
    for (let p = from; p < to; p++) sumDeflectionAtRated += groupRated[p] / groupK[p];
    const target = (preferredU * sumDeflectionAtRated) / (to - from);
    selectSizesForLevellingInto(
      problem.layout,
      problem.weightN,
      problem.cg.x,
      problem.cg.y,
      loads,
      groupRated,
      groupK,
      from,
      to,
      target,
      workspace,
    );
    const first = groupRows[workspace.sizeIndex[0]];
    let allSame = true;
    let fail = baseFail;
    let sumU = 0;
    let sumKd = 0;
    let sumK = 0;
    let sumKDamping = 0;
    let sumDefl = 0;
    let assumed = 0;
    let lo = Number.POSITIVE_INFINITY;
    let hi = Number.NEGATIVE_INFINITY;
    let price = 0;
    let lead = 0;
    const currency = currencyIndex[first];
    for (let i = 0; i < n; i++) {
      const r = groupRows[workspace.sizeIndex[i]];
      if (r !== first) allSame = false;
      const f = workspace.loadsN[i];
      seriesRow[g * n + i] = r;
      seriesLoad[g * n + i] = f;
      const u = f / rated[r];
      sumU += u;
      if (u * margin > maxUtilization || u < minUtilization) fail |= failUtilization;
      if (isSpring[r] === 1 && u * light < minUtilization) fail |= failLight;
      const d = workspace.deflectionsM[i];
      if (d * margin > maxDeflectionM[r]) fail |= failDeflection;
      if (d * margin > springLimitM[r]) fail |= failReserve;
      fail |= rowFail[r];
      assumed |= rowAssumed[r];
      const k = kv[r];
      sumK += k;
      // the support under the point in series with the mount (§15); c = 0 on a rigid floor
      const total = hasSupport ? d + f * supportCompliance[i] : d;
      sumDefl += total;
      if (total < lo) lo = total;
      if (total > hi) hi = total;
      sumKd += hasSupport ? 1 / (1 / (nd[r] * k) + supportCompliance[i]) : nd[r] * k;
      sumKDamping += k * rowDamping[r];
      price += unitPrice[r];
      if (currencyIndex[r] !== currency) price = Number.NaN;
      lead = Math.max(lead, leadDays[r]); // NaN (unknown) stays NaN
    }
    // Offered only when picking sizes per point levels the skid better than one size of the
    // series everywhere would: with one size k at every point the level error is ΔF/k, least
    // for the stiffest size picked.
    let stiffest = 0;
    for (let i = 0; i < n; i++) stiffest = Math.max(stiffest, kv[groupRows[workspace.sizeIndex[i]]]);
    if ((allSame || workspace.levelErrorM >= spread / stiffest) && !everySeries) {
      skip[c] = 1;
      skipped++;
      continue;
    }
    store.fail[c] = fail;
    if (altBuffers) checkSeriesAlt(store, problem, c, altBuffers);
    store.assumed[c] = assumed;
    store.meanUtilization[c] = sumU / n;
    store.levelErrorM[c] = hasSupport ? hi - lo : workspace.levelErrorM;
    store.meanDeflectionM[c] = sumDefl / n;
    store.fnHz[c] = naturalFrequencyHz(sumKd, massKg);
    // One series shares one damping figure in practice; sizes that differ are averaged by stiffness.
    store.damping[c] = sumKDamping / sumK;
    store.hysteretic[c] = rowHysteretic[first];
    store.price[c] = price;
    store.lead[c] = lead;
    store.candidateCurrency[c] = currency;
    store.tieKey[c] = 2 ** 31 + id[groupRows[from]];
  }
  return skipped;
}
