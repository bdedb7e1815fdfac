import { formatMeasure, SEISMIC_CODE_EDITION, SEISMIC_RESTRAINT_CAUTION, toDisplay, unitLabel, type UnitSystem } from '@tacet/vibration';
import type { RestraintInput } from '../selection/dto/restraint.dto.js';
import type { CandidateRestraint } from '../selection/selection.types.js';

/**
 * The seismic restraint section of the calculation report (docs/engineering/seismic-restraint.md):
 * the code edition, the input, the design force and how it was found, the assumptions, the demand
 * on every mount point against its ratings, the governing check and direction, and the caution.
 * Plain text lines; the report lays them out. (The report fonts lack ≤, ζ and √: none are used.)
 */
export interface RestraintReportLines {
  heading: string;
  paragraphs: string[];
}

const pct = (value: number) => `${Math.round(value * 100)} %`;
const deg = (value: number) => `${Math.round(value)}°`;
const num = (value: number, digits: number) => value.toFixed(digits);

const LIMIT_TEXT: Record<CandidateRestraint['limit'], string> = {
  formula: 'the formula governs',
  minimum: 'the lower limit 0.3·S_DS·I_p·W_p governs',
  maximum: 'the upper limit 1.6·S_DS·I_p·W_p governs',
};

/** The assumptions the figures rest on, as the report states them. */
export const RESTRAINT_ASSUMPTIONS: readonly string[] = [
  'The machine is a rigid body on its mounts; the mounts stand in one horizontal plane (taken at the mean height of the mount points).',
  'The design force acts at the centre of gravity in every horizontal direction; each mount is given its worst direction (found exactly, not by steps).',
  'Horizontal forces are shared in proportion to the mounts’ horizontal static stiffnesses, with the twist about their centre of stiffness; where the catalog gives no horizontal stiffness it is taken equal to the vertical.',
  'Overturning (the design force times the height of the centre of gravity above the mount plane) is carried by the mounts’ vertical static stiffnesses as a rigid plane.',
  'Uplift and compression follow the strength-level combinations 0.9·D − E_v + E_h and 1.2·D + E_v + E_h with E_v = 0.2·S_DS·D.',
  'Catalog restraint ratings are strength-level capacities; a mount without a rating, or whose rating is exceeded, does not pass.',
];

/** The lines of the section; `restraint` is the design's input, `figures` the chosen candidate's (when computed). */
export function restraintReportLines(
  restraint: RestraintInput,
  figures: CandidateRestraint | undefined,
  units: UnitSystem = 'SI',
): RestraintReportLines {
  /** A force in the reader's units, whole, grouped: "8,826 N" / "1,984 lbf". */
  const n = (value: number) => `${Math.round(toDisplay('force', value, units)).toLocaleString('en-US')} ${unitLabel('force', units)}`;
  const paragraphs: string[] = [];
  paragraphs.push(
    `Checked to ${SEISMIC_CODE_EDITION} §13.3.1 (nonstructural components), with the coefficients of Table 13.6-1 for vibration-isolated components unless stated.`,
  );
  paragraphs.push(
    `Input: S_DS = ${num(restraint.sdsG, 3)} g, I_p = ${num(restraint.importanceFactor, 1)}, z/h = ${num(restraint.zOverH, 2)}, ` +
      `a_p = ${num(restraint.ap ?? figures?.ap ?? 2.5, 2)}, R_p = ${num(restraint.rp ?? figures?.rp ?? 2, 2)}, ` +
      `gap to the restraints ${restraint.snubberGapMm === undefined || restraint.snubberGapMm === null ? 'not specified' : formatMeasure('deflection', restraint.snubberGapMm / 1000, units, units === 'SI' ? 1 : 3)}.`,
  );
  if (!figures) {
    paragraphs.push(
      'The chosen mounts were evaluated without the restraint check: run the selection again and choose the mounts to record the figures.',
    );
    paragraphs.push(SEISMIC_RESTRAINT_CAUTION);
    return { heading: `Seismic restraint (${SEISMIC_CODE_EDITION})`, paragraphs };
  }
  paragraphs.push(
    `F_p = 0.4·a_p·S_DS·W_p·(1 + 2·z/h)/(R_p/I_p) = ${n(figures.fpFormulaN)}; limits ${n(figures.fpMinN)} to ${n(figures.fpMaxN)}; ` +
      `${LIMIT_TEXT[figures.limit]}: F_p = ${n(figures.fpN)}.`,
  );
  paragraphs.push(
    figures.doubled
      ? `The gap to the restraints exceeds 0.25 in (6.35 mm) or is not specified: the design force is 2·F_p = ${n(figures.designForceN)} (Table 13.6-1, footnote).`
      : `The gap to the restraints is at most 0.25 in (6.35 mm): the design force is F_p = ${n(figures.designForceN)}.`,
  );
  paragraphs.push(
    `Vertical effect E_v = 0.2·S_DS·D = ${n(figures.verticalForceN)}; height of the centre of gravity above the mount plane ${formatMeasure('position', figures.cgHeightM, units)}.`,
  );
  paragraphs.push('Assumptions:');
  for (const assumption of RESTRAINT_ASSUMPTIONS) paragraphs.push(`• ${assumption}`);
  paragraphs.push('Demand on each mount point (worst direction; angles of the design force from the x axis towards y):');
  for (const p of figures.perPoint) {
    const shear =
      p.restraintCapacityN === null
        ? `no horizontal restraint rating`
        : `rating ${n(p.restraintCapacityN)}, ${pct(p.shearUtilization ?? 0)}`;
    const uplift =
      p.tensionN <= 0
        ? 'no uplift'
        : p.upliftCapacityN === null
          ? `uplift ${n(p.tensionN)} at ${deg(p.tensionDirectionDeg)}, no uplift rating`
          : `uplift ${n(p.tensionN)} at ${deg(p.tensionDirectionDeg)} (rating ${n(p.upliftCapacityN)}, ${pct(p.tensionUtilization ?? 0)})`;
    paragraphs.push(
      `${p.label} (${p.partNumber}): shear ${n(p.shearN)} at ${deg(p.shearDirectionDeg)} (${shear}); ${uplift}; ` +
        `compression ${n(p.compressionN)}; dead load ${n(p.deadLoadN)} — ${p.passes ? 'within the ratings' : 'NOT within the ratings'}.`,
    );
  }
  const g = figures.governing;
  const what = g.kind === 'shear' ? 'horizontal restraint' : 'uplift';
  paragraphs.push(
    `Governing: ${what} at point ${g.label}, ${n(g.demandN)}` +
      `${g.capacityN === null ? ' (no rating)' : ` against ${n(g.capacityN)} (${pct(g.utilization ?? 0)})`}, ` +
      `with the design force at ${deg(g.directionDeg)} from the x axis.`,
  );
  paragraphs.push(figures.passes ? 'Result: every restraint is within its ratings.' : 'Result: the restraint check is NOT met.');
  paragraphs.push(SEISMIC_RESTRAINT_CAUTION);
  return { heading: `Seismic restraint (${SEISMIC_CODE_EDITION})`, paragraphs };
}
