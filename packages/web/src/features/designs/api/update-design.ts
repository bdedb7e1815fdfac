import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import { errorStatus } from '@/lib/api-errors';
import type { Design, UpdateDesignInput } from '@/types/design-api';

import { designQueryKey } from './get-design';
import { projectDesignsQueryKey } from './get-project-designs';

/**
 * `PUT /api/designs/:id` with the version the user started from (engineer author or admin;
 * drafts only). A stale version answers 409 and nothing is written.
 */
export async function updateDesign({ designId, ...body }: UpdateDesignInput & { designId: number }): Promise<Design> {
  const { data } = await api.put<Design>(`/designs/${designId}`, body);
  return data;
}

/** The server refused because someone saved in between (optimistic locking). */
export function isEditConflict(error: unknown): boolean {
  return errorStatus(error) === 409;
}

export function useUpdateDesign() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateDesign,
    onSuccess: (design) => {
      queryClient.setQueryData(designQueryKey(design.id), design);
      return queryClient.invalidateQueries({ queryKey: projectDesignsQueryKey(design.projectId) });
    },
  });
}
