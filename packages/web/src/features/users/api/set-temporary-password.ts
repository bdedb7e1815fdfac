import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { User } from '../types';
import { usersQueryKey } from './get-users';

/** `POST /api/users/:id/temporary-password {password}` (admin): the person must choose a new one at the next sign-in. */
export async function setTemporaryPassword({ id, password }: { id: number; password: string }): Promise<User> {
  const { data } = await api.post<User>(`/users/${id}/temporary-password`, { password });
  return data;
}

export function useSetTemporaryPassword() {
  const queryClient = useQueryClient();
  return useMutation({ mutationFn: setTemporaryPassword, onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }) });
}
