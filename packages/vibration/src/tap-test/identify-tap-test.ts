import { requireNonEmpty, requirePositive, requireSameLength } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { exponentialWindowDampingCorrection } from '../identification/half-power.js';
import { identifyFromFrf, type IdentificationIssue, type MeasuredFrf } from '../identification/identify-from-frf.js';
import type { TapTestWarning } from './impact-frf.js';

/** Options of {@link identifyTapTest}. */
export interface TapTestIdentificationOptions {
  /** Mass of the isolated machine m [kg], for k = m·(2π·fn)². */
  massKg?: number;
  /** τ of the exponential window applied to the record [s] (null or omitted: none). */
  exponentialTimeConstantS?: number | null;
  /** Length of each analysed block of a raw record [s], for the record-length check. */
  recordDurationS?: number;
  /** Coherence γ² per line of `frf` (averaged raw records). */
  coherence?: ArrayLike<number> | null;
}

/** Natural frequency, damping and stiffness from a tap-test FRF. Missing figures could not be determined. */
export interface TapTestIdentification {
  /** Undamped natural frequency fn = f_p/√(1 − 2ζ²) [Hz] (f_p when ζ is unknown). */
  naturalFrequencyHz?: number;
  /** Frequency of the receptance peak f_p (parabolic interpolation) [Hz]. */
  peakFrequencyHz?: number;
  /** ζ after the exponential-window correction [–]. */
  dampingRatio?: number;
  /** ζ from the half-power bandwidth before any correction [–]. */
  measuredDampingRatio?: number;
  /** Δζ = 1/(ωn·τ) taken off for the exponential window [–] (0 without one). */
  windowDampingCorrection?: number;
  /** Half-power frequencies f₁, f₂ [Hz]. */
  halfPowerHz?: { lower: number; upper: number };
  /** k = m·(2π·fn)² [N/m] (with `massKg`). */
  stiffnessNPerM?: number;
  /** Band the identification used: half to twice the frequency of the largest response [Hz]. */
  bandHz: { min: number; max: number };
  /** Mean coherence γ² over the half-power band (averaged raw records) [–]. */
  meanCoherence?: number;
  /** From identifyFromFrf: `poor` means no natural frequency was found. */
  quality: 'good' | 'fair' | 'poor';
  reasons: IdentificationIssue[];
  warnings: TapTestWarning[];
}

/** Coherence under this in the half-power band makes the result doubtful [CP]. */
export const MIN_COHERENCE = 0.9;
/** Decay time constants per record: e^(−5) leaves under 1 % of the response (docs/engineering/tap-test.md §6). */
const DECAY_TIME_CONSTANTS = 5;

/** |H| per line in the quantity as measured (where the noise is most nearly even), for locating the resonance. */
function magnitudeAsMeasured(frf: MeasuredFrf): number[] {
  const n = frf.frequencyHz.length;
  let magnitude: number[];
  if (frf.re !== undefined && frf.im !== undefined) {
    requireSameLength('re', frf.re, n);
    requireSameLength('im', frf.im, n);
    magnitude = Array.from(frf.re, (r, i) => Math.hypot(r, frf.im![i]));
  } else if (frf.magnitude !== undefined) {
    requireSameLength('magnitude', frf.magnitude, n);
    magnitude = Array.from(frf.magnitude, (m) => Math.abs(m));
  } else {
    throw new VibrationInputError('re', 'give re and im, or magnitude and phaseDeg', 'empty');
  }
  return magnitude;
}

function subset<T extends ArrayLike<number> | undefined>(values: T, keep: number[]): number[] | undefined {
  return values === undefined ? undefined : keep.map((i) => values[i]);
}

/**
 * Identifies a tap test's natural frequency, damping and stiffness (docs/engineering/tap-test.md §5–§7):
 * 1. the resonance is located at the largest |H| in the quantity as measured (converting first
 *    would amplify the noise at one end: receptance from accelerance by 1/ω²), and the band
 *    from half to twice that frequency is kept;
 * 2. {@link identifyFromFrf} on that band: peak picking on |receptance| with parabolic
 *    interpolation, and ζ from the half-power bandwidth (Ewins, Modal Testing, the peak-amplitude
 *    method, from memory);
 * 3. the exponential window's apparent damping is taken off: ζ = ζ_measured − 1/(ωn·τ);
 * 4. the receptance peak lies at fn·√(1 − 2ζ²), so fn = f_p/√(1 − 2ζ²);
 * 5. k = m·(2π·fn)² with the machine's mass;
 * 6. warnings: a record shorter than 5/(ζ·ωn), coherence under 0.9 in the half-power band.
 * @param frf the measured FRF (lines [Hz], receptance, mobility or accelerance)
 * @param options mass [kg], exponential window τ [s], block length [s], coherence
 * @returns the figures that could be identified, quality, reasons and warnings
 */
export function identifyTapTest(frf: MeasuredFrf, options: TapTestIdentificationOptions = {}): TapTestIdentification {
  requireNonEmpty('frequencyHz', frf.frequencyHz);
  const n = frf.frequencyHz.length;
  const magnitude = magnitudeAsMeasured(frf);
  let top = 0;
  for (let i = 1; i < n; i++) if (magnitude[i] > magnitude[top]) top = i;
  const rough = frf.frequencyHz[top];
  let keep = Array.from({ length: n }, (_, i) => i);
  if (rough > 0) {
    const band = keep.filter((i) => frf.frequencyHz[i] >= rough / 2 && frf.frequencyHz[i] <= rough * 2);
    if (band.length >= 5) keep = band;
  }
  const part: MeasuredFrf = {
    kind: frf.kind,
    frequencyHz: keep.map((i) => frf.frequencyHz[i]),
    re: subset(frf.re, keep),
    im: subset(frf.im, keep),
    magnitude: frf.re === undefined ? subset(frf.magnitude, keep) : undefined,
    phaseDeg: frf.re === undefined ? subset(frf.phaseDeg, keep) : undefined,
  };
  const id = identifyFromFrf(part);
  // k comes from the mass here, so the low-frequency stiffness and the k–m fit do not count
  const reasons = id.reasons.filter((r) => r.code !== 'no-low-frequency-lines' && r.code !== 'fit-not-physical');
  const warnings: TapTestWarning[] = [];
  const result: TapTestIdentification = {
    bandHz: { min: part.frequencyHz[0], max: part.frequencyHz[part.frequencyHz.length - 1] },
    quality: id.quality === 'poor' ? 'poor' : reasons.length > 0 ? 'fair' : 'good',
    reasons,
    warnings,
  };
  if (id.naturalFrequencyHz === undefined) return result;
  const fp = id.naturalFrequencyHz;
  result.peakFrequencyHz = fp;
  let zeta: number | undefined;
  if (id.halfPower) {
    result.halfPowerHz = { lower: id.halfPower.lowerHz, upper: id.halfPower.upperHz };
    result.measuredDampingRatio = id.halfPower.dampingRatio;
    const tau = options.exponentialTimeConstantS ?? null;
    const correction = tau === null ? 0 : exponentialWindowDampingCorrection(fp, tau);
    result.windowDampingCorrection = correction;
    const corrected = id.halfPower.dampingRatio - correction;
    if (corrected > 0) {
      zeta = corrected;
    } else {
      warnings.push({
        code: 'window-correction-too-large',
        message:
          'The damping the exponential window adds is as large as the damping measured, so the damping is not identified; ' +
          'record longer after each hit.',
      });
    }
  }
  result.dampingRatio = zeta;
  result.naturalFrequencyHz = zeta !== undefined && 2 * zeta * zeta < 1 ? fp / Math.sqrt(1 - 2 * zeta * zeta) : fp;
  const fn = result.naturalFrequencyHz;
  if (options.massKg !== undefined) {
    result.stiffnessNPerM = requirePositive('massKg', options.massKg) * (2 * Math.PI * fn) ** 2;
  }
  if (options.recordDurationS !== undefined && zeta !== undefined) {
    const needed = DECAY_TIME_CONSTANTS / (zeta * 2 * Math.PI * fn);
    if (requirePositive('recordDurationS', options.recordDurationS) < needed) {
      warnings.push({
        code: 'record-too-short',
        message:
          `Each block lasts ${options.recordDurationS.toPrecision(3)} s; with this damping the response needs ` +
          `${needed.toPrecision(3)} s (5/(damping ratio × 2π × natural frequency)) to die away. Leave more time between hits.`,
      });
    }
  }
  if (options.coherence) {
    requireSameLength('coherence', options.coherence, n);
    const lower = result.halfPowerHz?.lower ?? fp;
    const upper = result.halfPowerHz?.upper ?? fp;
    let inBand = keep.filter((i) => frf.frequencyHz[i] >= lower && frf.frequencyHz[i] <= upper);
    if (inBand.length === 0)
      inBand = [...keep].sort((a, b) => Math.abs(frf.frequencyHz[a] - fp) - Math.abs(frf.frequencyHz[b] - fp)).slice(0, 1);
    const mean = inBand.reduce((sum, i) => sum + options.coherence![i], 0) / inBand.length;
    result.meanCoherence = mean;
    if (mean < MIN_COHERENCE) {
      warnings.push({
        code: 'low-coherence',
        message: `The coherence around the resonance is ${mean.toFixed(2)} (under ${MIN_COHERENCE}): the hits disagree or noise is high; the figures are doubtful.`,
      });
    }
  }
  return result;
}
