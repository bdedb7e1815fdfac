import { requireFinite, requireNonEmpty, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** A predicted natural frequency and the mode it belongs to (e.g. `bounce`, `pitch`). */
export interface PredictedMode {
  /** [Hz] */
  frequencyHz: number;
  mode: string;
}

/** How a measured natural frequency compares with the prediction. */
export type VerificationVerdict = 'agrees' | 'stiffer' | 'softer';

/** The default tolerance on the natural frequency: ±10 % (common practice). */
export const DEFAULT_VERIFICATION_TOLERANCE_PCT = 10;

/** Result of {@link verificationVerdict}. */
export interface VerificationComparison {
  /** (f_measured − f_predicted)/f_predicted × 100 [%]. */
  deviationPct: number;
  /** ((f_measured/f_predicted)² − 1) × 100: the stiffness deviation at the same mass [%]. */
  stiffnessDeviationPct: number;
  /** `agrees` within ±tolerance; `stiffer` above it; `softer` below it. */
  verdict: VerificationVerdict;
}

/**
 * The predicted mode whose frequency is nearest the measured one (on a ratio scale, so 4 Hz
 * is as near 2 Hz as 8 Hz).
 * @param measuredHz identified natural frequency [Hz], > 0
 * @param modes predicted modes [Hz], at least one
 * @returns the nearest mode
 */
export function nearestMode(measuredHz: number, modes: readonly PredictedMode[]): PredictedMode {
  requirePositive('measuredHz', measuredHz);
  requireNonEmpty('modes', modes);
  let best: PredictedMode | undefined;
  let distance = Infinity;
  modes.forEach((mode, i) => {
    requirePositive(`modes[${i}].frequencyHz`, mode.frequencyHz);
    const d = Math.abs(Math.log(measuredHz / mode.frequencyHz));
    if (d < distance) {
      distance = d;
      best = mode;
    }
  });
  return best!;
}

/**
 * Deviation of a measured natural frequency from the predicted one and the verdict against a
 * tolerance (docs/engineering/tap-test.md §8). With the mass unchanged, fn ∝ √k, so the
 * stiffness deviates by (f_m/f_p)² − 1 (about twice the frequency deviation).
 * @param measuredHz identified fn [Hz], > 0
 * @param predictedHz predicted fn [Hz], > 0
 * @param tolerancePct accepted |deviation| [%], > 0 (default 10)
 * @returns deviation [%], stiffness deviation [%], verdict
 */
export function verificationVerdict(
  measuredHz: number,
  predictedHz: number,
  tolerancePct = DEFAULT_VERIFICATION_TOLERANCE_PCT,
): VerificationComparison {
  requirePositive('measuredHz', measuredHz);
  requirePositive('predictedHz', predictedHz);
  requireFinite('tolerancePct', tolerancePct);
  if (!(tolerancePct > 0 && tolerancePct < 100)) throw new VibrationInputError('tolerancePct', 'must lie between 0 and 100 %');
  const ratio = measuredHz / predictedHz;
  const deviationPct = (ratio - 1) * 100;
  // a deviation equal to the tolerance agrees (1e-9 absorbs binary rounding: 5.5/5 − 1 is 0.10000000000000009)
  const limit = tolerancePct + 1e-9;
  const verdict: VerificationVerdict = deviationPct > limit ? 'stiffer' : deviationPct < -limit ? 'softer' : 'agrees';
  return { deviationPct, stiffnessDeviationPct: (ratio * ratio - 1) * 100, verdict };
}
