import { useMutation } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';

export type PasswordResetAnswer = ApiSchemas['PasswordResetAnswerDto'];

/** `POST /api/auth/password-reset {email}`: always 202 with the same answer, whether or not the address has an account. */
export async function requestPasswordReset(input: ApiSchemas['PasswordResetRequestDto']): Promise<PasswordResetAnswer> {
  const { data } = await api.post<PasswordResetAnswer>('/auth/password-reset', input);
  return data;
}

/** `POST /api/auth/password-reset/confirm {token, password}`: 200; a used or expired link answers 400. */
export async function confirmPasswordReset(input: ApiSchemas['PasswordResetConfirmDto']): Promise<PasswordResetAnswer> {
  const { data } = await api.post<PasswordResetAnswer>('/auth/password-reset/confirm', input);
  return data;
}

export function useRequestPasswordReset() {
  return useMutation({ mutationFn: requestPasswordReset });
}

export function useConfirmPasswordReset() {
  return useMutation({ mutationFn: confirmPasswordReset });
}
