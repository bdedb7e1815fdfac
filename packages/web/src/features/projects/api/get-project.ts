import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Project } from '@/types/design-api';

import { projectsQueryKey } from './get-projects';

/** `GET /api/projects/:id`. */
export async function getProject(projectId: number): Promise<Project> {
  const { data } = await api.get<Project>(`/projects/${projectId}`);
  return data;
}

export function projectQueryOptions(projectId: number) {
  return queryOptions({ queryKey: [...projectsQueryKey, projectId], queryFn: () => getProject(projectId) });
}

export function useProject(projectId: number) {
  return useQuery(projectQueryOptions(projectId));
}
