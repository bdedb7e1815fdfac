import { useMutation } from '@tanstack/react-query';

import { api } from '@/lib/api-client';
import type { Design } from '@/types/design-api';

/**
 * `POST /api/designs/:id/revisions` (engineer, admin; from a released or superseded design):
 * a new draft with the same input and chosen mounts and the next revision number.
 */
export async function createRevision(designId: number): Promise<Design> {
  const { data } = await api.post<Design>(`/designs/${designId}/revisions`);
  return data;
}

export function useCreateRevision() {
  return useMutation({ mutationFn: createRevision });
}
