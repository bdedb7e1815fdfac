import { useMutation } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';

/** Body of `POST /api/auth/me/password`. */
export type ChangePasswordInput = ApiSchemas['ChangePasswordDto'];

/** Answers 204; a wrong current password answers 400 "Current password is incorrect". */
export async function changePassword(input: ChangePasswordInput): Promise<void> {
  await api.post('/auth/me/password', input);
}

export function useChangePassword() {
  return useMutation({ mutationFn: changePassword });
}
