import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { UpdateUserInput, User } from '../types';
import { usersQueryKey } from './get-users';

/** `PATCH /api/users/:id` (admin). An admin cannot deactivate or demote themselves (409). */
export async function updateUser(id: number, changes: UpdateUserInput): Promise<User> {
  const { data } = await api.patch<User>(`/users/${id}`, changes);
  return data;
}

export function useUpdateUser() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: ({ id, changes }: { id: number; changes: UpdateUserInput }) => updateUser(id, changes),
    onSuccess: () => queryClient.invalidateQueries({ queryKey: usersQueryKey }),
  });
}
