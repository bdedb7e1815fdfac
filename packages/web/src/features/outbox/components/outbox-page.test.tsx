import { screen, waitFor, within } from '@testing-library/react';

import { installFakeApi } from '@/testing/fake-api';
import { renderApp, TEST_TOKEN } from '@/testing/render';

import type { OutboxMessage } from '../types';

const BOM_CSV = 'mount_point,part_number,quantity\nA1,EX-220,1\n';

/** Two captured messages as the server lists them (newest first); invented addresses. */
const MESSAGES: OutboxMessage[] = [
  {
    id: 7,
    to: 'Quotes <quotes@supplier-one.example.test>',
    subject: 'Request for quotation: demo skid, revision B',
    receivedAt: '2025-03-04T10:15:00.000Z',
    from: 'Tacet <no-reply@tacet.test>',
    text: 'Please quote the mounts in the attached list.\nDelivery to the demo site.',
    attachments: [
      { filename: 'bom.csv', size: 1824 },
      { filename: 'report.pdf', size: 2_400_000 },
    ],
  },
  {
    id: 3,
    to: 'sales@supplier-two.example.test',
    subject: '',
    receivedAt: '2025-03-03T08:00:00.000Z',
    from: 'Tacet <no-reply@tacet.test>',
    text: '',
    attachments: [],
  },
];

const summaryOf = ({ from: _from, text: _text, ...summary }: OutboxMessage) => summary;

function serveOutbox(messages: OutboxMessage[] = MESSAGES) {
  return installFakeApi()
    .on('get', '/outbox', { status: 200, data: messages.map(summaryOf) })
    .on('get', '/outbox/:id', ({ params }) => {
      const message = messages.find((candidate) => candidate.id === Number(params.id));
      return message
        ? { status: 200, data: message }
        : { status: 404, data: { statusCode: 404, message: `No message ${params.id} in the outbox` } };
    });
}

/** The browser's download machinery, which jsdom lacks: records what would have been saved. */
function captureDownloads() {
  const saved: { name: string; blob: Blob }[] = [];
  const blobs = new Map<string, Blob>();
  const original = { create: URL.createObjectURL, revoke: URL.revokeObjectURL };
  URL.createObjectURL = (blob: Blob) => {
    const url = `blob:test/${blobs.size}`;
    blobs.set(url, blob);
    return url;
  };
  URL.revokeObjectURL = () => undefined;
  vi.spyOn(HTMLAnchorElement.prototype, 'click').mockImplementation(function (this: HTMLAnchorElement) {
    saved.push({ name: this.download, blob: blobs.get(this.href)! });
  });
  onTestFinished(() => {
    URL.createObjectURL = original.create;
    URL.revokeObjectURL = original.revoke;
  });
  return saved;
}

async function findTable() {
  return screen.findByRole('table', { name: 'Captured messages' });
}

describe('Outbox page', () => {
  it('lists the captured messages: received at, recipient, subject and number of attachments', async () => {
    serveOutbox();
    renderApp({ signedInAs: 'admin', path: '/admin/outbox' });

    const table = await findTable();
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const cells = (row: HTMLElement) =>
      within(row)
        .getAllByRole('cell')
        .map((cell) => cell.textContent);
    expect(cells(rows[0]!)).toEqual([
      expect.stringMatching(/4 Mar 2025/),
      'Quotes <quotes@supplier-one.example.test>',
      'Request for quotation: demo skid, revision B',
      '2',
    ]);
    expect(cells(rows[1]!)).toEqual([expect.stringMatching(/3 Mar 2025/), 'sales@supplier-two.example.test', '(no subject)', '0']);
    expect(screen.getByText(/^2 messages, newest first/)).toBeInTheDocument();
    expect(screen.getByText('Choose a message to read its text and download its attachments.')).toBeInTheDocument();
  });

  it('opens a message with its sender, text and attachments when its row is clicked', async () => {
    const fake = serveOutbox();
    const { user, router } = renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    const table = await findTable();

    await user.click(within(table).getByText('Quotes <quotes@supplier-one.example.test>'));

    const message = await screen.findByRole('region', { name: 'Request for quotation: demo skid, revision B' });
    expect(router.state.location.search).toBe('?message=7');
    expect(fake.calls('get', '/outbox/7')).toHaveLength(1);
    expect(message).toHaveTextContent('FromTacet <no-reply@tacet.test>');
    expect(message).toHaveTextContent('ToQuotes <quotes@supplier-one.example.test>');
    expect(within(message).getByLabelText('Message text').textContent).toBe(
      'Please quote the mounts in the attached list.\nDelivery to the demo site.',
    );
    const attachments = within(message).getAllByRole('listitem');
    expect(attachments.map((item) => item.textContent)).toEqual([
      expect.stringMatching(/^bom\.csv1\.8 kB/),
      expect.stringMatching(/^report\.pdf2\.4 MB/),
    ]);
    expect(within(table).getByRole('link', { name: 'Request for quotation: demo skid, revision B' })).toHaveAttribute(
      'aria-current',
      'true',
    );
  });

  it('opens the message named in the address, and says so when it has no attachments', async () => {
    serveOutbox();
    renderApp({ signedInAs: 'admin', path: '/admin/outbox?message=3' });
    const message = await screen.findByRole('region', { name: '(no subject)' });
    expect(within(message).getByText('No attachments.')).toBeInTheDocument();
    expect(within(message).getByLabelText('Message text')).toHaveTextContent('(no text)');
  });

  it('downloads an attachment through the API client, with the bearer token, as a file', async () => {
    const fake = serveOutbox().on('get', '/outbox/:id/attachments/:index', {
      status: 200,
      data: new Blob([BOM_CSV], { type: 'text/csv' }),
      headers: { 'content-type': 'text/csv', 'content-disposition': 'attachment; filename="bom.csv"' },
    });
    const saved = captureDownloads();
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/outbox?message=7' });

    await user.click(await screen.findByRole('button', { name: 'Download bom.csv' }));

    await waitFor(() => expect(saved).toHaveLength(1));
    const [request] = fake.calls('get', '/outbox/7/attachments/0');
    expect(request?.headers.authorization).toBe(`Bearer ${TEST_TOKEN}`);
    expect(saved[0]?.name).toBe('bom.csv');
    expect(await saved[0]?.blob.text()).toBe(BOM_CSV);
  });

  it('explains a failed download in words', async () => {
    const fake = serveOutbox().on('get', '/outbox/:id/attachments/:index', {
      status: 404,
      data: new Blob([JSON.stringify({ statusCode: 404, message: 'Message 7 in the outbox has no attachment 1' })], {
        type: 'application/json',
      }),
    });
    captureDownloads();
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/outbox?message=7' });

    await user.click(await screen.findByRole('button', { name: 'Download report.pdf' }));
    expect(await screen.findByRole('alert')).toHaveTextContent(
      'report.pdf could not be downloaded. Message 7 in the outbox has no attachment 1.',
    );
    expect(fake.calls('get', '/outbox/7/attachments/1')).toHaveLength(1);
  });

  it('says when an opened message has dropped out of the outbox', async () => {
    serveOutbox();
    renderApp({ signedInAs: 'admin', path: '/admin/outbox?message=1' });
    expect(await screen.findByText('This message is no longer in the outbox')).toBeInTheDocument();
  });

  it('explains an empty outbox', async () => {
    serveOutbox([]);
    renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    expect(await screen.findByText('No messages yet')).toBeInTheDocument();
    expect(screen.getByText(/Messages Tacet sends in demo mode .* appear here as soon as they are sent/)).toBeInTheDocument();
    expect(screen.queryByRole('table')).not.toBeInTheDocument();
  });

  it('explains in words that a server outside demo mode has no outbox', async () => {
    installFakeApi().on('get', '/outbox', {
      status: 404,
      data: { statusCode: 404, message: 'The outbox exists only in demo and test mode' },
    });
    renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    expect(await screen.findByText('There is no outbox on this server')).toBeInTheDocument();
    expect(screen.getByText('The outbox exists only in demo and test mode.')).toBeInTheDocument();
    expect(screen.getByText(/mail server its administrator configured \(SMTP_URL\)/)).toBeInTheDocument();
  });

  it('offers to try again when the outbox could not be loaded', async () => {
    const fake = installFakeApi().on('get', '/outbox', {
      status: 500,
      data: { statusCode: 500, message: 'Internal server error' },
    });
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    expect(await screen.findByText('The outbox could not be loaded')).toBeInTheDocument();

    fake.on('get', '/outbox', { status: 200, data: [] });
    await user.click(screen.getByRole('button', { name: 'Try again' }));
    expect(await screen.findByText('No messages yet')).toBeInTheDocument();
  });

  it('looks again when Refresh is pressed', async () => {
    const fake = serveOutbox([]);
    const { user } = renderApp({ signedInAs: 'admin', path: '/admin/outbox' });
    await screen.findByText('No messages yet');

    fake.on('get', '/outbox', { status: 200, data: [summaryOf(MESSAGES[0]!)] });
    await user.click(screen.getByRole('button', { name: 'Refresh' }));
    expect(await findTable()).toHaveTextContent('Request for quotation: demo skid, revision B');
  });

  it('is not shown to other roles, and they do not ask the server for it', async () => {
    const fake = serveOutbox();
    renderApp({ signedInAs: 'engineer', path: '/admin/outbox' });
    expect(await screen.findByText('Your role does not give access to this page')).toBeInTheDocument();
    expect(fake.calls('get', '/outbox')).toHaveLength(0);
  });
});
