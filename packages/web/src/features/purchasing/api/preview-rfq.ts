import { useMutation } from '@tanstack/react-query';

import { api } from '@/lib/api-client';

import type { RfqPreview, SendRfqInput } from '../types';

/** `POST /api/designs/:id/rfqs/preview`: what a request for quotation would send; nothing is sent or recorded. */
export async function previewRfq({ designId, ...body }: SendRfqInput): Promise<RfqPreview> {
  const { data } = await api.post<RfqPreview>(`/designs/${designId}/rfqs/preview`, body);
  return data;
}

export function usePreviewRfq() {
  return useMutation({ mutationFn: previewRfq });
}
