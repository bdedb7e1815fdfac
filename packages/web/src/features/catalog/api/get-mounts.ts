import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { MountPage, MountQuery, MountSearchParams } from '../types';

/** Every catalog query key starts here, so one invalidation refreshes lists and details. */
export const mountsQueryKey = ['mounts'] as const;

/** Round a converted number so that the query string stays short and stable (6 significant digits). */
function compact(value: number): string {
  return String(Number(value.toPrecision(6)));
}

/** The query string of `GET /api/mounts` for a catalog query; empty filters are left out. */
export function mountsSearchParams(query: MountQuery): Partial<Record<keyof MountSearchParams, string>> {
  const params: Partial<Record<keyof MountSearchParams, string>> = {
    page: String(query.page),
    pageSize: String(query.pageSize),
  };
  const q = query.q.trim();
  if (q) params.q = q;
  if (query.supplierId !== null) params.supplierId = String(query.supplierId);
  if (query.types.length > 0) params.type = query.types.join(',');
  if (query.minLoadN !== null) params.minLoadN = compact(query.minLoadN);
  if (query.maxLoadN !== null) params.maxLoadN = compact(query.maxLoadN);
  if (query.sort) params.sort = `${query.sort.direction === 'desc' ? '-' : ''}${query.sort.field}`;
  if (query.includeRetired) params.includeRetired = 'true';
  return params;
}

/** `GET /api/mounts` (any role): one page of the catalog and the number of matching mounts. */
export async function getMounts(query: MountQuery, signal?: AbortSignal): Promise<MountPage> {
  const { data } = await api.get<MountPage>('/mounts', { params: mountsSearchParams(query), signal });
  return data;
}

export function mountsQueryOptions(query: MountQuery) {
  return queryOptions({
    queryKey: [...mountsQueryKey, 'list', mountsSearchParams(query)],
    queryFn: ({ signal }) => getMounts(query, signal),
    // Show the page being left until the next one arrives, and keep only the page on screen
    // in memory: a 100,000-row catalog is never held by the browser.
    placeholderData: keepPreviousData,
    gcTime: 0,
  });
}

export function useMounts(query: MountQuery) {
  return useQuery(mountsQueryOptions(query));
}
