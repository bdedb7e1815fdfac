import { screen, waitFor, within } from '@testing-library/react';

import { installFakeApi } from '@/testing/fake-api';
import { queueRow, releasedDesign, servePurchasing } from '@/testing/purchasing-fakes';
import { renderApp } from '@/testing/render';

describe('Purchasing queue', () => {
  it('lists released designs with project, revision, release date, lines, total and request counts', async () => {
    installFakeApi().on('get', '/purchasing/designs', {
      status: 200,
      data: [
        queueRow(),
        queueRow({
          designId: 90,
          projectName: 'Harbour Chiller Hall',
          name: 'Cooling tower fan F-1',
          revision: 1,
          releasedAt: '2025-01-20T08:00:00.000Z',
          lineCount: 1,
          total: null,
          rfqs: { requested: 0, quoted: 0, ordered: 0, received: 0, failed: 0 },
        }),
      ],
    });
    renderApp({ signedInAs: 'purchaser', path: '/purchasing' });

    const table = await screen.findByRole('table', { name: 'Released designs' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows).toHaveLength(2);
    const cells = within(rows[0]!)
      .getAllByRole('cell')
      .map((cell) => cell.textContent);
    expect(cells).toEqual([
      'North Loop Chilled Water Plant',
      'CHW pump P-2 skid',
      '2',
      '1 Feb 2025',
      '3',
      'USD 644.00',
      '1 requested1 not sent',
      '—',
    ]);
    expect(within(rows[1]!).getByText('None sent')).toBeInTheDocument();
    expect(within(rows[1]!).getAllByRole('cell')[5]).toHaveTextContent('—');
  });

  it('opens a design’s purchasing view from the queue', async () => {
    const fake = installFakeApi().on('get', '/purchasing/designs', { status: 200, data: [queueRow()] });
    servePurchasing(fake, releasedDesign());
    const { user, router } = renderApp({ signedInAs: 'purchaser', path: '/purchasing' });

    await user.click(await screen.findByRole('link', { name: 'CHW pump P-2 skid' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/purchasing/designs/81'));
    expect(await screen.findByRole('heading', { name: 'CHW pump P-2 skid', level: 1 })).toBeInTheDocument();
    expect(screen.getByRole('table', { name: 'Bill of materials' })).toBeInTheDocument();
  });

  it('says so when nothing is released and when the list cannot be loaded', async () => {
    const fake = installFakeApi().on('get', '/purchasing/designs', { status: 200, data: [] });
    const { unmount } = renderApp({ signedInAs: 'admin', path: '/purchasing' });
    expect(await screen.findByText('Nothing released yet')).toBeInTheDocument();
    unmount();

    fake.on('get', '/purchasing/designs', { status: 403, data: { statusCode: 403, message: 'Forbidden resource' } });
    renderApp({ signedInAs: 'admin', path: '/purchasing' });
    expect(await screen.findByText('The released designs could not be loaded')).toBeInTheDocument();
    expect(screen.getByText('Forbidden resource.')).toBeInTheDocument();
  });
});
