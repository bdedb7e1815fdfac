/**
 * The sources of the whole-machine model from a machine's operating conditions
 * (docs/engineering/forcing.md §7): the sources the engineer gave, or the default vertical force
 * through the CG at every disturbing frequency; with motor poles on a drive the motor's magnetic
 * force follows the speed.
 */
import { requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type Axis, type Vec3 } from '../geometry/vector.js';
import { type SpeedBand, type SpeedSource } from '../whole-machine/types.js';

/** Balance grade when none is given [mm/s] (G6.3, the usual grade of pump impellers and general machinery). */
export const DEFAULT_BALANCE_GRADE_MM_PER_S = 6.3;

/** A source as the engineer states it (the design input's `operating.sources[i]`). */
export interface OperatingSourceInput {
  label: string;
  /** `unbalance`: m_r·e·ω² rotating in the plane normal to `axis`; `force`: a harmonic force along `axis`. */
  kind: 'unbalance' | 'force';
  /** Where the force acts [m]. */
  at: Vec3;
  axis: Axis;
  /** Multiple of shaft speed [–], default 1. */
  order?: number;
  /** Rotor mass [kg] (unbalance). */
  rotorMassKg?: number;
  /** Balance grade G [mm/s] (unbalance), default 6.3. */
  balanceGradeMmPerS?: number;
  /** Force amplitude [N] (force). */
  amplitudeN?: number;
  /** Fixed frequency [Hz] (force), instead of an order. */
  frequencyHz?: number;
}

/** The operating conditions the sources depend on (the design input's `operating`). */
export interface OperatingForcingInput {
  /** Fixed speed [rpm]. */
  speedRpm?: number;
  /** Speed range of a drive [rpm]. */
  speedRangeRpm?: { min: number; max: number };
  /** Shaft orders of the default source [–]. */
  orders?: readonly number[];
  /** Impeller vanes or fan blades: the default source also acts at Z·n/60. */
  vaneCount?: number;
  /** Supply frequency [Hz]: the motor's magnetic force at 2·f_L. */
  lineFrequencyHz?: number;
  /** Motor poles on a drive: the magnetic force follows the speed, 2·p·n/120 [Hz]. */
  motorPoles?: number;
  /** Further fixed disturbing frequencies [Hz] of the default source. */
  extraFrequenciesHz?: readonly number[];
  sources?: readonly OperatingSourceInput[];
  skipBandsRpm?: readonly SpeedBand[];
}

/** One resolved source, ready for `speedSweep`. */
export interface ResolvedSource extends SpeedSource {
  /** The engineer's label, or a generated one for a default source ("Vertical force at CG, 1×"). */
  label: string;
  /** Index in `operating.sources`, or −1 for a default source. */
  inputIndex: number;
  /** The default source: unit vertical force through the CG (its forces are per newton applied). */
  unitForce: boolean;
  /** The shaft order it follows, or null at a fixed frequency. */
  followsOrder: number | null;
}

/** The sources of a machine and the speeds they run over. */
export interface ResolvedOperating {
  sources: ResolvedSource[];
  /** Running range [rpm] (min = max for a fixed speed); null when no speed is given (fixed frequencies only). */
  speedRangeRpm: { min: number; max: number } | null;
  skipBandsRpm: SpeedBand[];
}

const ordinal = (order: number) => `${Number.isInteger(order) ? order.toFixed(0) : String(order)}×`;
const hz = (f: number) => (Number.isInteger(f) ? f.toFixed(0) : String(Math.round(f * 100) / 100));

/**
 * Resolves the sources of the whole-machine model.
 * - Given sources: an unbalance becomes a rotating source of m_r·e·ω², e = G/Ω_max with Ω_max the
 *   rotor's own highest speed 2π·o·n_max/60 (the sweep takes Ω_max at shaft speed, so the grade is
 *   passed as G/o); a force a directional one of `amplitudeN` at o·n/60 or `frequencyHz`. With
 *   motor poles on a drive, a force at twice the supply frequency is the motor's magnetic force
 *   and follows the speed at order p (2·p·n/120 = p·n/60).
 * - No sources: a unit vertical force through the CG at each shaft order, the vane pass, twice
 *   the supply frequency (or order p with motor poles on a drive) and each extra frequency.
 * @param operating speeds [rpm], orders, sources (positions [m]), skip bands [rpm]
 * @param cg the machine's centre of gravity [m] (where the default source acts)
 * @throws VibrationInputError (fields `operating.…`) when a source turning with the shaft has no speed, or nothing forces the machine
 */
export function resolveOperatingSources(operating: OperatingForcingInput, cg: Vec3): ResolvedOperating {
  const range = operating.speedRangeRpm
    ? { min: requirePositive('operating.speedRangeRpm.min', operating.speedRangeRpm.min), max: operating.speedRangeRpm.max }
    : operating.speedRpm !== undefined
      ? { min: requirePositive('operating.speedRpm', operating.speedRpm), max: operating.speedRpm }
      : null;
  const onDrive = operating.speedRangeRpm !== undefined && operating.motorPoles !== undefined;
  const poles = operating.motorPoles ?? 0;
  const supplyTwice = operating.lineFrequencyHz === undefined ? undefined : 2 * operating.lineFrequencyHz;
  const sources: ResolvedSource[] = [];
  const given = operating.sources ?? [];
  given.forEach((s, i) => {
    const magnetic = onDrive && s.kind === 'force' && s.frequencyHz !== undefined && s.frequencyHz === supplyTwice;
    const fixedHz = magnetic ? undefined : s.frequencyHz;
    const order = magnetic ? poles : (s.order ?? 1);
    if (fixedHz === undefined && range === null) {
      throw new VibrationInputError(`operating.sources[${i}]`, 'turns with the shaft: give the speed or the speed range', 'empty');
    }
    const base = { label: s.label, inputIndex: i, unitForce: false, at: { ...s.at }, axis: s.axis };
    if (s.kind === 'unbalance') {
      const grade = s.balanceGradeMmPerS ?? DEFAULT_BALANCE_GRADE_MM_PER_S;
      sources.push({
        ...base,
        kind: 'rotating',
        order,
        followsOrder: order,
        unbalance: { rotorMassKg: s.rotorMassKg ?? 0, balanceGradeMmPerS: grade / order },
      });
    } else {
      sources.push({
        ...base,
        kind: 'directional',
        ...(fixedHz === undefined ? { order } : { frequencyHz: fixedHz }),
        followsOrder: fixedHz === undefined ? order : null,
        amplitudeN: s.amplitudeN ?? 0,
      });
    }
  });
  if (given.length === 0) {
    const unit = (label: string, spec: { order: number } | { frequencyHz: number }): ResolvedSource => ({
      label,
      inputIndex: -1,
      unitForce: true,
      at: { ...cg },
      axis: 'z',
      kind: 'directional',
      amplitudeN: 1,
      ...spec,
      followsOrder: 'order' in spec ? spec.order : null,
    });
    if (range !== null) {
      for (const o of operating.orders ?? []) sources.push(unit(`Vertical force through the CG, ${ordinal(o)} shaft`, { order: o }));
      if (operating.vaneCount !== undefined) {
        sources.push(unit(`Vertical force through the CG, vane pass (${operating.vaneCount} vanes)`, { order: operating.vaneCount }));
      }
    }
    if (onDrive) {
      sources.push(unit(`Vertical force through the CG, 2× drive output (${poles}-pole motor)`, { order: poles }));
    } else if (supplyTwice !== undefined) {
      sources.push(unit(`Vertical force through the CG, 2× line (${hz(supplyTwice / 2)} Hz supply)`, { frequencyHz: supplyTwice }));
    }
    for (const f of operating.extraFrequenciesHz ?? [])
      sources.push(unit(`Vertical force through the CG, ${hz(f)} Hz`, { frequencyHz: f }));
  }
  if (sources.length === 0)
    throw new VibrationInputError('operating', 'gives no source: set a speed, a line frequency or extra frequencies', 'empty');
  return { sources, speedRangeRpm: range, skipBandsRpm: (operating.skipBandsRpm ?? []).map((b) => ({ min: b.min, max: b.max })) };
}

/**
 * The default source for bare disturbing frequencies (no operating conditions): a unit vertical
 * force through the CG at each frequency.
 * @param frequenciesHz f [Hz], > 0 each
 * @param cg centre of gravity [m]
 */
export function verticalSourcesAt(frequenciesHz: readonly number[], cg: Vec3): ResolvedOperating {
  const sources = frequenciesHz.map((f, i): ResolvedSource => ({
    label: `Vertical force through the CG, ${hz(requirePositive(`disturbingFrequenciesHz[${i}]`, f))} Hz`,
    inputIndex: -1,
    unitForce: true,
    at: { ...cg },
    axis: 'z',
    kind: 'directional',
    amplitudeN: 1,
    frequencyHz: f,
    followsOrder: null,
  }));
  return { sources, speedRangeRpm: null, skipBandsRpm: [] };
}
