/** Speed sweep of one source over a running range, and the passage through modes below it (docs/engineering/whole-machine.md §6–§8). */
import { requireFinite, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { crossingSpeeds } from './crossings.js';
import { maxPeakMountMotion, setUnitLoad, solveAt, sumOfPeakMountForces } from './response-kernel.js';
import { requireRange } from './speed-range.js';
import { type WholeMachineSystem, wholeMachineModes } from './system.js';
import {
  type ModeCrossing,
  type PassageInput,
  type PassagePoint,
  type SpeedBand,
  type SpeedSource,
  type SpeedSweepInput,
  type SpeedSweepResult,
  type SweepPoint,
} from './types.js';

/** Default largest grid step as a share of speed [%] (PRODUCT rule: no coarser than 0.5 %). */
export const DEFAULT_SWEEP_STEP_PCT = 0.5;

/** Golden-section steps that refine the worst point between its grid neighbours. */
const REFINE_STEPS = 16;

/**
 * Frequency [Hz] of a source at shaft speed n [rpm]: `frequencyHz` when given, else order·n/60
 * (order default 1).
 */
export function sourceFrequencyHz(source: Pick<SpeedSource, 'order' | 'frequencyHz'>, speedRpm: number): number {
  if (source.frequencyHz !== undefined) return requirePositive('source.frequencyHz', source.frequencyHz);
  const order = source.order === undefined ? 1 : requirePositive('source.order', source.order);
  return (order * requireNonNegative('speedRpm', speedRpm)) / 60;
}

/**
 * Amplitude [N] of a source at shaft speed n [rpm]: for an unbalance (`unbalance` given)
 * m_r·e·ω² with e = G/Ω_max, ω = 2π·f (f from `sourceFrequencyHz`), Ω_max = 2π·maxRpm/60
 * (ISO 21940-11: G = e·Ω); otherwise `amplitudeN`.
 * @param maxRpm highest running speed [rpm], > 0 (sets the eccentricity of an unbalance)
 */
export function sourceAmplitudeN(source: SpeedSource, speedRpm: number, maxRpm: number): number {
  if (source.unbalance !== undefined) {
    const u = source.unbalance;
    if (u == null || typeof u !== 'object')
      throw new VibrationInputError('source.unbalance', 'must be {rotorMassKg, balanceGradeMmPerS}', 'not-finite');
    const mr = requireNonNegative('source.unbalance.rotorMassKg', u.rotorMassKg);
    const g = requireNonNegative('source.unbalance.balanceGradeMmPerS', u.balanceGradeMmPerS) / 1000;
    const omegaMax = (2 * Math.PI * requirePositive('maxRpm', maxRpm)) / 60;
    const w = 2 * Math.PI * sourceFrequencyHz(source, speedRpm);
    return ((mr * g) / omegaMax) * w * w;
  }
  if (source.amplitudeN === undefined) throw new VibrationInputError('source.amplitudeN', 'must be given for a force', 'not-finite');
  return requireNonNegative('source.amplitudeN', source.amplitudeN);
}

/** The running intervals [a, b] of [minRpm, maxRpm] outside the skip bands' interiors. */
function runningIntervals(minRpm: number, maxRpm: number, bands: readonly SpeedBand[]): [number, number][] {
  const sorted = [...bands].sort((a, b) => a.min - b.min);
  const out: [number, number][] = [];
  let start = minRpm;
  for (const band of sorted) {
    if (band.max <= start) continue;
    if (band.min >= maxRpm) break;
    if (band.min >= start) out.push([start, band.min]);
    start = band.max;
  }
  if (start <= maxRpm) out.push([start, maxRpm]);
  if (out.length === 0) throw new VibrationInputError('skipBandsRpm', 'cover the whole running range', 'out-of-range');
  return out;
}

/** Geometric grid over [a, b] with ratio ≤ 1 + step, both ends exact, the extras in [a, b] merged in. */
function intervalGrid(a: number, b: number, step: number, extras: readonly number[]): number[] {
  const pts: number[] = [];
  if (b > a) {
    const n = Math.max(1, Math.ceil(Math.log(b / a) / Math.log1p(step) - 1e-9));
    const ratio = b / a;
    for (let k = 0; k < n; k++) pts.push(a * Math.pow(ratio, k / n));
  }
  pts.push(b);
  const inside = extras.filter((x) => x >= a && x <= b);
  if (inside.length === 0) return pts;
  // merge; an extra replaces a grid point that coincides with it to rounding
  const merged = [...pts, ...inside].sort((x, y) => x - y);
  const out: number[] = [];
  const isExtra = new Set(inside);
  for (const x of merged) {
    const last = out[out.length - 1];
    if (last !== undefined && Math.abs(x - last) <= 1e-12 * x) {
      if (isExtra.has(x) && !isExtra.has(last)) out[out.length - 1] = x;
      continue;
    }
    out.push(x);
  }
  return out;
}

function requireStep(maxStepPct: number | undefined): number {
  const pct = maxStepPct === undefined ? DEFAULT_SWEEP_STEP_PCT : requirePositive('maxStepPct', maxStepPct);
  return pct / 100;
}

/**
 * The sweep's speed grid [rpm], ascending: each running interval (the range minus the skip
 * bands' interiors) on geometric steps no larger than maxStepPct of speed, with both ends, every
 * skip-band edge inside the range, and the given extra speeds (crossings) that lie in a running interval.
 * @returns speeds [rpm]
 */
export function sweepGrid(
  minRpm: number,
  maxRpm: number,
  skipBandsRpm: readonly { min: number; max: number }[] = [],
  extraRpm: readonly number[] = [],
  maxStepPct = DEFAULT_SWEEP_STEP_PCT,
): Float64Array {
  const bands = requireRange(minRpm, maxRpm, skipBandsRpm);
  const step = requireStep(maxStepPct);
  extraRpm.forEach((x, i) => requireFinite(`extraRpm[${i}]`, x));
  const all: number[] = [];
  for (const [a, b] of runningIntervals(minRpm, maxRpm, bands)) {
    for (const x of intervalGrid(a, b, step, extraRpm)) if (all.length === 0 || x > all[all.length - 1]) all.push(x);
  }
  return Float64Array.from(all);
}

function modeFrequencies(system: WholeMachineSystem, given: readonly number[] | undefined): readonly number[] {
  if (given !== undefined) {
    given.forEach((f, i) => requireFinite(`modeFrequenciesHz[${i}]`, f));
    return given;
  }
  return wholeMachineModes(system).modes.map((m) => m.frequencyHz);
}

/**
 * Whole-machine transmissibility of one source over the running range: evaluated on
 * `sweepGrid` (crossings included), the maximum then refined by golden-section search between
 * its grid neighbours. A fixed-frequency source has the same T at every speed: one solve, and
 * the worst point is reported at the lowest running speed.
 * @param system from `prepareWholeMachine`
 * @param input source, range [rpm], skip bands, step [%]
 * @returns worst point, crossings, optionally the curve
 */
export function speedSweep(system: WholeMachineSystem, input: SpeedSweepInput): SpeedSweepResult {
  const { source, minRpm, maxRpm } = input;
  const bands = requireRange(minRpm, maxRpm, input.skipBandsRpm);
  const step = requireStep(input.maxStepPct);
  if (source == null || typeof source !== 'object') throw new VibrationInputError('source', 'must be given', 'empty');
  setUnitLoad(system, source);
  const intervals = runningIntervals(minRpm, maxRpm, bands);
  const fixed = source.frequencyHz !== undefined;

  let crossings: ModeCrossing[] = [];
  let grid: number[][];
  if (fixed) {
    sourceFrequencyHz(source, minRpm);
    grid = intervals.map(([a, b]) => (input.curve ? intervalGrid(a, b, step, []) : [a]));
  } else {
    const order = source.order === undefined ? 1 : requirePositive('source.order', source.order);
    crossings = crossingSpeeds({
      modeFrequenciesHz: modeFrequencies(system, input.modeFrequenciesHz),
      order,
      minRpm,
      maxRpm,
      skipBandsRpm: bands,
    });
    const extra = crossings.map((c) => c.speedRpm);
    grid = intervals.map(([a, b]) => intervalGrid(a, b, step, extra));
  }
  sourceAmplitudeN(source, minRpm, maxRpm); // validates the amplitude once

  let evaluations = 0;
  const tAt = (speedRpm: number): number => {
    const omega = 2 * Math.PI * sourceFrequencyHz(source, speedRpm);
    evaluations++;
    return solveAt(system, omega) ? sumOfPeakMountForces(system, omega) : Infinity;
  };

  let worstT = -1;
  let worstSpeed = minRpm;
  let worstInterval = 0;
  let worstIndex = 0;
  const total = grid.reduce((s, g) => s + g.length, 0);
  const curve = input.curve
    ? {
        speedRpm: new Float64Array(total),
        frequencyHz: new Float64Array(total),
        transmissibility: new Float64Array(total),
        amplitudeN: new Float64Array(total),
      }
    : undefined;
  let c = 0;
  const fixedT = fixed ? tAt(minRpm) : 0;
  grid.forEach((pts, gi) => {
    for (let k = 0; k < pts.length; k++) {
      const n = pts[k];
      const t = fixed ? fixedT : tAt(n);
      if (t > worstT) {
        worstT = t;
        worstSpeed = n;
        worstInterval = gi;
        worstIndex = k;
      }
      if (curve) {
        curve.speedRpm[c] = n;
        curve.frequencyHz[c] = sourceFrequencyHz(source, n);
        curve.transmissibility[c] = t;
        curve.amplitudeN[c] = sourceAmplitudeN(source, n, maxRpm);
        c++;
      }
    }
  });

  if (!fixed && Number.isFinite(worstT)) {
    const pts = grid[worstInterval];
    const lo = pts[Math.max(0, worstIndex - 1)];
    const hi = pts[Math.min(pts.length - 1, worstIndex + 1)];
    if (hi > lo) {
      const found = goldenMax(tAt, lo, hi);
      if (found.value > worstT) {
        worstT = found.value;
        worstSpeed = found.at;
      }
    }
  }

  const worst: SweepPoint = {
    speedRpm: worstSpeed,
    frequencyHz: sourceFrequencyHz(source, worstSpeed),
    transmissibility: worstT,
    amplitudeN: sourceAmplitudeN(source, worstSpeed, maxRpm),
  };
  return curve ? { worst, crossings, evaluations, curve } : { worst, crossings, evaluations };
}

/** Golden-section search for the maximum of f on [a, b] (the best point it evaluated). */
function goldenMax(f: (x: number) => number, a: number, b: number): { at: number; value: number } {
  const g = (Math.sqrt(5) - 1) / 2;
  let x1 = b - g * (b - a);
  let x2 = a + g * (b - a);
  let f1 = f(x1);
  let f2 = f(x2);
  let best = f1 >= f2 ? { at: x1, value: f1 } : { at: x2, value: f2 };
  for (let i = 0; i < REFINE_STEPS; i++) {
    if (f1 >= f2) {
      b = x2;
      x2 = x1;
      f2 = f1;
      x1 = b - g * (b - a);
      f1 = f(x1);
      if (f1 > best.value) best = { at: x1, value: f1 };
    } else {
      a = x1;
      x1 = x2;
      f1 = f2;
      x2 = a + g * (b - a);
      f2 = f(x2);
      if (f2 > best.value) best = { at: x2, value: f2 };
    }
  }
  return best;
}

/**
 * Start-up and coast-down: for each unbalance source of order o and each mode f_j with
 * n = 60·f_j/o below minRpm, the steady peak motion at the mount points at that speed, with the
 * source's amplitude at that speed (e = G/Ω_max, Ω_max from maxRpm). Sources with a fixed
 * frequency and modes at 0 Hz are skipped. Ascending speed.
 * @returns one point per (mode, unbalance source) passed through; motion [m] (+Infinity when undamped)
 */
export function resonancePassage(system: WholeMachineSystem, input: PassageInput): PassagePoint[] {
  const minRpm = requirePositive('minRpm', input.minRpm);
  const maxRpm = requirePositive('maxRpm', input.maxRpm);
  if (maxRpm < minRpm) throw new VibrationInputError('maxRpm', `must not be below the lowest speed (${minRpm} rpm)`, 'out-of-range');
  const out: PassagePoint[] = [];
  let modes: readonly number[] | undefined;
  input.sources.forEach((source, sourceIndex) => {
    if (source?.unbalance === undefined || source.frequencyHz !== undefined) return;
    const field = `sources[${sourceIndex}]`;
    setUnitLoad(system, source, field);
    const order = source.order === undefined ? 1 : requirePositive(`${field}.order`, source.order);
    modes ??= modeFrequencies(system, input.modeFrequenciesHz);
    modes.forEach((f, modeIndex) => {
      if (!(f > 0)) return;
      const speedRpm = (60 * f) / order;
      if (speedRpm >= minRpm) return;
      const amplitude = sourceAmplitudeN(source, speedRpm, maxRpm);
      const omega = 2 * Math.PI * f;
      const motionM = solveAt(system, omega) ? amplitude * maxPeakMountMotion(system) : amplitude > 0 ? Infinity : 0;
      out.push({ modeIndex, modeFrequencyHz: f, sourceIndex, speedRpm, motionM });
    });
  });
  return out.sort((a, b) => a.speedRpm - b.speedRpm || a.sourceIndex - b.sourceIndex);
}
