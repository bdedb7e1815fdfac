import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { nearestMode, verificationVerdict } from './verification-verdict.js';

describe('comparing a measured natural frequency with the prediction', () => {
  it('takes the nearest predicted mode on a ratio scale', () => {
    const modes = [
      { frequencyHz: 2, mode: 'sway' },
      { frequencyHz: 8, mode: 'bounce' },
    ];
    expect(nearestMode(3.9, modes).mode).toBe('sway');
    expect(nearestMode(4.1, modes).mode).toBe('bounce');
    expect(() => nearestMode(4, [])).toThrow(VibrationInputError);
  });

  it('verdict at the default ±10 %: agrees inside, stiffer above, softer below; stiffness deviation (f_m/f_p)² − 1 at the same mass', () => {
    expect(verificationVerdict(5.2, 5)).toEqual({
      deviationPct: expect.closeTo(4, 12),
      stiffnessDeviationPct: expect.closeTo(8.16, 12),
      verdict: 'agrees',
    });
    expect(verificationVerdict(5.5, 5).verdict).toBe('agrees'); // exactly +10 % still agrees
    expect(verificationVerdict(5.51, 5).verdict).toBe('stiffer');
    expect(verificationVerdict(4.49, 5).verdict).toBe('softer');
    expect(verificationVerdict(5.2, 5, 3).verdict).toBe('stiffer');
    expect(() => verificationVerdict(5, 5, 0)).toThrow(/tolerancePct/);
    expect(() => verificationVerdict(5, 0)).toThrow(/predictedHz/);
  });
});
