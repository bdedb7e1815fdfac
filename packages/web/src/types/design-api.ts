/**
 * Shapes of the projects, designs and selection API as the web reads and sends them (SI units:
 * kg, m, N, Hz, °C; a name carries its unit where it is not SI base). They mirror the server's
 * contract in one place for every feature; replace them with types generated from the server's
 * OpenAPI document once that script exists.
 */

export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

export interface PersonRef {
  id: number;
  name: string;
}

export interface SupplierRef {
  id: number;
  name: string;
}

// ---- Projects ----

export interface Project {
  id: number;
  name: string;
  site: string | null;
  client: string | null;
  description: string | null;
  owner: PersonRef;
  archived: boolean;
  designCount: number;
  createdAt: string;
  updatedAt: string;
}

export interface CreateProjectInput {
  name: string;
  site?: string;
  client?: string;
  description?: string;
}

// ---- Design input ----

/** One part of the supported assembly. CG in m; optional box dimensions (m) or own inertia (kg·m²). */
export interface DesignComponent {
  name: string;
  massKg: number;
  cg: Vec3;
  box?: { lx: number; ly: number; lz: number };
  inertia?: { ixx: number; iyy: number; izz: number; ixy?: number; ixz?: number; iyz?: number };
}

/** A mount position in m; z is the height of the mount's elastic centre. */
export interface MountPoint {
  label: string;
  x: number;
  y: number;
  z: number;
}

export interface OperatingConditions {
  speedRpm?: number;
  speedRangeRpm?: { min: number; max: number };
  orders: number[];
  vaneCount?: number;
  lineFrequencyHz?: number;
  extraFrequenciesHz?: number[];
}

/** Mount kinds of the catalog. */
export const MOUNT_TYPES = [
  'elastomer_pad',
  'elastomer_mount',
  'open_spring',
  'housed_spring',
  'restrained_spring',
  'air_spring',
  'wire_rope',
] as const;

export type MountType = (typeof MOUNT_TYPES)[number];

export interface Criteria {
  minIsolationPct: number;
  /** Lowest load / rated load at any point (fraction). */
  minUtilization: number;
  /** Highest load / rated load at any point (fraction). */
  maxUtilization: number;
  ambientTempC?: number;
  mountTypes?: string[];
  supplierIds?: number[];
  weightMarginPct?: number;
}

export interface DesignInput {
  components: DesignComponent[];
  mountPoints: MountPoint[];
  operating: OperatingConditions;
  criteria: Criteria;
}

// ---- Selection ----

export type ModeName = 'surge' | 'sway' | 'bounce' | 'roll' | 'pitch' | 'yaw';

export interface CandidatePoint {
  label: string;
  mountId: number;
  partNumber: string;
  loadN: number;
  utilization: number;
  staticDeflectionMm: number;
}

export interface CandidateIsolation {
  frequencyHz: number;
  transmissibility: number;
  efficiencyPct: number;
  dB: number;
}

/**
 * Damping of a candidate's mounts, if the server sends it (not in the first contract; when
 * absent the web reads it from the catalog mount).
 */
export type CandidateDamping =
  | { model: 'viscous'; dampingRatio: number }
  | { model: 'hysteretic'; lossFactor: number };

export interface Candidate {
  kind: 'uniform' | 'series';
  mountId?: number;
  /** `${supplierId}:${series}` */
  seriesId?: string;
  label: string;
  supplier: SupplierRef;
  perPoint: CandidatePoint[];
  /** Uncoupled bounce estimate √(Σk_dyn/m)/2π [Hz]. */
  verticalNaturalFrequencyHz: number;
  /** In the order of the disturbing frequencies. */
  isolation: CandidateIsolation[];
  resonanceAmplification: number;
  levelErrorMm: number;
  totalPrice: number | null;
  currency: string;
  maxLeadTimeDays: number | null;
  modes?: { frequencyHz: number; dominant: ModeName; coupled: boolean }[];
  passes: boolean;
  /** Why it fails, in words (empty when it passes). */
  reasons: string[];
  /** Assumptions and remarks that do not fail the candidate. */
  notes?: string[];
  score: number;
  scoreTerms: { isolation: number; utilization: number; level: number; price: number; leadTime: number };
  damping?: CandidateDamping;
}

export interface SelectionResult {
  candidates: Candidate[];
  considered: number;
  elapsedMs: number;
  totalMassKg: number;
  cg: Vec3;
  /** Equal-stiffness first guess, in the order of the mount points. */
  pointLoadsN: number[];
  disturbingFrequenciesHz: number[];
}

// ---- Designs ----

export const DESIGN_STATUSES = ['draft', 'in_review', 'released', 'superseded'] as const;

export type DesignStatus = (typeof DESIGN_STATUSES)[number];

export interface DesignListItem {
  id: number;
  name: string;
  revision: number;
  status: DesignStatus;
  updatedAt: string;
  author: PersonRef;
}

export interface BomLine {
  supplier: SupplierRef;
  partNumber: string;
  mountId: number;
  quantity: number;
  mountPoints: string[];
  unitPrice: number | null;
  extendedPrice: number | null;
  currency: string;
  leadTimeDays: number | null;
}

export interface Design {
  id: number;
  projectId: number;
  projectName: string;
  name: string;
  revision: number;
  status: DesignStatus;
  version: number;
  input: DesignInput;
  disturbingFrequencies: { frequencyHz: number; label: string }[];
  chosen: Candidate | null;
  bom: BomLine[];
  author: PersonRef;
  checker: PersonRef | null;
  createdAt: string;
  updatedAt: string;
}

export interface UpdateDesignInput {
  version: number;
  name?: string;
  input?: DesignInput;
  chosenMountId?: number;
  chosenSeriesId?: string;
}
