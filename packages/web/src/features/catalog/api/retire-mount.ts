import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Mount } from '../types';
import { mountQueryKey } from './get-mount';
import { mountsQueryKey } from './get-mounts';

/**
 * `DELETE /api/mounts/:id` (catalog manager, admin): retires the mount (`active: false`). Rows are
 * never deleted, so released designs that chose it keep their data.
 */
export async function retireMount(id: number): Promise<Mount> {
  const { data } = await api.delete<Mount>(`/mounts/${id}`);
  return data;
}

export function useRetireMount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retireMount,
    onSuccess: (mount) => {
      queryClient.setQueryData(mountQueryKey(mount.id), mount);
      return queryClient.invalidateQueries({ queryKey: mountsQueryKey });
    },
  });
}
