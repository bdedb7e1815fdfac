/**
 * The seismic restraint figures of one candidate: the demand on each mount point from
 * @tacet/vibration (ASCE 7-16 §13.3.1, the worst over every horizontal direction) against the
 * ratings of the mount there, and the check that governs (docs/engineering/seismic-restraint.md
 * §6–§9). Pure: the engine's restraint check (engine/restraint-check.ts) calls it per candidate.
 */
import { governingRestraintDemand, mmToM, radToDeg, seismicRestraintDemand, SEISMIC_CODE_EDITION } from '@tacet/vibration';
import type { RestraintInput } from './dto/restraint.dto.js';
import type { SelectionProblem } from './selection-problem.js';
import type { CandidateRestraint } from './selection.types.js';

/** A mount at one point as the restraint check reads it (SI; NaN / null where the catalog gives nothing). */
export interface RestraintMount {
  partNumber: string;
  /** Static vertical stiffness, N/m. */
  verticalStiffnessNPerM: number;
  /** Static horizontal stiffness, N/m; NaN: not given, taken equal to the vertical (as for the modes). */
  horizontalStiffnessNPerM: number;
  restraintCapacityN: number | null;
  upliftCapacityN: number | null;
}

/**
 * Height of the CG above the mount plane, m: the plane is taken at the mean height of the mount
 * points (docs/engineering/seismic-restraint.md §7).
 */
export function cgHeightAboveMounts(problem: Pick<SelectionProblem, 'cg' | 'points'>): number {
  const plane = problem.points.reduce((sum, p) => sum + p.z, 0) / problem.points.length;
  return problem.cg.z - plane;
}

/** A rating as the check uses it: null when absent or not a positive finite number. */
const rating = (value: number | null | undefined): number | null =>
  value !== null && value !== undefined && Number.isFinite(value) && value > 0 ? value : null;

/**
 * Demand and ratings of one candidate. A point fails when its shear exceeds the restraint rating
 * or there is none, or when it lifts and the uplift exceeds the uplift rating or there is none.
 * @throws VibrationInputError for an input the calculation refuses (the caller maps it to a 400)
 */
export function restraintFigures(
  problem: SelectionProblem,
  restraint: RestraintInput,
  mounts: readonly RestraintMount[],
): CandidateRestraint {
  const cgHeightM = cgHeightAboveMounts(problem);
  const demand = seismicRestraintDemand({
    points: problem.points,
    verticalStiffnessNPerM: mounts.map((m) => m.verticalStiffnessNPerM),
    horizontalStiffnessNPerM: mounts.map((m) =>
      Number.isNaN(m.horizontalStiffnessNPerM) ? m.verticalStiffnessNPerM : m.horizontalStiffnessNPerM,
    ),
    weightN: problem.weightN,
    cg: { x: problem.cg.x, y: problem.cg.y },
    cgHeightM,
    sdsG: restraint.sdsG,
    importanceFactor: restraint.importanceFactor,
    zOverH: restraint.zOverH,
    ap: restraint.ap,
    rp: restraint.rp,
    snubberGapM: restraint.snubberGapMm === undefined || restraint.snubberGapMm === null ? null : mmToM(restraint.snubberGapMm),
  });
  const ratings = mounts.map((m) => ({ shearCapacityN: rating(m.restraintCapacityN), upliftCapacityN: rating(m.upliftCapacityN) }));
  const check = governingRestraintDemand(demand.perPoint, ratings);
  const perPoint = demand.perPoint.map((d, i) => {
    const u = check.perPoint[i];
    const shearOk = u.shear !== null && u.shear <= 1;
    const tensionOk = d.tensionN <= 0 || (u.tension !== null && u.tension <= 1);
    return {
      label: problem.points[i].label,
      partNumber: mounts[i].partNumber,
      deadLoadN: d.deadLoadN,
      shearN: d.shearN,
      shearDirectionDeg: radToDeg(d.shearDirectionRad),
      tensionN: d.tensionN,
      tensionDirectionDeg: radToDeg(d.tensionDirectionRad),
      compressionN: d.compressionN,
      compressionDirectionDeg: radToDeg(d.compressionDirectionRad),
      restraintCapacityN: ratings[i].shearCapacityN,
      upliftCapacityN: ratings[i].upliftCapacityN,
      shearUtilization: u.shear,
      tensionUtilization: u.tension,
      passes: shearOk && tensionOk,
    };
  });
  const g = check.governing;
  return {
    codeEdition: SEISMIC_CODE_EDITION,
    ap: demand.ap,
    rp: demand.rp,
    fpFormulaN: demand.fpFormulaN,
    fpMinN: demand.fpMinN,
    fpMaxN: demand.fpMaxN,
    fpN: demand.fpN,
    limit: demand.limit,
    doubled: demand.doubled,
    designForceN: demand.designForceN,
    verticalForceN: demand.verticalForceN,
    cgHeightM,
    governing: {
      label: problem.points[g.pointIndex].label,
      kind: g.kind,
      demandN: g.demandN,
      capacityN: g.capacityN,
      utilization: g.utilisation,
      directionDeg: radToDeg(g.directionRad),
    },
    perPoint,
    passes: perPoint.every((p) => p.passes),
  };
}
