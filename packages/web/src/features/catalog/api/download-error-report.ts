import { useMutation } from '@tanstack/react-query';

import { downloadFile } from '@/lib/download-file';

/**
 * `GET /api/mounts/imports/:id/errors.csv` (catalog manager, admin): the rejected rows with their
 * problems, to fix and import again. Saved through the browser's download.
 */
export function downloadErrorReport(importId: number): Promise<string> {
  return downloadFile(`/mounts/imports/${importId}/errors.csv`, `tacet-import-${importId}-problems.csv`);
}

export function useDownloadErrorReport() {
  return useMutation({ mutationFn: downloadErrorReport });
}
