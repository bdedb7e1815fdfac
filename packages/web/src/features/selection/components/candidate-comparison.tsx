import { Button, Spinner } from '@blueprintjs/core';
import { CrossIcon } from '@blueprintjs/icons';
import { RESULT_LABELS } from '@tacet/vibration';
import { lazy, Suspense, useMemo, type ReactNode } from 'react';

import { SERIES_COLORS } from '@/components/charts/chart-style';
import type { FrequencyMarker, TransmissibilityCurve } from '@/components/charts/transmissibility-chart';
import { useUnits } from '@/lib/units';
import type { Candidate } from '@/types/design-api';
import type { Model2Candidate } from '@/types/model2-api';

import { useCandidatesDamping } from '../hooks/use-candidate-damping';
import {
  candidateKey,
  formatDays,
  formatFrequency,
  formatMoney,
  formatPct,
  formatRatio,
  formatUtilizationRange,
  KIND_LABELS,
  shortLabel,
  utilizationRange,
  worstIsolationPct,
} from './candidate-format';
import type { DisturbingFrequencyLine } from './candidate-detail';
import { VerdictTag } from './candidates-table';
import { modeMotionText } from './mode-format';

const TransmissibilityChart = lazy(() =>
  import('@/components/charts/transmissibility-chart').then((m) => ({ default: m.TransmissibilityChart })),
);

export interface ComparedCandidate {
  rank: number;
  candidate: Candidate;
}

export interface CandidateComparisonProps {
  /** Two to four candidates, in the order they were ticked. */
  compared: readonly ComparedCandidate[];
  frequencies: readonly DisturbingFrequencyLine[] | null;
  targetTransmissibility: number | null;
  onOpen: (key: string) => void;
  onRemove: (key: string) => void;
  onClose: () => void;
}

interface FigureRow {
  label: ReactNode;
  /** The figure per candidate, for display. */
  cells: ReactNode[];
  /** The figure per candidate for finding the best one (NaN = none), and which way is better. */
  values?: number[];
  better?: 'high' | 'low';
  /** The rounding the cells show (default: none). */
  round?: (v: number) => number;
}

/** Rounding to what a row shows, so that figures that read the same are not told apart. */
const toDecimals = (decimals: number) => (v: number) => Math.round(v * 10 ** decimals) / 10 ** decimals;
const toSignificant = (digits: number) => (v: number) => (Number.isFinite(v) && v !== 0 ? Number(v.toPrecision(digits)) : v);

/**
 * Indices of the best value(s) of a row, compared as shown (`round`); none when fewer than two
 * candidates have one or all read the same.
 */
export function bestOf(values: readonly number[], better: 'high' | 'low', round: (v: number) => number = (v) => v): Set<number> {
  const finite = values.map((v, i) => ({ v: round(v), i })).filter((x) => Number.isFinite(x.v));
  if (finite.length < 2) return new Set();
  const target = better === 'high' ? Math.max(...finite.map((x) => x.v)) : Math.min(...finite.map((x) => x.v));
  const best = finite.filter((x) => Math.abs(x.v - target) <= 1e-9 * Math.max(1, Math.abs(target))).map((x) => x.i);
  return best.length === finite.length ? new Set() : new Set(best);
}

function RemarkList({ items, empty }: { items: readonly string[]; empty: string }) {
  if (items.length === 0) return <span className="tc-muted">{empty}</span>;
  return (
    <ul className="tc-compare-list">
      {items.map((item) => (
        <li key={item}>{item}</li>
      ))}
    </ul>
  );
}

/**
 * Two to four candidates side by side: their figures in one table (the best of each row in
 * bold), the reasons and notes, and their transmissibility curves drawn over each other.
 */
export function CandidateComparison({
  compared,
  frequencies,
  targetTransmissibility,
  onOpen,
  onRemove,
  onClose,
}: CandidateComparisonProps) {
  const units = useUnits();
  const candidates = useMemo(() => compared.map((c) => c.candidate), [compared]);
  const damping = useCandidatesDamping(candidates);
  // With the whole-machine verdict the per-frequency figures are the bounce estimate: say so.
  const estimate = candidates.some((c) => (c as Candidate & Model2Candidate).wholeMachine !== undefined);

  const isolationRows = useMemo<FigureRow[]>(() => {
    const byFrequency = (candidates[0]?.isolation ?? []).map((row, j) => {
      const label = frequencies?.find((f) => Math.abs(f.frequencyHz - row.frequencyHz) <= 1e-6 * row.frequencyHz)?.label;
      const values = candidates.map((c) => c.isolation[j]?.efficiencyPct ?? NaN);
      return {
        label: (
          <>
            {estimate ? 'Bounce estimate' : 'Isolation'} at {formatFrequency(row.frequencyHz)}
            {label ? <span className="tc-cell-note">{label}</span> : null}
          </>
        ),
        cells: values.map(formatPct),
        values,
        better: 'high' as const,
        round: toDecimals(1),
      };
    });
    return byFrequency;
  }, [candidates, frequencies, estimate]);

  const rows: FigureRow[] = [
    { label: 'Result', cells: candidates.map((c) => <VerdictTag key="v" passes={c.passes} />) },
    {
      label: estimate ? 'Isolation, whole machine' : 'Isolation, lowest',
      cells: candidates.map((c) => formatPct(worstIsolationPct(c))),
      values: candidates.map(worstIsolationPct),
      better: 'high',
      round: toDecimals(1),
    },
    ...isolationRows,
    {
      label: 'Natural frequency, vertical',
      cells: candidates.map((c) => formatFrequency(c.verticalNaturalFrequencyHz)),
      values: candidates.map((c) => c.verticalNaturalFrequencyHz),
      better: 'low',
      round: toSignificant(3),
    },
    {
      label: RESULT_LABELS.resonance,
      cells: candidates.map((c) => formatRatio(c.resonanceAmplification)),
      values: candidates.map((c) => c.resonanceAmplification),
      better: 'low',
      round: toDecimals(2),
    },
    {
      label: 'Utilisation (as checked)',
      cells: candidates.map(formatUtilizationRange),
      values: candidates.map((c) => utilizationRange(c)[1]),
    },
    {
      label: 'Level error',
      cells: candidates.map((c) => units.measure('deflection', c.levelErrorMm / 1000)),
      values: candidates.map((c) => c.levelErrorMm),
      better: 'low',
      round: toSignificant(3),
    },
    {
      label: 'Price, all points',
      cells: candidates.map((c) => formatMoney(c.totalPrice, c.currency)),
      // prices in different currencies are not compared
      values: new Set(candidates.map((c) => c.currency)).size === 1 ? candidates.map((c) => c.totalPrice ?? NaN) : undefined,
      better: 'low',
      round: toDecimals(0),
    },
    {
      label: 'Longest lead time',
      cells: candidates.map((c) => formatDays(c.maxLeadTimeDays)),
      values: candidates.map((c) => c.maxLeadTimeDays ?? NaN),
      better: 'low',
    },
    {
      label: 'Rigid-body modes',
      cells: candidates.map((c) =>
        c.modes?.length ? (
          <>
            {formatFrequency(Math.min(...c.modes.map((m) => m.frequencyHz)))} –{' '}
            {formatFrequency(Math.max(...c.modes.map((m) => m.frequencyHz)))}
            <span className="tc-cell-note">
              {(() => {
                const mixed = c.modes.filter((m) => modeMotionText(m).mixed).length;
                return mixed === 0 ? 'none mixed' : `${mixed} mixed`;
              })()}
            </span>
          </>
        ) : (
          <span className="tc-muted">not computed</span>
        ),
      ),
    },
    {
      label: RESULT_LABELS.checksNotMet,
      cells: candidates.map((c) => <RemarkList key="r" items={c.reasons} empty={c.passes ? 'Meets every requirement' : '—'} />),
    },
    { label: 'Notes', cells: candidates.map((c) => <RemarkList key="n" items={c.notes ?? []} empty="None" />) },
  ];

  const curves = useMemo<TransmissibilityCurve[]>(
    () =>
      candidates.map((c, i) => ({
        key: candidateKey(c),
        naturalFrequencyHz: c.verticalNaturalFrequencyHz,
        damping: damping[i]?.damping,
        color: SERIES_COLORS[i % SERIES_COLORS.length]!,
      })),
    [candidates, damping],
  );
  const markers = useMemo<FrequencyMarker[]>(
    () => (frequencies ?? []).map((f) => ({ frequencyHz: f.frequencyHz, label: shortLabel(f.label), governing: f.governing })),
    [frequencies],
  );
  const loading = damping.some((d) => d.source === 'loading');

  return (
    <section className="tc-comparison" aria-label="Comparison">
      <div className="tc-comparison-head">
        <h3 className="tc-subsection-title">Side by side</h3>
        <Button variant="minimal" icon={<CrossIcon />} text="Close the comparison" onClick={onClose} />
      </div>
      <div className="tc-comparison-scroll" role="region" aria-label="Compared figures" tabIndex={0}>
        <table className="tc-comparison-table" aria-label="Compared candidates">
          <thead>
            <tr>
              <td className="tc-comparison-corner" />
              {compared.map(({ rank, candidate }, i) => (
                <th key={candidateKey(candidate)} scope="col">
                  <span className="tc-swatch" style={{ background: SERIES_COLORS[i % SERIES_COLORS.length] }} aria-hidden="true" />
                  <span className="tc-muted">#{rank}</span> <span className="tc-comparison-name">{candidate.label}</span>
                  <span className="tc-candidate-meta">
                    {candidate.supplier.name} · {KIND_LABELS[candidate.kind]}
                  </span>
                  <span className="tc-comparison-actions">
                    <Button
                      size="small"
                      variant="minimal"
                      text="Details"
                      aria-label={`Details of ${candidate.label}`}
                      onClick={() => onOpen(candidateKey(candidate))}
                    />
                    <Button
                      size="small"
                      variant="minimal"
                      text="Remove"
                      aria-label={`Remove ${candidate.label} from the comparison`}
                      onClick={() => onRemove(candidateKey(candidate))}
                    />
                  </span>
                </th>
              ))}
            </tr>
          </thead>
          <tbody>
            {rows.map((row, r) => {
              const best = row.values && row.better ? bestOf(row.values, row.better, row.round) : new Set<number>();
              return (
                <tr key={r}>
                  <th scope="row">{row.label}</th>
                  {row.cells.map((cell, i) => (
                    <td key={i} className={best.has(i) ? 'tc-best' : undefined}>
                      {cell}
                      {best.has(i) ? <span className="tc-visually-hidden"> (best)</span> : null}
                    </td>
                  ))}
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <figure className="tc-chart" data-testid="comparison-chart" aria-label="Transmissibility of the compared candidates">
        <h4 className="tc-chart-title">{estimate ? 'Transmissibility, compared (bounce estimate)' : 'Transmissibility, compared'}</h4>
        <ul className="tc-chart-legend">
          {compared.map(({ rank, candidate }, i) => (
            <li key={candidateKey(candidate)}>
              <span className="tc-swatch" style={{ background: SERIES_COLORS[i % SERIES_COLORS.length] }} aria-hidden="true" />#{rank}{' '}
              {candidate.label} — fn {formatFrequency(candidate.verticalNaturalFrequencyHz)}
              {damping[i]?.description
                ? `, ${damping[i]!.description}`
                : damping[i]?.source === 'unknown'
                  ? ', damping unknown (undamped)'
                  : ''}
            </li>
          ))}
        </ul>
        {loading ? (
          <div className="tc-chart-loading">
            <Spinner size={24} aria-label="Reading the damping from the catalog" />
          </div>
        ) : (
          <Suspense
            fallback={
              <div className="tc-chart-loading">
                <Spinner size={24} aria-label="Loading the chart" />
              </div>
            }
          >
            <TransmissibilityChart curves={curves} markers={markers} targetTransmissibility={targetTransmissibility} />
          </Suspense>
        )}
        <figcaption className="tc-muted tc-chart-caption">
          Force reaching the floor per unit of force from the machine, each candidate as one mass on its mounts (the bounce estimate).
          Dashed lines: the disturbing frequencies{targetTransmissibility ? ' and the target' : ''}; dotted: each candidate’s fn.
        </figcaption>
      </figure>
    </section>
  );
}
