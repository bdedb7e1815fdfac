import { requireNonNegative, requirePositive } from '../errors/validate.js';
import { type Damping, dampingValue } from '../sdof/damping.js';
import { transmissibility } from './transmissibility.js';

/** Input of {@link harmonicForceResponse}. */
export interface HarmonicForceInput {
  /** Supported mass m [kg]. */
  massKg: number;
  /** Isolator (dynamic) stiffness k [N/m]. */
  stiffnessNPerM: number;
  /** ζ or η; omitted = undamped. */
  damping?: Damping;
  /** Amplitude of the harmonic force F0 [N]. */
  forceAmplitudeN: number;
  /** Forcing frequency f [Hz]. */
  frequencyHz: number;
}

/** Steady-state response to a harmonic force on a rigid foundation. */
export interface HarmonicForceResponse {
  /** r = f/fn [–]. */
  frequencyRatio: number;
  /** Machine displacement amplitude |X| [m]. */
  displacementAmplitudeM: number;
  /** Force transmitted to the foundation |F_T| = T·F0 [N]. */
  transmittedForceN: number;
  /** T [–]. */
  transmissibility: number;
}

/**
 * Machine displacement and transmitted force under a harmonic force:
 * |X| = (F0/k)/√((1 − r²)² + (2ζr)²) (η instead of 2ζr for hysteretic damping), |F_T| = T·F0.
 * Above resonance |X| falls with added mass while T at a given r does not change.
 * @returns displacement [m], transmitted force [N], r and T
 */
export function harmonicForceResponse(input: HarmonicForceInput): HarmonicForceResponse {
  const m = requirePositive('massKg', input.massKg);
  const k = requirePositive('stiffnessNPerM', input.stiffnessNPerM);
  const f0 = requireNonNegative('forceAmplitudeN', input.forceAmplitudeN);
  const f = requireNonNegative('frequencyHz', input.frequencyHz);
  const v = dampingValue(input.damping);
  const r = (2 * Math.PI * f) / Math.sqrt(k / m);
  const a = 1 - r * r;
  const d = input.damping?.model === 'hysteretic' ? v : 2 * v * r;
  const t = transmissibility(r, input.damping);
  return {
    frequencyRatio: r,
    displacementAmplitudeM: f0 / k / Math.sqrt(a * a + d * d),
    transmittedForceN: t * f0,
    transmissibility: t,
  };
}
