import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router-dom';

import { MOUNT_SORT_FIELDS, MOUNT_TYPES, type MountQuery, type MountSort, type MountSortField, type MountType } from '../types';

/** Rows per page of the catalog table. */
export const CATALOG_PAGE_SIZE = 100;

function positiveInt(value: string | null): number | null {
  if (value === null || !/^\d+$/.test(value)) return null;
  const number = Number(value);
  return number > 0 ? number : null;
}

function nonNegative(value: string | null): number | null {
  if (value === null || value.trim() === '') return null;
  const number = Number(value);
  return Number.isFinite(number) && number >= 0 ? number : null;
}

export function parseSort(value: string | null): MountSort | null {
  if (!value) return null;
  const descending = value.startsWith('-');
  const field = descending ? value.slice(1) : value;
  if (!(MOUNT_SORT_FIELDS as readonly string[]).includes(field)) return null;
  return { field: field as MountSortField, direction: descending ? 'desc' : 'asc' };
}

export function sortParam(sort: MountSort | null): string | null {
  return sort ? `${sort.direction === 'desc' ? '-' : ''}${sort.field}` : null;
}

/**
 * The catalog query kept in the address (`?q=…&type=…&page=2`), so a filtered view can be
 * bookmarked or shared, and Back returns to it. Loads are in N.
 */
export function parseCatalogQuery(params: URLSearchParams, pageSize = CATALOG_PAGE_SIZE): MountQuery {
  const types = (params.get('type') ?? '')
    .split(',')
    .filter((type): type is MountType => (MOUNT_TYPES as readonly string[]).includes(type));
  return {
    q: params.get('q') ?? '',
    supplierId: positiveInt(params.get('supplier')),
    types: [...new Set(types)],
    minLoadN: nonNegative(params.get('minLoadN')),
    maxLoadN: nonNegative(params.get('maxLoadN')),
    includeRetired: params.get('retired') === '1',
    sort: parseSort(params.get('sort')),
    page: positiveInt(params.get('page')) ?? 1,
    pageSize,
  };
}

export type CatalogQueryChange = Partial<Omit<MountQuery, 'pageSize'>>;

function writeQuery(params: URLSearchParams, query: MountQuery): void {
  const set = (key: string, value: string | null) => (value ? params.set(key, value) : params.delete(key));
  set('q', query.q.trim() ? query.q : null);
  set('supplier', query.supplierId !== null ? String(query.supplierId) : null);
  set('type', query.types.length > 0 ? query.types.join(',') : null);
  set('minLoadN', query.minLoadN !== null ? String(Number(query.minLoadN.toPrecision(6))) : null);
  set('maxLoadN', query.maxLoadN !== null ? String(Number(query.maxLoadN.toPrecision(6))) : null);
  set('retired', query.includeRetired ? '1' : null);
  set('sort', sortParam(query.sort));
  set('page', query.page > 1 ? String(query.page) : null);
}

export interface CatalogQueryState {
  query: MountQuery;
  /** Changes filters or sort (back to page 1) or, with only `page`, the page. */
  change: (change: CatalogQueryChange) => void;
  /** Removes every filter and the sort. */
  reset: () => void;
  /** The mount whose details are open (`?mount=<id>`). */
  selectedId: number | null;
  select: (id: number | null) => void;
}

export function useCatalogQuery(options: { allowRetired: boolean }): CatalogQueryState {
  const [params, setParams] = useSearchParams();
  const { allowRetired } = options;

  const query = useMemo(() => {
    const parsed = parseCatalogQuery(params);
    return allowRetired ? parsed : { ...parsed, includeRetired: false };
  }, [params, allowRetired]);

  const change = useCallback(
    (change: CatalogQueryChange) => {
      setParams(
        (previous) => {
          const current = parseCatalogQuery(previous);
          const onlyPage = Object.keys(change).every((key) => key === 'page');
          const next: MountQuery = { ...current, ...change, page: onlyPage ? (change.page ?? 1) : 1 };
          const result = new URLSearchParams(previous);
          writeQuery(result, next);
          return result;
        },
        { replace: true },
      );
    },
    [setParams],
  );

  const reset = useCallback(() => {
    setParams(
      (previous) => {
        const result = new URLSearchParams();
        const mount = previous.get('mount');
        if (mount) result.set('mount', mount);
        return result;
      },
      { replace: true },
    );
  }, [setParams]);

  const selectedId = positiveInt(params.get('mount'));
  const select = useCallback(
    (id: number | null) => {
      setParams((previous) => {
        const result = new URLSearchParams(previous);
        if (id === null) result.delete('mount');
        else result.set('mount', String(id));
        return result;
      });
    },
    [setParams],
  );

  return { query, change, reset, selectedId, select };
}
