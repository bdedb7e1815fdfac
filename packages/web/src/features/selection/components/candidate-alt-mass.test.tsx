import { screen, within } from '@testing-library/react';

import { demoCandidates } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderWithProviders } from '@/testing/render';
import type { Candidate, CandidateAltMassCase } from '@/types/design-api';

import { CandidateAltMass, lowestAltIsolation } from './candidate-alt-mass';
import { CandidateDetail } from './candidate-detail';

/** Invented figures: the pump drained (1000 kg → 940 kg), the mounts stiffer for the lighter machine. */
const ALT_CASE: CandidateAltMassCase = {
  massKg: 940,
  cg: { x: 0.04, y: 0.012, z: 0.33 },
  verticalNaturalFrequencyHz: 3.25,
  perPoint: [],
  isolation: [
    { frequencyHz: 24.67, transmissibility: 0.018, efficiencyPct: 98.2 },
    { frequencyHz: 49.33, transmissibility: 0.0044, efficiencyPct: 99.56 },
  ],
  wholeMachineWorst: {
    transmissibility: 0.112,
    efficiencyPct: 88.8,
    frequencyHz: 24.67,
    speedRpm: 1480,
    source: 'Motor rotor',
    stiffnessFactor: 1.15,
  },
  passes: false,
};

function candidateWith(overrides: Partial<Candidate>): Candidate {
  return { ...demoCandidates()[0], ...overrides };
}

function renderDetail(candidate: Candidate) {
  installFakeApi();
  return renderWithProviders(
    <CandidateDetail
      candidate={candidate}
      heading="Selected"
      referenceMassKg={1000}
      liveMassKg={null}
      frequencies={null}
      targetTransmissibility={0.1}
      isChosen={false}
      canChoose={false}
      chooseBlockedReason={null}
      choosing={false}
      onChoose={() => undefined}
    />,
    { signedInAs: 'engineer' },
  );
}

describe('second mass case of a candidate', () => {
  it('shows the mass, the bounce estimate, the whole-machine worst point and the verdict', () => {
    renderWithProviders(<CandidateAltMass altCase={ALT_CASE} />, { signedInAs: 'engineer' });
    const section = screen.getByRole('region', { name: 'Second mass case' });
    expect(within(section).getByText('Fails')).toBeInTheDocument();
    expect(section).toHaveTextContent('940 kg');
    expect(section).toHaveTextContent('3.25 Hz');
    expect(section).toHaveTextContent('98.2 % at 24.7 Hz');
    expect(screen.getByTestId('alt-mass-worst')).toHaveTextContent(
      'isolation 88.8 % at 1,480 rpm, 24.7 Hz, from Motor rotor, at the stiff end of the band (+15 %)',
    );
  });

  it('says "no isolation" when the worst point amplifies, and leaves out what it does not have', () => {
    const amplified: CandidateAltMassCase = {
      ...ALT_CASE,
      isolation: [],
      wholeMachineWorst: { ...ALT_CASE.wholeMachineWorst!, transmissibility: 1.6, efficiencyPct: -60, speedRpm: null, stiffnessFactor: 1 },
      passes: true,
    };
    renderWithProviders(<CandidateAltMass altCase={amplified} />, { signedInAs: 'engineer' });
    expect(screen.getByText('Passes')).toBeInTheDocument();
    expect(screen.getByTestId('alt-mass-worst')).toHaveTextContent('no isolation (transmissibility 1.6');
    expect(screen.getByTestId('alt-mass-worst')).not.toHaveTextContent('rpm');
    expect(screen.queryByText('Lowest isolation (bounce estimate)')).not.toBeInTheDocument();
    expect(lowestAltIsolation(amplified)).toBeNull();
  });

  it('appears in the candidate detail only when the candidate has it', () => {
    const { unmount } = renderDetail(candidateWith({ altMassCase: ALT_CASE }));
    expect(screen.getByTestId('alt-mass-case')).toBeInTheDocument();
    unmount();
    renderDetail(candidateWith({}));
    expect(screen.queryByTestId('alt-mass-case')).not.toBeInTheDocument();
  });

  it('adds the support deflection to the points table where a support stiffness was given', () => {
    const base = demoCandidates()[0];
    const perPoint = base.perPoint.map((point, index) => (index === 0 ? { ...point, supportDeflectionMm: 0.42 } : point));
    renderDetail(candidateWith({ perPoint }));
    const table = screen.getByRole('table', { name: 'Loads per point' });
    expect(within(table).getByRole('columnheader', { name: 'Support deflection' })).toBeInTheDocument();
    const rows = within(table).getAllByRole('row');
    expect(rows[1]).toHaveTextContent('0.420 mm');
    expect(rows[2]).toHaveTextContent('rigid');
  });

  it('keeps the points table as it was without a support stiffness', () => {
    renderDetail(candidateWith({}));
    const table = screen.getByRole('table', { name: 'Loads per point' });
    expect(within(table).queryByRole('columnheader', { name: 'Support deflection' })).not.toBeInTheDocument();
  });
});
