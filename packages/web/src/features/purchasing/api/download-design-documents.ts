import { useMutation } from '@tanstack/react-query';

import { downloadFile } from '@/lib/download-file';

/** The files a released design gives its purchaser, with the file name used when none is sent. */
export type DesignDocument = 'bom-csv' | 'bom-xlsx' | 'report-pdf';

export const DESIGN_DOCUMENTS: Record<DesignDocument, { path: string; extension: string; label: string }> = {
  'bom-csv': { path: 'bom.csv', extension: 'csv', label: 'BOM (CSV)' },
  'bom-xlsx': { path: 'bom.xlsx', extension: 'xlsx', label: 'BOM (Excel)' },
  'report-pdf': { path: 'report.pdf', extension: 'pdf', label: 'Calculation report (PDF)' },
};

export interface DownloadDocumentInput {
  designId: number;
  /** Used for the fallback file name, e.g. "chw-pump-p-3-skid-rev2". */
  baseName: string;
  document: DesignDocument;
}

/**
 * `GET /api/designs/:id/bom.csv`, `bom.xlsx` and `report.pdf` through the API client (so the
 * sign-in token goes along), saved as a file.
 */
export function downloadDesignDocument({ designId, baseName, document }: DownloadDocumentInput): Promise<string> {
  const { path, extension } = DESIGN_DOCUMENTS[document];
  const suffix = document === 'report-pdf' ? 'report' : 'bom';
  return downloadFile(`/designs/${designId}/${path}`, `${baseName}-${suffix}.${extension}`);
}

export function useDownloadDesignDocument() {
  return useMutation({ mutationFn: downloadDesignDocument });
}
