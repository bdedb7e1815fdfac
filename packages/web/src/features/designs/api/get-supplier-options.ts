import { queryOptions, useQuery } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';
import type { SupplierRef } from '@/types/design-api';

type SupplierRow = Pick<ApiSchemas['SupplierDto'], 'id' | 'name' | 'active'>;

/**
 * `GET /api/suppliers` reduced to what the criteria need (id and name of active suppliers).
 * The design screen works without it: a failure only hides the supplier filter.
 */
export async function getSupplierOptions(): Promise<SupplierRef[]> {
  const { data } = await api.get<SupplierRow[]>('/suppliers');
  return (Array.isArray(data) ? data : [])
    .filter((supplier) => supplier.active !== false)
    .map(({ id, name }) => ({ id, name }))
    .sort((a, b) => a.name.localeCompare(b.name));
}

export function supplierOptionsQueryOptions() {
  return queryOptions({
    queryKey: ['designs', 'supplier-options'] as const,
    queryFn: getSupplierOptions,
    staleTime: 5 * 60_000,
    retry: false,
  });
}

export function useSupplierOptions() {
  return useQuery(supplierOptionsQueryOptions());
}
