import { useMutation, useQueryClient } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';
import type { Project } from '@/types/design-api';

import { projectsQueryKey } from './get-projects';

export type UpdateProjectInput = ApiSchemas['UpdateProjectDto'] & { projectId: number };

/** `PATCH /api/projects/:id` (the owner or an admin): rename, archive or restore. */
export async function updateProject({ projectId, ...body }: UpdateProjectInput): Promise<Project> {
  const { data } = await api.patch<Project>(`/projects/${projectId}`, body);
  return data;
}

export function useUpdateProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateProject,
    onSuccess: (project) => {
      queryClient.setQueryData([...projectsQueryKey, project.id], project);
      return queryClient.invalidateQueries({ queryKey: projectsQueryKey, exact: true });
    },
  });
}
