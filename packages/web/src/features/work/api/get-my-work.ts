import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { MyWork } from '../types';

/** `GET /api/my-work` (any signed-in role). */
export async function getMyWork(): Promise<MyWork> {
  const { data } = await api.get<MyWork>('/my-work');
  return data;
}

export const myWorkQueryKey = ['my-work'] as const;

export function myWorkQueryOptions() {
  return queryOptions({ queryKey: myWorkQueryKey, queryFn: getMyWork });
}

export function useMyWork() {
  return useQuery(myWorkQueryOptions());
}
