import { Button } from '@blueprintjs/core';
import { DocumentIcon, DownloadIcon, ThIcon } from '@blueprintjs/icons';
import type { ReactElement } from 'react';

import { errorMessage } from '@/lib/api-errors';

import { DESIGN_DOCUMENTS, useDownloadDesignDocument, type DesignDocument } from '../api/download-design-documents';

const ICONS: Record<DesignDocument, ReactElement> = {
  'bom-csv': <DownloadIcon />,
  'bom-xlsx': <ThIcon />,
  'report-pdf': <DocumentIcon />,
};

/** Downloads of the bill of materials and the calculation report. */
export function DesignDocuments({
  designId,
  baseName,
  documents = Object.keys(DESIGN_DOCUMENTS) as DesignDocument[],
}: {
  designId: number;
  baseName: string;
  /** The files offered (default: all). */
  documents?: readonly DesignDocument[];
}) {
  const download = useDownloadDesignDocument();
  return (
    <div className="tc-documents">
      {documents.map((document) => (
        <Button
          key={document}
          icon={ICONS[document]}
          text={DESIGN_DOCUMENTS[document].label}
          loading={download.isPending && download.variables?.document === document}
          onClick={() => download.mutate({ designId, baseName, document })}
        />
      ))}
      {download.isError ? (
        <span className="tc-alert-error" role="alert">
          {DESIGN_DOCUMENTS[download.variables.document].label} could not be downloaded. {errorMessage(download.error)}
        </span>
      ) : null}
    </div>
  );
}
