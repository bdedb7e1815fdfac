import { requireFinite, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type PlanPoint, requirePlanPoint } from '../geometry/vector.js';
import { type MountLoadWarning, mountLoads, prepareLayout } from '../loads/mount-loads.js';
import { type SeismicForceInput, type SeismicForceResult, seismicDesignForce } from './seismic-design-force.js';

/** The machine on its mounts, as the restraint check sees it. */
export interface RestraintLayoutInput {
  /** Plan positions of the mounts [m], all in one horizontal plane (the mount plane); ≥ 3, not collinear. */
  points: readonly PlanPoint[];
  /** Vertical static stiffness per mount [N/m], > 0: one value for equal mounts, or one per point. */
  verticalStiffnessNPerM: number | readonly number[];
  /** Horizontal static stiffness per mount [N/m], > 0, the same in every horizontal direction: one value or one per point. */
  horizontalStiffnessNPerM: number | readonly number[];
  /** Operating weight D = W_p [N], > 0. */
  weightN: number;
  /** Plan position of the centre of gravity [m]. */
  cg: PlanPoint;
  /** Height of the centre of gravity above the mount plane [m] (negative: below it). */
  cgHeightM: number;
}

/** Input of {@link seismicRestraintDemand}: the layout and the seismic parameters (W_p is `weightN`). */
export interface RestraintDemandInput extends RestraintLayoutInput, Omit<SeismicForceInput, 'weightN'> {}

/**
 * One mount's demands, each the worst over every horizontal direction of the design force, with
 * the direction that produces it. Directions are plan angles from +x towards +y [rad].
 */
export interface RestraintPointDemand {
  /** Dead load D_i on the mount [N] (rigid frame on the vertical stiffnesses; negative = lifts). */
  deadLoadN: number;
  /** Largest horizontal force on the mount [N]. */
  shearN: number;
  /** Direction of the design force giving `shearN`, in [0, π) (the opposite sense gives the same) [rad]. */
  shearDirectionRad: number;
  /** Largest change of vertical reaction from overturning |ΔR_i| [N]. */
  overturningN: number;
  /** Uplift max(0, −(0.9 − 0.2·S_DS)·D_i − ΔR_i), worst direction [N]. */
  tensionN: number;
  /** Direction of the design force giving the least reaction (the most uplift), in [0, 2π) [rad]. */
  tensionDirectionRad: number;
  /** Compression (1.2 + 0.2·S_DS)·D_i + ΔR_i, worst direction [N]. */
  compressionN: number;
  /** Direction of the design force giving `compressionN`, in [0, 2π) [rad]. */
  compressionDirectionRad: number;
}

/** Result of {@link seismicRestraintDemand}. */
export interface RestraintDemandResult extends SeismicForceResult {
  /** Per mount, in the order of `points`. */
  perPoint: RestraintPointDemand[];
  /** Centre of the horizontal stiffnesses [m]: a force through it twists nothing. */
  centreOfStiffness: PlanPoint;
  /** Warnings of the dead-load solution (CG outside the mounts, a mount lifting under dead load). */
  warnings: MountLoadWarning[];
}

/** Forces on each mount for the design force in one direction. */
export interface RestraintDirectionForces {
  /** Horizontal force components and magnitude on each mount [N] (the mount's reaction on the machine is opposite). */
  shearXN: number[];
  shearYN: number[];
  shearN: number[];
  /** Change of vertical reaction from overturning ΔR_i [N], positive = more compression. */
  overturningN: number[];
  /** Uplift max(0, −(0.9 − 0.2·S_DS)·D_i − ΔR_i) [N]. */
  tensionN: number[];
  /** Compression (1.2 + 0.2·S_DS)·D_i + ΔR_i [N]. */
  compressionN: number[];
}

/** The linear unit responses of one layout (force 1 N at the CG in x and in y). */
interface UnitResponses {
  n: number;
  force: SeismicForceResult;
  deadLoadN: number[];
  warnings: MountLoadWarning[];
  /** Per mount, horizontal force for unit F_x: (axx, ayx); for unit F_y: (axy, ayy). */
  axx: Float64Array;
  ayx: Float64Array;
  axy: Float64Array;
  ayy: Float64Array;
  /** Per mount, ΔR for unit F_x (px) and unit F_y (py) [N/N]. */
  px: Float64Array;
  py: Float64Array;
  centreOfStiffness: PlanPoint;
  /** Load factors on D of the strength-level combinations: 0.9 − 0.2·S_DS and 1.2 + 0.2·S_DS. */
  upliftFactor: number;
  compressionFactor: number;
}

function stiffnesses(field: string, value: number | readonly number[], n: number): Float64Array {
  const k = new Float64Array(n);
  if (typeof value === 'number') {
    k.fill(requirePositive(field, value));
  } else {
    if (!Array.isArray(value) || value.length !== n) {
      throw new VibrationInputError(field, `must be one number or ${n} values, one per point`, 'length-mismatch');
    }
    value.forEach((v, i) => (k[i] = requirePositive(`${field}[${i}]`, v)));
  }
  return k;
}

/** docs/engineering/seismic-restraint.md §6–§7. */
function unitResponses(input: RestraintDemandInput): UnitResponses {
  const { n, x, y } = prepareLayout(input.points);
  const kv = stiffnesses('verticalStiffnessNPerM', input.verticalStiffnessNPerM, n);
  const kh = stiffnesses('horizontalStiffnessNPerM', input.horizontalStiffnessNPerM, n);
  const cg = requirePlanPoint('cg', input.cg);
  const h = requireFinite('cgHeightM', input.cgHeightM);
  const force = seismicDesignForce({ ...input, weightN: input.weightN });
  // Dead loads: the rigid frame on the vertical stiffnesses (docs/engineering/mount-loads.md §2).
  const dead = mountLoads({ points: input.points, stiffnessNPerM: Array.from(kv), weightN: input.weightN, cg });

  // Horizontal: translation plus torsion about the centre of the horizontal stiffnesses (§6).
  let kSum = 0;
  let kxSum = 0;
  let kySum = 0;
  for (let i = 0; i < n; i++) {
    kSum += kh[i];
    kxSum += kh[i] * x[i];
    kySum += kh[i] * y[i];
  }
  const xs = kxSum / kSum;
  const ys = kySum / kSum;
  let torsion = 0;
  for (let i = 0; i < n; i++) torsion += kh[i] * ((x[i] - xs) ** 2 + (y[i] - ys) ** 2);
  const ex = cg.x - xs;
  const ey = cg.y - ys;
  const axx = new Float64Array(n);
  const ayx = new Float64Array(n);
  const axy = new Float64Array(n);
  const ayy = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const dx = x[i] - xs;
    const dy = y[i] - ys;
    // unit F_x: u = (1/K, 0), torque −e_y, rotation φ = −e_y/J, mount displacement u − φ·dy, φ·dx
    axx[i] = kh[i] * (1 / kSum + (ey * dy) / torsion);
    ayx[i] = kh[i] * ((-ey * dx) / torsion);
    // unit F_y: u = (0, 1/K), torque +e_x, rotation φ = e_x/J
    axy[i] = kh[i] * ((-ex * dy) / torsion);
    ayy[i] = kh[i] * (1 / kSum + (ex * dx) / torsion);
  }

  // Overturning: the moment h·F on the elastic plane of the vertical stiffnesses (§7).
  let vSum = 0;
  let vxSum = 0;
  let vySum = 0;
  for (let i = 0; i < n; i++) {
    vSum += kv[i];
    vxSum += kv[i] * x[i];
    vySum += kv[i] * y[i];
  }
  const xc = vxSum / vSum;
  const yc = vySum / vSum;
  let kxx = 0;
  let kyy = 0;
  let kxy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - xc;
    const dy = y[i] - yc;
    kxx += kv[i] * dx * dx;
    kyy += kv[i] * dy * dy;
    kxy += kv[i] * dx * dy;
  }
  const det = kxx * kyy - kxy * kxy;
  // unit F_x at height h: Σ ΔR_i·(x_i − x_c) = h, Σ ΔR_i·(y_i − y_c) = 0; unit F_y likewise
  const bxX = (kyy * h) / det;
  const byX = (-kxy * h) / det;
  const bxY = (-kxy * h) / det;
  const byY = (kxx * h) / det;
  const px = new Float64Array(n);
  const py = new Float64Array(n);
  for (let i = 0; i < n; i++) {
    const dx = x[i] - xc;
    const dy = y[i] - yc;
    px[i] = kv[i] * (bxX * dx + byX * dy);
    py[i] = kv[i] * (bxY * dx + byY * dy);
  }
  const sds = input.sdsG;
  return {
    n,
    force,
    deadLoadN: dead.loadsN,
    warnings: dead.warnings,
    axx,
    ayx,
    axy,
    ayy,
    px,
    py,
    centreOfStiffness: { x: xs, y: ys },
    upliftFactor: 0.9 - 0.2 * sds,
    compressionFactor: 1.2 + 0.2 * sds,
  };
}

/** Angle in [0, period). */
function wrap(angle: number, period: number): number {
  const a = angle % period;
  const w = a < 0 ? a + period : a;
  return w >= period ? 0 : w;
}

/**
 * Forces on each mount when the design force acts at the CG in one horizontal direction θ:
 * shear from translation and torsion about the centre of the horizontal stiffnesses, the
 * overturning change of reaction ΔR_i on the elastic plane of the vertical stiffnesses, and the
 * uplift and compression of the strength-level combinations (0.9 − 0.2·S_DS)·D − E_h and
 * (1.2 + 0.2·S_DS)·D + E_h. docs/engineering/seismic-restraint.md §6–§8.
 * @param input layout [m, N/m, N] and seismic parameters
 * @param directionRad θ, plan angle of the force from +x towards +y [rad]
 * @returns per mount [N]
 * @throws VibrationInputError for bad input
 */
export function restraintForcesInDirection(input: RestraintDemandInput, directionRad: number): RestraintDirectionForces {
  requireFinite('directionRad', directionRad);
  const u = unitResponses(input);
  const f = u.force.designForceN;
  const c = Math.cos(directionRad);
  const s = Math.sin(directionRad);
  const out: RestraintDirectionForces = { shearXN: [], shearYN: [], shearN: [], overturningN: [], tensionN: [], compressionN: [] };
  for (let i = 0; i < u.n; i++) {
    const vx = f * (u.axx[i] * c + u.axy[i] * s);
    const vy = f * (u.ayx[i] * c + u.ayy[i] * s);
    const dr = f * (u.px[i] * c + u.py[i] * s);
    out.shearXN.push(vx);
    out.shearYN.push(vy);
    out.shearN.push(Math.hypot(vx, vy));
    out.overturningN.push(dr);
    out.tensionN.push(Math.max(0, -u.upliftFactor * u.deadLoadN[i] - dr));
    out.compressionN.push(u.compressionFactor * u.deadLoadN[i] + dr);
  }
  return out;
}

/**
 * Seismic demand on each restraint, ASCE 7-16 §13.3.1 with the strength-level combinations of
 * §2.3.6/§12.4.2: the design force F (F_p or 2·F_p, {@link seismicDesignForce}) acts at the CG in
 * every horizontal direction, and each mount gets its worst shear, uplift and compression with
 * the direction that produces it. The worst direction is exact, not searched: a mount's shear is
 * F·|A_i·c| for the unit direction c, whose maximum is F times the largest singular value of the
 * 2×2 matrix A_i, reached along its right singular vector; the overturning change of reaction is
 * F·(p_i·c), extreme along ±p_i. docs/engineering/seismic-restraint.md §6–§8.
 * @param input layout [m, N/m, N], S_DS [g], I_p, z/h, a_p, R_p [–], gap [m]
 * @returns the design forces [N] and the per-mount worst demands [N] with their directions [rad]
 * @throws VibrationInputError for bad input (including `too-few-mounts`, `collinear-mounts`)
 */
export function seismicRestraintDemand(input: RestraintDemandInput): RestraintDemandResult {
  const u = unitResponses(input);
  const f = u.force.designForceN;
  const perPoint: RestraintPointDemand[] = [];
  for (let i = 0; i < u.n; i++) {
    // S = AᵀA for A = [[axx, axy], [ayx, ayy]]; largest eigenvalue and its eigenvector angle
    const a = u.axx[i] * u.axx[i] + u.ayx[i] * u.ayx[i];
    const b = u.axx[i] * u.axy[i] + u.ayx[i] * u.ayy[i];
    const d = u.axy[i] * u.axy[i] + u.ayy[i] * u.ayy[i];
    const lambda = (a + d) / 2 + Math.hypot((a - d) / 2, b);
    const shearDirectionRad = wrap(0.5 * Math.atan2(2 * b, a - d), Math.PI);
    const g = Math.hypot(u.px[i], u.py[i]);
    const up = g === 0 ? 0 : Math.atan2(u.py[i], u.px[i]);
    const deadLoadN = u.deadLoadN[i];
    perPoint.push({
      deadLoadN,
      shearN: f * Math.sqrt(lambda),
      shearDirectionRad,
      overturningN: f * g,
      tensionN: Math.max(0, f * g - u.upliftFactor * deadLoadN),
      tensionDirectionRad: wrap(up + Math.PI, 2 * Math.PI),
      compressionN: u.compressionFactor * deadLoadN + f * g,
      compressionDirectionRad: wrap(up, 2 * Math.PI),
    });
  }
  return { ...u.force, perPoint, centreOfStiffness: u.centreOfStiffness, warnings: u.warnings };
}
