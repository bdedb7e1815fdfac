import { screen, waitFor, within } from '@testing-library/react';

import { demoCandidates, makeDesign, serveDesign } from '@/testing/design-fakes';
import { installFakeApi } from '@/testing/fake-api';
import { renderApp, type RenderOptions } from '@/testing/render';

import type { Verification } from '../types';

vi.setConfig({ testTimeout: 20_000 });

const DESIGN_ID = 72;
const NAME = 'CHW pump P-2 skid';

function measurement(overrides: Partial<Verification> = {}): Verification {
  const f = Array.from({ length: 60 }, (_, i) => 0.5 + i * 0.1);
  return {
    id: 5,
    designId: DESIGN_ID,
    kind: 'impact',
    quantity: 'accelerance',
    fileName: 'tap-p2.csv',
    note: 'Hammer above the centre of gravity',
    measuredBy: { id: 3, name: 'Erin Engineer' },
    createdAt: '2025-02-03T10:00:00.000Z',
    tolerancePct: 10,
    identified: {
      naturalFrequencyHz: 2.67,
      dampingRatio: 0.03,
      stiffnessNPerM: 281_400,
      peakFrequencyHz: 2.668,
      measuredDampingRatio: 0.03,
      windowDampingCorrection: 0,
      halfPowerHz: { lower: 2.59, upper: 2.75 },
      meanCoherence: 0.99,
      quality: 'good',
    },
    predicted: {
      naturalFrequencyHz: 2.566,
      mode: 'bounce',
      coupled: false,
      source: 'rigid-body modes',
      massKg: 1000,
      stiffnessNPerM: 259_900,
      damping: { model: 'viscous', value: 0.008 },
    },
    deviationPct: 4.05,
    stiffnessDeviationPct: 8.3,
    verdict: 'agrees',
    notes: ['The measured natural frequency agrees with the predicted bounce mode within ±10 %.'],
    warnings: [],
    processing: {
      sampleRateHz: 128,
      hitsFound: 5,
      hitsAveraged: 5,
      hitTimesS: [1, 13, 25, 37, 49],
      blockDurationS: 12,
      resolutionHz: 0.0625,
      preTriggerS: 0.03,
      forceWindowS: 0.1,
      exponentialTimeConstantS: null,
      usableBandHz: { min: 0.0625, max: 30 },
    },
    measured: { quantity: 'accelerance', frequencyHz: f, magnitude: f.map(() => 1e-3), phaseDeg: f.map(() => 90), coherence: null },
    ...overrides,
  };
}

function openReleased(list: Verification[], signedInAs: RenderOptions['signedInAs']) {
  const fake = installFakeApi();
  serveDesign(fake, makeDesign({ id: DESIGN_ID, name: NAME, status: 'released', chosen: demoCandidates()[0]! }));
  fake.on('get', '/designs/:id/verifications', { status: 200, data: list });
  const rendered = renderApp({ signedInAs, path: `/designs/${DESIGN_ID}?tab=measured` });
  return { ...rendered, fake };
}

describe('Measured tab', () => {
  it('shows the latest measurement beside the prediction, its verdict and who measured it, to a viewer without the upload', async () => {
    openReleased([measurement()], 'viewer');
    const panel = await screen.findByTestId('measured-panel');
    const result = await within(panel).findByTestId('verification-result');
    expect(within(result).getByTestId('verification-verdict')).toHaveTextContent('Agrees with the design');
    expect(within(result).getByTestId('measured-frequency')).toHaveTextContent('2.670 Hz');
    expect(within(result).getByTestId('frequency-deviation')).toHaveTextContent('+4.1 %');
    expect(within(panel).getByRole('table', { name: 'Measurements' })).toHaveTextContent('Erin Engineer');
    expect(within(panel).queryByRole('group', { name: 'Upload a tap test' })).not.toBeInTheDocument();
  });

  it('an engineer uploads a file; a refused one lists its problems by row and column', async () => {
    const { user, fake } = openReleased([], 'engineer');
    const form = await screen.findByRole('group', { name: 'Upload a tap test' });
    await screen.findByText('No measurement yet');
    fake.on('post', '/designs/:id/verifications', {
      status: 422,
      data: {
        statusCode: 422,
        message: 'The file cannot be used: row 7, frequency_hz: frequencies must increase',
        errors: [{ row: 7, column: 'frequency_hz', message: 'frequencies must increase: 5.2 Hz follows 5.3 Hz' }],
      },
    });
    await user.selectOptions(within(form).getByLabelText('The file holds'), 'frf');
    await user.selectOptions(within(form).getByLabelText('Quantity (SI)'), 'receptance');
    await user.upload(
      within(form).getByLabelText('Measurement file'),
      new File(['frequency_hz,real,imag\n'], 'frf.csv', { type: 'text/csv' }),
    );
    await user.click(within(form).getByRole('button', { name: 'Upload and compare' }));
    const problems = await within(form).findByRole('table', { name: 'Problems in the file' });
    expect(problems).toHaveTextContent('frequency_hz');
    expect(problems).toHaveTextContent('frequencies must increase: 5.2 Hz follows 5.3 Hz');
    const sent = fake.calls('post', '/designs/:id/verifications')[0]!.body as FormData;
    expect(sent.get('kind')).toBe('frf');
    expect(sent.get('quantity')).toBe('receptance');
    expect(sent.get('tolerancePct')).toBe('10');

    fake.on('post', '/designs/:id/verifications', { status: 201, data: measurement({ verdict: 'stiffer', deviationPct: 14 }) });
    fake.on('get', '/designs/:id/verifications', { status: 200, data: [measurement({ verdict: 'stiffer', deviationPct: 14 })] });
    await user.upload(within(form).getByLabelText('Measurement file'), new File(['x'], 'frf2.csv', { type: 'text/csv' }));
    await user.click(within(form).getByRole('button', { name: 'Upload and compare' }));
    await waitFor(() => expect(screen.getByTestId('verification-verdict')).toHaveTextContent('Stiffer than predicted'));
  });
});
