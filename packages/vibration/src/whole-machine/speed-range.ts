/** Checks of a running range and its skip bands (internal, not exported from the package). */
import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type SpeedBand } from './types.js';

/** @internal Checks a running range and its skip bands; returns the bands. */
export function requireRange(minRpm: number, maxRpm: number, skipBandsRpm: readonly SpeedBand[] | undefined): readonly SpeedBand[] {
  requirePositive('minRpm', minRpm);
  requirePositive('maxRpm', maxRpm);
  if (maxRpm < minRpm) throw new VibrationInputError('maxRpm', `must not be below the lowest speed (${minRpm} rpm)`, 'out-of-range');
  const bands = skipBandsRpm ?? [];
  bands.forEach((b, i) => {
    if (b == null || typeof b !== 'object') throw new VibrationInputError(`skipBandsRpm[${i}]`, 'must be {min, max}', 'not-finite');
    requireFinite(`skipBandsRpm[${i}].min`, b.min);
    requireFinite(`skipBandsRpm[${i}].max`, b.max);
    if (!(b.max > b.min)) throw new VibrationInputError(`skipBandsRpm[${i}].max`, 'must be above the band’s lowest speed', 'out-of-range');
  });
  return bands;
}

/** @internal True when n lies strictly inside one of the bands. */
export function insideSkipBand(speedRpm: number, bands: readonly SpeedBand[]): boolean {
  for (const b of bands) if (speedRpm > b.min && speedRpm < b.max) return true;
  return false;
}
