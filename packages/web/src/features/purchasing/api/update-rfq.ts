import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Rfq, UpdateRfqInput } from '../types';
import { purchasingDesignsQueryKey } from './get-purchasing-designs';
import { rfqsQueryKey } from './get-rfqs';

/**
 * `PATCH /api/rfqs/:id {status, lines?, reference?, validUntil?, quotedAt?, note?}`: records a
 * quote (a unit price for every line), an order or a delivery. Forward only.
 */
export async function updateRfq({ rfqId, designId: _designId, ...body }: UpdateRfqInput): Promise<Rfq> {
  const { data } = await api.patch<Rfq>(`/rfqs/${rfqId}`, body);
  return data;
}

export function useUpdateRfq() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: updateRfq,
    onSuccess: (_rfq, input) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: rfqsQueryKey(input.designId) }),
        queryClient.invalidateQueries({ queryKey: purchasingDesignsQueryKey }),
      ]),
  });
}
