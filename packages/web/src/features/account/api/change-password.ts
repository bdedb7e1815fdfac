import { useMutation } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

/** Body of `POST /api/auth/me/password`. */
export interface ChangePasswordInput {
  currentPassword: string;
  newPassword: string;
}

/** Answers 204; a wrong current password answers 400 "Current password is incorrect". */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await api.post('/auth/me/password', input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
