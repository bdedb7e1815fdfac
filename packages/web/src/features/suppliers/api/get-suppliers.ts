import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Supplier } from '../types';

/** `GET /api/suppliers` (any role): every supplier, sorted by name. */
export async function getSuppliers(signal?: AbortSignal): Promise<Supplier[]> {
  const { data } = await api.get<Supplier[]>('/suppliers', { signal });
  return data;
}

export const suppliersQueryKey = ['suppliers'] as const;

export function suppliersQueryOptions() {
  return queryOptions({ queryKey: suppliersQueryKey, queryFn: ({ signal }) => getSuppliers(signal) });
}

export function useSuppliers() {
  return useQuery(suppliersQueryOptions());
}
