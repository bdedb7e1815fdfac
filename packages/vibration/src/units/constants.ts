/**
 * Exact conversion constants between SI and US customary units.
 * Source: NIST Special Publication 811 (2008), Appendix B, "Guide for the Use of the
 * International System of Units" — the pound (avoirdupois), inch and pound-force are
 * defined exactly in SI; standard gravity g_n = 9.80665 m/s² is exact by definition (CGPM 1901).
 */

/** 1 lb (avoirdupois) in kg — exact (NIST SP 811). */
export const KG_PER_LB = 0.45359237;
/** 1 in in m — exact (NIST SP 811). */
export const M_PER_IN = 0.0254;
/** 1 lbf in N — exact: 0.45359237 kg × 9.80665 m/s² (NIST SP 811). */
export const N_PER_LBF = 4.4482216152605;
/** Standard acceleration of gravity g_n in m/s² — exact by definition. */
export const STANDARD_GRAVITY = 9.80665;
/** 1 kgf in N — exact (kg × g_n). */
export const N_PER_KGF = STANDARD_GRAVITY;
/** 1 lbf/in in N/m (= N_PER_LBF / M_PER_IN ≈ 175.1268). */
export const N_PER_M_PER_LBF_PER_IN = N_PER_LBF / M_PER_IN;
/** 1 mechanical horsepower (550 ft·lbf/s) in W — NIST SP 811 table value 7.456999 E+02. */
export const W_PER_HP = 745.6998715822702;
/** Millimetres per inch — exact (NIST SP 811). */
export const MM_PER_IN = 25.4;
