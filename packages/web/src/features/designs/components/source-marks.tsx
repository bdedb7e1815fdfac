import type { OperatingSource, SourceAxis } from '@/types/model2-api';

/** What a drawing needs of a source: where it acts, its kind and axis. */
export type DrawnSource = Pick<OperatingSource, 'label' | 'kind' | 'at' | 'axis'>;

const HALF = 7;

/**
 * One source drawn at (cx, cy): a diamond, with a ring around it for a rotating unbalance whose
 * plane is the drawing's plane (its shaft along the line of sight) and a short arrow along the
 * axis otherwise. `screenAxes` maps the design's axes to the drawing's directions (px per unit
 * along +x and +y of the screen; null when the axis points out of the drawing).
 */
export function SourceMark({
  source,
  cx,
  cy,
  screenAxes,
  labelLeft,
  arrowId,
  number,
}: {
  source: DrawnSource;
  /** The source's number in the legend (1-based). */
  number: number;
  cx: number;
  cy: number;
  screenAxes: Record<SourceAxis, { dx: number; dy: number } | null>;
  labelLeft: boolean;
  /** Id of this drawing's SourceArrowDef. */
  arrowId: string;
}) {
  const direction = screenAxes[source.axis];
  const arrow = 20;
  return (
    <g className={`tc-drawing-source tc-drawing-source--${source.kind}`} data-testid="drawn-source">
      {direction ? (
        <line
          x1={cx - direction.dx * arrow}
          y1={cy - direction.dy * arrow}
          x2={cx + direction.dx * arrow}
          y2={cy + direction.dy * arrow}
          className="tc-drawing-source-axis"
          markerEnd={source.kind === 'force' ? `url(#${arrowId})` : undefined}
        />
      ) : source.kind === 'unbalance' ? (
        <circle cx={cx} cy={cy} r={HALF + 5} className="tc-drawing-source-ring" />
      ) : null}
      <path d={`M ${cx} ${cy - HALF} L ${cx + HALF} ${cy} L ${cx} ${cy + HALF} L ${cx - HALF} ${cy} Z`} />
      <text x={cx + (labelLeft ? -10 : 10)} y={cy - 8} textAnchor={labelLeft ? 'end' : 'start'} className="tc-drawing-source-label">
        {number}
        <title>{source.label}</title>
      </text>
    </g>
  );
}

/** The arrowhead for a force's line of action (one per drawing's <defs>). */
export function SourceArrowDef({ id }: { id: string }) {
  return (
    <marker id={id} viewBox="0 0 10 10" refX="9" refY="5" markerWidth="6" markerHeight="6" orient="auto-start-reverse">
      <path d="M 0 0 L 10 5 L 0 10 z" className="tc-drawing-source-arrowhead" />
    </marker>
  );
}

/** The sources' names under a drawing, numbered as on it. */
export function SourceLegend({ sources }: { sources: readonly DrawnSource[] }) {
  if (sources.length === 0) return null;
  return (
    <ol className="tc-source-legend" aria-label="Sources on the drawing">
      {sources.map((source, index) => (
        <li key={`${source.label}-${index}`}>
          {source.label} ({source.kind === 'unbalance' ? `unbalance, shaft along ${source.axis}` : `force along ${source.axis}`})
        </li>
      ))}
    </ol>
  );
}
