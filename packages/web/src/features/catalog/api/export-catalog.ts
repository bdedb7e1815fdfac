import { useMutation } from '@tanstack/react-query';

import { downloadFile } from '@/lib/download-file';

function today(): string {
  return new Date().toISOString().slice(0, 10);
}

/**
 * `GET /api/mounts/export.csv` (any role): the active catalog in the import format, downloaded
 * through the API client so the sign-in token goes with it.
 */
export function exportCatalog(): Promise<string> {
  return downloadFile('/mounts/export.csv', `tacet-catalog-${today()}.csv`);
}

export function useExportCatalog() {
  return useMutation({ mutationFn: exportCatalog });
}
