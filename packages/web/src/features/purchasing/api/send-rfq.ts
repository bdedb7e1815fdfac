import { useMutation, useQueryClient } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { Rfq, SendRfqInput } from '../types';
import { purchasingDesignsQueryKey } from './get-purchasing-designs';
import { rfqsQueryKey } from './get-rfqs';

/**
 * `POST /api/designs/:id/rfqs {supplierId, message?}`: e-mails the supplier its BOM lines. A
 * failed send still answers 201, with status `failed` and the reason, so nothing is lost.
 */
export async function sendRfq({ designId, supplierId, message, machineCount }: SendRfqInput): Promise<Rfq> {
  const body = { supplierId, ...(message ? { message } : {}), ...(machineCount && machineCount !== 1 ? { machineCount } : {}) };
  const { data } = await api.post<Rfq>(`/designs/${designId}/rfqs`, body);
  return data;
}

export function useSendRfq() {
  const queryClient = useQueryClient();
  return useMutation({
    mutationFn: sendRfq,
    onSuccess: (rfq) =>
      Promise.all([
        queryClient.invalidateQueries({ queryKey: rfqsQueryKey(rfq.designId) }),
        queryClient.invalidateQueries({ queryKey: purchasingDesignsQueryKey }),
        queryClient.invalidateQueries({ queryKey: ['my-work'] }),
      ]),
  });
}
