import { useMutation, useQueryClient } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';
import type { Design } from '@/types/design-api';

import { designQueryKey } from './get-design';
import { projectDesignsQueryKey } from './get-project-designs';

/** The project and the body (`input` omitted: the server starts from its default input). */
export type CreateDesignInput = ApiSchemas['CreateDesignDto'] & { projectId: number };

/** `POST /api/projects/:id/designs` (engineer, admin) → 201 Design (revision 1, draft, version 1). */
export async function createDesign({ projectId, ...body }: CreateDesignInput): Promise<Design> {
  const { data } = await api.post<Design>(`/projects/${projectId}/designs`, body);
  return data;
}

export function useCreateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createDesign,
    onSuccess: (design) => {
      queryClient.setQueryData(designQueryKey(design.id), design);
      // The project's design list and its design count both change.
      return queryClient.invalidateQueries({ queryKey: ['projects'] });
    },
    onSettled: (_design, _error, variables) => queryClient.invalidateQueries({ queryKey: projectDesignsQueryKey(variables.projectId) }),
  });
}
