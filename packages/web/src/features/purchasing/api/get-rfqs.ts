import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Rfq } from '../types';

/** `GET /api/designs/:id/rfqs` (purchaser, admin): every request for quotation of a design. */
export async function getRfqs(designId: number): Promise<Rfq[]> {
  const { data } = await api.get<Rfq[]>(`/designs/${designId}/rfqs`);
  return data;
}

export const rfqsQueryKey = (designId: number) => ['purchasing', 'rfqs', designId] as const;

export function rfqsQueryOptions(designId: number) {
  return queryOptions({ queryKey: rfqsQueryKey(designId), queryFn: () => getRfqs(designId) });
}

export function useRfqs(designId: number) {
  return useQuery(rfqsQueryOptions(designId));
}
