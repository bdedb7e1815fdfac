import { requireNonNegative } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import type { RestraintPointDemand } from './restraint-demand.js';

/** A mount's restraint ratings (strength level) [N]; null where the catalog gives none. */
export interface RestraintRating {
  /** Horizontal (shear) capacity of the restraint [N]. */
  shearCapacityN: number | null;
  /** Uplift (tension) capacity [N]. */
  upliftCapacityN: number | null;
}

/** Demand over rating of one mount's checks; null where the rating is missing (or, for tension, there is no uplift). */
export interface RestraintPointUtilisation {
  shear: number | null;
  tension: number | null;
}

/** The check that governs a layout and the direction of the design force that produces it. */
export interface GoverningRestraintDemand {
  /** Index of the mount point. */
  pointIndex: number;
  /** Horizontal restraint (shear) or uplift (tension). */
  kind: 'shear' | 'tension';
  /** Demand [N]. */
  demandN: number;
  /** Rating [N], null when the catalog gives none. */
  capacityN: number | null;
  /** demand / rating [–], null without a rating. */
  utilisation: number | null;
  /** Plan direction of the design force that produces the demand [rad], from +x towards +y. */
  directionRad: number;
}

/** Result of {@link governingRestraintDemand}. */
export interface RestraintCheck {
  perPoint: RestraintPointUtilisation[];
  governing: GoverningRestraintDemand;
}

function ratio(field: string, demandN: number, capacityN: number | null): number | null {
  if (capacityN == null) return null;
  requireNonNegative(field, capacityN);
  if (capacityN === 0) return demandN > 0 ? Number.POSITIVE_INFINITY : 0;
  return demandN / capacityN;
}

/**
 * Compares each mount's worst shear and uplift with its ratings and names the governing check:
 * the largest demand/rating among the rated checks (uplift only where there is uplift); when no
 * check has a rating, the largest shear. docs/engineering/seismic-restraint.md §9.
 * @param perPoint demands from `seismicRestraintDemand` [N]
 * @param ratings one per point [N], in the same order
 * @returns utilisations per point [–] and the governing check with its direction [rad]
 * @throws VibrationInputError `length-mismatch`, `empty`, or a negative rating
 */
export function governingRestraintDemand(perPoint: readonly RestraintPointDemand[], ratings: readonly RestraintRating[]): RestraintCheck {
  if (!Array.isArray(perPoint) || perPoint.length === 0) throw new VibrationInputError('perPoint', 'must not be empty', 'empty');
  if (!Array.isArray(ratings) || ratings.length !== perPoint.length) {
    throw new VibrationInputError('ratings', `must have ${perPoint.length} entries, one per point`, 'length-mismatch');
  }
  const utilisations = perPoint.map((p, i) => ({
    shear: ratio(`ratings[${i}].shearCapacityN`, p.shearN, ratings[i].shearCapacityN),
    tension: p.tensionN > 0 ? ratio(`ratings[${i}].upliftCapacityN`, p.tensionN, ratings[i].upliftCapacityN) : null,
  }));
  let governing: GoverningRestraintDemand | null = null;
  perPoint.forEach((p, i) => {
    const u = utilisations[i];
    if (u.shear !== null && (governing === null || u.shear > (governing.utilisation ?? -1))) {
      governing = {
        pointIndex: i,
        kind: 'shear',
        demandN: p.shearN,
        capacityN: ratings[i].shearCapacityN,
        utilisation: u.shear,
        directionRad: p.shearDirectionRad,
      };
    }
    if (u.tension !== null && (governing === null || u.tension > (governing.utilisation ?? -1))) {
      governing = {
        pointIndex: i,
        kind: 'tension',
        demandN: p.tensionN,
        capacityN: ratings[i].upliftCapacityN,
        utilisation: u.tension,
        directionRad: p.tensionDirectionRad,
      };
    }
  });
  if (governing === null) {
    let best = 0;
    perPoint.forEach((p, i) => {
      if (p.shearN > perPoint[best].shearN) best = i;
    });
    governing = {
      pointIndex: best,
      kind: 'shear',
      demandN: perPoint[best].shearN,
      capacityN: null,
      utilisation: null,
      directionRad: perPoint[best].shearDirectionRad,
    };
  }
  return { perPoint: utilisations, governing };
}
