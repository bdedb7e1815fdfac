import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { User } from '../types';

/** `GET /api/users` (admin): every account, sorted by email. */
export async function getUsers(): Promise<User[]> {
  const { data } = await api.get<User[]>('/users');
  return data;
}

export const usersQueryKey = ['users'] as const;

export function usersQueryOptions() {
  return queryOptions({ queryKey: usersQueryKey, queryFn: getUsers });
}

export function useUsers() {
  return useQuery(usersQueryOptions());
}
