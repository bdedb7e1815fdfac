/**
 * Steady forced response of a rigid body on mounts: (K(ω) − ω²M)q = F, per-mount forces,
 * whole-machine transmissibility (docs/engineering/whole-machine.md §3–§5).
 */
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
  void re;
  void im;
  void offset;
  throw new Error('not implemented yet');
}

/**
 * The complex force vector of a source of amplitude F (e^{iωt} convention): directional F·e_axis;
 * rotating about +z F·(e_x − i·e_y), and likewise cyclically about x and y.
 * @returns re, im [N] (length 3)
 */
export function sourceForceVector(source: Pick<HarmonicSourceAt, 'kind' | 'axis' | 'amplitudeN'>): { re: number[]; im: number[] } {
  void source;
  throw new Error('not implemented yet');
}

/**
 * Forced response at one frequency: solves (K + i(H + ωV) − ω²M)q = F with F the force and its
 * moment about the CG, then the mount forces f_i = k_i(1 + i·d_i)(u_cg + θ × r_i), their peaks,
 * the whole-machine transmissibility and the peak motion of each mount point.
 * @param system from `prepareWholeMachine`
 * @param source position [m], kind, axis, amplitude [N]
 * @param frequencyHz f [Hz], ≥ 0
 * @returns a fresh result (allocates; use `wholeMachineTransmissibility` in loops)
 * @throws VibrationInputError for an invalid source or frequency, or a singular system (a mechanism at ω = 0)
 */
export function wholeMachineResponse(system: WholeMachineSystem, source: HarmonicSourceAt, frequencyHz: number): WholeMachineResponse {
  void system;
  void source;
  void frequencyHz;
  throw new Error('not implemented yet');
}

/**
 * Whole-machine transmissibility only (no allocation; the system's work buffers are reused).
 * The source amplitude cancels; unit force is used.
 * @param system from `prepareWholeMachine`
 * @param source position [m], kind, axis (amplitude ignored)
 * @param frequencyHz f [Hz], ≥ 0
 * @returns T = Σ peak mount force / peak applied force [–]
 */
export function wholeMachineTransmissibility(
  system: WholeMachineSystem,
  source: Pick<HarmonicSourceAt, 'at' | 'kind' | 'axis'>,
  frequencyHz: number,
): number {
  void system;
  void source;
  void frequencyHz;
  throw new Error('not implemented yet');
}
