import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Project } from '@/types/design-api';

/** `GET /api/projects` (any signed-in role). */
export async function getProjects(): Promise<Project[]> {
  const { data } = await api.get<Project[]>('/projects');
  return data;
}

export const projectsQueryKey = ['projects'] as const;

export function projectsQueryOptions() {
  return queryOptions({ queryKey: projectsQueryKey, queryFn: getProjects });
}

export function useProjects() {
  return useQuery(projectsQueryOptions());
}
