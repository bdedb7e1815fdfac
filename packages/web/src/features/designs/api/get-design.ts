import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Design } from '@/types/design-api';

/** `GET /api/designs/:id`: input, status, revision, version, the chosen candidate and the BOM. */
export async function getDesign(designId: number): Promise<Design> {
  const { data } = await api.get<Design>(`/designs/${designId}`);
  return data;
}

export const designQueryKey = (designId: number) => ['designs', designId] as const;

export function designQueryOptions(designId: number) {
  return queryOptions({ queryKey: designQueryKey(designId), queryFn: () => getDesign(designId) });
}

export function useDesign(designId: number) {
  return useQuery(designQueryOptions(designId));
}
