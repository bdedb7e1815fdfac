import { screen, within } from '@testing-library/react';

import { TEST_USERS } from '@/testing/factories';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';

import type { MyWork, WorkItem } from '../types';

vi.setConfig({ testTimeout: 15_000 });

const item = (overrides: Partial<WorkItem>): WorkItem => ({
  designId: 1,
  projectId: 1,
  projectName: 'North Loop Chilled Water Plant',
  name: 'CHW pump P-3 skid',
  revision: 1,
  status: 'in_review',
  updatedAt: '2025-02-03T09:00:00.000Z',
  author: { id: 4, name: 'Chris Checker' },
  requestedChecker: null,
  lastComment: null,
  ...overrides,
});

function serveWork(work: Partial<MyWork>) {
  installFakeApi().on('get', '/my-work', { status: 200, data: { toCheck: [], returned: [], drafts: [], released: [], ...work } });
}

describe('Overview: your work', () => {
  it('shows an engineer what waits for their check, what came back, their drafts and recent releases', async () => {
    serveWork({
      toCheck: [
        item({ designId: 7, name: 'Condenser pump skid', requestedChecker: { id: TEST_USERS.engineer.id, name: 'Erin Engineer' } }),
      ],
      returned: [item({ designId: 8, name: 'Fan skid', status: 'draft', lastComment: 'Take the next size at C.' })],
    });
    renderApp({ signedInAs: 'engineer', path: '/' });
    const toCheck = await screen.findByRole('region', { name: /Waiting for your check/ });
    expect(within(toCheck).getByRole('link', { name: 'Condenser pump skid' })).toHaveAttribute('href', '/designs/7');
    expect(toCheck).toHaveTextContent('Sent by Chris Checker, who asked you to check it');
    const returned = screen.getByRole('region', { name: /Returned to you/ });
    expect(returned).toHaveTextContent('“Take the next size at C.”');
    expect(screen.getByRole('region', { name: /Your drafts/ })).toHaveTextContent('You have no drafts.');
    expect(screen.getByRole('region', { name: /Released lately/ })).toBeInTheDocument();
  });

  it('shows a purchaser the released designs waiting for a request for quotation, leading to purchasing', async () => {
    serveWork({ released: [item({ designId: 9, name: 'Chiller skid', status: 'released' })] });
    renderApp({ signedInAs: 'purchaser', path: '/' });
    const waiting = await screen.findByRole('region', { name: /Released, waiting for a request for quotation/ });
    expect(within(waiting).getByRole('link', { name: 'Chiller skid' })).toHaveAttribute('href', '/purchasing/designs/9');
    expect(screen.queryByRole('region', { name: /Waiting for your check/ })).not.toBeInTheDocument();
  });
});
