import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { CreateProjectInput, Project } from '@/types/design-api';

import { projectsQueryKey } from './get-projects';

/** `POST /api/projects` (engineer, admin) → 201 Project. */
export async function createProject(input: CreateProjectInput): Promise<Project> {
  const { data } = await api.post<Project>('/projects', input);
  return data;
}

export function useCreateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createProject,
    onSuccess: (project) => {
      queryClient.setQueryData([...projectsQueryKey, project.id], project);
      return queryClient.invalidateQueries({ queryKey: projectsQueryKey, exact: true });
    },
  });
}
