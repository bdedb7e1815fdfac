import { requireNonEmpty, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type Damping, dampingValue } from '../sdof/damping.js';
import { type Complex } from './complex.js';

/** A single-degree-of-freedom mass–spring(–damper) system. */
export interface SdofSystem {
  /** m [kg], > 0 */
  massKg: number;
  /** k [N/m], > 0 (the dynamic stiffness for elastomers) */
  stiffnessNPerM: number;
  /** ζ (viscous) or η (hysteretic); omitted = undamped */
  damping?: Damping;
}

/**
 * Frequency response functions of a SDOF system.
 * - `receptance` α = X/F [m/N]
 * - `mobility` Y = V/F = jω·α [m/(N·s)]
 * - `accelerance` A/F = −ω²·α [(m/s²)/N = 1/kg]
 * - `dynamicStiffness` K_d = F/X = 1/α [N/m]
 * - `impedance` Z = F/V = K_d/(jω) [N·s/m]
 * - `apparentMass` M_app = F/A = −K_d/ω² [kg]
 */
export type FrfKind = 'receptance' | 'mobility' | 'accelerance' | 'dynamicStiffness' | 'impedance' | 'apparentMass';

/** SI unit of each FRF kind (for axis labels and dB references). */
export const FRF_UNITS: Readonly<Record<FrfKind, string>> = Object.freeze({
  receptance: 'm/N',
  mobility: 'm/(N·s)',
  accelerance: '1/kg',
  dynamicStiffness: 'N/m',
  impedance: 'N·s/m',
  apparentMass: 'kg',
});

/** An FRF sampled over a frequency grid. Phase is atan2(im, re) in degrees, in (−180°, 180°]. */
export interface FrfCurve {
  kind: FrfKind;
  /** [Hz] */
  frequencyHz: Float64Array;
  /** real part, in {@link FRF_UNITS}[kind] */
  re: Float64Array;
  /** imaginary part */
  im: Float64Array;
  /** |H| */
  magnitude: Float64Array;
  /** ∠H [deg] */
  phaseDeg: Float64Array;
}

const KINDS: readonly FrfKind[] = ['receptance', 'mobility', 'accelerance', 'dynamicStiffness', 'impedance', 'apparentMass'];

interface Prepared {
  m: number;
  k: number;
  /** viscous coefficient c [N·s/m] (0 for hysteretic) */
  c: number;
  /** hysteretic imaginary stiffness η·k [N/m] (0 for viscous) */
  ek: number;
}

function prepare(system: SdofSystem, kind: FrfKind): Prepared {
  if (!KINDS.includes(kind)) throw new VibrationInputError('kind', `must be one of ${KINDS.join(', ')}`);
  const m = requirePositive('massKg', system.massKg);
  const k = requirePositive('stiffnessNPerM', system.stiffnessNPerM);
  const v = dampingValue(system.damping);
  const hysteretic = system.damping?.model === 'hysteretic';
  return { m, k, c: hysteretic ? 0 : 2 * v * Math.sqrt(k * m), ek: hysteretic ? v * k : 0 };
}

function checkFrequency(kind: FrfKind, f: number, field: string): void {
  if (kind === 'impedance' || kind === 'apparentMass') requirePositive(field, f);
  else requireNonNegative(field, f);
}

/** Writes H(f) for one frequency into `out` (no allocation on the curve path). */
function evaluate(p: Prepared, kind: FrfKind, f: number, out: Complex): void {
  const w = 2 * Math.PI * f;
  // dynamic stiffness K_d = a + j·b
  const a = p.k - p.m * w * w;
  const b = w * p.c + p.ek;
  const d = a * a + b * b;
  switch (kind) {
    case 'dynamicStiffness':
      out.re = a;
      out.im = b;
      return;
    case 'receptance':
      out.re = a / d;
      out.im = -b / d;
      return;
    case 'mobility':
      out.re = (w * b) / d;
      out.im = (w * a) / d;
      return;
    case 'accelerance':
      out.re = (-w * w * a) / d;
      out.im = (w * w * b) / d;
      return;
    case 'impedance':
      out.re = b / w;
      out.im = -a / w;
      return;
    case 'apparentMass':
      out.re = -a / (w * w);
      out.im = -b / (w * w);
      return;
  }
}

/**
 * One FRF value of a SDOF system:
 * K_d = k − mω² + jωc (viscous, c = 2ζ√(km)) or k(1 + jη) − mω² (hysteretic), and the other
 * kinds derived from it (see {@link FrfKind}).
 * @param system m [kg], k [N/m], damping
 * @param kind which FRF
 * @param frequencyHz f [Hz], ≥ 0 (> 0 for impedance and apparent mass)
 * @returns complex value in {@link FRF_UNITS}[kind]
 */
export function sdofFrfAt(system: SdofSystem, kind: FrfKind, frequencyHz: number): Complex {
  const p = prepare(system, kind);
  checkFrequency(kind, frequencyHz, 'frequencyHz');
  const out = { re: 0, im: 0 };
  evaluate(p, kind, frequencyHz, out);
  return out;
}

/**
 * An FRF of a SDOF system over a frequency grid, with magnitude and phase (atan2, degrees).
 * The hysteretic receptance has phase −atan(η) at ω → 0, an artefact of the model, which is
 * defined for harmonic response only.
 * @param system m [kg], k [N/m], damping
 * @param kind which FRF
 * @param frequenciesHz grid [Hz], e.g. from {@link logSpace}
 * @returns typed arrays, one value per frequency
 */
export function sdofFrf(system: SdofSystem, kind: FrfKind, frequenciesHz: ArrayLike<number>): FrfCurve {
  const p = prepare(system, kind);
  requireNonEmpty('frequenciesHz', frequenciesHz);
  const n = frequenciesHz.length;
  const curve: FrfCurve = {
    kind,
    frequencyHz: Float64Array.from(frequenciesHz),
    re: new Float64Array(n),
    im: new Float64Array(n),
    magnitude: new Float64Array(n),
    phaseDeg: new Float64Array(n),
  };
  const h = { re: 0, im: 0 };
  const toDeg = 180 / Math.PI;
  for (let i = 0; i < n; i++) {
    const f = frequenciesHz[i];
    checkFrequency(kind, f, `frequenciesHz[${i}]`);
    evaluate(p, kind, f, h);
    curve.re[i] = h.re;
    curve.im[i] = h.im;
    curve.magnitude[i] = Math.hypot(h.re, h.im);
    curve.phaseDeg[i] = Math.atan2(h.im, h.re) * toDeg + 0; // + 0 turns −0 into 0
  }
  return curve;
}

/**
 * Level in decibels, 20·log10(|H|/reference). State the reference on plots, e.g. dB re 1 m/N.
 * @param magnitude |H|, > 0
 * @param reference reference value in the same unit, > 0 (default 1)
 * @returns level [dB]
 */
export function decibels(magnitude: number, reference = 1): number {
  requirePositive('magnitude', magnitude);
  requirePositive('reference', reference);
  return 20 * Math.log10(magnitude / reference);
}
