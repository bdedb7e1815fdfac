import { requireFinite, requireNonEmpty, requireNonNegative, requirePositive } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { type Axis, type Matrix3, type Vec3, requireRotation, requireVec3 } from '../geometry/vector.js';
import { STANDARD_GRAVITY } from '../units/constants.js';

/**
 * Inertia tensor [kg·m²] in body axes. Diagonal entries are moments of inertia; off-diagonal
 * entries follow the tensor convention, i.e. `xy` = −∫x·y dm (so J_xy = −Σ m·x·y).
 */
export interface InertiaTensor {
  xx: number;
  yy: number;
  zz: number;
  xy: number;
  xz: number;
  yz: number;
}

interface ComponentBase {
  /** Free text, e.g. "pump". */
  name?: string;
  /** Operating mass [kg] (with liquid, insulation...), > 0. */
  massKg: number;
  /** Position of the component's own centre of gravity in body axes [m]. */
  cg: Vec3;
  /**
   * Inertia tensor about the component's own CG in the component's axes [kg·m²]. When given it
   * replaces the value the shape would give (use it for motors and pumps from data sheets).
   */
  ownInertia?: InertiaTensor;
  /** Rotation whose columns are the component's axes in body coordinates (default: aligned). */
  orientation?: Matrix3;
}

/** A lumped mass (no own inertia unless `ownInertia` is given). */
export interface PointMassComponent extends ComponentBase {
  shape?: 'point';
}

/** A uniform solid box with edge lengths along its own axes [m]. */
export interface BoxComponent extends ComponentBase {
  shape: 'box';
  /** Edge lengths L_x, L_y, L_z [m], ≥ 0. */
  dimensions: Vec3;
}

/** A uniform solid cylinder. */
export interface CylinderComponent extends ComponentBase {
  shape: 'cylinder';
  /** Radius R [m], ≥ 0. */
  radius: number;
  /** Length L [m], ≥ 0. */
  length: number;
  /** Component axis along the cylinder's length. */
  axis: Axis;
}

/** One part of the supported assembly (pump, motor, base frame, inertia base...). */
export type AssemblyComponent = PointMassComponent | BoxComponent | CylinderComponent;

/** Mass, weight, centre of gravity and inertia tensor about the CG of an assembly. */
export interface MassProperties {
  /** Total mass m [kg]. */
  massKg: number;
  /** Weight W = m·g_n [N]. */
  weightN: number;
  /** Combined centre of gravity r_G [m]. */
  cg: Vec3;
  /** Inertia tensor about the combined CG, body axes [kg·m²]. */
  inertia: InertiaTensor;
}

type M3 = number[][];

/**
 * Inertia tensor of a uniform box about its own CG: J_c = (m/12)·diag(L_y²+L_z², L_x²+L_z², L_x²+L_y²).
 * @param massKg m [kg]
 * @param dimensions edge lengths [m]
 * @returns J_c [kg·m²]
 */
export function boxInertia(massKg: number, dimensions: Vec3): InertiaTensor {
  requirePositive('massKg', massKg);
  const { x, y, z } = dimensions;
  [x, y, z].forEach((v, i) => requireNonNegative(`dimensions.${'xyz'[i]}`, v));
  const f = massKg / 12;
  return { xx: f * (y * y + z * z), yy: f * (x * x + z * z), zz: f * (x * x + y * y), xy: 0, xz: 0, yz: 0 };
}

/**
 * Inertia tensor of a uniform solid cylinder about its own CG: m·R²/2 about its axis and
 * m·(3R² + L²)/12 about the transverse axes.
 * @param massKg m [kg]
 * @param radius R [m]
 * @param length L [m]
 * @param axis axis along the length
 * @returns J_c [kg·m²]
 */
export function cylinderInertia(massKg: number, radius: number, length: number, axis: Axis): InertiaTensor {
  requirePositive('massKg', massKg);
  requireNonNegative('radius', radius);
  requireNonNegative('length', length);
  const axial = (massKg * radius * radius) / 2;
  const transverse = (massKg * (3 * radius * radius + length * length)) / 12;
  if (axis === 'x') return { xx: axial, yy: transverse, zz: transverse, xy: 0, xz: 0, yz: 0 };
  if (axis === 'y') return { xx: transverse, yy: axial, zz: transverse, xy: 0, xz: 0, yz: 0 };
  if (axis === 'z') return { xx: transverse, yy: transverse, zz: axial, xy: 0, xz: 0, yz: 0 };
  throw new VibrationInputError('axis', "must be 'x', 'y' or 'z'");
}

/** Inertia tensor [kg·m²] → 3×3 matrix (rows) [kg·m²]. */
export function inertiaToMatrix(j: InertiaTensor): number[][] {
  return [
    [j.xx, j.xy, j.xz],
    [j.xy, j.yy, j.yz],
    [j.xz, j.yz, j.zz],
  ];
}

function requireInertia(field: string, j: InertiaTensor): InertiaTensor {
  for (const key of ['xx', 'yy', 'zz', 'xy', 'xz', 'yz'] as const) requireFinite(`${field}.${key}`, j[key]);
  for (const key of ['xx', 'yy', 'zz'] as const) requireNonNegative(`${field}.${key}`, j[key]);
  return j;
}

function rotate(j: M3, r: Matrix3): M3 {
  // R·J·Rᵀ
  const out: M3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  for (let a = 0; a < 3; a++) {
    for (let b = 0; b < 3; b++) {
      let s = 0;
      for (let p = 0; p < 3; p++) for (let q = 0; q < 3; q++) s += r[a][p] * j[p][q] * r[b][q];
      out[a][b] = s;
    }
  }
  return out;
}

function ownInertia(c: AssemblyComponent, field: string): InertiaTensor | undefined {
  if (c.ownInertia) return requireInertia(`${field}.ownInertia`, c.ownInertia);
  const shape = c.shape ?? 'point';
  if (shape === 'point') return undefined;
  if (shape === 'box') {
    const b = c as BoxComponent;
    requireVec3(`${field}.dimensions`, b.dimensions);
    return boxInertia(c.massKg, b.dimensions);
  }
  if (shape === 'cylinder') {
    const cy = c as CylinderComponent;
    requireNonNegative(`${field}.radius`, cy.radius);
    requireNonNegative(`${field}.length`, cy.length);
    return cylinderInertia(c.massKg, cy.radius, cy.length, cy.axis);
  }
  throw new VibrationInputError(`${field}.shape`, "must be 'point', 'box' or 'cylinder'");
}

/**
 * Total mass, weight, combined centre of gravity and inertia tensor about the CG of an assembly
 * of components (parallel-axis theorem):
 * m = Σm_j, r_G = Σ m_j·r_j/m, J_G = Σ [R_j·J_j·R_jᵀ + m_j·(|d_j|²·I − d_j·d_jᵀ)], d_j = r_j − r_G.
 * Use operating masses (liquid in the casing, inertia base...).
 * @param components parts with mass [kg], CG [m] and optional shape or own inertia
 * @returns mass [kg], weight [N], CG [m], inertia about the CG [kg·m²]
 */
export function massProperties(components: readonly AssemblyComponent[]): MassProperties {
  requireNonEmpty('components', components);
  let m = 0;
  let sx = 0;
  let sy = 0;
  let sz = 0;
  components.forEach((c, i) => {
    const mj = requirePositive(`components[${i}].massKg`, c.massKg);
    const p = requireVec3(`components[${i}].cg`, c.cg);
    m += mj;
    sx += mj * p.x;
    sy += mj * p.y;
    sz += mj * p.z;
  });
  const cg = { x: sx / m, y: sy / m, z: sz / m };
  const j: M3 = [
    [0, 0, 0],
    [0, 0, 0],
    [0, 0, 0],
  ];
  components.forEach((c, i) => {
    const field = `components[${i}]`;
    const own = ownInertia(c, field);
    if (own) {
      let jc = inertiaToMatrix(own);
      if (c.orientation) jc = rotate(jc, requireRotation(`${field}.orientation`, c.orientation));
      for (let a = 0; a < 3; a++) for (let b = 0; b < 3; b++) j[a][b] += jc[a][b];
    }
    const d = [c.cg.x - cg.x, c.cg.y - cg.y, c.cg.z - cg.z];
    const d2 = d[0] * d[0] + d[1] * d[1] + d[2] * d[2];
    for (let a = 0; a < 3; a++) {
      for (let b = 0; b < 3; b++) j[a][b] += c.massKg * ((a === b ? d2 : 0) - d[a] * d[b]);
    }
  });
  return {
    massKg: m,
    weightN: m * STANDARD_GRAVITY,
    cg,
    inertia: { xx: j[0][0], yy: j[1][1], zz: j[2][2], xy: j[0][1], xz: j[0][2], yz: j[1][2] },
  };
}
