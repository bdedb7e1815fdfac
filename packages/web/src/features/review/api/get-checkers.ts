import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { PersonRef } from '@/types/design-api';

/** `GET /api/designs/:id/checkers`: who may be asked to check the design (engineers and admins other than its author). */
export async function getCheckers(designId: number): Promise<PersonRef[]> {
  const { data } = await api.get<PersonRef[]>(`/designs/${designId}/checkers`);
  return data;
}

export function useCheckers(designId: number, enabled: boolean) {
  return useQuery({ ...queryOptions({ queryKey: ['design-checkers', designId], queryFn: () => getCheckers(designId) }), enabled });
}
