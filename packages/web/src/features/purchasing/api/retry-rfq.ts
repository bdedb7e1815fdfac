import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Rfq } from '../types';
import { purchasingDesignsQueryKey } from './get-purchasing-designs';
import { rfqsQueryKey } from './get-rfqs';

/** `POST /api/rfqs/:id/retry`: sends a failed request for quotation again. */
export async function retryRfq(rfqId: number): Promise<Rfq> {
  const { data } = await api.post<Rfq>(`/rfqs/${rfqId}/retry`);
  return data;
}

export function useRetryRfq() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: retryRfq,
    onSuccess: (rfq) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: rfqsQueryKey(rfq.designId) }),
        queryClient.invalidateQueries({ queryKey: purchasingDesignsQueryKey }),
      ]),
  });
}
