export { type Axis, type Matrix3, type PlanPoint, type Vec3, IDENTITY3, rotationAboutAxis } from './vector.js';
export * from './convex-hull.js';
