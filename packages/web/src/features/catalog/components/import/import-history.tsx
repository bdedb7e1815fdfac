import { Button, Callout, HTMLTable } from '@blueprintjs/core';
import { DownloadIcon } from '@blueprintjs/icons';

import { PageLoader } from '@/components/page-loader';
import { errorMessage } from '@/lib/api-errors';
import { formatNumber } from '@/lib/units';

import { useDownloadErrorReport } from '../../api/download-error-report';
import { useImports } from '../../api/get-imports';
import type { ImportMode } from '../../types';

export const IMPORT_MODE_LABELS: Record<ImportMode, string> = {
  all_or_nothing: 'All or nothing',
  skip_invalid: 'Valid rows only',
};

const whenFormat = new Intl.DateTimeFormat('en-GB', {
  day: 'numeric',
  month: 'short',
  year: 'numeric',
  hour: '2-digit',
  minute: '2-digit',
});

function whenText(iso: string): string {
  const date = new Date(iso);
  return Number.isNaN(date.getTime()) ? iso : whenFormat.format(date);
}

/** Every import so far, newest first: who, when, which file, how, and what it did. */
export function ImportHistory() {
  const imports = useImports();
  const download = useDownloadErrorReport();

  return (
    <section className="tc-section" aria-labelledby="import-history-title">
      <h2 className="tc-section-title" id="import-history-title">
        Earlier imports
      </h2>
      <div className="tc-panel">
        {imports.isPending ? <PageLoader label="Loading earlier imports" /> : null}
        {imports.isError ? (
          <Callout intent="danger" title="Earlier imports could not be loaded">
            {errorMessage(imports.error)}
          </Callout>
        ) : null}
        {download.isError ? (
          <Callout intent="danger" role="alert" className="tc-import-callout">
            The error report could not be downloaded. {errorMessage(download.error)}
          </Callout>
        ) : null}
        {imports.data && imports.data.length === 0 ? <p className="tc-muted">No file has been imported yet.</p> : null}
        {imports.data && imports.data.length > 0 ? (
          <HTMLTable className="tc-table" striped compact aria-label="Earlier imports">
            <thead>
              <tr>
                <th scope="col">When</th>
                <th scope="col">Who</th>
                <th scope="col">File</th>
                <th scope="col">Mode</th>
                <th scope="col" className="tc-number">
                  Added
                </th>
                <th scope="col" className="tc-number">
                  Updated
                </th>
                <th scope="col" className="tc-number">
                  Skipped
                </th>
                <th scope="col">Error report</th>
              </tr>
            </thead>
            <tbody>
              {imports.data.map((record) => (
                <tr key={record.id}>
                  <td>{whenText(record.createdAt)}</td>
                  <td>{record.user?.name ?? '—'}</td>
                  <td className="tc-import-file">{record.fileName}</td>
                  <td>{IMPORT_MODE_LABELS[record.mode] ?? record.mode}</td>
                  <td className="tc-number">{formatNumber(record.created, 0)}</td>
                  <td className="tc-number">{formatNumber(record.updated, 0)}</td>
                  <td className="tc-number">{formatNumber(record.rejected, 0)}</td>
                  <td>
                    {record.hasErrorReport ? (
                      <Button
                        variant="minimal"
                        size="small"
                        icon={<DownloadIcon />}
                        text="Download"
                        aria-label={`Download the error report of ${record.fileName}`}
                        loading={download.isPending && download.variables === record.id}
                        onClick={() => download.mutate(record.id)}
                      />
                    ) : (
                      <span className="tc-muted">—</span>
                    )}
                  </td>
                </tr>
              ))}
            </tbody>
          </HTMLTable>
        ) : null}
      </div>
    </section>
  );
}
