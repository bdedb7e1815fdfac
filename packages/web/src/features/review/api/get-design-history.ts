import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { DesignHistoryEntry } from '../types';

/** `GET /api/designs/:id/history`: every transition and revision of the design, oldest first. */
export async function getDesignHistory(designId: number): Promise<DesignHistoryEntry[]> {
  const { data } = await api.get<DesignHistoryEntry[]>(`/designs/${designId}/history`);
  return data;
}

export const designHistoryQueryKey = (designId: number) => ['design-history', designId] as const;

export function designHistoryQueryOptions(designId: number) {
  return queryOptions({ queryKey: designHistoryQueryKey(designId), queryFn: () => getDesignHistory(designId) });
}

export function useDesignHistory(designId: number) {
  return useQuery(designHistoryQueryOptions(designId));
}
