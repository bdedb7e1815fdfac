/**
 * The checks of steel coil springs, open and housed (docs/engineering/selection.md §16):
 * lateral stability as the horizontal-to-vertical stiffness ratio, reserve travel beyond the
 * static deflection, and the minimum load in the light case. The restrained spring is left out:
 * its housing guides it sideways and stops it short of solid.
 *
 * Where they run: stability is a row check (candidate-store.ts, when a row is stored); reserve
 * travel and the light case are per point, in the evaluation loops (evaluate-uniform.ts,
 * evaluate-series.ts), with the per-row limits prepared here so the loops only compare.
 */
import { FAIL } from './checks.js';

/** Mount types the spring checks apply to. */
export const SPRING_TYPES: ReadonlySet<string> = new Set(['open_spring', 'housed_spring']);

/**
 * Lateral stability: k_h/k_v at least this. A published project-specification rule (isolation
 * specifications for building services commonly ask for it; from memory, no single source named).
 */
export const SPRING_MIN_HORIZONTAL_RATIO = 0.8;

/** Reserve travel: δ_max − δ_static ≥ this × δ_static (common practice). */
export const SPRING_RESERVE = 0.5;

/** Row check of a spring: stability fails when k_h/k_v < 0.8, or when k_h is not given (it cannot be shown). */
export function springRowChecks(mountType: string, kv: number, kh: number): number {
  if (!SPRING_TYPES.has(mountType)) return 0;
  return kh >= SPRING_MIN_HORIZONTAL_RATIO * kv ? 0 : FAIL.springStability; // NaN (not given) fails
}

/**
 * The static deflection a spring may take with its reserve: δ_max/(1 + reserve); Infinity for
 * other types (their travel check is the plain one, selection.md §6).
 */
export function springDeflectionLimitM(mountType: string, maxDeflectionM: number): number {
  return SPRING_TYPES.has(mountType) ? maxDeflectionM / (1 + SPRING_RESERVE) : Number.POSITIVE_INFINITY;
}
