import type { InertiaTensor, RigidBodyDof } from '@tacet/vibration';
import type { Criteria, OperatingConditions, Vec3 } from './dto/design-input.dto.js';

/** A mount point's share of a candidate (in the order of the request's mount points). */
export interface CandidatePoint {
  label: string;
  mountId: number;
  partNumber: string;
  /** Static load, N. */
  loadN: number;
  /** Load / rated load, without the weight margin: what the lower utilisation check compares with minUtilization. */
  utilization: number;
  /**
   * Load × (1 + weightMarginPct/100) / rated load: what the upper utilisation check compares with
   * maxUtilization (equal to `utilization` without a margin). Absent on candidates stored before it was given.
   */
  utilizationWithMargin?: number;
  /** The mount's own static deflection, mm. */
  staticDeflectionMm: number;
  /** The deflection of the flexible support under the point, mm (only where `supportStiffnessNPerMm` is given). */
  supportDeflectionMm?: number;
}

/** Isolation at one disturbing frequency (in the order of the frequencies). */
export interface CandidateIsolation {
  frequencyHz: number;
  transmissibility: number;
  efficiencyPct: number;
  dB: number;
}

export interface CandidateMode {
  frequencyHz: number;
  dominant: RigidBodyDof;
  coupled: boolean;
  /** Share of the mode's kinetic energy in each coordinate (sums to 1). */
  energyFractions: Record<RigidBodyDof, number>;
}

/** One mount point's seismic demand against its ratings (restraint-figures.ts; N, degrees). */
export interface RestraintPoint {
  label: string;
  partNumber: string;
  deadLoadN: number;
  shearN: number;
  shearDirectionDeg: number;
  tensionN: number;
  tensionDirectionDeg: number;
  compressionN: number;
  compressionDirectionDeg: number;
  restraintCapacityN: number | null;
  upliftCapacityN: number | null;
  shearUtilization: number | null;
  tensionUtilization: number | null;
  passes: boolean;
}

/** The seismic restraint figures of a candidate (ASCE 7-16 §13.3.1; docs/engineering/seismic-restraint.md). */
export interface CandidateRestraint {
  codeEdition: string;
  ap: number;
  rp: number;
  fpFormulaN: number;
  fpMinN: number;
  fpMaxN: number;
  fpN: number;
  limit: 'formula' | 'minimum' | 'maximum';
  doubled: boolean;
  designForceN: number;
  verticalForceN: number;
  cgHeightM: number;
  governing: {
    label: string;
    kind: 'shear' | 'tension';
    demandN: number;
    capacityN: number | null;
    utilization: number | null;
    directionDeg: number;
  };
  perPoint: RestraintPoint[];
  passes: boolean;
}

/** A source order crossing a rigid-body mode inside the running range (docs/engineering/selection.md §20). */
export interface CandidateCrossing {
  /** The mode's motion, e.g. "pitch" or "roll + sway (mixed)". */
  mode: string;
  modeFrequencyHz: number;
  /** The source's label. */
  source: string;
  /** Index of the source in the resolved list (internal; not in the answer). */
  sourceIndex?: number;
  order: number;
  speedRpm: number;
}

/** A rigid-body mode passed through below the running range on start-up and coast-down (docs/engineering/start-up-passage.md §1). */
export interface CandidatePassage {
  /** The mode's motion, named as the crossings name it. */
  mode: string;
  modeFrequencyHz: number;
  /** n = 60·f/order of the unbalance that crosses it, below the lowest running speed, rpm. */
  speedRpm: number;
  /** Steady peak motion at the mounts there: the largest over the mounts and the unbalance sources at that speed, mm. */
  motionMm: number;
}

/** The whole-machine response of one source at one speed, at the governing stiffness factor. */
export interface WholeMachinePerFrequency {
  source: string;
  frequencyHz: number;
  /** Null for a fixed-frequency source when the input gives no speed. */
  speedRpm: number | null;
  transmissibility: number;
  /** The source's amplitude there, N (1 for the default vertical force: the forces are then per newton). */
  amplitudeN: number;
  /** Peak dynamic force through each mount, N. */
  perPoint: { label: string; forceN: number }[];
}

/** The whole-machine verdict's figures (docs/engineering/selection.md §19–§21). */
export interface CandidateWholeMachine {
  worst: {
    transmissibility: number;
    efficiencyPct: number;
    frequencyHz: number;
    speedRpm: number | null;
    /** The source's label. */
    source: string;
    /** The stiffness factor that governed (1 − tol, 1 or 1 + tol). */
    stiffnessFactor: number;
  };
  /** The stiffness band applied, ± % (the criteria's, or the default of the mount type). */
  stiffnessTolerancePct: number;
  perFrequency: WholeMachinePerFrequency[];
}

/** The candidate in the second mass case (components' `altMassKg`; docs/engineering/selection.md §18). */
export interface CandidateAltMassCase {
  massKg: number;
  cg: Vec3;
  /** Bounce estimate with the second mass, Hz. */
  verticalNaturalFrequencyHz: number;
  perPoint: { label: string; loadN: number; utilization: number; staticDeflectionMm: number }[];
  /** Bounce estimate of the isolation at the disturbing frequencies with the second mass. */
  isolation: { frequencyHz: number; transmissibility: number; efficiencyPct: number }[];
  /** The whole-machine verdict's worst point with the second mass (absent when the model cannot be built). */
  wholeMachineWorst?: CandidateWholeMachine['worst'];
  passes: boolean;
}

/** Weighted score terms; they add up to `score` (see scoring.ts). */
export interface ScoreTerms {
  isolation: number;
  utilization: number;
  level: number;
  price: number;
  leadTime: number;
}

/**
 * One way to carry the machine: one part number at every point (`uniform`), or one series with
 * the size picked per point so that the skid sits level (`series`).
 */
export interface Candidate {
  kind: 'uniform' | 'series';
  mountId?: number;
  /** `${supplierId}:${series}` */
  seriesId?: string;
  label: string;
  supplier: { id: number; name: string };
  perPoint: CandidatePoint[];
  /**
   * The allowance on the weight the checks applied, %: the upper utilisation and deflection
   * checks compare utilisation × (1 + weightMarginPct/100).
   */
  weightMarginPct: number;
  /** Uncoupled bounce estimate √(Σ n_d·k_v / m)/2π, Hz. */
  verticalNaturalFrequencyHz: number;
  isolation: CandidateIsolation[];
  /** Transmissibility at resonance (start-up / coast-down). */
  resonanceAmplification: number;
  levelErrorMm: number;
  totalPrice: number | null;
  currency: string;
  maxLeadTimeDays: number | null;
  /** The six coupled rigid-body modes, where computed (the best candidates). */
  modes?: CandidateMode[];
  /** Seismic restraint figures, when the input asks for restraint. */
  restraint?: CandidateRestraint;
  /** The whole-machine verdict's figures (absent when the model cannot be built: the inertia is unknown). */
  wholeMachine?: CandidateWholeMachine;
  /** Crossings of the source orders with the modes inside the running range, lowest speed first. */
  crossings?: CandidateCrossing[];
  /** The second mass case, when a component gives `altMassKg`: its figures (the verdict covers it). */
  altMassCase?: CandidateAltMassCase;
  /** Modes passed through below the running range on start-up, lowest speed first (with the whole-machine verdict; [] when nothing is passed). */
  passage?: CandidatePassage[];
  /** The largest motion the passage is checked against, mm (the criteria's or the default). */
  passageLimitMm?: number;
  /** Follows the whole-machine verdict in both mass cases (with the load, deflection, mode, passage and restraint checks). */
  passes: boolean;
  /** Why it fails, in words a user understands (empty when it passes). */
  reasons: string[];
  /** Remarks and warnings that do not fail the candidate. */
  notes: string[];
  /**
   * Every value that did not come from the catalog or the input, with the value used (the
   * unfavourable one for the check it feeds; docs/engineering/selection.md §14). Absent in
   * candidates chosen before it was kept.
   */
  assumptions?: string[];
  score: number;
  scoreTerms: ScoreTerms;
}

export interface SelectionResult {
  /** Passing candidates best first, then failing ones best first. */
  candidates: Candidate[];
  /** Number of candidates evaluated. */
  considered: number;
  /** Server-side time, ms. */
  elapsedMs: number;
  totalMassKg: number;
  cg: Vec3;
  /** Loads with equal stiffness at every point (the first guess), N. */
  pointLoadsN: number[];
  disturbingFrequenciesHz: number[];
}

/** `POST /api/selection/curves`: transmissibility against speed per source of one candidate (docs/engineering/selection.md §22). */
export interface SelectionCurves {
  candidate: { kind: 'uniform' | 'series'; mountId?: number; seriesId?: string; label: string; passes: boolean };
  /** Running range, rpm (min = max at a fixed speed); null when only fixed frequencies force the machine. */
  speedRangeRpm: { min: number; max: number } | null;
  skipBandsRpm: { min: number; max: number }[];
  /** The isolation requirement and the transmissibility it allows. */
  requirement: { minIsolationPct: number; transmissibility: number };
  stiffnessTolerancePct: number;
  /** Modes at the nominal stiffness. */
  modes: { frequencyHz: number; dominant: string; coupled: boolean }[];
  crossings: CandidateCrossing[];
  worst: CandidateWholeMachine['worst'] | null;
  sources: {
    label: string;
    order: number | null;
    fixedFrequencyHz: number | null;
    speedRpm: number[];
    frequencyHz: number[];
    transmissibility: number[];
    softEnd: number[] | null;
    stiffEnd: number[] | null;
  }[];
}

/** A disturbing frequency with where it comes from. */
export interface LabelledFrequency {
  frequencyHz: number;
  label: string;
}

/** One line of a design's bill of materials (one part number). */
export interface BomLine {
  supplier: { id: number; name: string };
  partNumber: string;
  mountId: number;
  quantity: number;
  /** Labels of the mount points that get this part. */
  mountPoints: string[];
  unitPrice: number | null;
  extendedPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
}

/** A catalog mount as it was when the design's candidate was chosen (Mount JSON fields). */
export interface MountSnapshot {
  id: number;
  supplier: { id: number; name: string };
  partNumber: string;
  series: string | null;
  mountType: string;
  ratedLoadN: number;
  verticalStiffnessNPerM: number;
  horizontalStiffnessNPerM: number | null;
  /** Null: the catalog gives none. */
  dynamicStiffnessRatio: number | null;
  dampingModel: 'viscous' | 'hysteretic';
  dampingRatio: number | null;
  lossFactor: number | null;
  maxDeflectionMm: number | null;
  tempMinC: number | null;
  tempMaxC: number | null;
  heightMm: number | null;
  /** Absent in snapshots taken before the restraint ratings existed. */
  restraintCapacityN?: number | null;
  upliftCapacityN?: number | null;
  unitPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
  updatedAt: string;
}

/** Everything a released design must keep even if the catalog changes later. */
export interface DesignSnapshot {
  takenAt: string;
  mounts: MountSnapshot[];
  candidate: Candidate;
  massProperties: { massKg: number; weightN: number; cg: Vec3; inertia: InertiaTensor };
  pointLoadsN: number[];
  disturbingFrequencies: LabelledFrequency[];
  criteria: Criteria;
  /**
   * The operating conditions the verdict was computed for (sources, speeds, skip bands, motor
   * poles), frozen with it. Absent in snapshots taken before the whole-machine verdict.
   */
  operating?: OperatingConditions;
  /** The whole-machine figures frozen at the choice: the sweep's worst point, the crossings and the verdict (absent before it existed, or when the inertia is unknown). */
  wholeMachine?: {
    worst: CandidateWholeMachine['worst'];
    stiffnessTolerancePct: number;
    crossings: CandidateCrossing[];
    passes: boolean;
    reasons: string[];
    /** Transmissibility against speed per source (the report's chart). */
    curves: SelectionCurves['sources'];
    speedRangeRpm: { min: number; max: number } | null;
    skipBandsRpm: { min: number; max: number }[];
    requirementTransmissibility: number;
    /** The start-up passage and its limit, mm (absent in snapshots taken before it existed). */
    passage?: CandidatePassage[];
    passageLimitMm?: number;
  };
}
