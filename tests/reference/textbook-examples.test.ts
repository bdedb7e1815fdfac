/**
 * Worked textbook examples. The statements and answers are recalled FROM MEMORY (example numbers
 * are not given where unsure, as they differ between printings); each one was chosen because its
 * answer can be re-derived from the closed forms, which was done here by hand before writing the
 * expected values. None of them disagrees with the engineering notes (docs/engineering/sdof.md,
 * docs/engineering/transmissibility.md).
 */
import { describe, expect, it } from 'vitest';
import {
  criticalDamping,
  dampingRatioFromLogDecrement,
  harmonicForceResponse,
  logDecrementFromAmplitudes,
  roundsTo,
  stiffnessForNaturalFrequency,
  transmissibilityUndamped,
  viscousDamping,
} from './vibration.js';

describe('Rao, Mechanical Vibrations, 5th ed., ch. 9 (Vibration Control), example "Spring support for exhaust fan" — from memory', () => {
  // An exhaust fan of 40 kg running at 1000 rpm on four springs of stiffness K each; only 10 % of the
  // unbalanced force may reach the base. Undamped: T = 1/(r² − 1) = 0.1 → r² = 11;
  // ω = 104.72 rad/s, ωn = ω/√11 = 31.574 rad/s, 4K = m·ωn² → K = 9969.1 N/m (book's answer as recalled).
  it('K = 9969.1 N/m per spring', () => {
    const r = Math.sqrt(11);
    expect(transmissibilityUndamped(r)).toBeCloseTo(0.1, 12);
    const fnHz = 1000 / 60 / r;
    const kPerSpring = stiffnessForNaturalFrequency(fnHz, 40) / 4;
    // exact arithmetic gives 9969.3; the book rounds ωn before squaring (slack of 2 units in the last digit)
    expect(roundsTo(kPerSpring, '9969.1', 2)).toBe(true);
  });
});

describe('Rao, Mechanical Vibrations, 5th ed., ch. 2 (free vibration), example "Shock absorber for a motorcycle" — from memory', () => {
  // m = 200 kg; damped period 2 s; amplitude reduced to 1/4 in one half cycle (x₁.₅ = x₁/4), so over
  // a full cycle x₁/x₂ = 16: Λ = ln 16 = 2.7726, ζ = Λ/√(4π² + Λ²) = 0.4037; ωd = 2π/2 = π rad/s,
  // ωn = ωd/√(1 − ζ²) = 3.4338 rad/s; k = m·ωn² = 2358.2 N/m; c = ζ·2√(km) = 554.5 N·s/m.
  it('ζ = 0.4037, k = 2358.2 N/m, c = 554.5 N·s/m', () => {
    const lambda = logDecrementFromAmplitudes(4, 1, 0.5);
    expect(roundsTo(lambda, '2.7726')).toBe(true);
    const zeta = dampingRatioFromLogDecrement(lambda);
    expect(roundsTo(zeta, '0.4037')).toBe(true);
    const wn = Math.PI / Math.sqrt(1 - zeta * zeta);
    // exact: ωn = 3.43386, k = 2358.28; the book truncates (slack of 1 unit in the last digit)
    expect(roundsTo(wn, '3.4338', 1)).toBe(true);
    const k = stiffnessForNaturalFrequency(wn / (2 * Math.PI), 200);
    expect(roundsTo(k, '2358.2', 1)).toBe(true);
    expect(roundsTo(zeta * criticalDamping(k, 200), '554.5')).toBe(true);
  });
});

describe('Thomson & Dahleh, Theory of Vibration with Applications, 5th ed., ch. 3, vibration-isolation example — from memory', () => {
  // A 100 kg machine on springs of total stiffness 700 kN/m with a rotating unbalance giving 350 N at
  // 3000 rpm, ζ = 0.20. ωn = √7000 = 83.67 rad/s, ω = 314.16 rad/s, r = 3.755;
  // X = (350/7e5)/√((1 − r²)² + (2ζr)²) = 3.79e-5 m; T = √(1 + (2ζr)²)/(same) = 0.137; F_T = 47.9 N.
  it('X = 0.0379 mm, T = 0.137, F_T = 47.9 N', () => {
    const res = harmonicForceResponse({
      massKg: 100,
      stiffnessNPerM: 7e5,
      damping: viscousDamping(0.2),
      forceAmplitudeN: 350,
      frequencyHz: 3000 / 60,
    });
    expect(roundsTo(res.frequencyRatio, '3.755')).toBe(true);
    expect(roundsTo(res.displacementAmplitudeM * 1000, '0.0379')).toBe(true);
    expect(roundsTo(res.transmissibility, '0.137')).toBe(true);
    expect(roundsTo(res.transmittedForceN, '47.9')).toBe(true);
  });
});
