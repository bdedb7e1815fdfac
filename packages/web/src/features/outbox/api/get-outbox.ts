import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { OutboxMessageSummary } from '../types';

/**
 * `GET /api/outbox` (admin; demo and test mode): the messages the local mail catcher received,
 * newest first. Elsewhere the server answers 404.
 */
export async function getOutbox(): Promise<OutboxMessageSummary[]> {
  const { data } = await api.get<OutboxMessageSummary[]>('/outbox');
  return data;
}

export const outboxQueryKey = ['outbox'] as const;

export function outboxQueryOptions() {
  // Mail arrives while the page is open: look again whenever it is shown.
  return queryOptions({ queryKey: outboxQueryKey, queryFn: getOutbox, staleTime: 0 });
}

export function useOutbox() {
  return useQuery(outboxQueryOptions());
}
