import { requireAllFinite, requireNonEmpty, requireNonNegative, requirePositive, requireSameLength } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type DynamicStiffnessFit, fitDynamicStiffness } from './dynamic-stiffness-fit.js';
import { type HalfPowerDamping, halfPowerDamping } from './half-power.js';

/** A measured FRF: frequencies and complex samples (re/im, or magnitude/phase). */
export interface MeasuredFrf {
  /** Spectral lines [Hz], strictly increasing, ≥ 0. */
  frequencyHz: ArrayLike<number>;
  /** What the samples are: receptance X/F [m/N], mobility V/F [m/(N·s)] or accelerance A/F [1/kg]. */
  kind: 'receptance' | 'mobility' | 'accelerance';
  /** Real parts (with `im`). */
  re?: ArrayLike<number>;
  /** Imaginary parts (with `re`). */
  im?: ArrayLike<number>;
  /** Magnitudes (with `phaseDeg`), in the unit of `kind`. */
  magnitude?: ArrayLike<number>;
  /** Phases [deg] (with `magnitude`). */
  phaseDeg?: ArrayLike<number>;
}

/** Options of {@link identifyFromFrf}. */
export interface IdentificationOptions {
  /** Lines at or below this fraction of fn count as stiffness-controlled (default 0.25). */
  lowFrequencyRatio?: number;
  /** Band for the least-squares fit of Re K_d = k − mω² [Hz] (default 0.5·fn … 1.5·fn). */
  fitBandHz?: { min: number; max: number };
}

/** Why a figure is missing or doubtful. */
export type IdentificationIssueCode =
  | 'too-few-points'
  | 'no-clear-peak'
  | 'peak-at-edge'
  | 'half-power-outside-range'
  | 'resolution-too-coarse'
  | 'no-low-frequency-lines'
  | 'fit-not-physical';

/** One reason behind the quality flag. */
export interface IdentificationIssue {
  code: IdentificationIssueCode;
  message: string;
}

/** Figures identified from a measured FRF. Missing figures could not be determined. */
export interface FrfIdentification {
  /** fn from the |α| peak with parabolic interpolation [Hz]. */
  naturalFrequencyHz?: number;
  /** Interpolated peak receptance |α|max [m/N]. */
  peakReceptance?: number;
  /** Half-power frequencies f₁, f₂ [Hz] (linear interpolation between lines) and damping. */
  halfPower?: HalfPowerDamping & { lowerHz: number; upperHz: number };
  /** Mean Re K_d over the stiffness-controlled lines [N/m]. */
  lowFrequencyStiffnessNPerM?: number;
  /** Least-squares k, m and damping from Re/Im K_d over the fit band. */
  fit?: DynamicStiffnessFit;
  /** `good`: no issue; `fair`: figures with caveats; `poor`: the peak could not be identified. */
  quality: 'good' | 'fair' | 'poor';
  reasons: IdentificationIssue[];
  /** Number of lines used. */
  lines: number;
}

const POOR: readonly IdentificationIssueCode[] = ['too-few-points', 'no-clear-peak', 'peak-at-edge'];
const MIN_LINES = 5;

/** Result of {@link findResonancePeak}. */
export interface ResonancePeak {
  /** Index of the largest sample. */
  index: number;
  /** Interpolated peak frequency [Hz]. */
  frequencyHz: number;
  /** Interpolated peak magnitude (unit of the input). */
  magnitude: number;
}

/**
 * Peak of a magnitude curve with quadratic (parabolic) interpolation through the largest sample
 * and its two neighbours (unequal spacing allowed).
 * @param frequencyHz lines [Hz], increasing
 * @param magnitude |H| per line
 * @returns the peak, or `undefined` when the largest sample is the first or last line
 */
export function findResonancePeak(frequencyHz: ArrayLike<number>, magnitude: ArrayLike<number>): ResonancePeak | undefined {
  requireNonEmpty('frequencyHz', frequencyHz);
  requireSameLength('magnitude', magnitude, frequencyHz.length);
  let i = 0;
  for (let j = 1; j < magnitude.length; j++) if (magnitude[j] > magnitude[i]) i = j;
  if (i === 0 || i === magnitude.length - 1) return undefined;
  const x0 = frequencyHz[i - 1];
  const x1 = frequencyHz[i];
  const x2 = frequencyHz[i + 1];
  const y0 = magnitude[i - 1];
  const y1 = magnitude[i];
  const y2 = magnitude[i + 1];
  const d1 = x1 - x0;
  const d2 = x1 - x2;
  const den = d1 * (y1 - y2) - d2 * (y1 - y0);
  if (den === 0) return { index: i, frequencyHz: x1, magnitude: y1 };
  const xp = x1 - (0.5 * (d1 * d1 * (y1 - y2) - d2 * d2 * (y1 - y0))) / den;
  // Lagrange form of the parabola at xp
  const yp =
    (y0 * (xp - x1) * (xp - x2)) / ((x0 - x1) * (x0 - x2)) +
    (y1 * (xp - x0) * (xp - x2)) / ((x1 - x0) * (x1 - x2)) +
    (y2 * (xp - x0) * (xp - x1)) / ((x2 - x0) * (x2 - x1));
  return { index: i, frequencyHz: xp, magnitude: Math.max(yp, y1) };
}

function toReceptance(frf: MeasuredFrf): { f: number[]; re: number[]; im: number[] } {
  requireNonEmpty('frequencyHz', frf.frequencyHz);
  const n = frf.frequencyHz.length;
  for (let i = 0; i < n; i++) {
    requireNonNegative(`frequencyHz[${i}]`, frf.frequencyHz[i]);
    if (i > 0 && !(frf.frequencyHz[i] > frf.frequencyHz[i - 1])) {
      throw new VibrationInputError(`frequencyHz[${i}]`, 'frequencies must be strictly increasing');
    }
  }
  let re: ArrayLike<number>;
  let im: ArrayLike<number>;
  if (frf.re !== undefined || frf.im !== undefined) {
    if (frf.re === undefined || frf.im === undefined) throw new VibrationInputError('im', 'give both re and im', 'empty');
    requireSameLength('re', frf.re, n);
    requireSameLength('im', frf.im, n);
    requireAllFinite('re', frf.re);
    requireAllFinite('im', frf.im);
    re = frf.re;
    im = frf.im;
  } else if (frf.magnitude !== undefined && frf.phaseDeg !== undefined) {
    requireSameLength('magnitude', frf.magnitude, n);
    requireSameLength('phaseDeg', frf.phaseDeg, n);
    for (let i = 0; i < n; i++) requireNonNegative(`magnitude[${i}]`, frf.magnitude[i]);
    requireAllFinite('phaseDeg', frf.phaseDeg);
    const mag = frf.magnitude;
    const ph = frf.phaseDeg;
    re = Array.from(mag, (m, i) => m * Math.cos((ph[i] * Math.PI) / 180));
    im = Array.from(mag, (m, i) => m * Math.sin((ph[i] * Math.PI) / 180));
  } else {
    throw new VibrationInputError('re', 'give re and im, or magnitude and phaseDeg', 'empty');
  }
  if (!['receptance', 'mobility', 'accelerance'].includes(frf.kind)) {
    throw new VibrationInputError('kind', "must be 'receptance', 'mobility' or 'accelerance'");
  }
  const out = { f: [] as number[], re: [] as number[], im: [] as number[] };
  for (let i = 0; i < n; i++) {
    const f = frf.frequencyHz[i];
    const w = 2 * Math.PI * f;
    if (frf.kind === 'receptance') {
      out.f.push(f);
      out.re.push(re[i]);
      out.im.push(im[i]);
    } else if (f > 0) {
      // α = Y/(jω) = (re + j·im)(−j)/ω ;  α = A/(−ω²)
      out.f.push(f);
      if (frf.kind === 'mobility') {
        out.re.push(im[i] / w);
        out.im.push(-re[i] / w);
      } else {
        out.re.push(-re[i] / (w * w));
        out.im.push(-im[i] / (w * w));
      }
    }
  }
  return out;
}

/**
 * Identifies natural frequency, damping and stiffness from a measured FRF (tap test):
 * - fn by peak picking on |α| with parabolic interpolation;
 * - ζ (and η) by the half-power bandwidth, interpolating linearly between lines;
 * - k from the low-frequency dynamic stiffness Re(1/α), and k, m, c, η together from the
 *   least-squares fit Re K_d = k − mω² (Im K_d = cω or ηk) over a band around fn.
 * Accelerance and mobility are converted to receptance first (α = A/(−ω²), α = Y/(jω)).
 * Returns whatever could be identified with a quality flag and the reasons (too few points, no
 * clear peak, peak at the edge, resolution too coarse — Δf should be ≤ (f₂ − f₁)/5 [CP]).
 * @param frf lines [Hz] and complex samples
 * @param options bands
 * @returns figures [Hz, m/N, N/m, kg, –], quality and reasons
 */
export function identifyFromFrf(frf: MeasuredFrf, options: IdentificationOptions = {}): FrfIdentification {
  const { f, re, im } = toReceptance(frf);
  const reasons: IdentificationIssue[] = [];
  const result: FrfIdentification = { quality: 'good', reasons, lines: f.length };
  const lowRatio = options.lowFrequencyRatio ?? 0.25;
  requirePositive('lowFrequencyRatio', lowRatio);
  const finish = (): FrfIdentification => {
    result.quality = reasons.length === 0 ? 'good' : reasons.some((r) => POOR.includes(r.code)) ? 'poor' : 'fair';
    return result;
  };

  if (f.length < MIN_LINES) {
    reasons.push({ code: 'too-few-points', message: `Only ${f.length} usable lines; at least ${MIN_LINES} are needed.` });
    return finish();
  }
  const mag = re.map((r, i) => Math.hypot(r, im[i]));
  const peak = findResonancePeak(f, mag);
  if (!peak) {
    reasons.push({
      code: 'peak-at-edge',
      message: 'The largest response is at the first or last line: the resonance is outside the measured band.',
    });
    return finish();
  }
  const level = peak.magnitude / Math.SQRT2;
  let lower: number | undefined;
  let upper: number | undefined;
  for (let j = peak.index; j > 0; j--) {
    if (mag[j - 1] < level) {
      lower = f[j - 1] + ((level - mag[j - 1]) / (mag[j] - mag[j - 1])) * (f[j] - f[j - 1]);
      break;
    }
  }
  for (let j = peak.index; j < f.length - 1; j++) {
    if (mag[j + 1] < level) {
      upper = f[j] + ((mag[j] - level) / (mag[j] - mag[j + 1])) * (f[j + 1] - f[j]);
      break;
    }
  }
  if (lower === undefined && upper === undefined) {
    reasons.push({
      code: 'no-clear-peak',
      message: 'The response never falls to the half-power level (−3 dB) on either side of its maximum.',
    });
    return finish();
  }
  result.naturalFrequencyHz = peak.frequencyHz;
  result.peakReceptance = peak.magnitude;
  const fn = peak.frequencyHz;
  if (lower === undefined || upper === undefined) {
    reasons.push({
      code: 'half-power-outside-range',
      message: 'One half-power point lies outside the measured band: damping not identified.',
    });
  } else {
    result.halfPower = { lowerHz: lower, upperHz: upper, ...halfPowerDamping(lower, upper, fn) };
    let df = 0;
    for (let j = Math.max(1, peak.index - 2); j <= Math.min(f.length - 1, peak.index + 2); j++) df = Math.max(df, f[j] - f[j - 1]);
    if (df > (upper - lower) / 5) {
      reasons.push({
        code: 'resolution-too-coarse',
        message: `Line spacing ${df.toPrecision(3)} Hz exceeds a fifth of the half-power bandwidth (${(upper - lower).toPrecision(3)} Hz): damping is overestimated.`,
      });
    }
  }

  // dynamic stiffness K_d = 1/α
  const kd = f.map((_, i) => {
    const d = re[i] * re[i] + im[i] * im[i];
    return d > 0 ? { re: re[i] / d, im: -im[i] / d } : undefined;
  });
  const low = f.map((fi, i) => ({ fi, k: kd[i] })).filter((p) => p.fi <= lowRatio * fn && p.k);
  if (low.length === 0) {
    reasons.push({
      code: 'no-low-frequency-lines',
      message: `No line at or below ${lowRatio} × fn: low-frequency stiffness not identified.`,
    });
  } else {
    result.lowFrequencyStiffnessNPerM = low.reduce((s, p) => s + (p.k as { re: number }).re, 0) / low.length;
  }

  const band = options.fitBandHz ?? { min: 0.5 * fn, max: 1.5 * fn };
  requireNonNegative('fitBandHz.min', band.min);
  requirePositive('fitBandHz.max', band.max);
  let idx = f.map((_, i) => i).filter((i) => f[i] > 0 && kd[i] && f[i] >= band.min && f[i] <= band.max);
  if (idx.length < 2) idx = f.map((_, i) => i).filter((i) => f[i] > 0 && kd[i]);
  if (idx.length >= 2) {
    const fit = fitDynamicStiffness(
      idx.map((i) => f[i]),
      idx.map((i) => kd[i]!.re),
      idx.map((i) => kd[i]!.im),
    );
    if (fit.stiffnessNPerM > 0 && fit.massKg > 0) result.fit = fit;
    else reasons.push({ code: 'fit-not-physical', message: 'The least-squares fit gave a non-positive stiffness or mass.' });
  }
  return finish();
}
