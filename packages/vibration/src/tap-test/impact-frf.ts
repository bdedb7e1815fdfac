import { requireAllFinite, requirePositive, requireSameLength } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { nextPowerOfTwo, realSpectrum } from './spectrum.js';

/** A raw tap-test record: hammer force and response acceleration sampled together at a constant rate. */
export interface ImpactRecord {
  /** fs [Hz], > 0 */
  sampleRateHz: number;
  /** Hammer force per sample [N]. */
  forceN: ArrayLike<number>;
  /** Response acceleration per sample [m/s²]. */
  accelerationMS2: ArrayLike<number>;
}

/** Options of {@link impactFrf}; the defaults are those of docs/engineering/tap-test.md §2–§3. */
export interface ImpactFrfOptions {
  /** Force that starts a hit, as a fraction of the largest force in the record (default 0.1). */
  triggerLevel?: number;
  /** A pulse starting less than this after the preceding hit's trigger belongs to that hit (a double hit) [s] (default 0.5). */
  minHitSpacingS?: number;
  /** Samples kept before each trigger [s] (default 0.01 s, at least 4 samples). */
  preTriggerS?: number;
  /**
   * Exponential window e^(−t/τ) on both channels of every block: `auto` (default: only when the
   * response has not died away to 1 % of its peak by the end of the block, with the τ that brings
   * it to 0.1 %), `off`,
   * or a given time constant τ [s].
   */
  exponentialWindow?: 'auto' | 'off' | number;
  /** Longest block analysed [samples] (default 2^20). */
  maxBlockSamples?: number;
}

/** What makes a tap-test result doubtful. */
export type TapTestWarningCode =
  | 'force-clipped'
  | 'response-clipped'
  | 'double-hit'
  | 'few-hits'
  | 'last-hit-dropped'
  | 'exponential-window'
  | 'record-too-short'
  | 'low-coherence'
  | 'window-correction-too-large';

/** A warning in words a user understands. */
export interface TapTestWarning {
  code: TapTestWarningCode;
  message: string;
}

/** Why a hit was left out of the average. */
export type ImpactHitProblem = 'double-hit' | 'force-clipped' | 'response-clipped' | 'short-tail';

/** One hammer hit found in the record. */
export interface ImpactHit {
  /** Trigger time (first sample at or above the trigger level) from the start of the record [s]. */
  timeS: number;
  /** Largest force of the hit, with its sign [N] (resting value removed). */
  peakForceN: number;
  /** Time the force stays at or above the trigger level [s]. */
  pulseDurationS: number;
  /** Averaged into the FRF. */
  used: boolean;
  problems: ImpactHitProblem[];
}

/** The H1 accelerance estimated from a raw impact record, with how it was formed. */
export interface ImpactFrf {
  kind: 'accelerance';
  /** Spectral lines k·fs/N, k ≥ 1, up to the end of the usable band [Hz]. */
  frequencyHz: number[];
  /** Re H1 [(m/s²)/N]. */
  re: number[];
  /** Im H1 [(m/s²)/N]. */
  im: number[];
  /** Ordinary coherence γ² per line (null with a single hit, where it is 1 by definition). */
  coherence: number[] | null;
  sampleRateHz: number;
  /** Samples of each hit analysed (before zero padding). */
  blockSamples: number;
  /** blockSamples / fs [s]. */
  blockDurationS: number;
  /** FFT size N (power of two ≥ blockSamples). */
  fftSize: number;
  /** fs/N [Hz]. */
  resolutionHz: number;
  /** Kept before each trigger [s]. */
  preTriggerS: number;
  /** Force window length from the block start [s]; the force is set to zero after it. */
  forceWindowS: number;
  /** τ of the exponential window [s], or null when none was applied. */
  exponentialTimeConstantS: number | null;
  /** Lines where the averaged force spectrum is within 20 dB of its level at the first line [Hz]. */
  usableBandHz: { min: number; max: number };
  hits: ImpactHit[];
  hitsAveraged: number;
  warnings: TapTestWarning[];
}

const DEFAULTS = {
  triggerLevel: 0.1,
  minHitSpacingS: 0.5,
  preTriggerS: 0.01,
  maxBlockSamples: 2 ** 20,
};

/** Fewest samples per block and per record. */
export const MIN_IMPACT_SAMPLES = 64;
/** Averages recommended for a coherence worth reading [CP]. */
export const RECOMMENDED_HITS = 5;
/** The response is taken as died away when its largest value in the block's last tenth is under this fraction of its peak. */
const DECAYED_RATIO = 0.01;
/** The exponential window brings the response at the block's end to this fraction of its peak. */
const WINDOWED_END_RATIO = 0.001;
/** Samples at the clip level in a row that make a flat top. */
const FLAT_TOP_SAMPLES = 3;

function median(values: ArrayLike<number>): number {
  const sorted = Float64Array.from(values).sort();
  const mid = sorted.length >> 1;
  return sorted.length % 2 ? sorted[mid] : (sorted[mid - 1] + sorted[mid]) / 2;
}

/** True when the largest |value| in [from, to) is held for FLAT_TOP_SAMPLES samples or more in a row. */
function hasFlatTop(values: Float64Array, from: number, to: number): boolean {
  let peak = 0;
  for (let i = from; i < to; i++) peak = Math.max(peak, Math.abs(values[i]));
  if (peak === 0) return false;
  const level = peak * (1 - 1e-6);
  let run = 0;
  for (let i = from; i < to; i++) {
    run = Math.abs(values[i]) >= level ? run + 1 : 0;
    if (run >= FLAT_TOP_SAMPLES) return true;
  }
  return false;
}

interface Pulse {
  start: number;
  end: number;
  peakIndex: number;
}

interface HitDraft {
  pulse: Pulse;
  later: Pulse[];
  start: number;
  problems: ImpactHitProblem[];
}

/**
 * Forms the H1 accelerance A/F from a raw impact record (docs/engineering/tap-test.md §2–§4):
 * 1. the resting value (median) of each channel is removed;
 * 2. hits are separated by force threshold crossings: a hit starts where the force first reaches
 *    `triggerLevel` × the largest force in the record; a pulse within `minHitSpacingS` of a
 *    hit's trigger belongs to that hit (a double hit). Each block starts `preTriggerS` before its
 *    trigger; all blocks have one length, the shortest distance to the next block (the last hit
 *    runs to the end of the record, and is dropped when that is under half the others);
 * 3. force window: the force is kept from the block start to the end of its pulse plus one pulse
 *    length, and set to zero after (it then holds no response noise);
 * 4. exponential window e^(−t/τ) on both channels from the block start, when the response has
 *    not died away within the block (it adds Δζ = 1/(ωn·τ) of apparent damping, corrected in
 *    {@link identifyTapTest});
 * 5. hits with a double hit or a flat top (clipped force or response) are left out when clean
 *    ones remain; the rest are averaged: H1 = Σ conj(F)·A / Σ |F|², γ² = |Σ conj(F)·A|² / (Σ|F|²·Σ|A|²).
 * @param record fs [Hz], force [N], acceleration [m/s²], equal lengths
 * @param options hit separation and windows
 * @returns H1 [(m/s²)/N] over the usable band, coherence, the hits and warnings
 */
export function impactFrf(record: ImpactRecord, options: ImpactFrfOptions = {}): ImpactFrf {
  const fs = requirePositive('sampleRateHz', record.sampleRateHz);
  const n = record.forceN.length;
  if (n < MIN_IMPACT_SAMPLES) {
    throw new VibrationInputError('forceN', `needs at least ${MIN_IMPACT_SAMPLES} samples (got ${n})`, 'out-of-range');
  }
  requireSameLength('accelerationMS2', record.accelerationMS2, n);
  requireAllFinite('forceN', record.forceN);
  requireAllFinite('accelerationMS2', record.accelerationMS2);
  const triggerLevel = options.triggerLevel ?? DEFAULTS.triggerLevel;
  if (!(triggerLevel > 0 && triggerLevel < 1)) throw new VibrationInputError('triggerLevel', 'must lie between 0 and 1');
  const spacing = Math.round(requirePositive('minHitSpacingS', options.minHitSpacingS ?? DEFAULTS.minHitSpacingS) * fs);
  const preTrigger = Math.max(4, Math.round(requirePositive('preTriggerS', options.preTriggerS ?? DEFAULTS.preTriggerS) * fs));
  const maxBlock = options.maxBlockSamples ?? DEFAULTS.maxBlockSamples;
  if (!Number.isInteger(maxBlock) || maxBlock < MIN_IMPACT_SAMPLES) {
    throw new VibrationInputError('maxBlockSamples', `must be a whole number ≥ ${MIN_IMPACT_SAMPLES}`);
  }

  // 1. resting values off
  const fRest = median(record.forceN);
  const aRest = median(record.accelerationMS2);
  const force = Float64Array.from(record.forceN, (v) => v - fRest);
  const accel = Float64Array.from(record.accelerationMS2, (v) => v - aRest);

  // 2. pulses and hits (the hammer's sign is that of its largest force)
  let peakIndex = 0;
  for (let i = 1; i < n; i++) if (Math.abs(force[i]) > Math.abs(force[peakIndex])) peakIndex = i;
  const largest = Math.abs(force[peakIndex]);
  if (largest === 0) {
    throw new VibrationInputError('forceN', 'the force never leaves its resting value: no hammer hit in the record', 'out-of-range');
  }
  const sign = Math.sign(force[peakIndex]);
  const threshold = triggerLevel * largest;
  const pulses: Pulse[] = [];
  for (let i = 0; i < n; i++) {
    if (sign * force[i] < threshold) continue;
    const start = i;
    let peak = i;
    while (i < n && sign * force[i] >= threshold) {
      if (sign * force[i] > sign * force[peak]) peak = i;
      i++;
    }
    pulses.push({ start, end: i, peakIndex: peak });
  }
  const drafts: HitDraft[] = [];
  for (const pulse of pulses) {
    const last = drafts[drafts.length - 1];
    if (last && pulse.start - last.pulse.start < spacing) last.later.push(pulse);
    else drafts.push({ pulse, later: [], start: Math.max(0, pulse.start - preTrigger), problems: [] });
  }

  // block length: up to the next block's start; the last hit runs to the end of the record
  const spans = drafts.map((d, i) => (i + 1 < drafts.length ? drafts[i + 1].start - d.start : n - d.start));
  let block = Math.min(...spans);
  const warnings: TapTestWarning[] = [];
  if (drafts.length > 1) {
    const others = Math.min(...spans.slice(0, -1));
    if (spans[spans.length - 1] < others / 2) {
      drafts[drafts.length - 1].problems.push('short-tail');
      block = others;
      warnings.push({
        code: 'last-hit-dropped',
        message: 'The record ends too soon after the last hit; that hit is left out.',
      });
    }
  }
  block = Math.min(block, maxBlock);
  if (block < MIN_IMPACT_SAMPLES) {
    throw new VibrationInputError(
      'forceN',
      `the hits are too close together: ${block} samples between them; at least ${MIN_IMPACT_SAMPLES} are needed`,
      'out-of-range',
    );
  }

  // 3. force window and hit checks
  let forceWindow = 2;
  for (const d of drafts) forceWindow = Math.max(forceWindow, d.pulse.end - d.start + (d.pulse.end - d.pulse.start));
  forceWindow = Math.min(forceWindow, block);
  for (const d of drafts) {
    if (d.problems.includes('short-tail')) continue;
    if (d.later.some((p) => p.start < d.start + block)) d.problems.push('double-hit');
    if (hasFlatTop(force, d.start, d.start + forceWindow)) d.problems.push('force-clipped');
    if (hasFlatTop(accel, d.start, d.start + block)) d.problems.push('response-clipped');
  }
  const clean = drafts.filter((d) => d.problems.length === 0);
  const used = clean.length > 0 ? clean : drafts.filter((d) => !d.problems.includes('short-tail'));
  const describeHits = (problem: ImpactHitProblem) =>
    drafts
      .map((d, i) => (d.problems.includes(problem) ? `${i + 1}` : ''))
      .filter(Boolean)
      .join(', ');
  const leftOut = clean.length > 0 ? ' and left out of the average' : '; no clean hit remains, so they are averaged anyway';
  if (drafts.some((d) => d.problems.includes('double-hit'))) {
    warnings.push({
      code: 'double-hit',
      message: `Double hit (the hammer struck again within the block) in hit ${describeHits('double-hit')}${leftOut}.`,
    });
  }
  if (drafts.some((d) => d.problems.includes('force-clipped'))) {
    warnings.push({
      code: 'force-clipped',
      message: `The force is clipped (flat top) in hit ${describeHits('force-clipped')}${leftOut}; hit more softly or raise the input range.`,
    });
  }
  if (drafts.some((d) => d.problems.includes('response-clipped'))) {
    warnings.push({
      code: 'response-clipped',
      message: `The acceleration is clipped (flat top) in hit ${describeHits('response-clipped')}${leftOut}; hit more softly or raise the input range.`,
    });
  }

  // 4. exponential window
  let tau: number | null = null;
  const choice = options.exponentialWindow ?? 'auto';
  if (typeof choice === 'number') {
    tau = requirePositive('exponentialWindow', choice);
  } else if (choice === 'auto') {
    let ratio = 0;
    const tailFrom = Math.floor(block * 0.9);
    for (const d of used) {
      let peak = 0;
      let tail = 0;
      for (let i = 0; i < block; i++) {
        const v = Math.abs(accel[d.start + i]);
        peak = Math.max(peak, v);
        if (i >= tailFrom) tail = Math.max(tail, v);
      }
      if (peak > 0) ratio = Math.max(ratio, tail / peak);
    }
    if (ratio > DECAYED_RATIO) tau = block / fs / Math.log(ratio / WINDOWED_END_RATIO);
  } else if (choice !== 'off') {
    throw new VibrationInputError('exponentialWindow', "must be 'auto', 'off' or a time constant in seconds");
  }

  // 5. spectra and averages
  const size = nextPowerOfTwo(block);
  const lines = size / 2 + 1;
  const sff = new Float64Array(lines);
  const saa = new Float64Array(lines);
  const sfaRe = new Float64Array(lines);
  const sfaIm = new Float64Array(lines);
  const xf = new Float64Array(block);
  const xa = new Float64Array(block);
  for (const d of used) {
    for (let i = 0; i < block; i++) {
      const w = tau === null ? 1 : Math.exp(-i / fs / tau);
      xf[i] = i < forceWindow ? force[d.start + i] * w : 0;
      xa[i] = accel[d.start + i] * w;
    }
    const F = realSpectrum(xf, size);
    const A = realSpectrum(xa, size);
    for (let k = 0; k < lines; k++) {
      sff[k] += F.re[k] * F.re[k] + F.im[k] * F.im[k];
      saa[k] += A.re[k] * A.re[k] + A.im[k] * A.im[k];
      // conj(F)·A
      sfaRe[k] += F.re[k] * A.re[k] + F.im[k] * A.im[k];
      sfaIm[k] += F.re[k] * A.im[k] - F.im[k] * A.re[k];
    }
  }

  // usable band: the force spectrum within 20 dB (a factor 100 in power) of its first line
  let last = lines - 1;
  for (let k = 2; k < lines; k++) {
    if (!(sff[k] >= 0.01 * sff[1])) {
      last = k - 1;
      break;
    }
  }
  const frequencyHz: number[] = [];
  const re: number[] = [];
  const im: number[] = [];
  const coherence: number[] | null = used.length > 1 ? [] : null;
  for (let k = 1; k <= last; k++) {
    if (!(sff[k] > 0)) continue;
    frequencyHz.push((k * fs) / size);
    re.push(sfaRe[k] / sff[k]);
    im.push(sfaIm[k] / sff[k]);
    if (coherence) {
      const c = saa[k] > 0 ? (sfaRe[k] * sfaRe[k] + sfaIm[k] * sfaIm[k]) / (sff[k] * saa[k]) : 0;
      coherence.push(Math.min(1, c));
    }
  }
  if (frequencyHz.length === 0) {
    throw new VibrationInputError('forceN', 'the force spectrum is empty: no usable spectral line', 'out-of-range');
  }

  if (tau !== null) {
    warnings.push({
      code: 'exponential-window',
      message:
        `The response had not died away within a block (${(block / fs).toPrecision(3)} s): an exponential window ` +
        `(time constant ${tau.toPrecision(3)} s) was applied and the damping corrected for it; a longer record between hits is better.`,
    });
  }
  if (used.length < RECOMMENDED_HITS) {
    warnings.push({
      code: 'few-hits',
      message:
        used.length === 1
          ? `One hit analysed: no coherence can be judged. Average at least ${RECOMMENDED_HITS} hits.`
          : `${used.length} hits averaged; at least ${RECOMMENDED_HITS} are recommended.`,
    });
  }

  return {
    kind: 'accelerance',
    frequencyHz,
    re,
    im,
    coherence,
    sampleRateHz: fs,
    blockSamples: block,
    blockDurationS: block / fs,
    fftSize: size,
    resolutionHz: fs / size,
    preTriggerS: preTrigger / fs,
    forceWindowS: forceWindow / fs,
    exponentialTimeConstantS: tau,
    usableBandHz: { min: frequencyHz[0], max: frequencyHz[frequencyHz.length - 1] },
    hits: drafts.map((d) => ({
      timeS: d.pulse.start / fs,
      peakForceN: force[d.pulse.peakIndex],
      pulseDurationS: (d.pulse.end - d.pulse.start) / fs,
      used: used.includes(d),
      problems: d.problems,
    })),
    hitsAveraged: used.length,
    warnings,
  };
}
