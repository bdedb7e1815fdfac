import { screen, waitFor, within } from '@testing-library/react';

import { makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { TEST_USERS } from '@/testing/factories';
import { renderApp, type RenderOptions } from '@/testing/render';
import type { Design, UpdateDesignInput } from '@/types/design-api';
import type { Model2Operating } from '@/types/model2-api';

const DESIGN_ID = 41;

function openRunning(
  design: Design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid' }),
  signedInAs: RenderOptions['signedInAs'] = 'engineer',
) {
  const fake = installFakeApi();
  serveDesign(fake, design);
  const rendered = renderApp({ signedInAs, path: `/designs/${design.id}` });
  return { ...rendered, fake };
}

async function goToRunning(user: ReturnType<typeof openRunning>['user']) {
  await screen.findByRole('heading', { name: 'CHW pump P-3 skid', level: 1 });
  await user.click(screen.getByRole('tab', { name: /Running conditions/ }));
}

const savedOperating = (fake: ReturnType<typeof openRunning>['fake'], index = 0) =>
  (fake.calls('put', `/designs/${DESIGN_ID}`)[index]!.body as UpdateDesignInput).input!.operating as Model2Operating;

// The whole design page in jsdom with typing: allow more than the default 5 s on a busy 2-core
// machine. A harness limit, not a speed check.
vi.setConfig({ testTimeout: 40_000 });

describe('Sources table — proposal from the equipment', () => {
  it('proposes an impeller and a rotor at the components’ centres of gravity, G 6.3, order 1, and draws them', async () => {
    const { user, fake } = openRunning();
    await goToRunning(user);
    expect(screen.getByTestId('no-sources')).toHaveTextContent('vertical force through its centre of gravity');

    await user.click(screen.getByRole('button', { name: 'Propose from the equipment' }));
    const table = screen.getByRole('table', { name: 'Sources' });
    const rows = within(table).getAllByTestId('source-row');
    // demo equipment: Pump 300 kg at (0.65, 0.05, 0.5), Motor 450 kg at (-0.3, 0, 0.45), Frame (proposes nothing)
    expect(rows).toHaveLength(2);
    expect(within(table).getByLabelText('Name of source 1')).toHaveValue('Pump impeller');
    expect(within(table).getByLabelText('x of Pump impeller')).toHaveValue('0.65');
    expect(within(table).getByLabelText('z of Pump impeller')).toHaveValue('0.5');
    expect(within(table).getByLabelText('Kind of Pump impeller')).toHaveValue('unbalance');
    expect(within(table).getByLabelText('Axis of Pump impeller')).toHaveValue('x');
    expect(within(table).getByLabelText('Order of Pump impeller')).toHaveValue('1');
    // a tenth of the pump, a third (0.3) of the motor: rules of thumb stated beside the proposal
    expect(within(table).getByLabelText('Rotor mass of Pump impeller')).toHaveValue('30');
    expect(within(table).getByLabelText('Rotor mass of Motor rotor')).toHaveValue('135');
    expect(within(table).getByLabelText('Balance grade of Motor rotor')).toHaveValue('6.3');
    expect(screen.getByTestId('proposal-note')).toHaveTextContent("replace them with the maker's figures");

    // both drawings show both sources
    const drawings = screen.getByTestId('sources-drawings');
    expect(within(drawings).getAllByTestId('drawn-source')).toHaveLength(4);

    // proposing again adds nothing twice
    await user.click(screen.getByRole('button', { name: 'Propose from the equipment' }));
    expect(within(table).getAllByTestId('source-row')).toHaveLength(2);
    expect(screen.getByTestId('proposal-note')).toHaveTextContent('already listed');

    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    expect(savedOperating(fake).sources).toEqual([
      {
        label: 'Pump impeller',
        kind: 'unbalance',
        at: { x: 0.65, y: 0.05, z: 0.5 },
        axis: 'x',
        order: 1,
        rotorMassKg: 30,
        balanceGradeMmPerS: 6.3,
      },
      {
        label: 'Motor rotor',
        kind: 'unbalance',
        at: { x: -0.3, y: 0, z: 0.45 },
        axis: 'x',
        order: 1,
        rotorMassKg: 135,
        balanceGradeMmPerS: 6.3,
      },
    ]);
  });

  it('says so when no component turns', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid' });
    design.input.components = [{ name: 'Tank', massKg: 800, cg: { x: 0, y: 0, z: 0.6 } }];
    const { user } = openRunning(design);
    await goToRunning(user);
    await user.click(screen.getByRole('button', { name: 'Propose from the equipment' }));
    expect(screen.getByTestId('proposal-note')).toHaveTextContent('No pump, fan or motor among the components');
    expect(screen.queryByRole('table', { name: 'Sources' })).not.toBeInTheDocument();
  });
});

describe('Sources table — units', () => {
  it('shows and takes positions in inches, masses in lb and forces in lbf for a US user; stores SI', async () => {
    const design = makeDesign({ id: DESIGN_ID, name: 'CHW pump P-3 skid' });
    (design.input.operating as Model2Operating).sources = [
      // 0.0254 m = 1 in; 45.359237 kg = 100 lb; 4.4482216152605 N = 1 lbf (exact definitions)
      { label: 'Coupling', kind: 'force', at: { x: 0.254, y: 0, z: 0.0254 }, axis: 'z', order: 2, amplitudeN: 444.82216152605 },
      { label: 'Fan wheel', kind: 'unbalance', at: { x: 0, y: 0.0254, z: 0.508 }, axis: 'y', rotorMassKg: 45.359237 },
    ];
    const { user, fake } = openRunning(design, { ...TEST_USERS.engineer, unitSystem: 'US' });
    await goToRunning(user);
    const table = screen.getByRole('table', { name: 'Sources' });
    expect(within(table).getByText('Acts at (in)')).toBeInTheDocument();
    expect(within(table).getByText('Rotor (lb) or force (lbf)')).toBeInTheDocument();
    expect(within(table).getByLabelText('x of Coupling')).toHaveValue('10');
    expect(within(table).getByLabelText('z of Coupling')).toHaveValue('1');
    expect(within(table).getByLabelText('Force of Coupling')).toHaveValue('100');
    expect(within(table).getByLabelText('z of Fan wheel')).toHaveValue('20');
    expect(within(table).getByLabelText('Rotor mass of Fan wheel')).toHaveValue('100');
    // an unbalance without a grade shows the usual G 6.3
    expect(within(table).getByLabelText('Balance grade of Fan wheel')).toHaveValue('6.3');

    const force = within(table).getByLabelText('Force of Coupling');
    await user.clear(force);
    await user.type(force, '50');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    await waitFor(() => expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(1));
    const [coupling, fan] = savedOperating(fake).sources!;
    expect(coupling!.amplitudeN).toBeCloseTo(50 * 4.4482216152605, 9);
    expect(coupling!.at.x).toBeCloseTo(0.254, 12);
    expect(fan!.rotorMassKg).toBeCloseTo(45.359237, 9);
    expect(fan!.balanceGradeMmPerS).toBe(6.3);
  });
});

describe('Sources table — validation', () => {
  it('explains a missing rotor mass, a missing force, a band that ends below its start and odd poles, and sends nothing', async () => {
    const { user, fake } = openRunning();
    await goToRunning(user);

    await user.click(screen.getByRole('button', { name: 'Add source' }));
    const table = screen.getByRole('table', { name: 'Sources' });
    for (const axis of ['x', 'y', 'z']) await user.type(within(table).getByLabelText(`${axis} of Source 1`), '0');
    await user.click(screen.getByRole('button', { name: 'Add source' }));
    await user.selectOptions(within(table).getByLabelText('Kind of Source 2'), 'force');
    for (const axis of ['x', 'y', 'z']) await user.type(within(table).getByLabelText(`${axis} of Source 2`), '0');
    // a force has no rotor, an unbalance no amplitude or fixed frequency
    expect(within(table).queryByLabelText('Rotor mass of Source 2')).not.toBeInTheDocument();
    expect(within(table).queryByLabelText('Force of Source 1')).not.toBeInTheDocument();
    expect(within(table).queryByLabelText('Fixed frequency of Source 1')).not.toBeInTheDocument();

    await user.click(screen.getByLabelText('Speed range (variable-speed drive)'));
    await user.type(screen.getByLabelText('Lowest speed'), '900');
    await user.type(screen.getByLabelText('Highest speed'), '1480');
    await user.click(screen.getByRole('button', { name: 'Add skip band' }));
    await user.type(screen.getByLabelText('Skip band 1 from'), '1200');
    await user.type(screen.getByLabelText('Skip band 1 to'), '1100');
    await user.type(screen.getByLabelText('Motor poles'), '3');

    await user.click(screen.getByRole('button', { name: 'Save' }));
    const problems = (await screen.findByText('Some input needs attention before it can be saved')).closest('.bp6-callout')!;
    expect(problems).toHaveTextContent('Running conditions, source 1 (Source 1): Enter the rotor mass');
    expect(problems).toHaveTextContent('Running conditions, source 2 (Source 2): Enter the force');
    expect(problems).toHaveTextContent('Running conditions, skip band 1: The band must end above where it starts');
    expect(problems).toHaveTextContent('A motor has an even number of poles');
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(0);
  });

  it('asks for a name of its own for each source', async () => {
    const { user, fake } = openRunning();
    await goToRunning(user);
    await user.click(screen.getByRole('button', { name: 'Propose from the equipment' }));
    const table = screen.getByRole('table', { name: 'Sources' });
    const second = within(table).getByLabelText('Name of source 2');
    await user.clear(second);
    await user.type(second, 'Pump impeller');
    await user.click(screen.getByRole('button', { name: 'Save' }));
    const problems = (await screen.findByText('Some input needs attention before it can be saved')).closest('.bp6-callout')!;
    expect(problems).toHaveTextContent('Each source needs its own name');
    expect(fake.calls('put', `/designs/${DESIGN_ID}`)).toHaveLength(0);
  });
});
