import { useMutation } from '@tanstack/react-query';

import { downloadFile } from '@/lib/download-file';

export interface OutboxAttachmentRef {
  messageId: number;
  /** 0-based position in the message's attachment list. */
  index: number;
  filename: string;
}

/**
 * `GET /api/outbox/:id/attachments/:index` (admin): the attachment's bytes, fetched through
 * the API client (so the bearer token goes with it) and saved through the browser's download.
 */
export function downloadOutboxAttachment({ messageId, index, filename }: OutboxAttachmentRef): Promise<string> {
  return downloadFile(`/outbox/${messageId}/attachments/${index}`, filename);
}

export function useDownloadOutboxAttachment() {
  return useMutation({ mutationFn: downloadOutboxAttachment });
}
