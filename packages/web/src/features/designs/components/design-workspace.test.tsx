import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, demoInput, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { TEST_USERS } from '@/testing/factories';
import { renderApp, type RenderOptions } from '@/testing/render';
import type { Design, DesignInput, UpdateDesignInput } from '@/types/design-api';

const DESIGN_ID = 40;

function openDesign(
  design: Design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid' }),
  signedInAs: RenderOptions['signedInAs'] = 'engineer',
) {
  const fake = installFakeApi();
  const server = serveDesign(fake, design);
  const rendered = renderApp({ signedInAs, path: `/designs/${design.id}` });
  return { ...rendered, fake, server };
}

async function waitForPage(name = 'CHW pump P-3 skid') {
  return screen.findByRole('heading', { name, level: 1 });
}

// The whole design page in jsdom with typing: allow more than the default 5 s on a busy 2-core
// machine. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

describe('Design page — input and live figures', () => {
  it('shows the saved input and the total mass and CG of CV-14', async () => {
    openDesign();
    await waitForPage();

    const equipment = screen.getByRole('table', { name: 'Equipment' });
    expect(within(equipment).getByLabelText('Mass of Pump')).toHaveValue('300');
    expect(within(equipment).getByLabelText('CG x of Pump')).toHaveValue('0.65');
    expect(within(equipment).getByLabelText('Box size along x of Frame')).toHaveValue('2');

    // docs/engineering/check-values.md CV-14: m = 1000 kg, CG (0.0600, 0.0150, 0.3775) m.
    expect(screen.getByTestId('total-mass')).toHaveTextContent('1,000 kg');
    expect(screen.getByTestId('total-cg')).toHaveTextContent('0.0600 m, 0.0150 m, 0.3775 m');
    expect(screen.getByTestId('equipment-cg')).toHaveTextContent('x 0.0600 m, y 0.0150 m, z 0.3775 m');
    expect(screen.getByTestId('total-weight')).toHaveTextContent('9,807 N');
    expect(screen.getByTestId('chosen-mounts')).toHaveTextContent('None chosen yet');
  });

  it('draws four mount loads on the plan that add up to the weight (CV-15)', async () => {
    const { user } = openDesign();
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Mount layout' }));

    const plan = screen.getByTestId('plan-view');
    const loads = within(plan).getAllByTestId('plan-load');
    expect(loads).toHaveLength(4);
    const values = loads.map((el) => Number(el.getAttribute('data-load-n')));
    expect(values.reduce((a, b) => a + b, 0)).toBeCloseTo(9806.65, 6);
    // CV-15 rigid-frame loads, shown rounded: 2717.3 / 2553.8 / 2349.5 / 2186.1 N.
    expect(loads.map((el) => el.textContent)).toEqual(['2,717 N', '2,554 N', '2,350 N', '2,186 N']);
    expect(
      within(plan)
        .getAllByTestId('plan-point')
        .map((p) => p.textContent?.charAt(0)),
    ).toEqual(['A', 'B', 'C', 'D']);
    expect(within(plan).getByTestId('plan-cg')).toBeInTheDocument();
    expect(screen.getByTestId('loads-total')).toHaveTextContent('Loads add up to 9,807 N; the weight is 9,807 N.');
    expect(screen.getByTestId('cg-height')).toHaveTextContent('0.378 m');
  });

  it('lists the disturbing frequencies of CV-13 with the governing one marked', async () => {
    const { user } = openDesign();
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Running conditions' }));

    const table = screen.getByRole('table', { name: 'Disturbing frequencies' });
    const rows = within(table).getAllByRole('row').slice(1);
    expect(rows.map((row) => within(row).getAllByRole('cell')[0]?.textContent)).toEqual(['24.67 Hz', '49.33 Hz', '100.0 Hz', '148.0 Hz']);
    expect(rows[0]).toHaveTextContent('1× shaft at 1480 rpm');
    expect(rows[0]).toHaveTextContent('Governing');
    expect(rows[2]).toHaveTextContent('2× line (50 Hz supply)');
    expect(rows[3]).toHaveTextContent('vane pass (6 vanes)');
    expect(rows.filter((row) => row.textContent?.includes('Governing'))).toHaveLength(1);
    expect(screen.getByTestId('governing-frequency')).toHaveTextContent('24.67 Hz');
  });

  it('recomputes the figures as the user types, without asking the server', async () => {
    const { user, fake } = openDesign();
    await waitForPage();
    const requestsBefore = fake.requests.length;

    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '400');
    expect(screen.getByTestId('total-mass')).toHaveTextContent('1,100 kg');
    // x_G = (400·0.65 − 450·0.30)/1100 = 0.1136 m
    expect(screen.getByTestId('total-cg')).toHaveTextContent('0.1136 m');

    await user.click(screen.getByRole('tab', { name: 'Running conditions' }));
    const speed = screen.getByLabelText('Running speed');
    await user.clear(speed);
    await user.type(speed, '2960');
    expect(screen.getByTestId('governing-frequency')).toHaveTextContent('49.33 Hz');
    expect(fake.requests.slice(requestsBefore).filter((r) => r.method !== 'get')).toEqual([]);
  });

  it('warns in words when the mounts are in one line or the machine would tip', async () => {
    const { user } = openDesign();
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Mount layout' }));
    for (const label of ['A', 'B', 'C', 'D']) {
      const y = screen.getByLabelText(`y of point ${label}`);
      await user.clear(y);
      await user.type(y, '0');
    }
    expect(await screen.findByText('Mount points in one line')).toBeInTheDocument();
    expect(screen.queryByTestId('plan-load')).not.toBeInTheDocument();

    const y = screen.getByLabelText('y of point A');
    await user.clear(y);
    await user.type(y, '0.45');
    await user.click(screen.getByRole('tab', { name: 'Equipment' }));
    const x = screen.getByLabelText('CG x of Pump');
    await user.clear(x);
    await user.type(x, '5');
    await user.click(screen.getByRole('tab', { name: 'Mount layout' }));
    expect(screen.getByText('Centre of gravity outside the mounts')).toBeInTheDocument();
    // x_G = (1500 − 135)/1000 = 1.365 m, beyond the mounts at x = 0.8 m: the far side pulls.
    expect(screen.getByText('Point C lifts off')).toBeInTheDocument();
    expect(screen.getByText('Point D lifts off')).toBeInTheDocument();
  });

  it('asks before leaving with unsaved changes', async () => {
    const { user, router } = openDesign();
    await waitForPage();
    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '310');
    await user.click(screen.getByRole('link', { name: /Harbour Chiller Hall/ }));

    const alert = await screen.findByRole('alertdialog');
    expect(alert).toHaveTextContent('This design has unsaved changes');
    await user.click(within(alert).getByRole('button', { name: 'Stay' }));
    expect(router.state.location.pathname).toBe(`/designs/${DESIGN_ID}`);
    expect(screen.getByLabelText('Mass of Pump')).toHaveValue('310');
  });

  it('shows a speed range and both its ends', async () => {
    const { user } = openDesign();
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Running conditions' }));
    await user.click(screen.getByLabelText('Speed range (variable-speed drive)'));
    await user.type(screen.getByLabelText('Lowest speed'), '900');
    await user.type(screen.getByLabelText('Highest speed'), '1480');
    const table = screen.getByRole('table', { name: 'Disturbing frequencies' });
    expect(within(table).getAllByRole('row')[1]).toHaveTextContent('15.00 Hz');
    expect(within(table).getAllByRole('row')[1]).toHaveTextContent('minimum speed');
  });
});

describe('Design page — saving', () => {
  it('marks unsaved changes and saves the SI input with the version', async () => {
    const { user, fake, server } = openDesign();
    await waitForPage();
    expect(screen.getByText('All changes saved')).toBeInTheDocument();
    expect(screen.getByRole('button', { name: 'Save' })).toBeDisabled();

    const mass = screen.getByLabelText('Mass of Motor');
    await user.clear(mass);
    await user.type(mass, '480');
    expect(screen.getByText('Unsaved changes')).toBeInTheDocument();
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    const body = fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body as UpdateDesignInput;
    expect(body.version).toBe(3);
    const expected: DesignInput = demoInput();
    expected.components[1]!.massKg = 480;
    expect(body.input).toEqual(expected);
    expect(await screen.findByText('All changes saved')).toBeInTheDocument();
    expect(server.design.version).toBe(4);

    // The next save carries the new version.
    await user.clear(mass);
    await user.type(mass, '470');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(2));
    expect((fake.calls('put', `/designs/${DESIGN_ID}`)[1]!.body as UpdateDesignInput).version).toBe(4);
  });

  it('explains invalid input in words and sends nothing', async () => {
    const { user, fake } = openDesign();
    await waitForPage();

    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '-5');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const problems = await screen.findByText('Some input needs attention before it can be saved');
    expect(problems.closest('.bp6-callout')).toHaveTextContent('Equipment, row 1 (Pump): The mass must be more than 0');
    expect(screen.getByLabelText('Mass of Pump')).toHaveAttribute('aria-invalid', 'true');
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(0);
  });

  it('places the server’s problems at their fields and names in the general message only what has no field', async () => {
    const { user, fake } = openDesign();
    await waitForPage();
    fake.on('put', '/designs/:id', {
      status: 400,
      data: {
        statusCode: 400,
        message: 'Validation failed',
        errors: [
          { field: 'input.components.1.massKg', message: 'Mass must be at most 10000000 kg' },
          { field: 'input.surprise', message: 'Surprise is not expected here' },
        ],
      },
    });
    const mass = screen.getByLabelText('Mass of Motor');
    await user.clear(mass);
    await user.type(mass, '480');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const notSaved = await screen.findByText('Not saved');
    expect(notSaved.closest('.bp6-callout')).toHaveTextContent('Some fields need attention — Surprise is not expected here.');
    expect(notSaved.closest('.bp6-callout')).not.toHaveTextContent('10000000');
    await waitFor(() => expect(screen.getByLabelText('Mass of Motor')).toHaveAttribute('aria-invalid', 'true'));
  });

  it('tells the user when someone else saved first, and reloads their version', async () => {
    const { user, fake, server } = openDesign();
    await waitForPage();
    // Someone else saves in the meantime.
    server.design = {
      ...server.design,
      version: 4,
      input: { ...server.design.input, components: server.design.input.components.map((c, i) => (i === 0 ? { ...c, massKg: 320 } : c)) },
    };

    const mass = screen.getByLabelText('Mass of Motor');
    await user.clear(mass);
    await user.type(mass, '480');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const alert = await screen.findByText('This design was changed by someone else; reload it');
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1);
    await user.click(within(alert.closest('.bp6-callout') as HTMLElement).getByRole('button', { name: 'Reload' }));

    await waitFor(() => expect(screen.getByLabelText('Mass of Pump')).toHaveValue('320'));
    expect(screen.getByLabelText('Mass of Motor')).toHaveValue('450');
    expect(screen.queryByText('This design was changed by someone else; reload it')).not.toBeInTheDocument();
  });

  it('saves the requirements: mount types and suppliers from the catalog', async () => {
    const { user, fake } = openDesign();
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Requirements' }));
    expect(screen.getByLabelText('Minimum isolation')).toHaveValue('90');

    await user.click(screen.getByRole('checkbox', { name: 'Housed spring' }));
    await user.click(screen.getByRole('checkbox', { name: 'Open spring' }));
    await user.click(await screen.findByRole('checkbox', { name: 'Stillmoor Isolation' }));
    await user.clear(screen.getByLabelText('Minimum isolation'));
    await user.type(screen.getByLabelText('Minimum isolation'), '95');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    expect((fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body as UpdateDesignInput).input!.criteria).toEqual({
      minIsolationPct: 95,
      minUtilization: 0.5,
      maxUtilization: 1,
      ambientTempC: 25,
      // In the catalog's order of types, whatever the order of the clicks.
      mountTypes: ['open_spring', 'housed_spring'],
      supplierIds: [3],
    });
  });

  it('says in words that saving a changed input clears the chosen mounts, before and after', async () => {
    const chosen = demoCandidates()[0]!;
    const { user, server } = openDesign(makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', chosen }));
    await waitForPage();
    expect(screen.getByTestId('chosen-mounts')).toHaveTextContent('QB-HS-300 housed spring');
    expect(screen.queryByTestId('save-clears-choice')).not.toBeInTheDocument();

    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '310');
    expect(screen.getByTestId('save-clears-choice')).toHaveTextContent('Saving clears the chosen mounts');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    const notice = await screen.findByTestId('choice-cleared');
    expect(notice).toHaveTextContent('The chosen mounts were cleared');
    expect(notice).toHaveTextContent('Saving the changed input cleared the choice of QB-HS-300 housed spring');
    expect(server.design.chosen).toBeNull();
    expect(screen.getByTestId('chosen-mounts')).toHaveTextContent('None chosen yet');

    await user.click(within(notice).getByRole('button', { name: 'Go to Mount selection' }));
    expect(screen.getByRole('tab', { name: 'Mount selection' })).toHaveAttribute('aria-selected', 'true');
    await user.click(within(screen.getByTestId('choice-cleared')).getByRole('button', { name: 'Dismiss' }));
    expect(screen.queryByTestId('choice-cleared')).not.toBeInTheDocument();
  });

  it('says nothing about the choice when a save keeps it', async () => {
    const chosen = demoCandidates()[0]!;
    const { user, fake } = openDesign(makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', chosen }));
    // a server that keeps the choice (e.g. the input came back the same)
    fake.on('put', '/designs/:id', ({ body }) => ({
      status: 200,
      data: makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', chosen, version: 4, input: (body as UpdateDesignInput).input! }),
    }));
    await waitForPage();
    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '310');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await screen.findByText('All changes saved');
    expect(screen.queryByTestId('choice-cleared')).not.toBeInTheDocument();
  });

  it('works without the supplier list', async () => {
    const { user, fake } = openDesign();
    fake.on('get', '/suppliers', { status: 500, data: { statusCode: 500, message: 'Internal server error' } });
    await waitForPage();
    await user.click(screen.getByRole('tab', { name: 'Requirements' }));
    expect(await screen.findByText('The supplier list is not available right now, so every supplier is considered.')).toBeInTheDocument();
    expect(screen.getByRole('checkbox', { name: 'Air spring' })).toBeInTheDocument();
  });

  it('converts values typed in US units to SI before sending', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid' });
    const { user, fake } = openDesign(design, { ...TEST_USERS.engineer, unitSystem: 'US' });
    await waitForPage();

    const equipment = screen.getByRole('table', { name: 'Equipment' });
    expect(within(equipment).getByRole('columnheader', { name: 'Mass (lb)' })).toBeInTheDocument();
    expect(screen.getByTestId('total-mass')).toHaveTextContent('2,205 lb');

    const mass = screen.getByLabelText('Mass of Pump');
    await user.clear(mass);
    await user.type(mass, '700');
    await user.click(screen.getByRole('tab', { name: 'Mount layout' }));
    const x = screen.getByLabelText('x of point A');
    await user.clear(x);
    await user.type(x, '36');
    await user.click(screen.getByRole('button', { name: 'Save' }));

    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    const input = (fake.calls('put', `/designs/${DESIGN_ID}`)[0]!.body as UpdateDesignInput).input!;
    // 1 lb = 0.45359237 kg and 1 in = 0.0254 m (exact definitions).
    expect(input.components[0]!.massKg).toBeCloseTo(700 * 0.45359237, 9);
    expect(input.mountPoints[0]!.x).toBeCloseTo(36 * 0.0254, 9);
    expect(input.components[1]!.massKg).toBeCloseTo(450, 3);
  });
});

describe('Design page — who may change it', () => {
  it('is read-only for a viewer, who still sees every figure', async () => {
    openDesign(undefined, 'viewer');
    await waitForPage();

    expect(screen.getByText('You can read this design; only engineers and administrators change designs.')).toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Save' })).not.toBeInTheDocument();
    expect(screen.queryByRole('button', { name: 'Add component' })).not.toBeInTheDocument();
    expect(screen.getByLabelText('Mass of Pump')).toHaveAttribute('readonly');
    expect(screen.getByTestId('total-mass')).toHaveTextContent('1,000 kg');
    expect(screen.queryByRole('button', { name: /Find mounts/ })).not.toBeInTheDocument();
  });

  it('is read-only once released, even for its author', async () => {
    openDesign(makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', status: 'released' }), 'engineer');
    await waitForPage();
    expect(screen.getByText('Released designs are frozen; a change starts a new revision.')).toBeInTheDocument();
    expect(screen.getByLabelText('Mass of Pump')).toHaveAttribute('readonly');
    expect(screen.queryByRole('button', { name: 'Save' })).not.toBeInTheDocument();
  });

  it('leaves another engineer’s draft to its author', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', author: { id: 77, name: 'Chris Checker' } });
    openDesign(design, 'engineer');
    await waitForPage();
    expect(screen.getByText('Only the author (Chris Checker) or an administrator can change this draft.')).toBeInTheDocument();
    expect(screen.getByLabelText('Mass of Pump')).toHaveAttribute('readonly');
  });

  it('lets an admin change anyone’s draft', async () => {
    openDesign(makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid', author: { id: 77, name: 'Chris Checker' } }), 'admin');
    await waitForPage();
    expect(screen.getByLabelText('Mass of Pump')).not.toHaveAttribute('readonly');
    expect(screen.getByRole('button', { name: 'Save' })).toBeInTheDocument();
  });
});
