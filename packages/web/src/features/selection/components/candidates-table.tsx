import { Button, Checkbox, HTMLSelect, Tag } from '@blueprintjs/core';
import { SortAscIcon, SortDescIcon } from '@blueprintjs/icons';
import { memo, useMemo, useState, type ReactNode } from 'react';

import type { Candidate } from '@/types/design-api';

import {
  allRemarks,
  assumptionsOf,
  candidateKey,
  firstReason,
  formatDays,
  formatFrequency,
  formatMargin,
  formatMoney,
  formatPct,
  formatUtilizationRange,
  KIND_LABELS,
  utilizationBasis,
  utilizationRange,
  weightMarginPct,
  worstIsolationPct,
  worstIsolationWhere,
} from './candidate-format';

export type SortDirection = 'asc' | 'desc';
export interface CandidateSort {
  column: ColumnKey;
  direction: SortDirection;
}

export interface RankedCandidate {
  rank: number;
  candidate: Candidate;
}

type ColumnKey =
  'rank' | 'label' | 'supplier' | 'kind' | 'fn' | 'isolation' | 'utilization' | 'level' | 'price' | 'leadTime' | 'verdict' | 'reason';

/** The most candidates compared side by side. */
export const MAX_COMPARED = 4;

interface SortSpec {
  key: ColumnKey;
  name: string;
  /** Sort value; null sorts last. */
  value: (row: RankedCandidate) => number | string | null;
}

const finiteOrNull = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? null : v);

/** Every order the candidates can be put in (the table's columns and a few more). */
const SORTS: readonly SortSpec[] = [
  { key: 'rank', name: 'Rank', value: (r) => r.rank },
  { key: 'verdict', name: 'Result', value: (r) => (r.candidate.passes ? 0 : 1) },
  { key: 'label', name: 'Mounts', value: (r) => r.candidate.label.toLowerCase() },
  { key: 'supplier', name: 'Supplier', value: (r) => r.candidate.supplier.name.toLowerCase() },
  { key: 'kind', name: 'Kind', value: (r) => r.candidate.kind },
  { key: 'isolation', name: 'Isolation', value: (r) => finiteOrNull(worstIsolationPct(r.candidate)) },
  { key: 'fn', name: 'Natural frequency', value: (r) => finiteOrNull(r.candidate.verticalNaturalFrequencyHz) },
  { key: 'utilization', name: 'Utilisation', value: (r) => finiteOrNull(utilizationRange(r.candidate)[1]) },
  { key: 'level', name: 'Level error', value: (r) => finiteOrNull(r.candidate.levelErrorMm) },
  { key: 'price', name: 'Price', value: (r) => finiteOrNull(r.candidate.totalPrice) },
  { key: 'leadTime', name: 'Lead time', value: (r) => finiteOrNull(r.candidate.maxLeadTimeDays) },
  { key: 'reason', name: 'Reason', value: (r) => firstReason(r.candidate).toLowerCase() },
];

export const SORT_OPTIONS = SORTS.map((c) => ({ value: c.key, label: c.name }));

export function VerdictTag({ passes }: { passes: boolean }) {
  return (
    <Tag minimal className={passes ? 'tc-verdict tc-verdict--pass' : 'tc-verdict tc-verdict--fail'}>
      {passes ? 'Passes' : 'Fails'}
    </Tag>
  );
}

/** Sorts a copy; missing values last whichever the direction; ties keep the server's rank. */
export function sortCandidates(rows: readonly RankedCandidate[], sort: CandidateSort): RankedCandidate[] {
  const column = SORTS.find((c) => c.key === sort.column) ?? SORTS[0]!;
  const sign = sort.direction === 'asc' ? 1 : -1;
  return [...rows].sort((a, b) => {
    const va = column.value(a);
    const vb = column.value(b);
    if (va === null && vb === null) return a.rank - b.rank;
    if (va === null) return 1;
    if (vb === null) return -1;
    const order = typeof va === 'number' && typeof vb === 'number' ? va - vb : String(va).localeCompare(String(vb));
    return order === 0 ? a.rank - b.rank : sign * order;
  });
}

export interface CandidatesTableProps {
  rows: readonly RankedCandidate[];
  sort: CandidateSort;
  onSort: (sort: CandidateSort) => void;
  selectedKey: string | null;
  /** The candidate chosen for the design, if it is in the list. */
  chosenKey: string | null;
  onOpen: (key: string) => void;
  /** Candidates ticked for comparison (at most MAX_COMPARED). */
  compareKeys: readonly string[];
  onToggleCompare: (key: string) => void;
  /** Shows the ticked candidates side by side. */
  onCompare: () => void;
}

interface HeaderProps {
  column: ColumnKey;
  sort: CandidateSort;
  onSort: (sort: CandidateSort) => void;
  className?: string;
  children: ReactNode;
  /** A second, smaller line under the name. */
  note?: ReactNode;
  title?: string;
}

/** A column header that sorts by its column (a second click turns the order round). */
function SortHeader({ column, sort, onSort, className, children, note, title }: HeaderProps) {
  const active = sort.column === column;
  const next: SortDirection = active && sort.direction === 'asc' ? 'desc' : 'asc';
  return (
    <th
      scope="col"
      className={[className, active ? 'tc-sorted-column' : ''].filter(Boolean).join(' ')}
      aria-sort={active ? (sort.direction === 'asc' ? 'ascending' : 'descending') : 'none'}
      title={title}
    >
      <button type="button" className="tc-sort-button" onClick={() => onSort({ column, direction: next })}>
        <span className="tc-sort-label">
          {children}
          <span aria-hidden="true">{active ? (sort.direction === 'asc' ? ' ▲' : ' ▼') : ''}</span>
        </span>
        {note ? <span className="tc-header-note">{note}</span> : null}
      </button>
    </th>
  );
}

/** The first reason in full, and the others (with the notes) on request: nothing cut off. */
function ReasonCell({ candidate }: { candidate: Candidate }) {
  const [open, setOpen] = useState(false);
  const remarks = allRemarks(candidate);
  const first = firstReason(candidate);
  const more = Math.max(0, remarks.length - 1);
  return (
    <td className="tc-reason-cell">
      {open && remarks.length > 1 ? (
        <ul className="tc-reason-list">
          {remarks.map((remark) => (
            <li key={remark}>{remark}</li>
          ))}
        </ul>
      ) : (
        <span className="tc-reason-text">{first}</span>
      )}
      {more > 0 ? (
        <button
          type="button"
          className="tc-link-button"
          aria-expanded={open}
          onClick={(event) => {
            event.stopPropagation();
            setOpen(!open);
          }}
        >
          {open ? 'Show less' : `${more} more`}
        </button>
      ) : null}
    </td>
  );
}

/**
 * The ranked candidates in a table that fits its column: the candidate column stays in place
 * when the table scrolls sideways inside its own box (narrow screens), the header when it
 * scrolls down, and the reasons wrap. Clicking a row opens its details; the boxes tick up to four
 * candidates to compare side by side.
 */
export const CandidatesTable = memo(function CandidatesTable({
  rows,
  sort,
  onSort,
  selectedKey,
  chosenKey,
  onOpen,
  compareKeys,
  onToggleCompare,
  onCompare,
}: CandidatesTableProps) {
  const sorted = useMemo(() => sortCandidates(rows, sort), [rows, sort]);
  const compared = new Set(compareKeys);
  const full = compareKeys.length >= MAX_COMPARED;
  const margins = new Set(rows.map((r) => weightMarginPct(r.candidate)));
  const margin = margins.size === 1 ? [...margins][0]! : 0;

  return (
    <div className="tc-candidates">
      <div className="tc-candidates-toolbar">
        <label className="tc-inline-label" htmlFor="candidate-sort">
          Sort by
        </label>
        <HTMLSelect
          id="candidate-sort"
          value={sort.column}
          options={SORT_OPTIONS}
          onChange={(event) => onSort({ column: event.currentTarget.value as ColumnKey, direction: sort.direction })}
        />
        <Button
          variant="minimal"
          icon={sort.direction === 'asc' ? <SortAscIcon /> : <SortDescIcon />}
          text={sort.direction === 'asc' ? 'Ascending' : 'Descending'}
          onClick={() => onSort({ column: sort.column, direction: sort.direction === 'asc' ? 'desc' : 'asc' })}
        />
        <span className="tc-toolbar-spacer" />
        <span className="tc-muted tc-compare-hint" role="status">
          {compareKeys.length === 0
            ? 'Tick two to four candidates to compare them.'
            : full
              ? `${compareKeys.length} ticked (the most that can be compared).`
              : `${compareKeys.length} ticked.`}
        </span>
        <Button intent="primary" variant="outlined" text="Compare" disabled={compareKeys.length < 2} onClick={onCompare} />
      </div>
      <div className="tc-results-scroll" data-testid="candidates-table" role="region" aria-label="Candidates, ranked" tabIndex={0}>
        <table className="tc-results" aria-label="Candidates">
          <colgroup>
            <col className="tc-col-candidate" />
            <col className="tc-col-verdict" />
            <col className="tc-col-isolation" />
            <col className="tc-col-fn" />
            <col className="tc-col-utilization" />
            <col className="tc-col-price" />
            <col className="tc-col-lead" />
            <col className="tc-col-reason" />
          </colgroup>
          <thead>
            <tr>
              <SortHeader column="rank" sort={sort} onSort={onSort} className="tc-results-sticky">
                Candidate
              </SortHeader>
              <SortHeader column="verdict" sort={sort} onSort={onSort}>
                Result
              </SortHeader>
              <SortHeader
                column="isolation"
                sort={sort}
                onSort={onSort}
                className="tc-number"
                title="The isolation the requirement is checked against: the whole machine's worst over the running range (or, without it, the lowest of the bounce estimate over the disturbing frequencies)"
              >
                Isolation
              </SortHeader>
              <SortHeader
                column="fn"
                sort={sort}
                onSort={onSort}
                className="tc-number"
                title="Natural frequency, vertical (bounce estimate)"
              >
                fn
              </SortHeader>
              <SortHeader
                column="utilization"
                sort={sort}
                onSort={onSort}
                className="tc-number"
                title={rows[0] ? utilizationBasis(rows[0].candidate) : undefined}
                note={margin > 0 ? `+${formatMargin(margin)} % weight` : null}
              >
                Utilisation
              </SortHeader>
              <SortHeader column="price" sort={sort} onSort={onSort} className="tc-number">
                Price
              </SortHeader>
              <SortHeader column="leadTime" sort={sort} onSort={onSort} className="tc-number">
                Lead time
              </SortHeader>
              <SortHeader column="reason" sort={sort} onSort={onSort}>
                Reason
              </SortHeader>
            </tr>
          </thead>
          <tbody>
            {sorted.map((row) => {
              const { candidate } = row;
              const key = candidateKey(candidate);
              const where = worstIsolationWhere(candidate);
              const assumed = assumptionsOf(candidate);
              const classes = [
                'tc-results-row',
                key === selectedKey ? 'is-selected' : '',
                candidate.passes ? '' : 'is-failing',
                compared.has(key) ? 'is-compared' : '',
              ];
              return (
                <tr key={key} className={classes.filter(Boolean).join(' ')} onClick={() => onOpen(key)}>
                  <th scope="row" className="tc-results-sticky tc-candidate-cell">
                    <div className="tc-candidate-cell-inner">
                      <span onClick={(event) => event.stopPropagation()}>
                        <Checkbox
                          className="tc-compare-box"
                          checked={compared.has(key)}
                          disabled={!compared.has(key) && full}
                          aria-label={`Compare ${candidate.label}`}
                          onChange={() => onToggleCompare(key)}
                        />
                      </span>
                      <span className="tc-rank">{row.rank}</span>
                      <span className="tc-candidate-name">
                        <button
                          type="button"
                          className="tc-candidate-open"
                          title={`Show the details of ${candidate.label}`}
                          onClick={(event) => {
                            event.stopPropagation();
                            onOpen(key);
                          }}
                        >
                          {candidate.label}
                        </button>
                        <span className="tc-candidate-meta">
                          {candidate.supplier.name} · {KIND_LABELS[candidate.kind]}
                          {key === chosenKey ? (
                            <Tag minimal intent="success" className="tc-chosen-tag">
                              Chosen
                            </Tag>
                          ) : null}
                          {assumed.length > 0 ? (
                            <Tag
                              minimal
                              intent="warning"
                              className="tc-assumed-tag"
                              data-testid="assumed-tag"
                              title={`Not from the catalog, assumed: ${assumed.join('; ')}`}
                            >
                              {assumed.length} assumed
                            </Tag>
                          ) : null}
                        </span>
                      </span>
                    </div>
                  </th>
                  <td>
                    <VerdictTag passes={candidate.passes} />
                  </td>
                  <td className="tc-number">
                    {formatPct(worstIsolationPct(candidate))}
                    {where ? <span className="tc-cell-note">{where}</span> : null}
                  </td>
                  <td className="tc-number">{formatFrequency(candidate.verticalNaturalFrequencyHz)}</td>
                  <td className="tc-number">{formatUtilizationRange(candidate)}</td>
                  <td className="tc-number">{formatMoney(candidate.totalPrice, candidate.currency)}</td>
                  <td className="tc-number">{formatDays(candidate.maxLeadTimeDays)}</td>
                  <ReasonCell candidate={candidate} />
                </tr>
              );
            })}
          </tbody>
        </table>
      </div>
      <p className="tc-muted tc-table-note">
        Isolation: the whole machine’s worst over the running range, where the results carry it; otherwise the lowest of the bounce estimate
        over the disturbing frequencies. “Assumed”: figures not in the catalog, filled in with the unfavourable value. Utilisation: load ÷
        rated load from the lightest point to the heaviest
        {margin > 0 ? `, the heaviest with the ${formatMargin(margin)} % weight margin` : ''}, as the checks compare it. Level error and the
        figures per point are in each candidate’s details.
      </p>
    </div>
  );
});
