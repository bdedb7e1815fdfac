/**
 * The checks a candidate must pass, as bits of its fail mask (`CandidateStore.fail`, a Uint16Array:
 * room for 16 checks; a candidate passes when its mask is 0). This file says what each check is
 * and where it is applied (the rules: docs/engineering/selection.md §5–§9); the words a user reads
 * for each failed bit are in reasons.ts.
 *
 * Where the checks run:
 * - per mount (row), when the row is stored: supplier (rowChecks); when its details are known:
 *   temperature and type (detailChecks). A candidate inherits the row bits of every mount it uses;
 *   row bits live in `CandidateStore.rowFail` (a Uint8Array: row checks use the low 8 bits);
 * - for the machine, the same for every candidate (machineChecks): CG outside the mount polygon;
 * - per candidate, in the evaluation loops (evaluate-uniform.ts, evaluate-series.ts): utilisation
 *   window, static deflection against the mount's travel;
 * - for every candidate at once (evaluate-isolation.ts): the bounce estimate at every disturbing
 *   frequency, which only orders the candidates (it fails none);
 * - for the best candidates only, as finalist checks (ranking.ts `FinalistCheck`): the rigid-body
 *   modes (mode-check.ts: a mechanism) and the whole-machine verdict (whole-machine-check.ts);
 * - seismic restraint, when the input asks for it (restraint-check.ts): every candidate screened
 *   before scoring (no rating, or a uniform candidate's demand over its ratings), then the exact
 *   figures of the best ones as a finalist check.
 *
 * To add a check: a new bit here, the place that sets it, and its sentence in reasons.ts.
 */
import type { MountType } from '../../catalog/mount-rules.js';
import type { Criteria } from '../dto/design-input.dto.js';
import type { SelectionProblem } from '../selection-problem.js';

/** Why a candidate fails (bit set). */
export const FAIL = {
  /** The centre of gravity lies outside the polygon of the mount points (the machine would tip). */
  cgOutside: 1,
  /**
   * Bounce estimate above the target at a disturbing frequency: the verdict only where the
   * whole-machine model cannot be built (whole-machine-check.ts); otherwise the estimate only orders.
   */
  isolation: 2,
  /** Load / rated load outside the allowed window at a point (with the weight margin), or a point lifting off. */
  utilization: 4,
  /** Static deflection (with the weight margin) beyond the mount's maximum deflection. */
  deflection: 8,
  /** Ambient temperature outside the mount's range. */
  temperature: 16,
  /** A rigid-body mode near a disturbing frequency, or a mechanism (mode-check.ts). */
  modes: 32,
  /** Mount type not among the allowed types. */
  type: 64,
  /** Supplier not among the allowed suppliers. */
  supplier: 128,
  /** Seismic restraint: a point's demand over its mount's rating, or no rating (restraint-check.ts). */
  restraint: 256,
  /**
   * Worst whole-machine transmissibility over the running range and the stiffness band above the
   * target (whole-machine-check.ts). 8192: the bits between are taken by the robustness checks.
   */
  wholeMachine: 8192,
} as const;

/** The row checks that need a mount's details (DETAIL_COLUMNS); a candidate takes them once the details are loaded. */
export const DETAIL_FAILS = FAIL.temperature | FAIL.type;

/** Checks of the machine on its mount points, failed by every candidate alike: the CG inside the polygon. */
export function machineChecks(problem: SelectionProblem): number {
  return problem.cgInside ? 0 : FAIL.cgOutside;
}

/** The allowed suppliers of a request (null: any). */
export function allowedSuppliersOf(criteria: Criteria): ReadonlySet<number> | null {
  return criteria.supplierIds?.length ? new Set<number>(criteria.supplierIds) : null;
}

/** Row checks known from the prefilter's columns: the supplier. */
export function rowChecks(allowedSuppliers: ReadonlySet<number> | null, supplierId: number): number {
  return allowedSuppliers && !allowedSuppliers.has(supplierId) ? FAIL.supplier : 0;
}

/**
 * Row checks that need the mount's details: ambient temperature inside its range (a limit the
 * supplier does not state, NaN, passes) and the allowed types. Rows from the prefilter meet both
 * already; a choice made outside the list may not.
 */
export function detailChecks(criteria: Criteria, mountType: string, tempMinC: number, tempMaxC: number): number {
  let fail = 0;
  const ambient = criteria.ambientTempC;
  if (ambient !== undefined && (ambient < tempMinC || ambient > tempMaxC)) fail |= FAIL.temperature;
  if (criteria.mountTypes?.length && !criteria.mountTypes.includes(mountType as MountType)) fail |= FAIL.type;
  return fail;
}
