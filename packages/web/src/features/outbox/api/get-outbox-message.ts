import { queryOptions, useQuery } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { OutboxMessage } from '../types';
import { outboxQueryKey } from './get-outbox';

/** `GET /api/outbox/:id` (admin): one captured message with its sender and text. */
export async function getOutboxMessage(id: number): Promise<OutboxMessage> {
  const { data } = await api.get<OutboxMessage>(`/outbox/${id}`);
  return data;
}

export function outboxMessageQueryOptions(id: number) {
  // A captured message never changes; it only drops out of the store eventually.
  return queryOptions({ queryKey: [...outboxQueryKey, id], queryFn: () => getOutboxMessage(id) });
}

export function useOutboxMessage(id: number) {
  return useQuery(outboxMessageQueryOptions(id));
}
