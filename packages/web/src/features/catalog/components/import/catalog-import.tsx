import { Alert, Button, Callout, FileInput, FormGroup, Tab, Tabs, type TabId } from '@blueprintjs/core';
import { DownloadIcon, ImportIcon, TickCircleIcon, UploadIcon } from '@blueprintjs/icons';
import { IMPORT_ROW_LABELS } from '@tacet/vibration';
import { useState, type ChangeEvent } from 'react';

import { PageHeader } from '@/components/page-header';
import { errorMessage, errorStatus } from '@/lib/api-errors';
import { formatNumber } from '@/lib/units';

import { useDownloadErrorReport } from '../../api/download-error-report';
import { useImportMounts, type ImportOutcome } from '../../api/import-mounts';
import { ImportHistory } from './import-history';
import { ImportPreviewTable } from './import-preview-table';
import { ImportProblemsTable } from './import-problems-table';

import '../catalog.css';

/** Largest file the server takes (catalog API: 20 MB, else 413). */
export const MAX_IMPORT_BYTES = 20 * 1024 * 1024;

function rows(count: number): string {
  return count === 1 ? '1 row' : `${formatNumber(count, 0)} rows`;
}

function sentence(text: string): string {
  const trimmed = text.trim();
  const capital = trimmed.charAt(0).toUpperCase() + trimmed.slice(1);
  return /[.!?]$/.test(capital) ? capital : `${capital}.`;
}

function mounts(count: number): string {
  return count === 1 ? '1 mount' : `${formatNumber(count, 0)} mounts`;
}

/** 413, 415 and the rest in the words of this page. */
function requestFailure(error: unknown): string {
  switch (errorStatus(error)) {
    case 413:
      return 'This file is larger than the 20 MB the import takes. Split it into smaller files and import them one after another.';
    case 415:
      return `This file is not a CSV file. ${errorMessage(error)} Save the sheet as “CSV UTF-8” and choose that file.`;
    default:
      return errorMessage(error);
  }
}

/** A refusal that concerns the file as a whole (no row was read): wrong format, missing or unknown columns. */
function isFileProblem(outcome: ImportOutcome): boolean {
  return outcome.status === 422 && outcome.result.accepted === 0 && outcome.result.rejected === 0;
}

function Counts({ outcome }: { outcome: ImportOutcome }) {
  const { created, updated, rejected } = outcome.result;
  const preview = outcome.mode === 'dry-run' || outcome.status !== 200;
  const items: Array<[string, number, string]> = preview
    ? [
        ['To add', created, 'tc-import-count--add'],
        ['To update', updated, 'tc-import-count--update'],
        [IMPORT_ROW_LABELS.rejected, rejected, 'tc-import-count--rejected'],
      ]
    : [
        ['Added', created, 'tc-import-count--add'],
        ['Updated', updated, 'tc-import-count--update'],
        [IMPORT_ROW_LABELS.rejected, rejected, 'tc-import-count--rejected'],
      ];
  return (
    <dl className="tc-import-counts" aria-label={preview ? 'What the import would do' : 'What the import did'}>
      {items.map(([label, value, className]) => (
        <div key={label} className={`tc-import-count ${className}`}>
          <dt>{label}</dt>
          <dd>{formatNumber(value, 0)}</dd>
        </div>
      ))}
    </dl>
  );
}

/** The suppliers a file would create: a typo in a supplier's name shows here before anything is written. */
function NewSuppliers({ suppliers, preview }: { suppliers: ImportOutcome['result']['newSuppliers']; preview: boolean }) {
  if (suppliers.length === 0) return null;
  const likelyTypos = suppliers.filter((supplier) => supplier.similarTo !== null).length;
  return (
    <Callout
      intent={likelyTypos > 0 ? 'warning' : 'primary'}
      className="tc-import-callout"
      title={`${preview ? 'New suppliers this file would create' : 'New suppliers created'}: ${suppliers.length}`}
    >
      <ul className="tc-new-suppliers" aria-label="New suppliers">
        {suppliers.map((supplier) => (
          <li key={supplier.name}>
            <strong>{supplier.name}</strong> — row {supplier.firstRow}
            {supplier.rows > 1 ? ` and ${supplier.rows - 1} more` : ''}
            {supplier.similarTo ? (
              <span className="tc-new-supplier-typo">
                {' '}
                — very like the existing supplier <strong>{supplier.similarTo}</strong>: a typo?
              </span>
            ) : null}
          </li>
        ))}
      </ul>
      {preview ? <p className="tc-muted">If a name is misspelt, correct it in the file and check it again before importing.</p> : null}
    </Callout>
  );
}

export interface CatalogImportProps {
  /** After mounts were written (e.g. to refresh the supplier list, which an import can add to). */
  onImported?: () => void;
}

/**
 * The import page: check a CSV file first (nothing is written), read every problem, then import
 * all of it — or, explicitly, only its valid rows, with the others in a downloadable error report.
 */
export function CatalogImport({ onImported }: CatalogImportProps) {
  const importMounts = useImportMounts();
  const errorReport = useDownloadErrorReport();
  const [file, setFile] = useState<File | null>(null);
  const [check, setCheck] = useState<ImportOutcome | null>(null);
  const [done, setDone] = useState<ImportOutcome | null>(null);
  const [failure, setFailure] = useState<string | null>(null);
  const [tab, setTab] = useState<TabId>('problems');
  const [confirmingSkip, setConfirmingSkip] = useState(false);
  const [pending, setPending] = useState<'dry-run' | 'all-or-nothing' | 'skip-invalid' | null>(null);

  const chooseFile = (event: ChangeEvent<HTMLInputElement>) => {
    const chosen = event.target.files?.[0] ?? null;
    setFile(chosen);
    setCheck(null);
    setDone(null);
    setFailure(null);
    errorReport.reset();
  };

  const send = async (mode: 'dry-run' | 'all-or-nothing' | 'skip-invalid') => {
    if (!file) return;
    setFailure(null);
    setPending(mode);
    try {
      const outcome = await importMounts.mutateAsync({ file, mode });
      if (mode === 'dry-run' || outcome.status !== 200) {
        setCheck(outcome);
        setDone(null);
        setTab(outcome.result.errors.length > 0 ? 'problems' : 'preview');
      } else {
        setDone(outcome);
        setCheck(null);
        onImported?.();
      }
    } catch (error) {
      setFailure(requestFailure(error));
    } finally {
      setPending(null);
    }
  };

  const tooLarge = file !== null && file.size > MAX_IMPORT_BYTES;
  const result = check?.result;
  const canImport = check !== null && !isFileProblem(check) && result !== undefined && result.accepted > 0;
  const hasProblems = result !== undefined && result.rejected > 0;

  return (
    <>
      <PageHeader
        title="Import mounts"
        description="Add and update catalog mounts from a CSV file. Rows are matched by supplier and part number: known mounts are updated, new ones added."
      />
      <section className="tc-panel tc-import-step" aria-labelledby="import-file-title">
        <h2 className="tc-section-title" id="import-file-title">
          1. Choose and check a file
        </h2>
        <p className="tc-muted tc-import-lead">
          One mount per row, with a header row. Required columns: <code>supplier</code>, <code>part_number</code>, <code>mount_type</code>,{' '}
          <code>rated_load_n</code> or <code>rated_load_lbf</code>, <code>vertical_stiffness_n_per_mm</code> or{' '}
          <code>vertical_stiffness_lbf_per_in</code>, and <code>damping_ratio</code> or <code>loss_factor</code>. Checking writes nothing.
        </p>
        <div className="tc-import-choose">
          <FormGroup label="Catalog file (CSV, up to 20 MB)" labelFor="import-file" className="tc-import-file-group">
            <FileInput
              fill
              text={file ? file.name : 'Choose a CSV file…'}
              buttonText="Browse"
              hasSelection={file !== null}
              onInputChange={chooseFile}
              inputProps={{ id: 'import-file', accept: '.csv,text/csv', name: 'file' }}
            />
          </FormGroup>
          <Button
            intent="primary"
            icon={<TickCircleIcon />}
            text="Check file"
            disabled={!file || tooLarge || pending !== null}
            loading={pending === 'dry-run'}
            onClick={() => void send('dry-run')}
          />
        </div>
        {tooLarge ? (
          <Callout intent="danger" role="alert" className="tc-import-callout">
            This file is larger than the 20 MB the import takes. Split it into smaller files.
          </Callout>
        ) : null}
        {failure ? (
          <Callout intent="danger" role="alert" title="The file was not accepted" className="tc-import-callout">
            {failure}
          </Callout>
        ) : null}
      </section>

      {check && isFileProblem(check) ? (
        <section className="tc-panel tc-import-step" aria-labelledby="import-report-title">
          <h2 className="tc-section-title" id="import-report-title">
            2. Problems with {check.fileName}
          </h2>
          <Callout intent="danger" role="alert" title="This file cannot be imported" className="tc-import-callout">
            {check.message ? `${sentence(check.message)} ` : ''}
            Nothing was written. Fix the columns below and check the file again.
          </Callout>
          <ImportProblemsTable problems={check.result.errors} truncated={check.result.errorsTruncated} />
        </section>
      ) : null}

      {check && result && !isFileProblem(check) ? (
        <section className="tc-panel tc-import-step" aria-labelledby="import-report-title">
          <h2 className="tc-section-title" id="import-report-title">
            2. What {check.fileName} holds
          </h2>
          <p className="tc-import-summary">
            {rows(result.accepted + result.rejected)} read: {rows(result.accepted)} valid
            {hasProblems ? `, ${rows(result.rejected)} ${IMPORT_ROW_LABELS.rejected.toLowerCase()}` : ''}.
          </p>
          <Counts outcome={check} />
          <NewSuppliers suppliers={result.newSuppliers} preview={check.mode === 'dry-run' || check.status !== 200} />
          <Tabs id="import-review" selectedTabId={tab} onChange={setTab} className="tc-import-tabs">
            <Tab
              id="problems"
              title="Problems"
              tagContent={formatNumber(result.errors.length, 0) + (result.errorsTruncated ? '+' : '')}
              tagProps={{ intent: result.errors.length > 0 ? 'danger' : 'none', minimal: true }}
              panel={
                result.errors.length > 0 ? (
                  <ImportProblemsTable problems={result.errors} truncated={result.errorsTruncated} />
                ) : (
                  <p className="tc-muted">No problems: every row can be imported.</p>
                )
              }
            />
            <Tab
              id="preview"
              title="Accepted rows"
              tagContent={formatNumber(result.accepted, 0)}
              tagProps={{ minimal: true }}
              panel={<ImportPreviewTable rows={result.preview} accepted={result.accepted} />}
            />
          </Tabs>
          {canImport ? (
            <div className="tc-import-actions">
              <h3 className="tc-subsection-title">3. Import</h3>
              <div className="tc-import-buttons">
                <Button
                  intent="primary"
                  icon={<ImportIcon />}
                  text="Import all"
                  disabled={hasProblems || pending !== null}
                  loading={pending === 'all-or-nothing'}
                  onClick={() => void send('all-or-nothing')}
                />
                {hasProblems ? (
                  <Button
                    icon={<UploadIcon />}
                    text="Import the valid rows only"
                    disabled={pending !== null}
                    loading={pending === 'skip-invalid'}
                    onClick={() => setConfirmingSkip(true)}
                  />
                ) : null}
              </div>
              {hasProblems ? (
                <p className="tc-muted tc-import-why" id="import-all-why">
                  “Import all” is off because {rows(result.rejected)} {result.rejected === 1 ? 'has' : 'have'} problems: by default an
                  import is all or nothing, so a file with any invalid row writes nothing. Fix the file and check it again, or import the
                  valid rows only and download the rest as an error report.
                </p>
              ) : (
                <p className="tc-muted tc-import-why">
                  Every row is valid: {mounts(result.created)} will be added and {mounts(result.updated)} updated.
                </p>
              )}
            </div>
          ) : (
            <Callout intent="warning" className="tc-import-callout">
              No row of this file can be imported. Fix the problems and check the file again.
            </Callout>
          )}
        </section>
      ) : null}

      {done ? (
        <section className="tc-panel tc-import-step" aria-labelledby="import-done-title">
          <h2 className="tc-section-title" id="import-done-title">
            Imported {done.fileName}
          </h2>
          <Callout intent={done.result.rejected > 0 ? 'warning' : 'success'} role="status" className="tc-import-callout">
            <p>
              {mounts(done.result.created)} added and {mounts(done.result.updated)} updated.
              {done.result.rejected > 0
                ? ` ${done.result.rejected === 1 ? `1 ${IMPORT_ROW_LABELS.rejectedRows.replace(/s$/, '')} was` : `${formatNumber(done.result.rejected, 0)} ${IMPORT_ROW_LABELS.rejectedRows} were`} not imported.`
                : ''}
            </p>
            {done.result.rejected > 0 && done.result.importId !== null ? (
              <Button
                icon={<DownloadIcon />}
                text="Download the error report (CSV)"
                loading={errorReport.isPending}
                onClick={() => errorReport.mutate(done.result.importId as number)}
              />
            ) : null}
            {errorReport.isError ? (
              <p className="tc-alert-error" role="alert">
                The error report could not be downloaded. {errorMessage(errorReport.error)}
              </p>
            ) : null}
          </Callout>
          <Counts outcome={done} />
        </section>
      ) : null}

      <Alert
        isOpen={confirmingSkip}
        intent="warning"
        icon={<UploadIcon />}
        confirmButtonText="Import the valid rows"
        cancelButtonText="Cancel"
        onConfirm={() => {
          setConfirmingSkip(false);
          void send('skip-invalid');
        }}
        onCancel={() => setConfirmingSkip(false)}
      >
        {result ? (
          <>
            <p>
              <strong>
                Import {rows(result.accepted)} and skip {rows(result.rejected)}?
              </strong>
            </p>
            <p>
              The {rows(result.rejected)} with problems will not be imported. You can download them with their problems as an error report,
              fix them and import that file again.
            </p>
          </>
        ) : null}
      </Alert>

      <ImportHistory />
    </>
  );
}
