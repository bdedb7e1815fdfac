import { QueryClient, type DefaultOptions } from '@tanstack/react-query';

import { errorStatus } from './api-errors';

const MAX_RETRIES = 2;

/** Retry only what may succeed next time: network failures and 5xx, never a 4xx answer. */
export function shouldRetry(failureCount: number, error: unknown): boolean {
  const status = errorStatus(error);
  if (status !== undefined && status >= 400 && status < 500) return false;
  return failureCount < MAX_RETRIES;
}

export const queryConfig = {
  queries: {
    retry: shouldRetry,
    staleTime: 30_000,
    refetchOnWindowFocus: false,
  },
  mutations: {
    retry: false,
  },
} satisfies DefaultOptions;

export function createQueryClient(): QueryClient {
  return new QueryClient({ defaultOptions: queryConfig });
}

/** The app's query client (tests create their own with `createQueryClient`). */
export const queryClient = createQueryClient();
