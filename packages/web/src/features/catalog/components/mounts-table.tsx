import { Menu, MenuDivider, MenuItem, Tag } from '@blueprintjs/core';
import { SortAlphabeticalDescIcon, SortAlphabeticalIcon, SortAscIcon, SortDescIcon, SortIcon } from '@blueprintjs/icons';
import {
  Cell,
  Column,
  ColumnHeaderCell,
  RegionCardinality,
  Regions,
  RenderMode,
  RowHeaderCell,
  Table,
  TableLoadingOption,
  type Region,
} from '@blueprintjs/table';
import { useMemo, type ReactElement } from 'react';

import { useUnits, type Units } from '@/lib/units';

import type { Mount, MountSort, MountSortField } from '../types';
import { dampingText, displayNumber, leadTimeText, mmToM, priceText, ratedFigures, temperatureRangeText } from '../utils/mount-display';
import { mountTypeLabel } from '../utils/mount-labels';

interface CatalogColumn {
  id: string;
  name: (units: Units) => string;
  /** What the header's tooltip explains. */
  title?: string;
  width: number;
  sortField?: MountSortField;
  /** Text sorts say A → Z, number sorts low → high. */
  sortKind?: 'text' | 'number';
  numeric?: boolean;
  text: (mount: Mount, units: Units) => string;
}

/** The catalog table's columns, left to right. The first two stay in view when scrolling sideways. */
export const CATALOG_COLUMNS: readonly CatalogColumn[] = [
  { id: 'supplier', name: () => 'Supplier', width: 160, sortField: 'supplier', sortKind: 'text', text: (m) => m.supplier.name },
  { id: 'partNumber', name: () => 'Part number', width: 150, sortField: 'partNumber', sortKind: 'text', text: (m) => m.partNumber },
  { id: 'series', name: () => 'Series', width: 80, sortField: 'series', sortKind: 'text', text: (m) => m.series ?? '—' },
  { id: 'mountType', name: () => 'Type', width: 136, sortField: 'mountType', sortKind: 'text', text: (m) => mountTypeLabel(m.mountType) },
  {
    id: 'ratedLoad',
    name: (u) => `Rated load (${u.label('force')})`,
    width: 120,
    sortField: 'ratedLoadN',
    sortKind: 'number',
    numeric: true,
    text: (m, u) => displayNumber(u, 'force', m.ratedLoadN),
  },
  {
    id: 'stiffness',
    name: (u) => `Stiffness (${u.label('stiffness')})`,
    title: 'Vertical static stiffness',
    width: 130,
    sortField: 'verticalStiffnessNPerM',
    sortKind: 'number',
    numeric: true,
    text: (m, u) => displayNumber(u, 'stiffness', m.verticalStiffnessNPerM),
  },
  {
    id: 'ratedDeflection',
    name: (u) => `Deflection at rated (${u.label('deflection')})`,
    title: 'Static deflection at the rated load: rated load ÷ vertical stiffness',
    width: 196,
    numeric: true,
    text: (m, u) => displayNumber(u, 'deflection', ratedFigures(m).deflectionM),
  },
  {
    id: 'naturalFrequency',
    name: () => 'fn at rated (Hz)',
    title: 'Vertical natural frequency at the rated load, from the static deflection and the dynamic stiffness ratio',
    width: 130,
    numeric: true,
    text: (m, u) => displayNumber(u, 'frequency', ratedFigures(m).naturalFrequencyHz),
  },
  { id: 'damping', name: () => 'Damping', width: 150, text: (m) => dampingText(m) },
  {
    id: 'maxDeflection',
    name: (u) => `Max deflection (${u.label('deflection')})`,
    width: 150,
    numeric: true,
    text: (m, u) => displayNumber(u, 'deflection', mmToM(m.maxDeflectionMm)),
  },
  {
    id: 'temperature',
    name: (u) => `Temperature (${u.label('temperature')})`,
    width: 130,
    text: (m, u) => temperatureRangeText(u, m.tempMinC, m.tempMaxC, false),
  },
  {
    id: 'price',
    name: () => 'Unit price',
    width: 120,
    sortField: 'unitPrice',
    sortKind: 'number',
    numeric: true,
    text: (m) => priceText(m.unitPrice, m.currency),
  },
  {
    id: 'leadTime',
    name: () => 'Lead time',
    width: 100,
    sortField: 'leadTimeDays',
    sortKind: 'number',
    numeric: true,
    text: (m) => leadTimeText(m.leadTimeDays),
  },
  { id: 'status', name: () => 'Status', width: 96, text: (m) => (m.active ? 'Active' : 'Retired') },
];

export interface MountsTableProps {
  mounts: readonly Mount[];
  /** Index of the first row on this page within the whole result (for row numbers). */
  offset: number;
  loading: boolean;
  sort: MountSort | null;
  onSort: (sort: MountSort | null) => void;
  /** The mount whose details are open; its row is highlighted. */
  openId: number | null;
  onOpen: (mount: Mount) => void;
}

function sortWords(kind: CatalogColumn['sortKind']): { asc: string; desc: string } {
  return kind === 'number' ? { asc: 'Sort low to high', desc: 'Sort high to low' } : { asc: 'Sort A to Z', desc: 'Sort Z to A' };
}

/**
 * One page of the catalog in a Blueprint Table: only the rows and columns in view are rendered,
 * so a page stays smooth however wide the columns. Click a row to open the mount; column menus sort.
 */
export function MountsTable({ mounts, offset, loading, sort, onSort, openId, onOpen }: MountsTableProps) {
  const units = useUnits();
  const openRow = openId === null ? -1 : mounts.findIndex((mount) => mount.id === openId);
  const selectedRegions = useMemo<Region[]>(() => (openRow >= 0 ? [Regions.row(openRow)] : []), [openRow]);

  const handleSelection = (regions: Region[]) => {
    const region = regions.find((candidate) => candidate.rows);
    const row = region?.rows?.[0];
    if (row === undefined) return;
    const mount = mounts[row];
    if (mount) onOpen(mount);
  };

  const renderHeader = (column: CatalogColumn) => () => {
    const field = column.sortField;
    const active = field && sort?.field === field ? sort.direction : null;
    const arrow = active === 'asc' ? ' ↑' : active === 'desc' ? ' ↓' : '';
    const words = sortWords(column.sortKind);
    const menuRenderer = field
      ? (): ReactElement => (
          <Menu aria-label={`Sort by ${column.name(units)}`}>
            <MenuItem
              icon={column.sortKind === 'number' ? <SortAscIcon /> : <SortAlphabeticalIcon />}
              text={words.asc}
              onClick={() => onSort({ field, direction: 'asc' })}
            />
            <MenuItem
              icon={column.sortKind === 'number' ? <SortDescIcon /> : <SortAlphabeticalDescIcon />}
              text={words.desc}
              onClick={() => onSort({ field, direction: 'desc' })}
            />
            {active ? (
              <>
                <MenuDivider />
                <MenuItem icon={<SortIcon />} text="Default order" onClick={() => onSort(null)} />
              </>
            ) : null}
          </Menu>
        )
      : undefined;
    return (
      <ColumnHeaderCell
        name={`${column.name(units)}${arrow}`}
        menuRenderer={menuRenderer}
        selectCellsOnMenuClick={false}
        className={column.numeric ? 'tc-catalog-header--numeric' : undefined}
      />
    );
  };

  const renderCell = (column: CatalogColumn) => (row: number) => {
    const mount = mounts[row];
    if (!mount) return <Cell />;
    if (column.id === 'partNumber') {
      return (
        <Cell interactive className="tc-catalog-cell">
          <button type="button" className="tc-catalog-open" onClick={() => onOpen(mount)} title={`Open ${mount.partNumber}`}>
            {mount.partNumber}
          </button>
        </Cell>
      );
    }
    if (column.id === 'status') {
      return (
        <Cell className="tc-catalog-cell">
          {mount.active ? (
            <Tag minimal intent="success">
              Active
            </Tag>
          ) : (
            <Tag minimal>Retired</Tag>
          )}
        </Cell>
      );
    }
    const classes = ['tc-catalog-cell'];
    if (column.numeric) classes.push('tc-catalog-cell--numeric');
    if (!mount.active) classes.push('tc-catalog-cell--retired');
    return <Cell className={classes.join(' ')}>{column.text(mount, units)}</Cell>;
  };

  return (
    <div className="tc-catalog-table" aria-label="Catalog mounts" role="region" aria-busy={loading}>
      <Table
        numRows={mounts.length}
        numFrozenColumns={2}
        // Only the cells in view exist (the table virtualizes rows and columns); with plain-text
        // cells they are cheap enough to draw at once, without the batched "scan-line" effect.
        renderMode={RenderMode.NONE}
        columnWidths={CATALOG_COLUMNS.map((column) => column.width)}
        defaultRowHeight={30}
        enableRowHeader
        rowHeaderCellRenderer={(row) => <RowHeaderCell name={String(offset + row + 1)} />}
        enableMultipleSelection={false}
        enableFocusedCell={false}
        enableColumnReordering={false}
        enableRowResizing={false}
        selectionModes={[RegionCardinality.CELLS, RegionCardinality.FULL_ROWS]}
        selectedRegions={selectedRegions}
        onSelection={handleSelection}
        loadingOptions={loading && mounts.length === 0 ? [TableLoadingOption.CELLS] : []}
        cellRendererDependencies={[mounts, units.system, sort]}
        getCellClipboardData={(row, col) => {
          const mount = mounts[row];
          const column = CATALOG_COLUMNS[col];
          return mount && column ? column.text(mount, units) : '';
        }}
      >
        {CATALOG_COLUMNS.map((column) => (
          <Column
            key={column.id}
            id={column.id}
            name={column.name(units)}
            columnHeaderCellRenderer={renderHeader(column)}
            cellRenderer={renderCell(column)}
          />
        ))}
      </Table>
    </div>
  );
}
