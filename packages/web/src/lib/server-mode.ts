import { useQuery } from '@tanstack/react-query';

import type { ApiSchemas } from '@/api/schema';

import { api } from './api-client';

type Health = ApiSchemas['HealthDto'];

/**
 * Whether the server runs in demo mode (`GET /api/health` says so, signed in or not). Texts
 * meant only for the demo — the sign-in page's note on demo accounts — show only then; while
 * the answer is pending or when it fails, the app assumes it is not a demo.
 */
export function useDemoMode(): boolean {
  const { data } = useQuery({
    queryKey: ['server-health'],
    queryFn: async () => (await api.get<Health>('/health')).data,
    staleTime: Infinity,
    retry: false,
  });
  return data?.demo === true;
}
