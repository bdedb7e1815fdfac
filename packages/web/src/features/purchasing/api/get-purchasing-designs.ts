import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { PurchasingDesign } from '../types';

/** `GET /api/purchasing/designs` (purchaser, admin): released designs, newest first. */
export async function getPurchasingDesigns(): Promise<PurchasingDesign[]> {
  const { data } = await api.get<PurchasingDesign[]>('/purchasing/designs');
  return data;
}

export const purchasingDesignsQueryKey = ['purchasing', 'designs'] as const;

export function purchasingDesignsQueryOptions() {
  return queryOptions({ queryKey: purchasingDesignsQueryKey, queryFn: getPurchasingDesigns, staleTime: 0 });
}

export function usePurchasingDesigns() {
  return useQuery(purchasingDesignsQueryOptions());
}
