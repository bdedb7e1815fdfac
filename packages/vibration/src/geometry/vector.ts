import { requireFinite } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';

/** A point or vector in body axes [m]: x along the skid / shaft, y lateral, z up. */
export interface Vec3 {
  x: number;
  y: number;
  z: number;
}

/** A plan position [m] (x, y in the horizontal mount plane). */
export interface PlanPoint {
  x: number;
  y: number;
}

/** A 3×3 matrix as rows, e.g. a rotation whose columns are a part's axes in body coordinates. */
export type Matrix3 = readonly [readonly [number, number, number], readonly [number, number, number], readonly [number, number, number]];

/** Rotation axis of {@link rotationAboutAxis}. */
export type Axis = 'x' | 'y' | 'z';

/** 3×3 identity. */
export const IDENTITY3: Matrix3 = Object.freeze([
  Object.freeze([1, 0, 0]),
  Object.freeze([0, 1, 0]),
  Object.freeze([0, 0, 1]),
]) as unknown as Matrix3;

/**
 * Right-handed rotation matrix about a body axis, e.g. R_z(45°) for a mount turned in plan.
 * Its columns are the rotated part's axes expressed in body coordinates.
 * @param axis 'x', 'y' or 'z'
 * @param angleRad rotation angle [rad] (use `degToRad` for degrees)
 * @returns R (3×3)
 */
export function rotationAboutAxis(axis: Axis, angleRad: number): Matrix3 {
  requireFinite('angleRad', angleRad);
  const c = Math.cos(angleRad);
  const s = Math.sin(angleRad);
  switch (axis) {
    case 'x':
      return [
        [1, 0, 0],
        [0, c, -s],
        [0, s, c],
      ];
    case 'y':
      return [
        [c, 0, s],
        [0, 1, 0],
        [-s, 0, c],
      ];
    case 'z':
      return [
        [c, -s, 0],
        [s, c, 0],
        [0, 0, 1],
      ];
    default:
      throw new VibrationInputError('axis', "must be 'x', 'y' or 'z'");
  }
}

/** @internal Checks a Vec3. */
export function requireVec3(field: string, v: Vec3 | undefined): Vec3 {
  if (v == null || typeof v !== 'object') throw new VibrationInputError(field, 'must be a point {x, y, z}', 'not-finite');
  requireFinite(`${field}.x`, v.x);
  requireFinite(`${field}.y`, v.y);
  requireFinite(`${field}.z`, v.z);
  return v;
}

/** @internal Checks a plan point. */
export function requirePlanPoint(field: string, v: PlanPoint | undefined): PlanPoint {
  if (v == null || typeof v !== 'object') throw new VibrationInputError(field, 'must be a point {x, y}', 'not-finite');
  requireFinite(`${field}.x`, v.x);
  requireFinite(`${field}.y`, v.y);
  return v;
}

/**
 * @internal Checks that a matrix is a proper rotation (orthonormal, det +1) within 1e-6.
 */
export function requireRotation(field: string, r: Matrix3): Matrix3 {
  if (!Array.isArray(r) || r.length !== 3 || r.some((row) => !Array.isArray(row) || row.length !== 3)) {
    throw new VibrationInputError(field, 'must be a 3×3 matrix', 'length-mismatch');
  }
  for (let i = 0; i < 3; i++) for (let j = 0; j < 3; j++) requireFinite(`${field}[${i}][${j}]`, r[i][j]);
  for (let i = 0; i < 3; i++) {
    for (let j = 0; j < 3; j++) {
      const dot = r[0][i] * r[0][j] + r[1][i] * r[1][j] + r[2][i] * r[2][j];
      if (Math.abs(dot - (i === j ? 1 : 0)) > 1e-6) throw new VibrationInputError(field, 'must be orthonormal (a rotation)');
    }
  }
  const det =
    r[0][0] * (r[1][1] * r[2][2] - r[1][2] * r[2][1]) -
    r[0][1] * (r[1][0] * r[2][2] - r[1][2] * r[2][0]) +
    r[0][2] * (r[1][0] * r[2][1] - r[1][1] * r[2][0]);
  if (det < 0) throw new VibrationInputError(field, 'must be a proper rotation (determinant +1)');
  return r;
}
