import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Mount, MountChanges } from '../types';
import { mountQueryKey } from './get-mount';
import { mountsQueryKey } from './get-mounts';

/** `PATCH /api/mounts/:id` (catalog manager, admin): the changed fields only; `{active: true}` restores. */
export async function updateMount(id: number, changes: MountChanges): Promise<Mount> {
  const { data } = await api.patch<Mount>(`/mounts/${id}`, changes);
  return data;
}

export function useUpdateMount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: MountChanges }) => updateMount(id, changes),
    onSuccess: (mount) => {
      queryClient.setQueryData(mountQueryKey(mount.id), mount);
      return queryClient.invalidateQueries({ queryKey: mountsQueryKey });
    },
  });
}
