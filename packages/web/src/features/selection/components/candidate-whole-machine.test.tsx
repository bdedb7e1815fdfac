import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, demoInput, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp } from '@/testing/render';
import type { Candidate } from '@/types/design-api';
import type { Model2Candidate, Model2Criteria, Model2Operating, SelectionCurves } from '@/types/model2-api';

const DESIGN_ID = 42;
const NAME = 'CHW pump P-3 skid';

/** Invented whole-machine figures for the first demo candidate on a 450–1480 rpm drive. */
function withWholeMachine(candidate: Candidate): Candidate & Model2Candidate {
  return {
    ...candidate,
    passes: false,
    reasons: ['The roll mode at 7.73 Hz is crossed by Motor rotor (1× shaft speed) at 464 rpm, inside the running range'],
    wholeMachine: {
      stiffnessTolerancePct: 15,
      worst: { transmissibility: 1.9, efficiencyPct: -90, frequencyHz: 7.72, speedRpm: 463, source: 'Motor rotor', stiffnessFactor: 0.85 },
      perFrequency: [
        {
          source: 'Motor rotor',
          frequencyHz: 7.72,
          speedRpm: 463,
          transmissibility: 1.9,
          amplitudeN: 12,
          perPoint: [
            { label: 'A', forceN: 6.3 },
            { label: 'B', forceN: 7.35 },
            { label: 'C', forceN: 6.51 },
            { label: 'D', forceN: 4.33 },
          ],
        },
        { source: 'Motor rotor', frequencyHz: 24.67, speedRpm: 1480, transmissibility: 0.03, amplitudeN: 120, perPoint: [] },
      ],
    },
    crossings: [{ mode: 'roll', modeFrequencyHz: 7.73, source: 'Motor rotor', order: 1, speedRpm: 464 }],
    passage: [
      { mode: 'sway', modeFrequencyHz: 2.1, speedRpm: 126, motionMm: 3.2 },
      { mode: 'surge', modeFrequencyHz: 2.4, speedRpm: 144, motionMm: 1.1 },
    ],
    assumptions: ['No dynamic-to-static ratio in the catalog: 1.4 used', 'No horizontal stiffness in the catalog: 0.5 × vertical used'],
  };
}

const CURVES: SelectionCurves = {
  candidate: { kind: 'uniform', mountId: 11, label: 'QB-HS-300 housed spring', passes: false },
  speedRangeRpm: { min: 450, max: 1480 },
  skipBandsRpm: [{ min: 1000, max: 1050 }],
  requirement: { minIsolationPct: 90, transmissibility: 0.1 },
  stiffnessTolerancePct: 15,
  modes: [],
  crossings: [],
  worst: null,
  sources: [
    {
      label: 'Motor rotor',
      order: 1,
      fixedFrequencyHz: null,
      speedRpm: [450, 464, 900, 1480],
      frequencyHz: [7.5, 7.73, 15, 24.67],
      transmissibility: [1.5, 1.8, 0.2, 0.03],
      softEnd: [1.9, 1.2, 0.15, 0.02],
      stiffEnd: [1.2, 1.9, 0.3, 0.04],
    },
  ],
};

function open() {
  const input = demoInput();
  input.operating = {
    orders: [1],
    speedRangeRpm: { min: 450, max: 1480 },
    skipBandsRpm: [{ min: 1000, max: 1050 }],
    sources: [{ label: 'Motor rotor', kind: 'unbalance', at: { x: -0.3, y: 0, z: 0.45 }, axis: 'x', rotorMassKg: 135 }],
  };
  (input.criteria as Model2Criteria).maxResonantMotionMm = 2;
  const [first, ...rest] = demoCandidates();
  const fake = installFakeApi();
  serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME, input }), [withWholeMachine(first!), ...rest]);
  fake.on('post', '/selection/curves', { status: 200, data: CURVES });
  const rendered = renderApp({ signedInAs: 'engineer', path: `/designs/${DESIGN_ID}?tab=selection` });
  return { ...rendered, fake };
}

// The whole design page in jsdom: allow more than the default 5 s on a busy 2-core machine. A
// harness limit, not a speed check.
vi.setConfig({ testTimeout: 20_000 });

describe('Candidate — whole machine', () => {
  it('counts the assumptions in the row and judges the isolation column by the whole machine', async () => {
    const { user } = open();
    await user.click(await screen.findByRole('button', { name: 'Find mounts' }));
    const table = await screen.findByTestId('candidates-table');
    const row = within(table).getAllByRole('row')[1]!;
    expect(within(row).getByTestId('assumed-tag')).toHaveTextContent('2 assumed');
    expect(within(row).getByTestId('assumed-tag')).toHaveAttribute('title', expect.stringContaining('No dynamic-to-static ratio'));
    // −90 % at the worst speed, not the bounce estimate's figure
    expect(row).toHaveTextContent('-90.0 %at 463 rpm');
    expect(within(table).getAllByTestId('assumed-tag')).toHaveLength(1);
  });

  it('shows the speed chart with the band from the curves, the crossing, the passage against its limit, the forces and the assumptions', async () => {
    const { user, fake } = open();
    await user.click(await screen.findByRole('button', { name: 'Find mounts' }));
    const table = await screen.findByTestId('candidates-table');
    await user.click(within(table).getByRole('button', { name: 'QB-HS-300 housed spring' }));

    const detail = await screen.findByRole('region', { name: 'Candidate 1' });
    const assumptions = within(detail).getByTestId('candidate-assumptions');
    expect(
      within(assumptions)
        .getAllByRole('listitem')
        .map((li) => li.textContent),
    ).toEqual(['No dynamic-to-static ratio in the catalog: 1.4 used', 'No horizontal stiffness in the catalog: 0.5 × vertical used']);
    expect(within(detail).getByTestId('candidate-reasons')).toHaveTextContent('crossed by Motor rotor');

    const whole = within(detail).getByTestId('whole-machine');
    expect(within(whole).getByTestId('whole-machine-worst')).toHaveTextContent(
      'Worst transmissibility 1.90 (no isolation: the force reaching the floor is amplified) at 463 rpm, 7.72 Hz, from Motor rotor, at the soft end of the band (-15 %).',
    );
    const chart = within(whole).getByTestId('speed-chart');
    expect(chart).toHaveAttribute('data-crossings', '1');
    await waitFor(() => expect(chart).toHaveAttribute('data-band', 'drawn'));
    // the curves are asked for this candidate on the saved input
    const body = fake.calls('post', '/selection/curves')[0]!.body as { mountId: number; operating: Model2Operating };
    expect(body.mountId).toBe(11);
    expect(body.operating.sources?.[0]?.label).toBe('Motor rotor');

    const crossings = within(whole).getByRole('table', { name: 'Crossings' });
    expect(within(crossings).getAllByRole('row')[1]).toHaveTextContent('roll7.73 HzMotor rotor1×464 rpm');

    // 3.2 mm is over the 2 mm limit, 1.1 mm is not
    const passage = within(whole).getByRole('table', { name: 'Start-up passage' });
    const [, sway, surge] = within(passage).getAllByRole('row');
    expect(sway).toHaveTextContent('sway2.10 Hz126 rpm3.20 mm');
    expect(within(sway!).getByText('3.20 mm')).toHaveClass('tc-text-danger');
    expect(within(surge!).getByText('1.10 mm')).not.toHaveClass('tc-text-danger');
    expect(within(whole).getByTestId('passage-limit')).toHaveTextContent('Limit: 2.00 mm.');

    const forces = within(whole).getByRole('table', { name: 'Dynamic force per mount at the worst point' });
    expect(
      within(forces)
        .getAllByRole('row')
        .map((r) => r.textContent),
    ).toEqual(['A6.30 N', 'B7.35 N', 'C6.51 N', 'D4.33 N']);

    // the quick figures stay, labelled as the estimate
    expect(within(detail).getByText('Bounce estimate: isolation at each disturbing frequency')).toBeInTheDocument();
    expect(within(detail).getByText('Natural frequency, vertical (bounce estimate)')).toBeInTheDocument();
  });
});
