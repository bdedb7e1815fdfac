import { describe, expect, it } from 'vitest';
import { VibrationInputError, isVibrationInputError } from './vibration-input-error.js';
import { requireFinite, requireNonEmpty, requirePositive, requireSameLength } from './validate.js';

describe('VibrationInputError', () => {
  it('carries the field, a code and a readable message', () => {
    const e = new VibrationInputError('massKg', 'must be greater than zero', 'not-positive');
    expect(e).toBeInstanceOf(Error);
    expect(e.name).toBe('VibrationInputError');
    expect(e.field).toBe('massKg');
    expect(e.code).toBe('not-positive');
    expect(e.message).toBe('massKg: must be greater than zero');
    expect(isVibrationInputError(e)).toBe(true);
    expect(isVibrationInputError(new Error('x'))).toBe(false);
  });

  it('validators reject NaN, infinities, zero and empty arrays with the field name', () => {
    expect(() => requireFinite('a', Number.NaN)).toThrow(/a: must be a finite number/);
    expect(() => requireFinite('a', Number.POSITIVE_INFINITY)).toThrow(VibrationInputError);
    expect(() => requirePositive('k', 0)).toThrow(/k: must be greater than zero/);
    expect(() => requirePositive('k', -1)).toThrow(VibrationInputError);
    expect(() => requireNonEmpty('f', [])).toThrow(/f: must not be empty/);
    expect(() => requireSameLength('re', [1, 2], 3)).toThrow(/must have 3 entries/);
    expect(requirePositive('k', 2)).toBe(2);
  });
});
