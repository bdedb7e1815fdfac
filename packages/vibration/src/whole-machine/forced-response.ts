/**
 * Steady forced response of a rigid body on mounts: (K(ω) − ω²M)q = F, per-mount forces,
 * whole-machine transmissibility (docs/engineering/whole-machine.md §3–§5).
 */
import { requireNonNegative } from '../errors/validate.js';
import { peak3, requireKindAxis, setUnitLoad, solveAt, sumOfPeakMountForces, unitForce } from './response-kernel.js';
import { type WholeMachineSystem } from './system.js';
import { type HarmonicSourceAt, type WholeMachineResponse } from './types.js';

/**
 * Peak over a cycle of a complex 3-vector v (the real vector Re(v·e^{iωt})):
 * √((‖v‖² + |v·v|)/2), where ‖v‖² = Σ|v_k|² and v·v = Σ v_k² (no conjugate).
 * A rotating force of magnitude F has peak F; a linear one F·e has peak F.
 * @param re real parts, the vector at [offset, offset+1, offset+2]
 * @param im imaginary parts, same layout
 * @param offset index of the x entry (default 0)
 * @returns peak magnitude (units of v)
 */
export function peakOverCycle(re: ArrayLike<number>, im: ArrayLike<number>, offset = 0): number {
  return peak3(re[offset], re[offset + 1], re[offset + 2], im[offset], im[offset + 1], im[offset + 2]);
}

/**
 * The complex force vector of a source of amplitude F (e^{iωt} convention): directional F·e_axis;
 * rotating about +z F·(e_x − i·e_y), and likewise cyclically about x (e_y − i·e_z) and y (e_z − i·e_x).
 * @returns re, im [N] (length 3)
 */
export function sourceForceVector(source: Pick<HarmonicSourceAt, 'kind' | 'axis' | 'amplitudeN'>): { re: number[]; im: number[] } {
  const a = requireKindAxis(source?.kind, source?.axis);
  const f = requireNonNegative('source.amplitudeN', source.amplitudeN);
  const u = new Float64Array(6);
  unitForce(source.kind, a, u);
  return { re: [f * u[0], f * u[1], f * u[2]], im: [f * u[3], f * u[4], f * u[5]] };
}

function requireFrequency(frequencyHz: number): number {
  return requireNonNegative('frequencyHz', frequencyHz);
}

/**
 * Forced response at one frequency: solves (K + i(H + ωV) − ω²M)q = F with F the force and its
 * moment about the CG, then the mount forces f_i = k_i(1 + i·d_i)(u_G + θ × r_i), their peaks,
 * the whole-machine transmissibility and the peak motion of each mount point. At an undamped
 * resonance (or a mechanism at 0 Hz) the response is unbounded: every peak and T are +Infinity,
 * and q and the complex forces are reported as +Infinity too.
 * @param system from `prepareWholeMachine`
 * @param source position [m], kind, axis, amplitude [N]
 * @param frequencyHz f [Hz], ≥ 0
 * @returns a fresh result (allocates; use `wholeMachineTransmissibility` in loops)
 * @throws VibrationInputError for an invalid source or frequency
 */
export function wholeMachineResponse(system: WholeMachineSystem, source: HarmonicSourceAt, frequencyHz: number): WholeMachineResponse {
  const f = requireFrequency(frequencyHz);
  setUnitLoad(system, source);
  const amplitude = requireNonNegative('source.amplitudeN', source.amplitudeN);
  const n = system.mountCount;
  const omega = 2 * Math.PI * f;
  const result: WholeMachineResponse = {
    frequencyHz: f,
    appliedPeakForceN: amplitude,
    displacementRe: new Float64Array(6),
    displacementIm: new Float64Array(6),
    mountForceRe: new Float64Array(3 * n),
    mountForceIm: new Float64Array(3 * n),
    mountPeakForceN: new Float64Array(n),
    mountPeakMotionM: new Float64Array(n),
    transmissibility: 0,
  };
  if (!solveAt(system, omega)) {
    for (const a of [
      result.displacementRe,
      result.displacementIm,
      result.mountForceRe,
      result.mountForceIm,
      result.mountPeakForceN,
      result.mountPeakMotionM,
    ])
      a.fill(Infinity);
    result.transmissibility = Infinity;
    return result;
  }
  const { bRe: q, bIm: qi } = system.work;
  for (let j = 0; j < 6; j++) {
    result.displacementRe[j] = amplitude * q[j];
    result.displacementIm[j] = amplitude * qi[j];
  }
  const { arm, mountStiffness: k, lossFactor, viscousPerOmega } = system;
  const u = new Float64Array(6);
  for (let i = 0; i < n; i++) {
    const rx = arm[3 * i];
    const ry = arm[3 * i + 1];
    const rz = arm[3 * i + 2];
    for (let part = 0; part < 2; part++) {
      const v = part === 0 ? result.displacementRe : result.displacementIm;
      u[3 * part] = v[0] + v[4] * rz - v[5] * ry;
      u[3 * part + 1] = v[1] + v[5] * rx - v[3] * rz;
      u[3 * part + 2] = v[2] + v[3] * ry - v[4] * rx;
    }
    result.mountPeakMotionM[i] = peak3(u[0], u[1], u[2], u[3], u[4], u[5]);
    const d = lossFactor[i] + omega * viscousPerOmega[i];
    for (let p = 0; p < 3; p++) {
      const kp = k[3 * i + p];
      result.mountForceRe[3 * i + p] = kp * (u[p] - d * u[3 + p]);
      result.mountForceIm[3 * i + p] = kp * (u[3 + p] + d * u[p]);
    }
    result.mountPeakForceN[i] = peakOverCycle(result.mountForceRe, result.mountForceIm, 3 * i);
  }
  result.transmissibility = amplitude > 0 ? sumOfPeakMountForces(system, omega) : 0;
  return result;
}

/**
 * Whole-machine transmissibility only (no allocation; the system's work buffers are reused).
 * The source amplitude cancels; unit force is used.
 * @param system from `prepareWholeMachine`
 * @param source position [m], kind, axis (amplitude ignored)
 * @param frequencyHz f [Hz], ≥ 0
 * @returns T = Σ peak mount force / peak applied force [–]; +Infinity at an undamped resonance
 */
export function wholeMachineTransmissibility(
  system: WholeMachineSystem,
  source: Pick<HarmonicSourceAt, 'at' | 'kind' | 'axis'>,
  frequencyHz: number,
): number {
  const omega = 2 * Math.PI * requireFrequency(frequencyHz);
  setUnitLoad(system, source);
  return solveAt(system, omega) ? sumOfPeakMountForces(system, omega) : Infinity;
}
