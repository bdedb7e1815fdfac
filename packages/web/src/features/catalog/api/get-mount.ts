import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Mount } from '../types';
import { mountsQueryKey } from './get-mounts';

/** `GET /api/mounts/:id` (any role); 404 for an unknown id. */
export async function getMount(id: number, signal?: AbortSignal): Promise<Mount> {
  const { data } = await api.get<Mount>(`/mounts/${id}`, { signal });
  return data;
}

export function mountQueryKey(id: number) {
  return [...mountsQueryKey, 'detail', id] as const;
}

export function mountQueryOptions(id: number) {
  return queryOptions({ queryKey: mountQueryKey(id), queryFn: ({ signal }) => getMount(id, signal) });
}

/** One mount; `placeholder` (the row the user clicked) shows at once while it loads. */
export function useMount(id: number | null, placeholder?: Mount) {
  return useQuery({
    ...mountQueryOptions(id ?? 0),
    enabled: id !== null,
    placeholderData: placeholder && placeholder.id === id ? placeholder : undefined,
  });
}
