import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { CatalogImportRecord } from '../types';

/** `GET /api/mounts/imports` (catalog manager, admin): every import, newest first. */
export async function getImports(signal?: AbortSignal): Promise<CatalogImportRecord[]> {
  const { data } = await api.get<CatalogImportRecord[]>('/mounts/imports', { signal });
  return data;
}

export const importsQueryKey = ['catalog-imports'] as const;

export function importsQueryOptions() {
  return queryOptions({ queryKey: importsQueryKey, queryFn: ({ signal }) => getImports(signal) });
}

export function useImports() {
  return useQuery(importsQueryOptions());
}
