import { requireFinite, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** The code edition these rules implement; name it wherever a restraint figure is shown. */
export const SEISMIC_CODE_EDITION = 'ASCE 7-16';

/**
 * Component amplification a_p and response modification R_p of ASCE 7-16 Table 13.6-1 for
 * vibration-isolated components and systems (spring- or elastomer-isolated, closely restrained by
 * snubbers or resilient stops; internally isolated): a_p = 2.5, R_p = 2.0. Values recalled from
 * the table [REC: ASCE 7-16 Table 13.6-1, from memory]; docs/engineering/seismic-restraint.md §3.
 */
export const VIBRATION_ISOLATED_COEFFICIENTS = Object.freeze({ ap: 2.5, rp: 2.0 });

/**
 * Nominal clearance between the equipment and its restraint above which the design force doubles
 * (0.25 in = 6.35 mm; ASCE 7-16 Table 13.6-1, footnote on vibration-isolated components)
 * [m]. docs/engineering/seismic-restraint.md §4.
 */
export const SNUBBER_GAP_LIMIT_M = 0.00635;

/** Ranges accepted by {@link seismicDesignForce}; docs/engineering/seismic-restraint.md §2–§4. */
export const SEISMIC_INPUT_LIMITS = Object.freeze({
  /** S_DS [g]: above 0, at most 4 (beyond any mapped value; catches a value in %). */
  sdsG: { max: 4 },
  /** I_p: 1.0 or 1.5 in the code (§13.1.3); anything between is accepted here. */
  importanceFactor: { min: 1, max: 1.5 },
  /** z/h: 0 (at or below grade) … 1 (roof). */
  zOverH: { min: 0, max: 1 },
  /** a_p: 1.0 … 2.5, the values of Tables 13.5-1 and 13.6-1. */
  ap: { min: 1, max: 2.5 },
  /** R_p: 1.0 … 12, the range of Tables 13.5-1 and 13.6-1. */
  rp: { min: 1, max: 12 },
});

/** Input of {@link seismicDesignForce}. */
export interface SeismicForceInput {
  /** Design spectral acceleration at short periods S_DS [g], > 0 (from the site's seismic data). */
  sdsG: number;
  /** Component importance factor I_p [–]: 1.0, or 1.5 for life-safety and hazardous components. */
  importanceFactor: number;
  /** Height of the attachment in the structure over the roof height above the base, z/h [–], 0 … 1. */
  zOverH: number;
  /** Component amplification factor a_p [–]; default 2.5 (Table 13.6-1, vibration-isolated). */
  ap?: number;
  /** Component response modification factor R_p [–]; default 2.0 (Table 13.6-1, vibration-isolated). */
  rp?: number;
  /**
   * Nominal clearance (air gap) between the equipment and its restraint [m], ≥ 0. Not given
   * (undefined or null) means not specified on the documents: the force is doubled.
   */
  snubberGapM?: number | null;
  /** Operating weight of the component W_p [N], > 0. */
  weightN: number;
}

/** Which bound of §13.3.1 sets F_p. */
export type SeismicForceLimit = 'formula' | 'minimum' | 'maximum';

/** The horizontal and vertical seismic design forces on the whole component. */
export interface SeismicForceResult {
  /** a_p used [–]. */
  ap: number;
  /** R_p used [–]. */
  rp: number;
  /** 0.4·a_p·S_DS·W_p·(1 + 2z/h)/(R_p/I_p) [N] (ASCE 7-16 Eq. 13.3-1). */
  fpFormulaN: number;
  /** Lower limit 0.3·S_DS·I_p·W_p [N] (Eq. 13.3-3). */
  fpMinN: number;
  /** Upper limit 1.6·S_DS·I_p·W_p [N] (Eq. 13.3-2). */
  fpMaxN: number;
  /** F_p within its limits [N]. */
  fpN: number;
  /** Which of formula, minimum or maximum gives F_p. */
  limit: SeismicForceLimit;
  /** True when the gap exceeds 0.25 in or is not given: the design force is 2·F_p. */
  doubled: boolean;
  /** Horizontal design force on the restraints, F_p or 2·F_p [N], acting at the CG in any horizontal direction. */
  designForceN: number;
  /** Vertical seismic load effect E_v = 0.2·S_DS·D on the whole component [N] (§12.4.2.2). */
  verticalForceN: number;
}

function inRange(field: string, value: number, min: number, max: number): number {
  requireFinite(field, value);
  if (value < min || value > max) throw new VibrationInputError(field, `must be between ${min} and ${max} (got ${value})`, 'out-of-range');
  return value;
}

/**
 * Seismic design force on a nonstructural component, ASCE 7-16 §13.3.1:
 *
 *   F_p = 0.4·a_p·S_DS·W_p·(1 + 2·z/h) / (R_p/I_p),   0.3·S_DS·I_p·W_p ≤ F_p ≤ 1.6·S_DS·I_p·W_p
 *
 * doubled (2·F_p) when the nominal gap to the restraint exceeds 0.25 in or is not given
 * (Table 13.6-1 footnote), and the vertical effect E_v = 0.2·S_DS·W_p (§12.4.2.2, D = W_p).
 * docs/engineering/seismic-restraint.md §2–§5.
 * @param input S_DS [g], I_p, z/h, a_p, R_p [–], gap [m], W_p [N]
 * @returns F_p and its bounds [N], the design force [N], E_v [N]
 * @throws VibrationInputError (`not-positive`, `not-finite`, `out-of-range`, `negative`)
 */
export function seismicDesignForce(input: SeismicForceInput): SeismicForceResult {
  const L = SEISMIC_INPUT_LIMITS;
  const sds = requirePositive('sdsG', input.sdsG);
  if (sds > L.sdsG.max) throw new VibrationInputError('sdsG', `must be at most ${L.sdsG.max} g (got ${sds})`, 'out-of-range');
  const ip = inRange('importanceFactor', input.importanceFactor, L.importanceFactor.min, L.importanceFactor.max);
  const zh = inRange('zOverH', input.zOverH, L.zOverH.min, L.zOverH.max);
  const ap = inRange('ap', input.ap ?? VIBRATION_ISOLATED_COEFFICIENTS.ap, L.ap.min, L.ap.max);
  const rp = inRange('rp', input.rp ?? VIBRATION_ISOLATED_COEFFICIENTS.rp, L.rp.min, L.rp.max);
  const gap = input.snubberGapM == null ? null : requireNonNegative('snubberGapM', input.snubberGapM);
  const wp = requirePositive('weightN', input.weightN);

  const fpFormulaN = (0.4 * ap * sds * wp * (1 + 2 * zh)) / (rp / ip);
  const fpMinN = 0.3 * sds * ip * wp;
  const fpMaxN = 1.6 * sds * ip * wp;
  let fpN = fpFormulaN;
  let limit: SeismicForceLimit = 'formula';
  if (fpFormulaN < fpMinN) {
    fpN = fpMinN;
    limit = 'minimum';
  } else if (fpFormulaN > fpMaxN) {
    fpN = fpMaxN;
    limit = 'maximum';
  }
  // a gap of exactly 0.25 in (6.35 mm, whatever its rounding through mm or in) does not double
  const doubled = gap === null || gap > SNUBBER_GAP_LIMIT_M * (1 + 1e-9);
  return {
    ap,
    rp,
    fpFormulaN,
    fpMinN,
    fpMaxN,
    fpN,
    limit,
    doubled,
    designForceN: doubled ? 2 * fpN : fpN,
    verticalForceN: 0.2 * sds * wp,
  };
}
