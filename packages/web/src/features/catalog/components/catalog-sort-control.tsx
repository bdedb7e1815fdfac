import { Button, HTMLSelect } from '@blueprintjs/core';
import { SortAscIcon, SortDescIcon } from '@blueprintjs/icons';

import type { MountSort, MountSortField } from '../types';

const SORT_LABELS: Record<MountSortField, string> = {
  supplier: 'Supplier',
  partNumber: 'Part number',
  series: 'Series',
  mountType: 'Type',
  ratedLoadN: 'Rated load',
  verticalStiffnessNPerM: 'Vertical stiffness',
  unitPrice: 'Unit price',
  leadTimeDays: 'Lead time',
  updatedAt: 'Last changed',
};

export interface CatalogSortControlProps {
  sort: MountSort | null;
  onSort: (sort: MountSort | null) => void;
}

/** The sort order as a plain control (the column menus of the table do the same). */
export function CatalogSortControl({ sort, onSort }: CatalogSortControlProps) {
  const direction = sort?.direction ?? 'asc';
  return (
    <div className="tc-catalog-sort">
      <label htmlFor="catalog-sort" className="tc-muted">
        Sort by
      </label>
      <HTMLSelect
        id="catalog-sort"
        value={sort?.field ?? ''}
        onChange={(event) => {
          const field = event.target.value as MountSortField | '';
          onSort(field ? { field, direction } : null);
        }}
      >
        <option value="">Supplier, then part number</option>
        {(Object.keys(SORT_LABELS) as MountSortField[]).map((field) => (
          <option key={field} value={field}>
            {SORT_LABELS[field]}
          </option>
        ))}
      </HTMLSelect>
      <Button
        variant="outlined"
        icon={direction === 'desc' ? <SortDescIcon /> : <SortAscIcon />}
        aria-label={direction === 'desc' ? 'Descending: switch to ascending' : 'Ascending: switch to descending'}
        title={direction === 'desc' ? 'Descending' : 'Ascending'}
        disabled={!sort}
        onClick={() => sort && onSort({ field: sort.field, direction: direction === 'desc' ? 'asc' : 'desc' })}
      />
    </div>
  );
}
