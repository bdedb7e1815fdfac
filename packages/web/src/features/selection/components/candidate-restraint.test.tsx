import { screen, within } from '@testing-library/react';

import { TEST_USERS } from '@/testing/factories';
import { renderWithProviders } from '@/testing/render';
import type { CandidateRestraint } from '@/types/design-api';

import { CandidateRestraintSection } from './candidate-restraint';

const point = (label: string, overrides: Partial<CandidateRestraint['perPoint'][number]> = {}): CandidateRestraint['perPoint'][number] => ({
  label,
  partNumber: 'QM-R1-05050',
  deadLoadN: 2500,
  shearN: 3000,
  shearDirectionDeg: 37,
  tensionN: 0,
  tensionDirectionDeg: 217,
  compressionN: 6000,
  compressionDirectionDeg: 37,
  restraintCapacityN: 6220,
  upliftCapacityN: 4500,
  shearUtilization: 3000 / 6220,
  tensionUtilization: null,
  passes: true,
  ...overrides,
});

/** Invented figures: B governs (horizontal force over its rating), D has no uplift rating. */
const RESTRAINT: CandidateRestraint = {
  codeEdition: 'ASCE 7-16',
  ap: 2.5,
  rp: 2,
  fpFormulaN: 10_000,
  fpMinN: 3_000,
  fpMaxN: 16_000,
  fpN: 10_000,
  limit: 'formula',
  doubled: true,
  designForceN: 20_000,
  verticalForceN: 2_000,
  cgHeightM: 0.6,
  governing: { label: 'B', kind: 'shear', demandN: 7000, capacityN: 6220, utilization: 7000 / 6220, directionDeg: 37 },
  perPoint: [
    point('A'),
    point('B', { shearN: 7000, shearUtilization: 7000 / 6220, passes: false }),
    point('C'),
    point('D', { tensionN: 800, upliftCapacityN: null, passes: false }),
  ],
  passes: false,
};

const LAYOUT = {
  points: [
    { label: 'A', x: 0.8, y: 0.45 },
    { label: 'B', x: 0.8, y: -0.45 },
    { label: 'D', x: -0.8, y: -0.45 },
    { label: 'C', x: -0.8, y: 0.45 },
  ],
  cg: { x: 0.06, y: 0.015 },
};

describe('candidate restraint section', () => {
  it('lists each point’s demand against its ratings and names the governing check and direction', () => {
    renderWithProviders(<CandidateRestraintSection restraint={RESTRAINT} layout={LAYOUT} />, { signedInAs: 'engineer' });
    const section = screen.getByRole('region', { name: 'Seismic restraint' });
    expect(within(section).getByText('Seismic restraint (ASCE 7-16 §13.3.1)')).toBeInTheDocument();
    expect(screen.getByTestId('candidate-design-force')).toHaveTextContent('20,000 N (2·F_p: gap above 0.25 in or not given)');
    expect(screen.getByTestId('restraint-governing')).toHaveTextContent(
      'horizontal restraint at point B: 7,000 N of 6,220 N (113 %), force at 37° from x',
    );
    const rows = within(screen.getByRole('table', { name: 'Restraint demand per point' })).getAllByRole('row');
    expect(rows).toHaveLength(5);
    expect(rows[2]).toHaveTextContent('B');
    expect(rows[2]).toHaveTextContent('113 %');
    expect(within(rows[2]!).getByText('over rating')).toBeInTheDocument();
    expect(within(rows[4]!).getByText('no rating')).toBeInTheDocument();
    expect(within(rows[1]!).getByText('within rating')).toBeInTheDocument();
    expect(section).toHaveTextContent('does not size anchorage');
    expect(section).toHaveTextContent('structural engineer');
  });

  it('draws the design-force arrow from the CG in the governing direction (37°: right and up on the plan)', () => {
    renderWithProviders(<CandidateRestraintSection restraint={RESTRAINT} layout={LAYOUT} />, { signedInAs: 'engineer' });
    expect(screen.getByRole('img', { name: 'Plan: the design force at 37° from the x axis governs, at point B' })).toBeInTheDocument();
    const arrow = screen.getByTestId('restraint-arrow');
    const [x1, y1, x2, y2] = ['x1', 'y1', 'x2', 'y2'].map((a) => Number(arrow.getAttribute(a)));
    // screen y grows downwards: up on the plan is a smaller y
    expect(Math.atan2(y1! - y2!, x2! - x1!) * (180 / Math.PI)).toBeCloseTo(37, 6);
  });

  it('shows forces in the user’s units (US: lbf; 1 lbf = 4.4482216152605 N)', () => {
    renderWithProviders(<CandidateRestraintSection restraint={RESTRAINT} layout={null} />, { signedInAs: TEST_USERS.purchaser });
    expect(screen.getByTestId('candidate-design-force')).toHaveTextContent('4,496 lbf');
    expect(screen.queryByRole('img')).not.toBeInTheDocument();
  });
});
