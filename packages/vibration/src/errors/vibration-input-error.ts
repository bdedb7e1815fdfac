/** Why an input was refused. */
export type VibrationInputErrorCode =
  | 'not-finite'
  | 'not-positive'
  | 'negative'
  | 'out-of-range'
  | 'empty'
  | 'length-mismatch'
  | 'too-few-mounts'
  | 'collinear-mounts'
  | 'not-positive-definite';

/**
 * Thrown by every function of `@tacet/vibration` when an input cannot give a meaningful,
 * finite result (non-finite number, negative or zero mass or stiffness, empty array, fewer
 * than three mounts, collinear mounts...). The calculations never return NaN instead.
 *
 * `field` names the offending input as a path, e.g. `massKg` or `mounts[2].x`, so that a
 * server can map it to a 4xx response and a form can highlight the field.
 */
export class VibrationInputError extends Error {
  /** Path of the offending input, e.g. `stiffnessNPerM` or `points[3].y`. */
  readonly field: string;
  /** Machine-readable reason. */
  readonly code: VibrationInputErrorCode;

  constructor(field: string, message: string, code: VibrationInputErrorCode = 'out-of-range') {
    super(`${field}: ${message}`);
    this.name = 'VibrationInputError';
    this.field = field;
    this.code = code;
  }
}

/** True when `value` is a {@link VibrationInputError} (also across bundle copies). */
export function isVibrationInputError(value: unknown): value is VibrationInputError {
  return value instanceof VibrationInputError || (value instanceof Error && value.name === 'VibrationInputError');
}
