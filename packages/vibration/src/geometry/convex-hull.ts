import { type PlanPoint } from './vector.js';

const cross = (o: PlanPoint, a: PlanPoint, b: PlanPoint): number => (a.x - o.x) * (b.y - o.y) - (a.y - o.y) * (b.x - o.x);

/**
 * Convex hull of plan points (Andrew's monotone chain), counter-clockwise, without collinear
 * points on the edges.
 * @param points plan positions [m]
 * @returns indices into `points` of the hull vertices
 */
export function convexHull(points: readonly PlanPoint[]): number[] {
  const idx = points.map((_, i) => i).sort((a, b) => points[a].x - points[b].x || points[a].y - points[b].y);
  if (idx.length < 3) return idx;
  const lower: number[] = [];
  for (const i of idx) {
    while (lower.length >= 2 && cross(points[lower[lower.length - 2]], points[lower[lower.length - 1]], points[i]) <= 0) lower.pop();
    lower.push(i);
  }
  const upper: number[] = [];
  for (let k = idx.length - 1; k >= 0; k--) {
    const i = idx[k];
    while (upper.length >= 2 && cross(points[upper[upper.length - 2]], points[upper[upper.length - 1]], points[i]) <= 0) upper.pop();
    upper.push(i);
  }
  lower.pop();
  upper.pop();
  return lower.concat(upper);
}

/**
 * Whether a plan point lies strictly inside the convex hull of `points`. A point on an edge
 * (within `tolerance` [m]) counts as not inside.
 * @param point plan position [m]
 * @param points polygon vertices (any order) [m]
 * @param tolerance distance [m] treated as "on the edge"
 */
export function isInsideConvexHull(point: PlanPoint, points: readonly PlanPoint[], tolerance = 1e-9): boolean {
  const hull = convexHull(points);
  if (hull.length < 3) return false;
  for (let k = 0; k < hull.length; k++) {
    const a = points[hull[k]];
    const b = points[hull[(k + 1) % hull.length]];
    const len = Math.hypot(b.x - a.x, b.y - a.y);
    // signed distance of the point to the left of edge a→b (hull is counter-clockwise)
    if (cross(a, b, point) / len <= tolerance) return false;
  }
  return true;
}
