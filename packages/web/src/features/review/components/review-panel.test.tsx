import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi, type FakeApi } from '@/testing/fake-api';
import { TEST_USERS } from '@/testing/factories';
import { renderApp, type RenderOptions } from '@/testing/render';
import type { Design } from '@/types/design-api';

import type { DesignHistoryEntry } from '../types';

// The whole design page renders in jsdom: allow more than the default 5 s on a busy 2-core
// machine. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

const DESIGN_ID = 71;
const NAME = 'CHW pump P-3 skid';
const CHECKER = { ...TEST_USERS.engineer, id: 4, email: 'checker@tacet.test', name: 'Chris Checker' };

const HISTORY: DesignHistoryEntry[] = [
  {
    id: 1,
    at: '2025-01-08T15:30:00.000Z',
    user: { id: 3, name: 'Erin Engineer' },
    from: 'draft',
    to: 'in_review',
    comment: null,
    note: null,
    requestedChecker: null,
    changes: null,
  },
  {
    id: 2,
    at: '2025-01-09T08:10:00.000Z',
    user: { id: 4, name: 'Chris Checker' },
    from: 'in_review',
    to: 'draft',
    comment: 'Point C runs at 98 % of its rating; take the next size.',
    note: null,
    requestedChecker: null,
    changes: null,
  },
];

/** The design routes of the fake server plus history, transitions and revisions like the server's. */
function openDesign(overrides: Partial<Design>, signedInAs: RenderOptions['signedInAs'] = 'engineer') {
  const fake: FakeApi = installFakeApi();
  const server = serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME, chosen: demoCandidates()[0]!, ...overrides }));
  fake.on('get', '/designs/:id/checkers', { status: 200, data: [{ id: CHECKER.id, name: CHECKER.name }] });
  fake.on('get', '/designs/:id/history', { status: 200, data: HISTORY }).on('post', '/designs/:id/transitions', ({ body }) => {
    const { to } = body as { to: Design['status'] };
    server.design = { ...server.design, status: to, version: server.design.version + 1 };
    return { status: 200, data: server.design };
  });
  const rendered = renderApp({ signedInAs, path: `/designs/${DESIGN_ID}` });
  return { ...rendered, fake, server };
}

/** "Send for check" opens a dialog (note, named checker); its own button sends. */
async function sendForCheck(
  user: {
    click: (element: Element) => Promise<void>;
    type: (element: Element, text: string) => Promise<void>;
    selectOptions: (element: Element, value: string) => Promise<void>;
  },
  region: HTMLElement,
  note?: string,
  checker?: string,
) {
  await user.click(within(region).getByRole('button', { name: 'Send for check' }));
  const dialog = await screen.findByRole('dialog', { name: 'Send for check' });
  if (note) await user.type(within(dialog).getByRole('textbox'), note);
  if (checker) {
    await within(dialog).findByRole('option', { name: checker });
    await user.selectOptions(within(dialog).getByLabelText('Ask someone to check it'), checker);
  }
  await user.click(within(dialog).getByRole('button', { name: 'Send for check' }));
}

async function panel() {
  await screen.findByRole('heading', { name: NAME, level: 1 });
  return screen.getByRole('region', { name: 'Check and release' });
}

describe('Check and release panel', () => {
  it('lets the author send a draft with chosen mounts for check and posts {to: "in_review"}', async () => {
    const { user, fake } = openDesign({ status: 'draft' });
    const region = await panel();
    expect(within(region).getByTestId('review-stage')).toHaveAttribute('data-status', 'draft');
    expect(within(region).queryByRole('button', { name: 'Release' })).not.toBeInTheDocument();

    await sendForCheck(user, region, 'Took the next size at C.', 'Chris Checker');

    await waitFor(() => expect(fake.calls('post', '/designs/:id/transitions')).toHaveLength(1));
    expect(fake.calls('post', '/designs/:id/transitions')[0]!.body).toEqual({
      to: 'in_review',
      note: 'Took the next size at C.',
      checkerId: CHECKER.id,
    });
    await waitFor(() =>
      expect(screen.getByRole('region', { name: 'Check and release' }).querySelector('[data-status]')).toHaveAttribute(
        'data-status',
        'in_review',
      ),
    );
    // Once in review the input is read only.
    expect(await screen.findByText('This revision is in check, so it cannot be changed now.')).toBeInTheDocument();
  });

  it('saves unsaved edits before sending for check, so the checker sees them and nothing is lost', async () => {
    const { user, fake, server } = openDesign({ status: 'draft' });
    // The save keeps the chosen mounts here, so the move follows it (the next test: the server
    // clears them, as it does whenever the input changes).
    fake.on('put', '/designs/:id', ({ body }) => {
      const update = body as { input?: Design['input'] };
      server.design = { ...server.design, input: update.input ?? server.design.input, version: server.design.version + 1 };
      return { status: 200, data: server.design };
    });
    const region = await panel();
    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '400');

    await sendForCheck(user, region);

    await waitFor(() => expect(fake.calls('post', '/designs/:id/transitions')).toHaveLength(1));
    const writes = fake.requests.filter((r) => r.method !== 'get').map((r) => r.method);
    expect(writes).toEqual(['put', 'post']); // the save first, then the move
    expect(server.design.input.components[0]!.massKg).toBe(400);
    expect(await screen.findByText('This revision is in check, so it cannot be changed now.')).toBeInTheDocument();
    expect(screen.getByLabelText('Mass of Pump')).toHaveValue('400');
  });

  it('stops after saving when the changed input cleared the chosen mounts, and says what to do', async () => {
    const { user, fake, server } = openDesign({ status: 'draft' });
    // The server clears the choice when the input changes.
    fake.on('put', '/designs/:id', ({ body }) => {
      const update = body as { input?: Design['input'] };
      server.design = { ...server.design, input: update.input ?? server.design.input, chosen: null, version: server.design.version + 1 };
      return { status: 200, data: server.design };
    });
    const region = await panel();
    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '400');

    await sendForCheck(user, region);

    expect(await within(region).findByText(/Your changes were saved. A changed input clears the chosen mounts/)).toBeInTheDocument();
    expect(fake.calls('post', '/designs/:id/transitions')).toHaveLength(0);
    expect(server.design.input.components[0]!.massKg).toBe(400);
  });

  it('does not send for check when the unsaved edits cannot be saved, and says why', async () => {
    const { user, fake } = openDesign({ status: 'draft' });
    const region = await panel();
    await user.clear(screen.getByLabelText('Mass of Pump')); // a required value left empty

    await sendForCheck(user, region);

    expect(await within(region).findByText(/Your changes could not be saved, so the design was not sent for check/)).toBeInTheDocument();
    expect(fake.calls('post', '/designs/:id/transitions')).toHaveLength(0);
  });

  it('says why a draft without chosen mounts cannot be sent', async () => {
    openDesign({ status: 'draft', chosen: null });
    const region = await panel();
    expect(within(region).getByRole('button', { name: 'Send for check' })).toBeDisabled();
    expect(within(region).getByText('Choose mounts before sending the design for check.')).toBeInTheDocument();
  });

  it('shows the author a disabled Release with the reason', async () => {
    openDesign({ status: 'in_review' });
    const region = await panel();
    expect(within(region).getByRole('button', { name: 'Release' })).toBeDisabled();
    expect(within(region).getByText('You wrote this design, so another engineer releases it.')).toBeInTheDocument();
  });

  it('lets another engineer release after confirming, posting {to: "released"}', async () => {
    const { user, fake } = openDesign({ status: 'in_review' }, CHECKER);
    const region = await panel();
    const release = within(region).getByRole('button', { name: 'Release' });
    expect(release).toBeEnabled();
    await user.click(release);
    const alert = await screen.findByRole('alertdialog');
    expect(alert).toHaveTextContent('licensed engineer');
    await user.click(within(alert).getByRole('button', { name: 'Release this revision' }));
    await waitFor(() => expect(fake.calls('post', '/designs/:id/transitions')[0]?.body).toEqual({ to: 'released' }));
  });

  it('requires a comment to return a design to draft, then posts it', async () => {
    const { user, fake } = openDesign({ status: 'in_review' }, CHECKER);
    const region = await panel();
    await user.click(within(region).getByRole('button', { name: 'Return to draft' }));
    const dialog = await screen.findByRole('dialog');
    await user.click(within(dialog).getByRole('button', { name: 'Return to draft' }));
    expect(within(dialog).getByText('Say what needs to change, so the author knows what to fix.')).toBeInTheDocument();
    expect(fake.calls('post', '/designs/:id/transitions')).toHaveLength(0);

    await user.type(within(dialog).getByLabelText('What needs to change'), 'Take the next size at point C');
    await user.click(within(dialog).getByRole('button', { name: 'Return to draft' }));
    await waitFor(() =>
      expect(fake.calls('post', '/designs/:id/transitions')[0]?.body).toEqual({
        to: 'draft',
        comment: 'Take the next size at point C',
      }),
    );
    await waitFor(() => expect(screen.queryByRole('dialog')).not.toBeInTheDocument());
  });

  it('puts a 403 and a 409 from the server in words', async () => {
    const { user, fake } = openDesign({ status: 'in_review' }, CHECKER);
    fake.on('post', '/designs/:id/transitions', {
      status: 403,
      data: { statusCode: 403, message: 'A design is released by an engineer other than its author' },
    });
    const region = await panel();
    await user.click(within(region).getByRole('button', { name: 'Release' }));
    await user.click(within(await screen.findByRole('alertdialog')).getByRole('button', { name: 'Release this revision' }));
    expect(await within(region).findByRole('alert')).toHaveTextContent(
      'Not allowed: A design is released by an engineer other than its author.',
    );

    fake.on('post', '/designs/:id/transitions', {
      status: 409,
      data: { statusCode: 409, message: 'A design cannot go from released to draft' },
    });
    await user.click(within(region).getByRole('button', { name: 'Return to draft' }));
    const dialog = await screen.findByRole('dialog');
    await user.type(within(dialog).getByLabelText('What needs to change'), 'Recheck');
    await user.click(within(dialog).getByRole('button', { name: 'Return to draft' }));
    expect(await within(region).findByText('Not possible now: A design cannot go from released to draft.')).toBeInTheDocument();
  });

  it('lists the record: who, when, from → to and the comment', async () => {
    openDesign({ status: 'draft' });
    const region = await panel();
    const record = await within(region).findByRole('list', { name: 'Check and release record' });
    const entries = within(record).getAllByRole('listitem');
    expect(entries).toHaveLength(2);
    expect(entries[0]).toHaveTextContent('Erin Engineer');
    expect(entries[0]).toHaveTextContent('Draft → In check');
    expect(entries[1]).toHaveTextContent('Chris Checker');
    expect(entries[1]).toHaveTextContent('In check → Draft');
    expect(entries[1]).toHaveTextContent('Point C runs at 98 % of its rating; take the next size.');
    expect(entries[1]).toHaveTextContent('9 Jan 2025');
  });

  it('starts a new revision from a released design and opens it', async () => {
    const { user, fake, router } = openDesign({ status: 'released', checker: { id: 4, name: 'Chris Checker' } }, CHECKER);
    fake.on('post', '/designs/:id/revisions', { status: 201, data: makeDesign({ id: 72, name: NAME, revision: 2 }) });
    const region = await panel();
    expect(within(region).getByText('Checked and released by Chris Checker')).toBeInTheDocument();
    await user.click(within(region).getByRole('button', { name: 'Start new revision' }));
    await waitFor(() => expect(router.state.location.pathname).toBe('/designs/72'));
    expect(fake.calls('post', '/designs/:id/revisions')[0]?.params).toEqual({ id: String(DESIGN_ID) });
  });

  it('shows a purchaser no moves, only why', async () => {
    openDesign({ status: 'in_review' }, 'purchaser');
    const region = await panel();
    expect(within(region).queryAllByRole('button')).toHaveLength(0);
    expect(within(region).getByText('Engineers and administrators move designs through check and release.')).toBeInTheDocument();
  });
});
