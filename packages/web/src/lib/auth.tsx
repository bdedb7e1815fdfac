import { useQuery, useQueryClient } from '@tanstack/react-query';
import { createContext, useCallback, useContext, useEffect, useMemo, useState, type ReactNode } from 'react';

import type { ApiSchemas } from '@/api/schema';

import { api, setUnauthorizedHandler } from './api-client';
import { clearToken, getToken, setToken } from './session';

/**
 * The signed-in user as the session knows it: the fields `POST /api/auth/login` returns.
 * `GET /api/auth/me` returns these plus `active`, `createdAt` and `updatedAt`.
 */
export type SessionUser = ApiSchemas['SignedInUserDto'];

/** Body of `POST /api/auth/login`. */
export type LoginInput = ApiSchemas['LoginDto'];

export type LoginResponse = ApiSchemas['LoginResponseDto'];

export async function loginWithEmailAndPassword(input: LoginInput): Promise<LoginResponse> {
  const { data } = await api.post<LoginResponse>('/auth/login', input);
  return data;
}

export async function getMe(): Promise<SessionUser> {
  const { data } = await api.get<SessionUser>('/auth/me');
  return data;
}

export const meQueryKey = ['auth', 'me'] as const;

export type AuthStatus = 'loading' | 'signed-in' | 'signed-out' | 'error';

/** Why the last session ended: the user signed out, or the server stopped accepting the token. */
export type SessionEndReason = 'signed-out' | 'expired';

export interface AuthContextValue {
  status: AuthStatus;
  user: SessionUser | null;
  /** Set when the session ended during this visit. */
  endReason: SessionEndReason | null;
  /** The error that stopped loading the user (status `error`), e.g. the server is unreachable. */
  loadError: unknown;
  login: (input: LoginInput) => Promise<SessionUser>;
  logout: () => void;
  /** Replaces the signed-in user after a profile change, so every screen follows at once. */
  setUser: (user: SessionUser) => void;
  /** Retries loading the signed-in user after an error. */
  reload: () => void;
}

const AuthContext = createContext<AuthContextValue | null>(null);

export function AuthProvider({ children }: { children: ReactNode }) {
  const queryClient = useQueryClient();
  const [token, setTokenState] = useState<string | null>(() => getToken());
  const [endReason, setEndReason] = useState<SessionEndReason | null>(null);

  const me = useQuery({
    queryKey: meQueryKey,
    queryFn: getMe,
    enabled: token !== null,
    staleTime: Infinity,
    gcTime: Infinity,
  });

  const endSession = useCallback(
    (reason: SessionEndReason) => {
      clearToken();
      setTokenState(null);
      setEndReason(reason);
      // Nothing of the previous user's data may survive into the next session.
      queryClient.removeQueries();
    },
    [queryClient],
  );

  useEffect(() => setUnauthorizedHandler(() => endSession('expired')), [endSession]);

  const login = useCallback(
    async (input: LoginInput) => {
      const response = await loginWithEmailAndPassword(input);
      queryClient.removeQueries();
      setToken(response.accessToken);
      queryClient.setQueryData(meQueryKey, response.user);
      setTokenState(response.accessToken);
      setEndReason(null);
      return response.user;
    },
    [queryClient],
  );

  const logout = useCallback(() => endSession('signed-out'), [endSession]);

  const setUser = useCallback(
    (user: SessionUser) => {
      queryClient.setQueryData<SessionUser>(meQueryKey, (previous) => ({ ...previous, ...user }));
    },
    [queryClient],
  );

  const { refetch } = me;
  const reload = useCallback(() => {
    void refetch();
  }, [refetch]);

  const user = token !== null ? (me.data ?? null) : null;
  let status: AuthStatus;
  if (token === null) status = 'signed-out';
  else if (user) status = 'signed-in';
  else if (me.isError) status = 'error';
  else status = 'loading';

  const value = useMemo<AuthContextValue>(
    () => ({ status, user, endReason, loadError: me.error, login, logout, setUser, reload }),
    [status, user, endReason, me.error, login, logout, setUser, reload],
  );

  return <AuthContext.Provider value={value}>{children}</AuthContext.Provider>;
}

export function useAuth(): AuthContextValue {
  const value = useContext(AuthContext);
  if (!value) throw new Error('useAuth must be used inside <AuthProvider>');
  return value;
}

/** The signed-in user. Only for screens behind the sign-in (the protected layout guarantees one). */
export function useUser(): SessionUser {
  const { user } = useAuth();
  if (!user) throw new Error('useUser needs a signed-in user');
  return user;
}
