/** Speed sweep of one source over a running range (docs/engineering/whole-machine.md §7). */
import { type WholeMachineSystem } from './system.js';
import { type PassageInput, type PassagePoint, type SpeedSource, type SpeedSweepInput, type SpeedSweepResult } from './types.js';

/**
 * Frequency [Hz] of a source at shaft speed n [rpm]: `frequencyHz` when given, else order·n/60.
 */
export function sourceFrequencyHz(source: Pick<SpeedSource, 'order' | 'frequencyHz'>, speedRpm: number): number {
  void source;
  void speedRpm;
  throw new Error('not implemented yet');
}

/**
 * Amplitude [N] of a source at shaft speed n [rpm]: `amplitudeN`, or for an unbalance
 * m_r·e·ω² with e = G/Ω_max, ω = 2π·f (f from `sourceFrequencyHz`), Ω_max = 2π·maxRpm/60.
 * @param maxRpm highest running speed [rpm], > 0 (sets the eccentricity of an unbalance)
 */
export function sourceAmplitudeN(source: SpeedSource, speedRpm: number, maxRpm: number): number {
  void source;
  void speedRpm;
  void maxRpm;
  throw new Error('not implemented yet');
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
  maxStepPct = 0.5,
): Float64Array {
  void minRpm;
  void maxRpm;
  void skipBandsRpm;
  void extraRpm;
  void maxStepPct;
  throw new Error('not implemented yet');
}

/**
 * Whole-machine transmissibility of one source over the running range: evaluated on
 * `sweepGrid` (crossings included), the maximum refined between its neighbours.
 * @param system from `prepareWholeMachine`
 * @param input source, range [rpm], skip bands, step [%]
 * @returns worst point, crossings, optionally the curve
 */
export function speedSweep(system: WholeMachineSystem, input: SpeedSweepInput): SpeedSweepResult {
  void system;
  void input;
  throw new Error('not implemented yet');
}

/**
 * Start-up and coast-down: for each unbalance source of order o and each mode f_j with
 * n = 60·f_j/o below minRpm, the steady peak motion at the mount points at that speed, with the
 * source's amplitude at that speed (e = G/Ω_max, Ω_max from maxRpm). Ascending speed.
 * @returns one point per (mode, unbalance source) passed through
 */
export function resonancePassage(system: WholeMachineSystem, input: PassageInput): PassagePoint[] {
  void system;
  void input;
  throw new Error('not implemented yet');
}
