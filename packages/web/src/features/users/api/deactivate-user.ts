import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { User } from '../types';
import { usersQueryKey } from './get-users';

/** `DELETE /api/users/:id` (admin): deactivates the account; rows are never deleted. */
export async function deactivateUser(id: number): Promise<User> {
  const { data } = await api.delete<User>(`/users/${id}`);
  return data;
}

export function useDeactivateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: deactivateUser,
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
