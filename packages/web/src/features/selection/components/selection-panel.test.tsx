import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { Design, UpdateDesignInput } from '@/types/design-api';

const DESIGN_ID = 41;
const NAME = 'CHW pump P-3 skid';

function openSelection(
  design: Design = makeDesign({ id: DESIGN_ID, name: NAME }),
  signedInAs: 'engineer' | 'viewer' | 'admin' = 'engineer',
) {
  const fake = installFakeApi();
  const server = serveDesign(fake, design);
  const rendered = renderApp({ signedInAs, path: `/designs/${design.id}?tab=selection` });
  return { ...rendered, fake, server };
}

async function findMounts(user: ReturnType<typeof renderApp>['user']) {
  await user.click(await screen.findByRole('button', { name: 'Find mounts' }));
  return screen.findByTestId('candidates-table');
}

/** The rows of the Blueprint table as text, one string per rendered cell. */
function tableRows(table: HTMLElement): string[][] {
  const cells = Array.from(table.querySelectorAll<HTMLElement>('.bp6-table-cell'));
  const rows = new Map<string, string[]>();
  for (const cell of cells) {
    const row = Array.from(cell.classList).find((c) => c.startsWith('bp6-table-cell-row-'));
    if (!row) continue;
    rows.set(row, [...(rows.get(row) ?? []), cell.textContent ?? '']);
  }
  return [...rows.values()];
}

// Each test drives the whole design page through typing and tables in jsdom; on a busy 2-core
// machine that can take longer than the default 5 s. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

describe('Mount selection', () => {
  beforeEach(() => {
    // jsdom lays nothing out: give Blueprint's table a viewport so it renders every column.
    vi.spyOn(HTMLElement.prototype, 'clientWidth', 'get').mockReturnValue(1600);
    vi.spyOn(HTMLElement.prototype, 'clientHeight', 'get').mockReturnValue(800);
  });

  it('runs the selection on the saved input and ranks the candidates with pass/fail and reasons', async () => {
    const { user, fake } = openSelection();
    const table = await findMounts(user);

    expect(fake.calls('post', `/designs/${DESIGN_ID}/selection`)).toHaveLength(1);
    expect(fake.calls('post', `/designs/${DESIGN_ID}/selection`)[0]!.body).toEqual({ limit: 50 });
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(0);
    expect(screen.getByText('3 candidates, 2 passing')).toBeInTheDocument();

    const rows = tableRows(table);
    expect(rows).toHaveLength(3);
    expect(rows[0]).toEqual([
      '1',
      'Passes',
      'QB-HS-300 housed spring',
      'Quellbrook Mounts',
      'One part',
      '3.15 Hz',
      // CV-13 with ζ = 0.05: T = 0.02108 at 24.67 Hz → 97.9 % (docs/engineering/check-values.md CV-13).
      '97.9 %',
      '0.68–0.85',
      '2.66 mm',
      '$368',
      '21 days',
      'Level error 2.7 mm: shim the low corner',
    ]);
    expect(rows[1]?.slice(1, 5)).toEqual(['Passes', 'SM-LV series, sized per point', 'Stillmoor Isolation', 'Sized per point']);
    expect(rows[2]?.[1]).toBe('Fails');
    expect(rows[2]?.[11]).toBe('Isolation 57.8 % at 24.67 Hz is below the 90 % asked for');
  });

  it('saves unsaved input before running, so the results match what is stored', async () => {
    const { user, fake } = openSelection();
    await screen.findByRole('heading', { name: NAME, level: 1 });
    await user.click(screen.getByRole('tab', { name: 'Equipment' }));
    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '320');
    await user.click(screen.getByRole('tab', { name: 'Mount selection' }));

    await user.click(screen.getByRole('button', { name: 'Save and find mounts' }));
    await screen.findByTestId('candidates-table');
    const order = fake.requests.filter((r) => r.method !== 'get').map((r) => `${r.method} ${r.path}`);
    expect(order).toEqual([`put /designs/${DESIGN_ID}`, `post /designs/${DESIGN_ID}/selection`]);
    expect((fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body as UpdateDesignInput).input!.components[0]!.massKg).toBe(320);
    expect(screen.queryByText('These results are for an earlier input')).not.toBeInTheDocument();
  });

  it('sorts the candidates in the browser', async () => {
    const { user, fake } = openSelection();
    const table = await findMounts(user);

    await user.selectOptions(screen.getByLabelText('Sort by'), 'Price');
    expect(tableRows(table).map((r) => r[2])).toEqual([
      'QB-EP-40 elastomer pad',
      'SM-LV series, sized per point',
      'QB-HS-300 housed spring',
    ]);
    await user.click(screen.getByRole('button', { name: 'Ascending' }));
    expect(tableRows(table).map((r) => r[0])).toEqual(['1', '2', '3']);
    expect(fake.calls('post', `/designs/${DESIGN_ID}/selection`)).toHaveLength(1);
  });

  it('opens a candidate: loads per point, the transmissibility and FRF charts, modes and reasons', async () => {
    const { user } = openSelection();
    await findMounts(user);
    await user.click(screen.getByRole('button', { name: 'QB-HS-300 housed spring' }));

    const detail = await screen.findByRole('region', { name: 'Candidate 1' });
    const loads = within(detail).getByRole('table', { name: 'Loads per point' });
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent('A');
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent('2,717 N');
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent('0.85');
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent('25.0 mm');

    const isolation = within(detail).getByRole('table', { name: 'Isolation per frequency' });
    expect(within(isolation).getAllByRole('row')[1]).toHaveTextContent('24.7 Hz');
    expect(within(isolation).getAllByRole('row')[1]).toHaveTextContent('1× shaft at 1480 rpm');

    const chart = within(detail).getByTestId('transmissibility-chart');
    await waitFor(() => expect(chart.querySelector('.VictoryContainer svg')).not.toBeNull(), { timeout: 10_000 });
    expect(within(chart).getByText('isolation (T < 1)')).toBeInTheDocument();
    expect(within(chart).getByText('1× shaft')).toBeInTheDocument();
    await waitFor(() => expect(within(detail).getByTestId('frf-chart').querySelectorAll('.VictoryContainer')).toHaveLength(3));

    const modes = within(detail).getByRole('table', { name: 'Rigid-body modes' });
    expect(within(modes).getAllByRole('row')).toHaveLength(7);
    expect(modes).toHaveTextContent('bounce — vertical');
    expect(within(detail).getByTestId('candidate-notes')).toHaveTextContent('Level error 2.7 mm: shim the low corner');
    expect(within(detail).queryByTestId('candidate-reasons')).not.toBeInTheDocument();
    expect(screen.getByRole('complementary', { name: 'Cautions' })).toHaveTextContent('licensed engineer');
  });

  it('lists why a failing candidate fails', async () => {
    const { user } = openSelection();
    await findMounts(user);
    await user.click(screen.getByRole('button', { name: 'QB-EP-40 elastomer pad' }));
    const detail = await screen.findByRole('region', { name: 'Candidate 3' });
    const reasons = within(detail).getByTestId('candidate-reasons');
    expect(reasons).toHaveTextContent('Why it fails');
    expect(reasons).toHaveTextContent('Utilisation 1.13 at point A exceeds 1.00');
  });

  it('chooses a candidate with a PUT carrying the version, and shows it as chosen', async () => {
    const { user, fake, server } = openSelection();
    await findMounts(user);
    await user.click(screen.getByRole('button', { name: 'QB-HS-300 housed spring' }));
    await user.click(await screen.findByRole('button', { name: 'Choose this' }));

    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body).toEqual({ version: 3, chosenMountId: 11 });
    expect(await screen.findByText('Chosen for this design')).toBeInTheDocument();
    expect(screen.getByTestId('chosen-mounts')).toHaveTextContent('QB-HS-300 housed spring');
    expect(server.design.chosen?.mountId).toBe(11);

    // A second choice carries the new version.
    await user.click(screen.getByRole('button', { name: 'SM-LV series, sized per point' }));
    await user.click(await screen.findByRole('button', { name: 'Choose this' }));
    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(2));
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)[1]!.body).toEqual({ version: 4, chosenSeriesId: '3:SM-LV' });
  });

  it('says the design was changed by someone else when choosing answers 409', async () => {
    const { user, server } = openSelection();
    await findMounts(user);
    server.design = { ...server.design, version: 9 };
    await user.click(screen.getByRole('button', { name: 'QB-HS-300 housed spring' }));
    await user.click(await screen.findByRole('button', { name: 'Choose this' }));

    const message = await screen.findByText('This design was changed by someone else; reload it');
    expect(within(message.closest('.bp6-callout') as HTMLElement).getByRole('button', { name: 'Reload' })).toBeInTheDocument();
    expect(screen.queryByText('Chosen for this design')).not.toBeInTheDocument();
  });

  it('will not choose from results older than the input', async () => {
    const { user } = openSelection();
    await findMounts(user);
    await user.click(screen.getByRole('tab', { name: 'Equipment' }));
    const mass = screen.getByLabelText('Mass of Frame');
    await user.clear(mass);
    await user.type(mass, '260');
    await user.click(screen.getByRole('tab', { name: 'Mount selection' }));
    expect(screen.getByText('These results are for an earlier input')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'QB-HS-300 housed spring' }));
    expect(await screen.findByRole('button', { name: 'Choose this' })).toBeDisabled();
  });

  it('shows the chosen mounts to a viewer, with the curve following the current mass', async () => {
    const chosen = demoCandidates()[0]!;
    openSelection(makeDesign({ id: DESIGN_ID, name: NAME, chosen, status: 'released' }), 'viewer');

    const detail = await screen.findByRole('region', { name: 'Chosen mounts' });
    expect(within(detail).getByText('Chosen for this design')).toBeInTheDocument();
    expect(within(detail).queryByRole('button', { name: 'Choose this' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: /Find mounts/ })).not.toBeInTheDocument();
    expect(screen.getByText('Running a selection is for engineers and administrators.')).toBeInTheDocument();
    await waitFor(
      () => expect(within(detail).getByTestId('transmissibility-chart').querySelector('.VictoryContainer svg')).not.toBeNull(),
      {
        timeout: 10_000,
      },
    );
  });

  it('updates the chosen candidate’s natural frequency live when the mass changes', async () => {
    const chosen = demoCandidates()[0]!;
    const { user } = openSelection(makeDesign({ id: DESIGN_ID, name: NAME, chosen }));
    const detail = await screen.findByRole('region', { name: 'Chosen mounts' });
    expect(within(detail).queryByTestId('live-fn')).not.toBeInTheDocument();

    await user.click(screen.getByRole('tab', { name: 'Equipment' }));
    const mass = screen.getByLabelText('Mass of Frame');
    await user.clear(mass);
    await user.type(mass, '1250');
    await user.click(screen.getByRole('tab', { name: 'Mount selection' }));
    // Same Σk, twice the mass: fn falls by √2, 3.15 Hz → 2.23 Hz.
    expect(within(detail).getByTestId('live-fn')).toHaveTextContent('2.23 Hz');
    expect(within(detail).getByTestId('live-fn')).toHaveTextContent('2,000 kg');
  });

  it('explains a failed run', async () => {
    const { user, fake } = openSelection();
    fake.on('post', '/designs/:id/selection', {
      status: 400,
      data: { statusCode: 400, message: 'mountPoints: mounts are collinear (or coincide): the frame would tip' },
    });
    await user.click(await screen.findByRole('button', { name: 'Find mounts' }));
    expect(await screen.findByText('The selection did not run')).toBeInTheDocument();
    expect(screen.getByText(/mounts are collinear/)).toBeInTheDocument();
  });
});
