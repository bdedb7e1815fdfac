import { useMutation } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';
import { api } from '@/lib/api-client';
import { useAuth, type SessionUser } from '@/lib/auth';

/** Body of `PATCH /api/auth/me`: a user may change only their own name and unit preference. */
export type UpdateProfileInput = ApiSchemas['UpdateProfileDto'];

export async function updateProfile(input: UpdateProfileInput): Promise<SessionUser> {
  const { data } = await api.patch<SessionUser>('/auth/me', input);
  return data;
}

/** Saves the profile and puts the answer into the session, so every page switches units at once. */
export function useUpdateProfile() {
  const { setUser } = useAuth();
  return useMutation({
    mutationFn: updateProfile,
    onSuccess: (user) => setUser(user),
  });
}
