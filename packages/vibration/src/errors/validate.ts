/**
 * Internal argument checks. Each throws a {@link VibrationInputError} naming the field.
 * Not part of the public API.
 */
import { VibrationInputError } from './vibration-input-error.js';

export function requireFinite(field: string, value: number): number {
  if (typeof value !== 'number' || !Number.isFinite(value)) {
    throw new VibrationInputError(field, `must be a finite number (got ${String(value)})`, 'not-finite');
  }
  return value;
}

export function requirePositive(field: string, value: number): number {
  requireFinite(field, value);
  if (value <= 0) throw new VibrationInputError(field, `must be greater than zero (got ${value})`, 'not-positive');
  return value;
}

export function requireNonNegative(field: string, value: number): number {
  requireFinite(field, value);
  if (value < 0) throw new VibrationInputError(field, `must not be negative (got ${value})`, 'negative');
  return value;
}

export function requireNonEmpty(field: string, values: ArrayLike<unknown>): void {
  if (values == null || values.length === 0) throw new VibrationInputError(field, 'must not be empty', 'empty');
}

export function requireSameLength(field: string, values: ArrayLike<unknown>, expected: number): void {
  if (values == null || values.length !== expected) {
    throw new VibrationInputError(
      field,
      `must have ${expected} entries (got ${values == null ? 'none' : values.length})`,
      'length-mismatch',
    );
  }
}

export function requireAllFinite(field: string, values: ArrayLike<number>): void {
  for (let i = 0; i < values.length; i++) requireFinite(`${field}[${i}]`, values[i]);
}
