import { memo, useMemo } from 'react';

import type { Units } from '@/lib/units';
import type { DesignComponent, MountPoint, Vec3 } from '@/types/design-api';

import { SourceArrowDef, SourceLegend, SourceMark, type DrawnSource } from './source-marks';

const WIDTH = 560;
const HEIGHT = 300;
const PAD = { left: 56, right: 170, top: 30, bottom: 60 };
/** Drawn size of a mount symbol, px (a symbol, not to scale). */
const MOUNT_HALF_HEIGHT = 12;

export interface SideElevationProps {
  points: readonly MountPoint[];
  cg: Vec3 | null;
  components?: readonly DesignComponent[] | null;
  /** Disturbing sources to draw where they act, if any. */
  sources?: readonly DrawnSource[] | null;
  units: Units;
}

/** Looking along +y: x to the right, z up the page, y away from the viewer. */
const SIDE_AXES = { x: { dx: 1, dy: 0 }, y: null, z: { dx: 0, dy: -1 } } as const;

/** Height of the mount plane: the mean height of the mounts' elastic centres [m]. */
export function mountPlaneHeight(points: readonly MountPoint[]): number {
  return points.reduce((sum, p) => sum + p.z, 0) / points.length;
}

function springPath(x: number, yTop: number, yBottom: number): string {
  const turns = 4;
  const step = (yBottom - yTop) / (turns * 2);
  let d = `M ${x} ${yTop}`;
  for (let i = 0; i < turns * 2; i++) d += ` L ${x + (i % 2 === 0 ? 6 : -6)} ${yTop + step * (i + 0.5)}`;
  return `${d} L ${x} ${yBottom}`;
}

/**
 * A to-scale side elevation seen looking along +y (x to the right, z up): the mounts, the mount
 * plane, the centre of gravity and its height above the plane, and each component's CG.
 */
export const SideElevation = memo(function SideElevation({ points, cg, components, sources, units }: SideElevationProps) {
  const geometry = useMemo(() => {
    if (points.length === 0) return null;
    const plane = mountPlaneHeight(points);
    const at = (sources ?? []).map((s) => s.at);
    const xs = [...points.map((p) => p.x), ...(cg ? [cg.x] : []), ...(components ?? []).map((c) => c.cg.x), ...at.map((a) => a.x)];
    const zs = [...points.map((p) => p.z), ...(cg ? [cg.z] : []), ...(components ?? []).map((c) => c.cg.z), ...at.map((a) => a.z)];
    const minX = Math.min(...xs);
    const maxX = Math.max(...xs);
    const minZ = Math.min(...zs);
    const maxZ = Math.max(...zs);
    const margin = Math.max(0.08 * Math.max(maxX - minX, maxZ - minZ), 0.05);
    const frame = { minX: minX - margin, maxX: maxX + margin, minZ: minZ - margin, maxZ: maxZ + margin };
    const spanX = frame.maxX - frame.minX;
    const spanZ = frame.maxZ - frame.minZ;
    const scale = Math.min((WIDTH - PAD.left - PAD.right) / spanX, (HEIGHT - PAD.top - PAD.bottom) / spanZ);
    const offsetX = PAD.left + (WIDTH - PAD.left - PAD.right - spanX * scale) / 2;
    const offsetY = PAD.top + (HEIGHT - PAD.top - PAD.bottom - spanZ * scale) / 2;
    const px = (x: number) => offsetX + (x - frame.minX) * scale;
    const py = (z: number) => offsetY + (frame.maxZ - z) * scale;
    return { plane, frame, px, py };
  }, [points, cg, components, sources]);

  if (!geometry) return null;
  const { plane, frame, px, py } = geometry;
  const planeY = py(plane);
  const left = px(frame.minX);
  const right = px(frame.maxX);
  const groundY = Math.max(...points.map((p) => py(p.z))) + MOUNT_HALF_HEIGHT;
  const heightAbovePlane = cg ? cg.z - plane : null;
  const dimensionX = right + 84;

  return (
    <figure className="tc-drawing">
      <svg
        viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
        role="img"
        aria-labelledby="tc-side-title"
        className="tc-drawing-svg"
        data-testid="side-elevation"
      >
        <title id="tc-side-title">Side elevation, looking along +y</title>
        <defs>
          <marker id="tc-dim-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
            <path d="M 0 0 L 10 5 L 0 10 z" className="tc-drawing-arrowhead" />
          </marker>
          <SourceArrowDef id="tc-side-source-arrow" />
        </defs>
        <line x1={left} y1={groundY} x2={right} y2={groundY} className="tc-drawing-ground" />
        {points.map((p, index) => (
          <path
            key={`${p.label}-${index}`}
            d={springPath(px(p.x), py(p.z) - MOUNT_HALF_HEIGHT, py(p.z) + MOUNT_HALF_HEIGHT)}
            className="tc-drawing-spring"
          />
        ))}
        <line x1={left} y1={planeY} x2={right} y2={planeY} className="tc-drawing-plane" />
        <text x={right + 6} y={planeY + 4} className="tc-drawing-caption">
          mount plane
        </text>
        {(components ?? []).map((c, index) => (
          <g key={`${c.name}-${index}`} className="tc-drawing-component">
            <circle cx={px(c.cg.x)} cy={py(c.cg.z)} r={3.5} />
            <text x={px(c.cg.x) + 6} y={py(c.cg.z) - 6}>
              {c.name}
            </text>
          </g>
        ))}
        {(sources ?? []).map((source, index) => (
          <SourceMark
            key={`${source.label}-${index}`}
            source={source}
            number={index + 1}
            cx={px(source.at.x)}
            cy={py(source.at.z)}
            arrowId="tc-side-source-arrow"
            screenAxes={SIDE_AXES}
            labelLeft={px(source.at.x) > (left + right) / 2}
          />
        ))}
        {cg && heightAbovePlane !== null ? (
          <>
            <g className="tc-drawing-cg" data-testid="side-cg">
              <circle cx={px(cg.x)} cy={py(cg.z)} r={9} />
              <path
                d={`M ${px(cg.x)} ${py(cg.z)} L ${px(cg.x) + 9} ${py(cg.z)} A 9 9 0 0 1 ${px(cg.x)} ${py(cg.z) + 9} Z M ${px(cg.x)} ${py(cg.z)} L ${px(cg.x) - 9} ${py(cg.z)} A 9 9 0 0 1 ${px(cg.x)} ${py(cg.z) - 9} Z`}
                className="tc-drawing-cg-fill"
              />
              <text x={px(cg.x) + 13} y={py(cg.z) - 10} className="tc-drawing-cg-label">
                CG
              </text>
            </g>
            <line x1={px(cg.x) + 10} y1={py(cg.z)} x2={dimensionX + 6} y2={py(cg.z)} className="tc-drawing-extension" />
            <line
              x1={dimensionX}
              y1={planeY}
              x2={dimensionX}
              y2={py(cg.z)}
              className="tc-drawing-dimension"
              markerStart="url(#tc-dim-arrow)"
              markerEnd="url(#tc-dim-arrow)"
            />
            <text x={dimensionX + 8} y={(planeY + py(cg.z)) / 2} className="tc-drawing-dimension-label" data-testid="cg-height">
              <tspan x={dimensionX + 8}>{units.format('position', heightAbovePlane, units.system === 'SI' ? 3 : 2)}</tspan>
              <tspan x={dimensionX + 8} dy="1.3em" className="tc-drawing-caption">
                CG above the
              </tspan>
              <tspan x={dimensionX + 8} dy="1.2em" className="tc-drawing-caption">
                mount plane
              </tspan>
            </text>
          </>
        ) : null}
        <g className="tc-drawing-axes">
          <line x1={PAD.left - 30} y1={HEIGHT - 22} x2={PAD.left + 14} y2={HEIGHT - 22} markerEnd="url(#tc-dim-arrow)" />
          <line x1={PAD.left - 30} y1={HEIGHT - 22} x2={PAD.left - 30} y2={HEIGHT - 66} markerEnd="url(#tc-dim-arrow)" />
          <text x={PAD.left + 18} y={HEIGHT - 18} className="tc-drawing-axis-label">
            x
          </text>
          <text x={PAD.left - 30} y={HEIGHT - 72} textAnchor="middle" className="tc-drawing-axis-label">
            z
          </text>
        </g>
      </svg>
      <SourceLegend sources={sources ?? []} />
    </figure>
  );
});
