import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Verification } from '../types';

/** `GET /api/designs/:id/verifications`: every tap test of the design, newest first. */
export async function getVerifications(designId: number): Promise<Verification[]> {
  const { data } = await api.get<Verification[]>(`/designs/${designId}/verifications`);
  return data;
}

export const verificationsQueryKey = (designId: number) => ['verifications', designId] as const;

export function verificationsQueryOptions(designId: number) {
  return queryOptions({ queryKey: verificationsQueryKey(designId), queryFn: () => getVerifications(designId) });
}

export function useVerifications(designId: number) {
  return useQuery(verificationsQueryOptions(designId));
}
