import { Button, Tooltip } from '@blueprintjs/core';
import { DownloadIcon } from '@blueprintjs/icons';

import { errorMessage } from '@/lib/api-errors';

import { useExportCatalog } from '../api/export-catalog';

/** Downloads the active catalog as CSV in the import format (any role). */
export function ExportCatalogButton() {
  const exportCatalog = useExportCatalog();
  return (
    <span className="tc-export">
      <Tooltip content="Every active mount, in the same CSV format the import reads" placement="bottom">
        <Button icon={<DownloadIcon />} text="Export CSV" loading={exportCatalog.isPending} onClick={() => exportCatalog.mutate()} />
      </Tooltip>
      {exportCatalog.isError ? (
        <span className="tc-alert-error tc-export-error" role="alert">
          {errorMessage(exportCatalog.error)}
        </span>
      ) : null}
    </span>
  );
}
