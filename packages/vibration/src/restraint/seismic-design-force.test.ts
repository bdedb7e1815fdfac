/**
 * The ASCE 7-16 §13.3.1 design force against hand calculations from the code's text
 * (docs/engineering/seismic-restraint.md §2–§5, docs/engineering/check-values.md CV-32).
 * Equation numbers and the Table 13.6-1 values are recalled [REC: ASCE 7-16, from memory].
 */
import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { mmToM } from '../units/convert.js';
import { SEISMIC_CODE_EDITION, SNUBBER_GAP_LIMIT_M, VIBRATION_ISOLATED_COEFFICIENTS, seismicDesignForce } from './seismic-design-force.js';

const W = 10_000; // N

describe('seismic design force, ASCE 7-16 §13.3.1', () => {
  it('names the edition and takes a_p = 2.5, R_p = 2.0 for vibration-isolated components (Table 13.6-1, from memory)', () => {
    expect(SEISMIC_CODE_EDITION).toBe('ASCE 7-16');
    expect(VIBRATION_ISOLATED_COEFFICIENTS).toEqual({ ap: 2.5, rp: 2.0 });
    expect(SNUBBER_GAP_LIMIT_M).toBeCloseTo(0.25 * 0.0254, 15);
  });

  it('CV-32 a [hand calculation, Eq. 13.3-1]: S_DS 1.0, I_p 1.0, z/h 0.5, defaults → F_p = 0.4·2.5·1·10 000·2/2 = 10 000 N', () => {
    const r = seismicDesignForce({ sdsG: 1.0, importanceFactor: 1.0, zOverH: 0.5, snubberGapM: mmToM(6), weightN: W });
    expect(r.ap).toBe(2.5);
    expect(r.rp).toBe(2.0);
    expect(r.fpFormulaN).toBeCloseTo(10_000, 9);
    expect(r.fpMinN).toBeCloseTo(3_000, 9); // 0.3·1.0·1.0·10 000
    expect(r.fpMaxN).toBeCloseTo(16_000, 9); // 1.6·1.0·1.0·10 000
    expect(r.limit).toBe('formula');
    expect(r.fpN).toBeCloseTo(10_000, 9);
    expect(r.doubled).toBe(false);
    expect(r.designForceN).toBeCloseTo(10_000, 9);
    expect(r.verticalForceN).toBeCloseTo(2_000, 9); // E_v = 0.2·1.0·10 000 (§12.4.2.2)
  });

  it('CV-32 b [hand calculation, Eq. 13.3-3]: the lower limit 0.3·S_DS·I_p·W_p governs (a_p 1.0, R_p 6.0, at grade)', () => {
    // formula 0.4·1.0·0.5·10 000·1/6 = 333.3 N < 0.3·0.5·1.0·10 000 = 1500 N
    const r = seismicDesignForce({ sdsG: 0.5, importanceFactor: 1.0, zOverH: 0, ap: 1.0, rp: 6.0, snubberGapM: mmToM(3), weightN: W });
    expect(r.fpFormulaN).toBeCloseTo(333.333333, 5);
    expect(r.limit).toBe('minimum');
    expect(r.fpN).toBeCloseTo(1_500, 9);
    expect(r.designForceN).toBeCloseTo(1_500, 9);
  });

  it('CV-32 c [hand calculation, Eq. 13.3-2]: the upper limit 1.6·S_DS·I_p·W_p governs, then doubles for a 10 mm gap', () => {
    // formula 0.4·2.5·1.5·10 000·3/(1.0/1.5) = 67 500 N > 1.6·1.5·1.5·10 000 = 36 000 N; gap > 0.25 in → 72 000 N
    const r = seismicDesignForce({ sdsG: 1.5, importanceFactor: 1.5, zOverH: 1, ap: 2.5, rp: 1.0, snubberGapM: mmToM(10), weightN: W });
    expect(r.fpFormulaN).toBeCloseTo(67_500, 6);
    expect(r.limit).toBe('maximum');
    expect(r.fpN).toBeCloseTo(36_000, 6);
    expect(r.doubled).toBe(true);
    expect(r.designForceN).toBeCloseTo(72_000, 6);
    expect(r.verticalForceN).toBeCloseTo(3_000, 9);
  });

  it('CV-32 d [hand calculation]: I_p 1.5 at the roof with the defaults: 0.4·2.5·1·10 000·3/(2/1.5) = 22 500 N, under the 24 000 N cap', () => {
    const r = seismicDesignForce({ sdsG: 1.0, importanceFactor: 1.5, zOverH: 1, snubberGapM: 0, weightN: W });
    expect(r.fpN).toBeCloseTo(22_500, 6);
    expect(r.fpMaxN).toBeCloseTo(24_000, 6);
    expect(r.limit).toBe('formula');
  });

  it('doubles above 0.25 in only, and when the gap is not given (Table 13.6-1 footnote)', () => {
    const base = { sdsG: 1.0, importanceFactor: 1.0, zOverH: 0.5, weightN: W };
    expect(seismicDesignForce({ ...base, snubberGapM: mmToM(6.35) }).doubled).toBe(false);
    expect(seismicDesignForce({ ...base, snubberGapM: 0.25 * 0.0254 }).doubled).toBe(false);
    expect(seismicDesignForce({ ...base, snubberGapM: mmToM(6.36) }).doubled).toBe(true);
    expect(seismicDesignForce({ ...base, snubberGapM: null }).doubled).toBe(true);
    const notGiven = seismicDesignForce(base);
    expect(notGiven.doubled).toBe(true);
    expect(notGiven.designForceN).toBeCloseTo(20_000, 9);
  });

  it('with the Table 13.6-1 defaults the formula always lies between the limits: 0.5·(1 + 2z/h)·I_p·S_DS·W_p', () => {
    for (const zOverH of [0, 0.25, 0.5, 1]) {
      for (const importanceFactor of [1, 1.5]) {
        const r = seismicDesignForce({ sdsG: 0.8, importanceFactor, zOverH, snubberGapM: 0, weightN: W });
        expect(r.limit).toBe('formula');
        expect(r.fpN).toBeCloseTo(0.5 * (1 + 2 * zOverH) * importanceFactor * 0.8 * W, 6);
      }
    }
  });

  it('refuses inputs outside the code’s ranges with the field named', () => {
    const base = { sdsG: 1.0, importanceFactor: 1.0, zOverH: 0.5, weightN: W };
    const refused = (patch: Record<string, unknown>, field: string, code: string) => {
      try {
        seismicDesignForce({ ...base, ...patch });
      } catch (e) {
        expect(e).toBeInstanceOf(VibrationInputError);
        expect((e as VibrationInputError).field).toBe(field);
        expect((e as VibrationInputError).code).toBe(code);
        return;
      }
      throw new Error(`accepted ${JSON.stringify(patch)}`);
    };
    refused({ sdsG: 0 }, 'sdsG', 'not-positive');
    refused({ sdsG: 150 }, 'sdsG', 'out-of-range');
    refused({ sdsG: Number.NaN }, 'sdsG', 'not-finite');
    refused({ importanceFactor: 2 }, 'importanceFactor', 'out-of-range');
    refused({ importanceFactor: 0.5 }, 'importanceFactor', 'out-of-range');
    refused({ zOverH: 1.2 }, 'zOverH', 'out-of-range');
    refused({ zOverH: -0.1 }, 'zOverH', 'out-of-range');
    refused({ ap: 3 }, 'ap', 'out-of-range');
    refused({ rp: 0.5 }, 'rp', 'out-of-range');
    refused({ snubberGapM: -0.001 }, 'snubberGapM', 'negative');
    refused({ weightN: 0 }, 'weightN', 'not-positive');
  });
});
