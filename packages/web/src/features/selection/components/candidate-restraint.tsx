import { HTMLTable, Tag } from '@blueprintjs/core';
import { SEISMIC_RESTRAINT_CAUTION } from '@tacet/vibration';
import { useMemo } from 'react';

import { formatNumber, useUnits, type Units } from '@/lib/units';
import type { CandidateRestraint } from '@/types/design-api';

import './candidate-restraint.css';

/** Mount points and centre of gravity in plan [m], for the arrow of the governing direction. */
export interface RestraintPlanLayout {
  points: readonly { label: string; x: number; y: number }[];
  cg: { x: number; y: number };
}

const KIND_WORDS = { shear: 'horizontal restraint', tension: 'uplift' } as const;
const LIMIT_WORDS = { formula: 'from the formula', minimum: 'lower limit governs', maximum: 'upper limit governs' } as const;

const WIDTH = 360;
const HEIGHT = 260;
const PAD = 36;

function percent(value: number | null): string {
  return value === null ? '—' : `${formatNumber(value * 100, 0)} %`;
}

function degrees(value: number): string {
  return `${formatNumber(value, 0)}°`;
}

/**
 * The plan seen from above (x right, y up): mount points, the centre of gravity and an arrow
 * from it in the direction of the design force that governs the check.
 */
export function RestraintPlan({ layout, restraint }: { layout: RestraintPlanLayout; restraint: CandidateRestraint }) {
  const geometry = useMemo(() => {
    const all = [...layout.points, layout.cg];
    const xs = all.map((p) => p.x);
    const ys = all.map((p) => p.y);
    const minX = Math.min(...xs);
    const maxX = Math.max(...xs);
    const minY = Math.min(...ys);
    const maxY = Math.max(...ys);
    const span = Math.max(maxX - minX, maxY - minY, 0.1);
    const scale = Math.min((WIDTH - 2 * PAD) / Math.max(maxX - minX, span * 0.2), (HEIGHT - 2 * PAD) / Math.max(maxY - minY, span * 0.2));
    const cx = (minX + maxX) / 2;
    const cy = (minY + maxY) / 2;
    return {
      px: (x: number) => WIDTH / 2 + (x - cx) * scale,
      py: (y: number) => HEIGHT / 2 - (y - cy) * scale,
    };
  }, [layout]);
  const { px, py } = geometry;
  // The outline joins the points around their centroid (input order may cross over itself).
  const outline = useMemo(() => {
    const cx = layout.points.reduce((sum, p) => sum + p.x, 0) / layout.points.length;
    const cy = layout.points.reduce((sum, p) => sum + p.y, 0) / layout.points.length;
    return [...layout.points].sort((a, b) => Math.atan2(a.y - cy, a.x - cx) - Math.atan2(b.y - cy, b.x - cx));
  }, [layout]);
  const theta = (restraint.governing.directionDeg * Math.PI) / 180;
  const length = Math.min(WIDTH, HEIGHT) * 0.32;
  const x0 = px(layout.cg.x);
  const y0 = py(layout.cg.y);
  const x1 = x0 + length * Math.cos(theta);
  const y1 = y0 - length * Math.sin(theta);
  const governingLabel = restraint.governing.label;
  return (
    <svg
      viewBox={`0 0 ${WIDTH} ${HEIGHT}`}
      className="tc-restraint-plan"
      role="img"
      aria-label={`Plan: the design force at ${degrees(restraint.governing.directionDeg)} from the x axis governs, at point ${governingLabel}`}
    >
      <defs>
        <marker id="tc-restraint-arrowhead" viewBox="0 0 10 10" refX="9" refY="5" markerWidth="7" markerHeight="7" orient="auto">
          <path d="M0,0 L10,5 L0,10 z" className="tc-restraint-arrowhead" />
        </marker>
      </defs>
      <polygon points={outline.map((p) => `${px(p.x)},${py(p.y)}`).join(' ')} className="tc-restraint-outline" />
      {layout.points.map((p) => (
        <g key={p.label} data-governing={p.label === governingLabel ? 'true' : undefined}>
          {p.label === governingLabel ? <circle cx={px(p.x)} cy={py(p.y)} r={11} className="tc-restraint-governing" /> : null}
          <circle cx={px(p.x)} cy={py(p.y)} r={5} className="tc-restraint-point" />
          <text x={px(p.x) + 9} y={py(p.y) - 9} className="tc-restraint-label">
            {p.label}
          </text>
        </g>
      ))}
      <line
        x1={x0}
        y1={y0}
        x2={x1}
        y2={y1}
        className="tc-restraint-arrow"
        markerEnd="url(#tc-restraint-arrowhead)"
        data-testid="restraint-arrow"
      />
      <circle cx={x0} cy={y0} r={4} className="tc-restraint-cg" />
      <text x={x0 + 8} y={y0 + 16} className="tc-restraint-label tc-muted">
        CG
      </text>
      <text
        x={x1 + (Math.cos(theta) >= 0 ? 6 : -6)}
        y={y1 - 6}
        textAnchor={Math.cos(theta) >= 0 ? 'start' : 'end'}
        className="tc-restraint-label"
      >
        {degrees(restraint.governing.directionDeg)}
      </text>
      <g className="tc-restraint-axes" transform={`translate(${12}, ${HEIGHT - 12})`}>
        <line x1={0} y1={0} x2={24} y2={0} />
        <line x1={0} y1={0} x2={0} y2={-24} />
        <text x={27} y={4}>
          x
        </text>
        <text x={-3} y={-28}>
          y
        </text>
      </g>
    </svg>
  );
}

function RestraintTable({ restraint, units }: { restraint: CandidateRestraint; units: Units }) {
  /** A rating with the share of it used, or why there is none. */
  const rated = (capacityN: number | null, utilization: number | null, demandN: number) => {
    if (capacityN === null) return <span className={demandN > 0 ? 'tc-text-danger' : 'tc-muted'}>none</span>;
    const over = utilization !== null && utilization > 1;
    return (
      <>
        {units.format('force', capacityN)}
        {demandN > 0 ? <span className={over ? 'tc-text-danger' : 'tc-muted'}> · {percent(utilization)}</span> : null}
      </>
    );
  };
  return (
    <div className="tc-table-scroll">
      <HTMLTable compact striped className="tc-table" aria-label="Restraint demand per point">
        <thead>
          <tr>
            <th scope="col">Point</th>
            <th scope="col">Part number</th>
            <th scope="col">Verdict</th>
            <th scope="col" className="tc-number">
              Horizontal force
            </th>
            <th scope="col" className="tc-number">
              Restraint rating · use
            </th>
            <th scope="col" className="tc-number">
              Uplift
            </th>
            <th scope="col" className="tc-number">
              Uplift rating · use
            </th>
            <th scope="col" className="tc-number">
              Compression
            </th>
          </tr>
        </thead>
        <tbody>
          {restraint.perPoint.map((p) => (
            <tr key={p.label}>
              <td>{p.label}</td>
              <td className="tc-nowrap">{p.partNumber}</td>
              <td>
                {p.passes ? (
                  <Tag minimal intent="success">
                    within rating
                  </Tag>
                ) : (
                  <Tag minimal intent="danger">
                    {p.restraintCapacityN === null || (p.tensionN > 0 && p.upliftCapacityN === null) ? 'no rating' : 'over rating'}
                  </Tag>
                )}
              </td>
              <td className="tc-number" title={`worst with the force at ${degrees(p.shearDirectionDeg)}`}>
                {units.format('force', p.shearN)}
              </td>
              <td className="tc-number">{rated(p.restraintCapacityN, p.shearUtilization, p.shearN)}</td>
              <td className="tc-number" title={p.tensionN > 0 ? `worst with the force at ${degrees(p.tensionDirectionDeg)}` : undefined}>
                {p.tensionN > 0 ? units.format('force', p.tensionN) : <span className="tc-muted">none</span>}
              </td>
              <td className="tc-number">{rated(p.upliftCapacityN, p.tensionUtilization, p.tensionN)}</td>
              <td className="tc-number" title={`worst with the force at ${degrees(p.compressionDirectionDeg)}`}>
                {units.format('force', p.compressionN)}
              </td>
            </tr>
          ))}
        </tbody>
      </HTMLTable>
    </div>
  );
}

/** A candidate's seismic restraint: the force, the governing check with its direction on a plan, and each point's demand against its ratings. */
export function CandidateRestraintSection({ restraint, layout }: { restraint: CandidateRestraint; layout: RestraintPlanLayout | null }) {
  const units = useUnits();
  const g = restraint.governing;
  return (
    <section className="tc-candidate-restraint" aria-label="Seismic restraint">
      <h4 className="tc-subsection-title">Seismic restraint ({restraint.codeEdition} §13.3.1)</h4>
      <div className="tc-restraint-summary">
        <dl className="tc-facts tc-facts--grid" aria-label="Seismic figures">
          <dt>F_p</dt>
          <dd>
            {units.format('force', restraint.fpN)} ({LIMIT_WORDS[restraint.limit]})
          </dd>
          <dt>Design force on the restraints</dt>
          <dd data-testid="candidate-design-force">
            {units.format('force', restraint.designForceN)}
            {restraint.doubled ? ' (2·F_p: gap above 0.25 in or not given)' : ''}
          </dd>
          <dt>Vertical effect E_v</dt>
          <dd>{units.format('force', restraint.verticalForceN)}</dd>
          <dt>Governs</dt>
          <dd data-testid="restraint-governing">
            {KIND_WORDS[g.kind]} at point {g.label}: {units.format('force', g.demandN)}
            {g.capacityN === null ? ', no rating' : ` of ${units.format('force', g.capacityN)} (${percent(g.utilization)})`}, force at{' '}
            {degrees(g.directionDeg)} from x
          </dd>
          <dt>Verdict</dt>
          <dd>
            {restraint.passes ? (
              <Tag intent="success">Restraints within their ratings</Tag>
            ) : (
              <Tag intent="danger">Restraint check not met</Tag>
            )}
          </dd>
        </dl>
        {layout ? <RestraintPlan layout={layout} restraint={restraint} /> : null}
      </div>
      <RestraintTable restraint={restraint} units={units} />
      <p className="tc-muted tc-note">
        Each figure is the worst over every horizontal direction of the design force (hover a figure for its direction); uplift and
        compression include the vertical effect (0.9·D − E_v and 1.2·D + E_v, strength level). Ratings are the catalog’s, at strength level.
      </p>
      <p className="tc-muted tc-note">{SEISMIC_RESTRAINT_CAUTION}</p>
    </section>
  );
}
