import type { InertiaTensor, RigidBodyDof } from '@tacet/vibration';
import type { Criteria, Vec3 } from './dto/design-input.dto.js';

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
  staticDeflectionMm: number;
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
  passes: boolean;
  /** Why it fails, in words a user understands (empty when it passes). */
  reasons: string[];
  /** Assumptions and remarks that do not fail the candidate. */
  notes: string[];
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
  dynamicStiffnessRatio: number;
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
}
