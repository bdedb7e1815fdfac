/** Crossing speeds of a source order with the undamped modes (docs/engineering/whole-machine.md §6). */
import { requireFinite, requirePositive } from '../errors/validate.js';
import { insideSkipBand, requireRange } from './speed-range.js';
import { type CrossingInput, type ModeCrossing } from './types.js';

/**
 * Speeds at which a source of order o runs at a mode's frequency: n_j = 60·f_j/o [rpm], kept when
 * minRpm ≤ n_j ≤ maxRpm and not strictly inside a skip band. Ascending speed.
 * @param input mode frequencies [Hz], order [–], range [rpm], skip bands [rpm]
 * @returns the crossings
 */
export function crossingSpeeds(input: CrossingInput): ModeCrossing[] {
  const order = requirePositive('order', input.order);
  const bands = requireRange(input.minRpm, input.maxRpm, input.skipBandsRpm);
  const out: ModeCrossing[] = [];
  input.modeFrequenciesHz.forEach((f, modeIndex) => {
    requireFinite(`modeFrequenciesHz[${modeIndex}]`, f);
    if (!(f > 0)) return;
    const speedRpm = (60 * f) / order;
    if (speedRpm < input.minRpm || speedRpm > input.maxRpm || insideSkipBand(speedRpm, bands)) return;
    out.push({ modeIndex, modeFrequencyHz: f, order, speedRpm });
  });
  return out.sort((a, b) => a.speedRpm - b.speedRpm || a.modeIndex - b.modeIndex);
}
