import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import { projectsQueryKey } from './get-projects';

/** `DELETE /api/projects/:id` (the owner or an admin; 409 while it holds a released design). */
export async function deleteProject(projectId: number): Promise<void> {
  await api.delete(`/projects/${projectId}`);
}

export function useDeleteProject() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deleteProject,
    onSuccess: (_, projectId) => {
      queryClient.removeQueries({ queryKey: [...projectsQueryKey, projectId] });
      return queryClient.invalidateQueries({ queryKey: projectsQueryKey, exact: true });
    },
  });
}
