/** Crossing speeds of a source order with the undamped modes (docs/engineering/whole-machine.md §6). */
import { type CrossingInput, type ModeCrossing } from './types.js';

/**
 * Speeds at which a source of order o runs at a mode's frequency: n_j = 60·f_j/o [rpm], kept when
 * minRpm ≤ n_j ≤ maxRpm and not strictly inside a skip band. Ascending speed.
 * @param input mode frequencies [Hz], order [–], range [rpm], skip bands [rpm]
 * @returns the crossings
 */
export function crossingSpeeds(input: CrossingInput): ModeCrossing[] {
  void input;
  throw new Error('not implemented yet');
}
