import { Button, HTMLSelect, Menu, MenuItem, Tag } from '@blueprintjs/core';
import { SortAscIcon, SortDescIcon } from '@blueprintjs/icons';
import { Cell, Column, ColumnHeaderCell, RegionCardinality, Regions, Table, type Region } from '@blueprintjs/table';
import { memo, useCallback, useMemo, type ReactNode } from 'react';

import type { Units } from '@/lib/units';
import type { Candidate } from '@/types/design-api';

import {
  candidateKey,
  firstReason,
  formatDays,
  formatFrequency,
  formatMoney,
  formatPct,
  formatUtilizationRange,
  KIND_LABELS,
  utilizationRange,
  worstIsolationPct,
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

interface ColumnSpec {
  key: ColumnKey;
  name: string;
  width: number;
  /** Sort value; null sorts last. */
  value: (row: RankedCandidate) => number | string | null;
  render: (row: RankedCandidate, units: Units, open: (key: string) => void) => ReactNode;
  numeric?: boolean;
}

const finiteOrNull = (v: number | null | undefined) => (v === null || v === undefined || !Number.isFinite(v) ? null : v);

const COLUMNS: readonly ColumnSpec[] = [
  { key: 'rank', name: 'Rank', width: 56, numeric: true, value: (r) => r.rank, render: (r) => r.rank },
  {
    key: 'verdict',
    name: 'Result',
    width: 76,
    value: (r) => (r.candidate.passes ? 0 : 1),
    render: (r) => <VerdictTag passes={r.candidate.passes} />,
  },
  {
    key: 'label',
    name: 'Mounts',
    width: 250,
    value: (r) => r.candidate.label.toLowerCase(),
    render: (r, _units, open) => (
      <Button
        variant="minimal"
        size="small"
        className="tc-candidate-open"
        text={r.candidate.label}
        title={`Show the details of ${r.candidate.label}`}
        onClick={() => open(candidateKey(r.candidate))}
      />
    ),
  },
  {
    key: 'supplier',
    name: 'Supplier',
    width: 140,
    value: (r) => r.candidate.supplier.name.toLowerCase(),
    render: (r) => r.candidate.supplier.name,
  },
  { key: 'kind', name: 'Kind', width: 112, value: (r) => r.candidate.kind, render: (r) => KIND_LABELS[r.candidate.kind] },
  {
    key: 'fn',
    name: 'fn',
    width: 76,
    numeric: true,
    value: (r) => finiteOrNull(r.candidate.verticalNaturalFrequencyHz),
    render: (r) => formatFrequency(r.candidate.verticalNaturalFrequencyHz),
  },
  {
    key: 'isolation',
    name: 'Isolation, worst',
    width: 112,
    numeric: true,
    value: (r) => finiteOrNull(worstIsolationPct(r.candidate)),
    render: (r) => formatPct(worstIsolationPct(r.candidate)),
  },
  {
    key: 'utilization',
    name: 'Utilisation',
    width: 104,
    numeric: true,
    value: (r) => finiteOrNull(utilizationRange(r.candidate)[1]),
    render: (r) => formatUtilizationRange(r.candidate),
  },
  {
    key: 'level',
    name: 'Level error',
    width: 96,
    numeric: true,
    value: (r) => finiteOrNull(r.candidate.levelErrorMm),
    render: (r, units) => units.format('deflection', r.candidate.levelErrorMm / 1000),
  },
  {
    key: 'price',
    name: 'Price',
    width: 92,
    numeric: true,
    value: (r) => finiteOrNull(r.candidate.totalPrice),
    render: (r) => formatMoney(r.candidate.totalPrice, r.candidate.currency),
  },
  {
    key: 'leadTime',
    name: 'Lead time',
    width: 88,
    numeric: true,
    value: (r) => finiteOrNull(r.candidate.maxLeadTimeDays),
    render: (r) => formatDays(r.candidate.maxLeadTimeDays),
  },
  {
    key: 'reason',
    name: 'First reason',
    width: 320,
    value: (r) => firstReason(r.candidate).toLowerCase(),
    render: (r) => firstReason(r.candidate),
  },
];

export const SORT_OPTIONS = COLUMNS.map((c) => ({ value: c.key, label: c.name }));

export function VerdictTag({ passes }: { passes: boolean }) {
  return (
    <Tag minimal className={passes ? 'tc-verdict tc-verdict--pass' : 'tc-verdict tc-verdict--fail'}>
      {passes ? 'Passes' : 'Fails'}
    </Tag>
  );
}

/** Sorts a copy; missing values last whichever the direction; ties keep the server's rank. */
export function sortCandidates(rows: readonly RankedCandidate[], sort: CandidateSort): RankedCandidate[] {
  const column = COLUMNS.find((c) => c.key === sort.column) ?? COLUMNS[0]!;
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
  onOpen: (key: string) => void;
  units: Units;
}

const ROW_HEIGHT = 30;

/**
 * The ranked candidates in a Blueprint table, sortable in the browser. Clicking a row (or the
 * mount name) opens its details.
 */
export const CandidatesTable = memo(function CandidatesTable({ rows, sort, onSort, selectedKey, onOpen, units }: CandidatesTableProps) {
  const sorted = useMemo(() => sortCandidates(rows, sort), [rows, sort]);
  const selectedRow = sorted.findIndex((r) => candidateKey(r.candidate) === selectedKey);
  const selectedRegions = useMemo(() => (selectedRow >= 0 ? [Regions.row(selectedRow)] : []), [selectedRow]);

  const onSelection = useCallback(
    (regions: Region[]) => {
      const row = regions[regions.length - 1]?.rows?.[0];
      if (row !== undefined && row !== null && sorted[row]) onOpen(candidateKey(sorted[row]!.candidate));
    },
    [sorted, onOpen],
  );

  const headerRenderer = (spec: ColumnSpec) => () => (
    <ColumnHeaderCell
      name={spec.name}
      className={sort.column === spec.key ? 'tc-sorted-column' : undefined}
      nameRenderer={(name) => (
        <span className="tc-column-name">
          {name}
          {sort.column === spec.key ? (sort.direction === 'asc' ? ' ▲' : ' ▼') : ''}
        </span>
      )}
      menuRenderer={() => (
        <Menu>
          <MenuItem icon={<SortAscIcon />} text="Sort ascending" onClick={() => onSort({ column: spec.key, direction: 'asc' })} />
          <MenuItem icon={<SortDescIcon />} text="Sort descending" onClick={() => onSort({ column: spec.key, direction: 'desc' })} />
        </Menu>
      )}
    />
  );

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
      </div>
      <div className="tc-candidates-table" style={{ height: Math.min(sorted.length, 12) * ROW_HEIGHT + 34 }} data-testid="candidates-table">
        <Table
          numRows={sorted.length}
          columnWidths={COLUMNS.map((c) => c.width)}
          defaultRowHeight={ROW_HEIGHT}
          enableRowHeader={false}
          enableMultipleSelection={false}
          selectionModes={[RegionCardinality.FULL_ROWS]}
          selectedRegions={selectedRegions}
          onSelection={onSelection}
          cellRendererDependencies={[sorted, units, selectedKey]}
          enableFocusedCell={false}
        >
          {COLUMNS.map((spec) => (
            <Column
              key={spec.key}
              id={spec.key}
              name={spec.name}
              columnHeaderCellRenderer={headerRenderer(spec)}
              cellRenderer={(rowIndex) => {
                const row = sorted[rowIndex];
                if (!row) return <Cell />;
                return (
                  <Cell
                    interactive={spec.key === 'label'}
                    className={[spec.numeric ? 'tc-cell-number' : '', row.candidate.passes ? '' : 'tc-cell-failing'].join(' ').trim()}
                  >
                    {spec.render(row, units, onOpen)}
                  </Cell>
                );
              }}
            />
          ))}
        </Table>
      </div>
    </div>
  );
});
