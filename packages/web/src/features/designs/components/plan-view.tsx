import { memo, useMemo } from 'react';

import type { Units } from '@/lib/units';
import type { MountPoint } from '@/types/design-api';

import { SourceArrowDef, SourceLegend, SourceMark, type DrawnSource } from './source-marks';

const WIDTH = 560;
const HEIGHT = 380;
/** Room around the drawing for labels and the axes, px. */
const PAD = { left: 40, right: 40, top: 24, bottom: 48 };

export interface PlanViewProps {
  points: readonly MountPoint[];
  /** Live load per point [N] (equal mounts), or null while it cannot be computed. */
  loadsN: readonly number[] | null;
  /** Plan position of the centre of gravity [m], or null. */
  cg: { x: number; y: number } | null;
  /** Points to draw in the warning colour (lift-off). */
  flagged?: ReadonlySet<number>;
  /** Disturbing sources to draw where they act, if any. */
  sources?: readonly DrawnSource[] | null;
  units: Units;
}

/** Seen from above: x to the right, y up the page, z towards the viewer. */
const PLAN_AXES = { x: { dx: 1, dy: 0 }, y: { dx: 0, dy: -1 }, z: null } as const;

interface Frame {
  minX: number;
  maxX: number;
  minY: number;
  maxY: number;
}

/** The bounding rectangle of the points with a margin: 8 % of the larger side, at least 50 mm. */
export function frameOutline(points: readonly { x: number; y: number }[]): Frame {
  const xs = points.map((p) => p.x);
  const ys = points.map((p) => p.y);
  const minX = Math.min(...xs);
  const maxX = Math.max(...xs);
  const minY = Math.min(...ys);
  const maxY = Math.max(...ys);
  const margin = Math.max(0.08 * Math.max(maxX - minX, maxY - minY), 0.05);
  return { minX: minX - margin, maxX: maxX + margin, minY: minY - margin, maxY: maxY + margin };
}

/**
 * A to-scale plan of the mount layout, seen from above (x to the right, y up): the frame
 * outline, every mount point with its label and live load, and the centre of gravity.
 */
export const PlanView = memo(function PlanView({ points, loadsN, cg, flagged, sources, units }: PlanViewProps) {
  const geometry = useMemo(() => {
    if (points.length === 0) return null;
    const frame = frameOutline([...points, ...(cg ? [cg] : []), ...(sources ?? []).map((s) => s.at)]);
    const spanX = frame.maxX - frame.minX;
    const spanY = frame.maxY - frame.minY;
    const scale = Math.min((WIDTH - PAD.left - PAD.right) / spanX, (HEIGHT - PAD.top - PAD.bottom) / spanY);
    // Centre the drawing in the free area.
    const offsetX = PAD.left + (WIDTH - PAD.left - PAD.right - spanX * scale) / 2;
    const offsetY = PAD.top + (HEIGHT - PAD.top - PAD.bottom - spanY * scale) / 2;
    const px = (x: number) => offsetX + (x - frame.minX) * scale;
    const py = (y: number) => offsetY + (frame.maxY - y) * scale;
    return { frame, scale, px, py };
  }, [points, cg, sources]);

  if (!geometry) return null;
  const { frame, px, py } = geometry;
  const originInside = frame.minX <= 0 && frame.maxX >= 0 && frame.minY <= 0 && frame.maxY >= 0;
  const centreX = px((frame.minX + frame.maxX) / 2);
  // Direction arrows in the corner below the drawing, outside the frame.
  const triadX = 18;
  const triadY = HEIGHT - 14;
  const arrow = 30;

  return (
    <figure className="tc-drawing">
      <svg viewBox={`0 0 ${WIDTH} ${HEIGHT}`} role="img" aria-labelledby="tc-plan-title" className="tc-drawing-svg" data-testid="plan-view">
        <title id="tc-plan-title">Plan of the mount points, seen from above</title>
        <defs>
          <marker id="tc-arrow" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto-start-reverse">
            <path d="M 0 0 L 10 5 L 0 10 z" className="tc-drawing-arrowhead" />
          </marker>
          <SourceArrowDef id="tc-plan-source-arrow" />
        </defs>
        <rect
          x={px(frame.minX)}
          y={py(frame.maxY)}
          width={px(frame.maxX) - px(frame.minX)}
          height={py(frame.minY) - py(frame.maxY)}
          className="tc-drawing-frame"
        />
        {originInside ? (
          <g className="tc-drawing-origin" data-testid="plan-origin">
            <line x1={px(0) - 6} y1={py(0)} x2={px(0) + 6} y2={py(0)} />
            <line x1={px(0)} y1={py(0) - 6} x2={px(0)} y2={py(0) + 6} />
          </g>
        ) : null}
        <g className="tc-drawing-axes">
          <line x1={triadX} y1={triadY} x2={triadX + arrow} y2={triadY} markerEnd="url(#tc-arrow)" />
          <line x1={triadX} y1={triadY} x2={triadX} y2={triadY - arrow} markerEnd="url(#tc-arrow)" />
          <text x={triadX + arrow + 4} y={triadY + 4} className="tc-drawing-axis-label">
            x
          </text>
          <text x={triadX} y={triadY - arrow - 5} textAnchor="middle" className="tc-drawing-axis-label">
            y
          </text>
        </g>
        {points.map((point, index) => {
          const load = loadsN?.[index];
          const isFlagged = flagged?.has(index) ?? false;
          // Texts sit beside the point, towards the middle of the frame, clear of its edge.
          const toLeft = px(point.x) > centreX;
          const textX = px(point.x) + (toLeft ? -12 : 12);
          const anchor = toLeft ? 'end' : 'start';
          return (
            <g
              key={`${point.label}-${index}`}
              className={isFlagged ? 'tc-drawing-point is-flagged' : 'tc-drawing-point'}
              data-testid="plan-point"
            >
              <circle cx={px(point.x)} cy={py(point.y)} r={7} />
              <text x={textX} y={py(point.y) - 2} textAnchor={anchor} className="tc-drawing-point-label">
                {point.label}
              </text>
              {load !== undefined ? (
                <text
                  x={textX}
                  y={py(point.y) + 13}
                  textAnchor={anchor}
                  className="tc-drawing-load"
                  data-testid="plan-load"
                  data-load-n={load}
                >
                  {units.format('force', load)}
                </text>
              ) : null}
            </g>
          );
        })}
        {(sources ?? []).map((source, index) => (
          <SourceMark
            key={`${source.label}-${index}`}
            source={source}
            number={index + 1}
            cx={px(source.at.x)}
            cy={py(source.at.y)}
            arrowId="tc-plan-source-arrow"
            screenAxes={PLAN_AXES}
            labelLeft={px(source.at.x) > centreX}
          />
        ))}
        {cg ? (
          <g className="tc-drawing-cg" data-testid="plan-cg">
            <circle cx={px(cg.x)} cy={py(cg.y)} r={9} />
            <path
              d={`M ${px(cg.x)} ${py(cg.y)} L ${px(cg.x) + 9} ${py(cg.y)} A 9 9 0 0 1 ${px(cg.x)} ${py(cg.y) + 9} Z M ${px(cg.x)} ${py(cg.y)} L ${px(cg.x) - 9} ${py(cg.y)} A 9 9 0 0 1 ${px(cg.x)} ${py(cg.y) - 9} Z`}
              className="tc-drawing-cg-fill"
            />
            <text x={px(cg.x) + 13} y={py(cg.y) - 10} className="tc-drawing-cg-label">
              CG
            </text>
          </g>
        ) : null}
        <text x={WIDTH - 12} y={HEIGHT - 12} textAnchor="end" className="tc-drawing-caption">
          + origin · x along the skid · outline {units.format('position', frame.maxX - frame.minX)} ×{' '}
          {units.format('position', frame.maxY - frame.minY)}
        </text>
      </svg>
      <SourceLegend sources={sources ?? []} />
      <figcaption className="tc-visually-hidden">Plan view to scale. Frame outline drawn around the mount points with a margin.</figcaption>
    </figure>
  );
});
