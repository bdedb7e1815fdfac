import { screen, waitFor, within } from '@testing-library/react';

import { makeImportRecord, makeImportResult, makePreviewRow } from '@/testing/catalog-fakes';
import { installFakeApi, type FakeApi, type FakeRequest } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

const FILE_LABEL = 'Catalog file (CSV, up to 20 MB)';

/** A small invented catalog file with two good rows and two bad ones. */
function csvFile(name = 'spring-range.csv'): File {
  const text = [
    'supplier,part_number,mount_type,rated_load_n,vertical_stiffness_n_per_mm,damping_ratio',
    'Quillmere Isolation,QM-S9-01000,open_spring,1000,40,0.01',
    'Quillmere Isolation,QM-S9-02000,open_spring,2000,80,0.01',
    'Quillmere Isolation,QM-S9-03000,open_spring,-3000,120,0.01',
    'Quillmere Isolation,QM-S9-04000,coil_thing,4000,160,0.01',
  ].join('\n');
  return new File([text], name, { type: 'text/csv' });
}

const PROBLEMS = [
  { row: 4, column: 'rated_load_n', message: 'must be a positive number' },
  {
    row: 5,
    column: 'mount_type',
    message: 'must be one of elastomer_pad, elastomer_mount, open_spring, housed_spring, restrained_spring, air_spring, wire_rope',
  },
];

const PREVIEW = [
  makePreviewRow({
    row: 2,
    supplierName: 'Quillmere Isolation',
    partNumber: 'QM-S9-01000',
    ratedLoadN: 1000,
    verticalStiffnessNPerM: 40_000,
    action: 'create',
  }),
  makePreviewRow({
    row: 3,
    supplierName: 'Quillmere Isolation',
    partNumber: 'QM-S9-02000',
    ratedLoadN: 2000,
    verticalStiffnessNPerM: 80_000,
    action: 'update',
  }),
];

const CHECKED = makeImportResult({ accepted: 2, rejected: 2, created: 1, updated: 1, errors: PROBLEMS, preview: PREVIEW });

/** The import endpoint answering as the contract says: a dry run reports, skip writes the valid rows. */
function serveImport(fake: FakeApi = installFakeApi()) {
  const history = [makeImportRecord({ id: 3, fileName: 'older.csv', mode: 'skip_invalid', rejected: 4, hasErrorReport: true })];
  fake
    .on('get', '/mounts/imports', () => ({ status: 200, data: history }))
    .on('post', '/mounts/import', ({ query }) => {
      if (query.dryRun === 'true') return { status: 200, data: CHECKED };
      if (query.onInvalid === 'skip') {
        history.unshift(
          makeImportRecord({ id: 7, mode: 'skip_invalid', accepted: 2, rejected: 2, created: 1, updated: 1, hasErrorReport: true }),
        );
        return { status: 200, data: { ...CHECKED, importId: 7 } };
      }
      return { status: 422, data: { statusCode: 422, message: 'The file has invalid rows; nothing was imported', ...CHECKED } };
    })
    .on('get', '/mounts/imports/:id/errors.csv', ({ params }) => ({
      status: 200,
      data: 'row,column,message\n4,rated_load_n,must be a positive number\n',
      headers: { 'content-disposition': `attachment; filename="tacet-import-${params.id}-errors.csv"` },
    }));
  return fake;
}

function importCalls(fake: FakeApi): FakeRequest[] {
  return fake.calls('post', '/mounts/import');
}

async function chooseAndCheck(user: ReturnType<typeof renderApp>['user'], file = csvFile()) {
  await user.upload(await screen.findByLabelText(FILE_LABEL), file);
  await user.click(screen.getByRole('button', { name: 'Check file' }));
}

/** Catches what the page hands to the browser as a download. */
function catchDownloads(): string[] {
  const names: string[] = [];
  Object.defineProperty(URL, 'createObjectURL', { value: vi.fn(() => 'blob:tacet-test'), configurable: true });
  Object.defineProperty(URL, 'revokeObjectURL', { value: vi.fn(), configurable: true });
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    names.push(this.download);
  });
  return names;
}

// Whole-app renders with Blueprint's overlays take a few seconds each on a busy 2-core machine:
// this is how long a test may run before it is abandoned, not a speed check.
vi.setConfig({ testTimeout: 30_000 });

describe('Catalog import page', () => {
  it('checks a file without writing and lists every problem with its row and column', async () => {
    const fake = serveImport();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);

    const problems = await screen.findByRole('table', { name: 'Problems in the file' });
    const rows = within(problems).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    expect(
      within(rows[0]!)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual(['4', 'rated_load_n', 'must be a positive number']);
    expect(rows[1]).toHaveTextContent('mount_type');

    const request = importCalls(fake)[0]!;
    expect(request.query).toEqual({ dryRun: 'true' });
    expect(request.body).toBeInstanceOf(FormData);
    expect(((request.body as FormData).get('file') as File).name).toBe('spring-range.csv');

    const counts = screen.getByLabelText('What the import would do');
    expect(within(counts).getByText('To add').nextElementSibling).toHaveTextContent('1');
    expect(within(counts).getByText('To update').nextElementSibling).toHaveTextContent('1');
    expect(within(counts).getByText('Rejected').nextElementSibling).toHaveTextContent('2');
  });

  it('keeps “Import all” off while the file has problems, and says why', async () => {
    serveImport();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);

    expect(await screen.findByRole('button', { name: 'Import all' })).toBeDisabled();
    expect(screen.getByText(/by default an import is all or nothing, so a file with any invalid row writes nothing/)).toBeInTheDocument();
  });

  it('shows the accepted rows in the user’s units', async () => {
    serveImport();
    const { user } = renderApp({ signedInAs: 'admin', path: '/catalog/import' });
    await chooseAndCheck(user);
    await user.click(await screen.findByRole('tab', { name: /Accepted rows/ }));
    const preview = await screen.findByRole('table', { name: 'Rows that will be imported' });
    const first = within(preview).getAllByRole('row')[1]!;
    expect(first).toHaveTextContent('QM-S9-01000');
    expect(first).toHaveTextContent('Add');
    expect(first).toHaveTextContent('1,000');
    expect(first).toHaveTextContent('40.0');
  });

  it('imports the valid rows only after confirming, and offers the error report', async () => {
    const fake = serveImport();
    const downloads = catchDownloads();
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);

    await user.click(await screen.findByRole('button', { name: 'Import the valid rows only' }));
    const confirm = await screen.findByRole('alertdialog');
    expect(confirm).toHaveTextContent('Import 2 rows and skip 2 rows?');
    expect(importCalls(fake)).toHaveLength(1);
    await user.click(within(confirm).getByRole('button', { name: 'Import the valid rows' }));

    await waitFor(() => expect(importCalls(fake)).toHaveLength(2));
    expect(importCalls(fake)[1]!.query).toEqual({ onInvalid: 'skip' });
    const done = await screen.findByRole('region', { name: 'Imported spring-range.csv' });
    expect(done).toHaveTextContent('1 mount added and 1 mount updated. 2 rejected rows were not imported.');
    expect(within(done).getByText('Added').nextElementSibling).toHaveTextContent('1');
    expect(within(done).getByText('Rejected').nextElementSibling).toHaveTextContent('2');

    await user.click(within(done).getByRole('button', { name: 'Download the error report (CSV)' }));
    await waitFor(() => expect(downloads).toEqual(['tacet-import-7-errors.csv']));
    const report = fake.calls('get', '/mounts/imports/:id/errors.csv')[0]!;
    expect(report.path).toBe('/mounts/imports/7/errors.csv');
    expect(report.headers.authorization).toBe('Bearer test-token');

    // The import joins the history at once.
    const history = screen.getByRole('table', { name: 'Earlier imports' });
    await waitFor(() => expect(within(history).getAllByRole('row')).toHaveLength(3));
  });

  it('imports a clean file all at once', async () => {
    const fake = installFakeApi();
    const clean = makeImportResult({ accepted: 2, created: 2, preview: PREVIEW.map((row) => ({ ...row, action: 'create' as const })) });
    fake.on('get', '/mounts/imports', { status: 200, data: [] }).on('post', '/mounts/import', ({ query }) => ({
      status: 200,
      data: query.dryRun === 'true' ? clean : { ...clean, importId: 9 },
    }));
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);

    expect(await screen.findByText('No problems: every row can be imported.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Import the valid rows only' })).not.toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Import all' }));
    await waitFor(() => expect(importCalls(fake)).toHaveLength(2));
    expect(importCalls(fake)[1]!.query).toEqual({});
    const done = await screen.findByRole('region', { name: 'Imported spring-range.csv' });
    expect(done).toHaveTextContent('2 mounts added and 0 mounts updated.');
    expect(within(done).queryByRole('button', { name: /error report/ })).not.toBeInTheDocument();
  });

  it('explains a file that is not a catalog CSV, in words', async () => {
    const fake = installFakeApi();
    fake.on('get', '/mounts/imports', { status: 200, data: [] }).on('post', '/mounts/import', {
      status: 422,
      data: {
        statusCode: 422,
        message: 'The file is missing required columns',
        ...makeImportResult({
          errors: [
            {
              row: 1,
              column: 'vertical_stiffness_n_per_mm',
              message: 'missing column: give vertical_stiffness_n_per_mm or vertical_stiffness_lbf_per_in',
            },
          ],
        }),
      },
    });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);

    const alert = await screen.findByRole('alert');
    expect(alert).toHaveTextContent('This file cannot be imported');
    expect(alert).toHaveTextContent('The file is missing required columns. Nothing was written.');
    const problems = screen.getByRole('table', { name: 'Problems in the file' });
    expect(problems).toHaveTextContent('vertical_stiffness_n_per_mm');
    expect(problems).toHaveTextContent('missing column: give vertical_stiffness_n_per_mm or vertical_stiffness_lbf_per_in');
    expect(screen.queryByRole('button', { name: 'Import all' })).not.toBeInTheDocument();
  });

  it('shows a dry run the server refuses with 422 like any other report', async () => {
    const fake = installFakeApi();
    fake.on('get', '/mounts/imports', { status: 200, data: [] }).on('post', '/mounts/import', {
      status: 422,
      data: { statusCode: 422, message: 'The file has invalid rows', ...CHECKED },
    });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);
    expect(await screen.findByRole('table', { name: 'Problems in the file' })).toHaveTextContent('must be a positive number');
    expect(screen.getByRole('button', { name: 'Import all' })).toBeDisabled();
    expect(screen.getByRole('button', { name: 'Import the valid rows only' })).toBeEnabled();
  });

  it.each([
    [413, 'File too large', /larger than the 20 MB the import takes/],
    [415, 'Only CSV files can be imported', /This file is not a CSV file\. Only CSV files can be imported\./],
  ])('explains a %s answer in words', async (status, message, expected) => {
    installFakeApi()
      .on('get', '/mounts/imports', { status: 200, data: [] })
      .on('post', '/mounts/import', { status, data: { statusCode: status, message } });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);
    expect(await screen.findByRole('alert')).toHaveTextContent(expected);
  });

  it('names the suppliers the file would create, with the existing one a new name resembles', async () => {
    const fake = installFakeApi();
    serveImport(fake);
    fake.on('post', '/mounts/import', {
      status: 200,
      data: {
        ...CHECKED,
        newSuppliers: [
          { name: 'Quilmere Isolation', firstRow: 2, rows: 2, similarTo: 'Quillmere Isolation' },
          { name: 'Brand New Mounts', firstRow: 4, rows: 1, similarTo: null },
        ],
      },
    });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);
    const list = await screen.findByRole('list', { name: 'New suppliers' });
    expect(screen.getByText('New suppliers this file would create: 2')).toBeInTheDocument();
    expect(list).toHaveTextContent('Quilmere Isolation — row 2 and 1 more — very like the existing supplier Quillmere Isolation: a typo?');
    expect(list).toHaveTextContent('Brand New Mounts — row 4');
  });

  it('says when only the first problems are listed', async () => {
    const fake = installFakeApi();
    fake.on('get', '/mounts/imports', { status: 200, data: [] }).on('post', '/mounts/import', {
      status: 200,
      data: { ...CHECKED, errorsTruncated: true },
    });
    const { user } = renderApp({ signedInAs: 'catalog_manager', path: '/catalog/import' });
    await chooseAndCheck(user);
    expect(await screen.findByText(/there are more problems in the error report/)).toBeInTheDocument();
  });

  it('lists earlier imports with who, when, mode and counts, and downloads their reports', async () => {
    const fake = serveImport();
    const downloads = catchDownloads();
    const { user } = renderApp({ signedInAs: 'admin', path: '/catalog/import' });
    const history = await screen.findByRole('table', { name: 'Earlier imports' });
    const row = within(history).getAllByRole('row')[1]!;
    expect(
      within(row)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    ).toEqual(['10 Mar 2025, 14:30', 'Cato Catalog', 'older.csv', 'Valid rows only', '10', '2', '4', 'Download']);
    await user.click(within(row).getByRole('button', { name: 'Download the error report of older.csv' }));
    await waitFor(() => expect(downloads).toEqual(['tacet-import-3-errors.csv']));
    expect(fake.calls('get', '/mounts/imports/:id/errors.csv')[0]?.path).toBe('/mounts/imports/3/errors.csv');
  });

  it('is not for viewers, who see no import link either', async () => {
    installFakeApi().on('get', '/suppliers', { status: 200, data: [] });
    renderApp({ signedInAs: 'viewer', path: '/catalog/import' });
    expect(await screen.findByText('Your role does not give access to this page')).toBeInTheDocument();
    const sections = screen.getByRole('navigation', { name: 'Catalog sections' });
    expect(within(sections).queryByRole('link', { name: 'Import' })).not.toBeInTheDocument();
  });
});
