import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { DesignListItem } from '@/types/design-api';

/** `GET /api/projects/:id/designs` (purchasers get only released and superseded ones). */
export async function getProjectDesigns(projectId: number): Promise<DesignListItem[]> {
  const { data } = await api.get<DesignListItem[]>(`/projects/${projectId}/designs`);
  return data;
}

export const projectDesignsQueryKey = (projectId: number) => ['projects', projectId, 'designs'] as const;

export function projectDesignsQueryOptions(projectId: number) {
  return queryOptions({ queryKey: projectDesignsQueryKey(projectId), queryFn: () => getProjectDesigns(projectId) });
}

export function useProjectDesigns(projectId: number) {
  return useQuery(projectDesignsQueryOptions(projectId));
}
