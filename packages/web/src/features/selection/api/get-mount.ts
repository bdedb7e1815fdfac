import { queryOptions, useQueries } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';

/** The part of a catalog mount the candidate detail needs (its damping). */
export type MountDampingData = Pick<
  ApiSchemas['MountDto'],
  'id' | 'partNumber' | 'dampingModel' | 'dampingRatio' | 'lossFactor' | 'dynamicStiffnessRatio'
>;

/** `GET /api/mounts/:id` (any signed-in role). */
export async function getMount(mountId: number): Promise<MountDampingData> {
  const { data } = await api.get<MountDampingData>(`/mounts/${mountId}`);
  return data;
}

export function mountQueryOptions(mountId: number) {
  return queryOptions({
    queryKey: ['mounts', mountId] as const,
    queryFn: () => getMount(mountId),
    staleTime: 5 * 60_000,
    retry: false,
  });
}

/** The catalog rows of several mounts, fetched in parallel. */
export function useMounts(mountIds: readonly number[], enabled = true) {
  return useQueries({
    queries: mountIds.map((id) => ({ ...mountQueryOptions(id), enabled })),
  });
}
