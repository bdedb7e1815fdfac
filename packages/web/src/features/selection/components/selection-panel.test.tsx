import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, makeCandidate, makeDesign, QUELLBROOK, selectionResultFor, serveDesign } from '@/testing/design-fakes';
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

/** The body rows of the candidates table, each as the text of its cells. */
function tableRows(table: HTMLElement): string[][] {
  return within(table)
    .getAllByRole('row')
    .slice(1)
    .map((row) => Array.from(row.querySelectorAll('th, td')).map((cell) => cell.textContent ?? ''));
}

/** The candidate's name as the first cell shows it (tick box, rank, name, supplier · kind). */
const nameOf = (row: string[]) => row[0] ?? '';

// Each test drives the whole design page through typing and tables in jsdom; on a busy 2-core
// machine that can take longer than the default 5 s. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

describe('Mount selection', () => {
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
      '1QB-HS-300 housed springQuellbrook Mounts · One part',
      'Passes',
      // CV-13 with ζ = 0.05: T = 0.02108 at 24.67 Hz → 97.9 % (docs/engineering/check-values.md CV-13).
      '97.9 %at 24.7 Hz',
      '3.15 Hz',
      '68–85 %',
      'USD 368.00',
      '21 days',
      'Level error 2.7 mm: shim the low corner',
    ]);
    expect(nameOf(rows[1]!)).toBe('2SM-LV series, sized per pointStillmoor Isolation · Sized per point');
    expect(rows[2]?.[1]).toBe('Fails');
    // the whole first reason, never cut short; the others on request
    expect(rows[2]?.[7]).toBe('Isolation 57.8 % at 24.67 Hz is below the 90 % asked for1 more');
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
    const names = () =>
      within(table)
        .getAllByRole('button', { name: /^Show the details|QB-|SM-/ })
        .map((b) => b.textContent);
    expect(names()).toEqual(['QB-EP-40 elastomer pad', 'SM-LV series, sized per point', 'QB-HS-300 housed spring']);
    await user.click(screen.getByRole('button', { name: 'Ascending' }));
    expect(names()).toEqual(['QB-HS-300 housed spring', 'SM-LV series, sized per point', 'QB-EP-40 elastomer pad']);
    // a column header sorts too, and a second click turns the order round
    await user.click(within(table).getByRole('button', { name: /^Lead time/ }));
    expect(within(table).getByRole('columnheader', { name: /Lead time/ })).toHaveAttribute('aria-sort', 'ascending');
    expect(names()).toEqual(['QB-EP-40 elastomer pad', 'QB-HS-300 housed spring', 'SM-LV series, sized per point']);
    await user.click(within(table).getByRole('button', { name: /^Lead time/ }));
    expect(names()[0]).toBe('SM-LV series, sized per point');
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
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent('85 %');
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
    // the figure beside the note reads as the note does (the sentence precision of @tacet/vibration formatMeasure)
    expect(within(detail).getByText('Level error').nextElementSibling).toHaveTextContent(/^2\.7 mm$/);
    expect(within(detail).queryByTestId('candidate-reasons')).not.toBeInTheDocument();
    expect(screen.getByRole('complementary', { name: 'Cautions' })).toHaveTextContent('licensed engineer');
  });

  it('lists why a failing candidate fails', async () => {
    const { user } = openSelection();
    await findMounts(user);
    await user.click(screen.getByRole('button', { name: 'QB-EP-40 elastomer pad' }));
    const detail = await screen.findByRole('region', { name: 'Candidate 3' });
    const reasons = within(detail).getByTestId('candidate-reasons');
    expect(reasons).toHaveTextContent('Checks not met');
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

  it('shows the selection kept with the design after a reload, without running it again', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: NAME });
    design.lastSelection = {
      ranAt: '2025-01-09T11:00:00.000Z',
      ranBy: { id: 3, name: 'Erin Engineer' },
      limit: 50,
      catalogChanged: false,
      result: selectionResultFor(design.input),
    };
    const { fake } = openSelection(design);
    const table = await screen.findByTestId('candidates-table');
    expect(tableRows(table)).toHaveLength(3);
    expect(fake.calls('post', `/designs/${DESIGN_ID}/selection`)).toHaveLength(0);
    expect(screen.getByText('3 candidates, 2 passing')).toBeInTheDocument();
    expect(screen.getByText(/run 9 Jan 2025, \d\d:\d\d by Erin Engineer, kept with the design/)).toBeInTheDocument();
    expect(screen.queryByText('The catalog changed since this run')).not.toBeInTheDocument();
  });

  it('says when the catalog changed since the kept run', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: NAME });
    design.lastSelection = {
      ranAt: '2025-01-09T11:00:00.000Z',
      ranBy: null,
      limit: 50,
      catalogChanged: true,
      result: selectionResultFor(design.input),
    };
    openSelection(design);
    expect(await screen.findByText('The catalog changed since this run')).toBeInTheDocument();
  });

  it('asks the page to read the design again after a run, so the kept run survives leaving the tab', async () => {
    const { user, fake } = openSelection();
    const before = fake.calls('get', `/designs/${DESIGN_ID}`).length;
    await findMounts(user);
    await waitFor(() => expect(fake.calls('get', `/designs/${DESIGN_ID}`).length).toBeGreaterThan(before));
  });

  it('shows every reason of a row on request, none cut short', async () => {
    const { user } = openSelection();
    const table = await findMounts(user);
    const failing = within(table).getAllByRole('row')[3]!;
    expect(failing).not.toHaveTextContent('Utilisation 1.13 at point A exceeds 1.00');
    await user.click(within(failing).getByRole('button', { name: '1 more' }));
    expect(failing).toHaveTextContent('Isolation 57.8 % at 24.67 Hz is below the 90 % asked for');
    expect(failing).toHaveTextContent('Utilisation 1.13 at point A exceeds 1.00');
    expect(screen.queryByRole('region', { name: 'Candidate 3' })).not.toBeInTheDocument();
    await user.click(within(failing).getByRole('button', { name: 'Show less' }));
    expect(failing).not.toHaveTextContent('Utilisation 1.13 at point A exceeds 1.00');
  });

  it('compares two to four candidates side by side: figures, reasons and the curves together', async () => {
    const { user } = openSelection();
    const table = await findMounts(user);
    const compareButton = screen.getByRole('button', { name: 'Compare' });
    expect(compareButton).toBeDisabled();
    await user.click(within(table).getByRole('checkbox', { name: 'Compare QB-HS-300 housed spring' }));
    expect(compareButton).toBeDisabled();
    await user.click(within(table).getByRole('checkbox', { name: 'Compare QB-EP-40 elastomer pad' }));
    expect(screen.getByText('2 ticked.')).toBeInTheDocument();
    await user.click(compareButton);

    const comparison = await screen.findByRole('region', { name: 'Comparison' });
    const figures = within(comparison).getByRole('table', { name: 'Compared candidates' });
    const head = within(figures).getAllByRole('columnheader');
    expect(head[0]).toHaveTextContent('#1 QB-HS-300 housed spring');
    expect(head[1]).toHaveTextContent('#3 QB-EP-40 elastomer pad');
    const row = (name: string) =>
      within(figures)
        .getByRole('rowheader', { name: new RegExp(`^${name}`) })
        .closest('tr')!;
    expect(row('Result')).toHaveTextContent(/Passes.*Fails/);
    // the better figure of a row is marked: lower fn, lower price
    const fn = within(row('Natural frequency, vertical')).getAllByRole('cell');
    expect(fn[0]).toHaveClass('tc-best');
    expect(fn[0]).toHaveTextContent('3.15 Hz (best)');
    expect(fn[1]).not.toHaveClass('tc-best');
    expect(within(row('Price, all points')).getAllByRole('cell')[1]).toHaveClass('tc-best');
    expect(row('Checks not met')).toHaveTextContent('Meets every requirement');
    expect(row('Checks not met')).toHaveTextContent('Utilisation 1.13 at point A exceeds 1.00');
    expect(row('Isolation at 24.7 Hz')).toHaveTextContent('1× shaft at 1480 rpm');

    const chart = within(comparison).getByTestId('comparison-chart');
    expect(within(chart).getByText(/#1 QB-HS-300 housed spring — fn 3\.15 Hz, viscous, damping ratio ζ = 0\.050/)).toBeInTheDocument();
    await waitFor(() => expect(chart.querySelector('.VictoryContainer svg')).not.toBeNull(), { timeout: 10_000 });
    expect(within(chart).getByText('T = 1')).toBeInTheDocument();

    // removing one leaves too few to compare; Details opens the candidate
    await user.click(within(comparison).getByRole('button', { name: 'Details of QB-HS-300 housed spring' }));
    expect(await screen.findByRole('region', { name: 'Candidate 1' })).toBeInTheDocument();
    await user.click(within(comparison).getByRole('button', { name: 'Remove QB-EP-40 elastomer pad from the comparison' }));
    expect(screen.queryByRole('region', { name: 'Comparison' })).not.toBeInTheDocument();
    expect(within(table).getByRole('checkbox', { name: 'Compare QB-EP-40 elastomer pad' })).not.toBeChecked();
  });

  it('ticks at most four candidates', async () => {
    const many = Array.from({ length: 5 }, (_, i) =>
      makeCandidate({
        kind: 'uniform',
        id: 20 + i,
        label: `QB-${i}`,
        supplier: QUELLBROOK,
        fnHz: 3 + i / 10,
        ratedLoadN: 3200,
        passes: true,
      }),
    );
    const fake = installFakeApi();
    serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME }), many);
    const { user } = renderApp({ signedInAs: 'engineer', path: `/designs/${DESIGN_ID}?tab=selection` });
    const table = await findMounts(user);
    for (let i = 0; i < 4; i++) await user.click(within(table).getByRole('checkbox', { name: `Compare QB-${i}` }));
    expect(within(table).getByRole('checkbox', { name: 'Compare QB-4' })).toBeDisabled();
    expect(screen.getByText('4 ticked (the most that can be compared).')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Compare' }));
    const figures = await screen.findByRole('table', { name: 'Compared candidates' });
    expect(within(figures).getAllByRole('columnheader')).toHaveLength(4);
  });

  it('shows utilisation on the checks’ basis: the heaviest point with the weight margin', async () => {
    const candidates = demoCandidates().map((c) => ({ ...c, weightMarginPct: 10 }));
    const fake = installFakeApi();
    serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME }), candidates);
    const { user } = renderApp({ signedInAs: 'engineer', path: `/designs/${DESIGN_ID}?tab=selection` });
    const table = await findMounts(user);
    // CV-15 loads on 3200 N mounts: 2186.1/3200 = 0.683 lightest; 2717.3/3200 × 1.10 = 0.934 heaviest with the margin
    expect(tableRows(table)[0]![4]).toBe('68–93 %');
    expect(within(table).getByRole('columnheader', { name: /Utilisation/ })).toHaveTextContent('Utilisation+10 % weight');

    await user.click(within(table).getByRole('button', { name: 'QB-HS-300 housed spring' }));
    const detail = await screen.findByRole('region', { name: 'Candidate 1' });
    const loads = within(detail).getByRole('table', { name: 'Loads per point' });
    expect(within(loads).getByRole('columnheader', { name: 'With the 10 % weight margin' })).toBeInTheDocument();
    expect(within(loads).getAllByRole('row')[1]).toHaveTextContent(/85 %\s*93 %/);
  });

  it('names mixed modes by the motions that carry them, with their shares', async () => {
    const { user } = openSelection();
    const table = await findMounts(user);
    await user.click(within(table).getByRole('button', { name: 'QB-HS-300 housed spring' }));
    const detail = await screen.findByRole('region', { name: 'Candidate 1' });
    const modes = within(detail).getByRole('table', { name: 'Rigid-body modes' });
    const rows = within(modes).getAllByRole('row').slice(1);
    // the two modes a dominant-only name called "yaw" both
    expect(rows[2]).toHaveTextContent('yaw + roll (mixed)yaw 55 %, roll 40 %');
    expect(rows[4]).toHaveTextContent('yaw + roll (mixed)yaw 50 %, roll 45 %');
    expect(rows[3]).toHaveTextContent('bounce — verticalone motion');
    expect(rows[5]).toHaveTextContent('pitch — about y');
    expect(modes).not.toHaveTextContent('yaw — about z');
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
