import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Mount, MountInput } from '../types';
import { mountsQueryKey } from './get-mounts';

/** `POST /api/mounts` (catalog manager, admin). A part number the supplier already has → 409. */
export async function createMount(input: MountInput): Promise<Mount> {
  const { data } = await api.post<Mount>('/mounts', input);
  return data;
}

export function useCreateMount() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: createMount,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: mountsQueryKey }),
  });
}
