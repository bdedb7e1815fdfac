import { screen, waitFor, within } from '@testing-library/react';

import { QUELLBROOK, STILLMOOR } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { makeRfq, releasedDesign, servePurchasing } from '@/testing/purchasing-fakes';
import { renderApp, TEST_TOKEN } from '@/testing/render';
import type { Design } from '@/types/design-api';

import type { Rfq } from '../types';

vi.setConfig({ testTimeout: 15_000 });

function openView(design: Design = releasedDesign(), rfqs: Rfq[] = []) {
  const fake = installFakeApi();
  const server = servePurchasing(fake, design, rfqs);
  const rendered = renderApp({ signedInAs: 'purchaser', path: `/purchasing/designs/${design.id}` });
  return { ...rendered, fake, server };
}

async function waitForView() {
  await screen.findByRole('heading', { name: 'CHW pump P-2 skid', level: 1 });
}

/** The browser's download machinery, which jsdom lacks: records the file names it would save. */
function catchDownloads(): string[] {
  const names: string[] = [];
  const original = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
  URL.createObjectURL = () => 'blob:tacet-test';
  URL.revokeObjectURL = () => undefined;
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    names.push(this.download);
  });
  onTestFinished(() => {
    URL.createObjectURL = original.create;
    URL.revokeObjectURL = original.revoke;
  });
  return names;
}

describe('Design purchasing view', () => {
  it('shows the BOM lines and their totals', async () => {
    openView();
    await waitForView();
    const table = screen.getByRole('table', { name: 'Bill of materials' });
    const rows = within(table).getAllByRole('row');
    const body = rows.slice(1, -1).map((row) =>
      within(row)
        .getAllByRole('cell')
        .map((cell) => cell.textContent),
    );
    expect(body).toEqual([
      ['Quellbrook Mounts', 'QB-HS-300', '4', 'A, B, C, D', 'USD 92.00', 'USD 368.00', '21 days'],
      ['Stillmoor Isolation', 'SM-LV-300', '2', 'A, B', 'USD 70.00', 'USD 140.00', '35 days'],
      ['Stillmoor Isolation', 'SM-LV-280', '2', 'C, D', 'USD 68.00', 'USD 136.00', '35 days'],
    ]);
    // 368 + 140 + 136 = 644; 4 + 2 + 2 = 8 mounts.
    expect(screen.getByTestId('bom-total-quantity')).toHaveTextContent('8');
    expect(screen.getByTestId('bom-total-price')).toHaveTextContent('USD 644.00');
    expect(screen.getByTestId('bom-longest-lead-time')).toHaveTextContent('longest 35 days');
    // the cautions a supplier's files carry, from the one source
    expect(screen.getByTestId('cautions')).toHaveTextContent(/qualified, licensed engineer/);
    expect(screen.getByTestId('cautions')).toHaveTextContent(/confirmed with the supplier before purchase/);
  });

  it('downloads the BOM as CSV and Excel and the report as PDF from their addresses', async () => {
    const { user, fake } = openView();
    const saved = catchDownloads();
    fake
      .on('get', '/designs/:id/bom.csv', {
        status: 200,
        data: new Blob(['supplier\n']),
        headers: { 'content-disposition': 'attachment; filename="p2-rev2-bom.csv"' },
      })
      .on('get', '/designs/:id/bom.xlsx', { status: 200, data: new Blob(['x']) })
      .on('get', '/designs/:id/report.pdf', { status: 200, data: new Blob(['%PDF']) });
    await waitForView();

    await user.click(screen.getByRole('button', { name: 'BOM (CSV)' }));
    await waitFor(() => expect(saved).toEqual(['p2-rev2-bom.csv']));
    await user.click(screen.getByRole('button', { name: 'BOM (Excel)' }));
    await waitFor(() => expect(saved).toHaveLength(2));
    await user.click(screen.getByRole('button', { name: 'Calculation report (PDF)' }));
    await waitFor(() => expect(saved).toHaveLength(3));

    expect(saved).toEqual(['p2-rev2-bom.csv', 'chw-pump-p-2-skid-rev2-bom.xlsx', 'chw-pump-p-2-skid-rev2-report.pdf']);
    const files = fake.requests.filter((request) => /\.(csv|xlsx|pdf)$/.test(request.path));
    expect(files.map((request) => request.path)).toEqual(['/designs/81/bom.csv', '/designs/81/bom.xlsx', '/designs/81/report.pdf']);
    expect(files.every((request) => request.headers.authorization === `Bearer ${TEST_TOKEN}`)).toBe(true);
  });

  it('says why a download failed', async () => {
    const { user, fake } = openView();
    catchDownloads();
    fake.on('get', '/designs/:id/bom.csv', {
      status: 409,
      data: new Blob([JSON.stringify({ statusCode: 409, message: 'Only released designs can be exported' })]),
    });
    await waitForView();
    await user.click(screen.getByRole('button', { name: 'BOM (CSV)' }));
    expect(await screen.findByRole('alert')).toHaveTextContent('BOM (CSV) could not be downloaded. Only released designs can be exported.');
  });

  it('sends a request for quotation to one supplier with the message and lists it as requested', async () => {
    const { user, fake } = openView();
    await waitForView();
    const section = await screen.findByRole('region', { name: /Stillmoor Isolation/ });
    expect(within(section).getByText('No request sent to Stillmoor Isolation yet.')).toBeInTheDocument();

    await user.type(within(section).getByLabelText('Message to the supplier (optional)'), 'Delivery to site by March, please.');
    const machines = within(section).getByLabelText('Identical machines');
    await user.clear(machines);
    await user.type(machines, '3');
    await user.click(within(section).getByRole('button', { name: 'Preview request for quotation' }));

    // a confirmation first: recipient, quantities for three machines, attachments; nothing sent yet
    const confirm = await screen.findByRole('dialog', { name: 'Send this request to Stillmoor Isolation?' });
    expect(within(confirm).getByTestId('rfq-to')).toHaveTextContent('quotes@stillmoor-isolation.invalid');
    expect(within(confirm).getByText('3 identical machines')).toBeInTheDocument();
    expect(within(confirm).getByRole('list', { name: 'Attachments' })).toHaveTextContent('quote-list.csv');
    expect(fake.calls('post', '/designs/:id/rfqs')).toHaveLength(0);
    await user.click(within(confirm).getByRole('button', { name: 'Send request' }));

    await waitFor(() => expect(fake.calls('post', '/designs/:id/rfqs')).toHaveLength(1));
    expect(fake.calls('post', '/designs/:id/rfqs')[0]!.body).toEqual({
      supplierId: STILLMOOR.id,
      message: 'Delivery to site by March, please.',
      machineCount: 3,
    });
    const list = await within(section).findByRole('list', { name: 'Requests to Stillmoor Isolation' });
    expect(within(list).getByText('Requested')).toBeInTheDocument();
    expect(within(section).getByLabelText('Message to the supplier (optional)')).toHaveValue('');
  });

  it('sends only the supplier when there is no message, and shows a refusal in words', async () => {
    const { user, fake } = openView();
    fake.on('post', '/designs/:id/rfqs/preview', {
      status: 422,
      data: { statusCode: 422, message: 'Supplier Quellbrook Mounts has no contact e-mail' },
    });
    await waitForView();
    const section = await screen.findByRole('region', { name: /Quellbrook Mounts/ });
    await user.click(within(section).getByRole('button', { name: 'Preview request for quotation' }));
    expect(await within(section).findByRole('alert')).toHaveTextContent('Supplier Quellbrook Mounts has no contact e-mail.');
    expect(fake.calls('post', '/designs/:id/rfqs/preview')[0]!.body).toEqual({ supplierId: QUELLBROOK.id, machineCount: 1 });
    expect(fake.calls('post', '/designs/:id/rfqs')).toHaveLength(0);
  });

  it('shows a failed request with its reason and sends it again', async () => {
    const failed = makeRfq({
      id: 41,
      status: 'failed',
      failureReason: 'The mail server refused the connection (ECONNREFUSED)',
    });
    const { user, fake } = openView(releasedDesign(), [failed]);
    await waitForView();
    const item = (await screen.findAllByTestId('rfq')).find((el) => el.getAttribute('data-rfq-id') === '41')!;
    expect(within(item).getByText('Not sent')).toBeInTheDocument();
    expect(item).toHaveTextContent('The e-mail could not be sent: The mail server refused the connection (ECONNREFUSED)');
    expect(within(item).queryByRole('button', { name: 'Record progress' })).not.toBeInTheDocument();

    await user.click(within(item).getByRole('button', { name: 'Send again' }));
    await waitFor(() => expect(fake.calls('post', '/rfqs/:id/retry')[0]?.params).toEqual({ id: '41' }));
    expect(await screen.findByText('Requested')).toBeInTheDocument();
  });

  it('records a quote line by line with its reference and validity, and offers only later states', async () => {
    const { user, fake } = openView(releasedDesign(), [makeRfq({ id: 42, status: 'requested' })]);
    await waitForView();
    await user.click(await screen.findByRole('button', { name: 'Record progress' }));
    const dialog = await screen.findByRole('dialog');
    const state = within(dialog).getByLabelText('New state');
    expect(
      within(state)
        .getAllByRole('option')
        .map((option) => option.textContent),
    ).toEqual(['Quoted', 'Ordered', 'Received']);

    await user.click(within(dialog).getByRole('button', { name: 'Record' }));
    expect(await within(dialog).findByText('Enter the unit price of this line.')).toBeInTheDocument();
    expect(fake.calls('patch', '/rfqs/:id')).toHaveLength(0);

    const price = within(dialog).getByLabelText('Unit price of QB-HS-220');
    await user.type(price, 'abc');
    await user.click(within(dialog).getByRole('button', { name: 'Record' }));
    expect(await within(dialog).findByText('Enter the unit price as a positive number, e.g. 41.25.')).toBeInTheDocument();

    await user.clear(price);
    await user.type(price, '87.80');
    await user.type(within(dialog).getByLabelText('Lead time of QB-HS-220'), '21');
    expect(within(dialog).getByTestId('quote-total')).toHaveTextContent('USD 351.20'); // 4 × 87.80
    await user.type(within(dialog).getByLabelText('Supplier’s reference (optional)'), 'QB-7781');
    await user.type(within(dialog).getByLabelText('Valid until (optional)'), '2025-03-31');
    await user.type(within(dialog).getByLabelText('Note (optional)'), 'By phone');
    await user.click(within(dialog).getByRole('button', { name: 'Record' }));

    await waitFor(() => expect(fake.calls('patch', '/rfqs/:id')).toHaveLength(1));
    const patch = fake.calls('patch', '/rfqs/:id')[0]!;
    expect(patch.params).toEqual({ id: '42' });
    expect(patch.body).toMatchObject({
      status: 'quoted',
      lines: [{ lineId: 900, unitPrice: 87.8, leadTimeDays: 21 }],
      reference: 'QB-7781',
      validUntil: '2025-03-31',
      note: 'By phone',
    });
    expect(typeof (patch.body as { quotedAt?: unknown }).quotedAt).toBe('string');
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
    expect(await screen.findByText('Quoted USD 351.20')).toBeInTheDocument();
  });

  it('lists each request’s history', async () => {
    const rfq = makeRfq({
      id: 43,
      status: 'ordered',
      quotedPrice: 360,
      history: [
        { at: '2025-02-03T09:00:00.000Z', status: 'requested', user: { id: 5, name: 'Bea Buyer' }, note: null },
        { at: '2025-02-06T11:00:00.000Z', status: 'quoted', user: { id: 5, name: 'Bea Buyer' }, note: 'By phone' },
        { at: '2025-02-07T16:30:00.000Z', status: 'ordered', user: { id: 5, name: 'Bea Buyer' }, note: 'PO 4471' },
      ],
    });
    openView(releasedDesign(), [rfq]);
    const history = await screen.findByRole('list', { name: 'History of request 43' });
    const entries = within(history)
      .getAllByRole('listitem')
      .map((li) => li.textContent);
    expect(entries).toHaveLength(3);
    expect(entries[1]).toContain('Quoted — Bea Buyer: By phone');
    expect(entries[2]).toContain('Ordered — Bea Buyer: PO 4471');
  });

  it('offers no requests for a design that is not released', async () => {
    openView(releasedDesign({ status: 'in_review', checker: null }));
    await waitForView();
    expect(screen.getByText('Purchasing starts once a second engineer has released this design.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Preview request for quotation' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'BOM (CSV)' })).not.toBeInTheDocument();
  });
});
