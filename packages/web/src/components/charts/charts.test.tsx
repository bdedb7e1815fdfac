import { render, screen } from '@testing-library/react';
import { hystereticDamping, viscousDamping } from '@tacet/vibration';

import { AppProvider } from '@/app/provider';
import { createTestQueryClient } from '@/testing/render';

import { decades, formatTick, oneTwoFive } from './chart-style';
import { FrfChart, inverseUnit } from './frf-chart';
import { frequencySpan, TransmissibilityChart } from './transmissibility-chart';

const MARKERS = [
  { frequencyHz: 24.67, label: '1× shaft', governing: true },
  { frequencyHz: 49.33, label: '2× shaft' },
  { frequencyHz: 100, label: '2× line' },
];

describe('chart helpers', () => {
  it('spans the plot from below fn to above the highest disturbing frequency, in whole decades', () => {
    expect(frequencySpan(3.15, MARKERS)).toEqual([1, 1000]);
    expect(frequencySpan(12, [])).toEqual([1, 1000]);
    expect(frequencySpan(0.5, [{ frequencyHz: 5, label: 'x' }])).toEqual([0.1, 10]);
  });

  it('puts ticks on decades and on 1–2–5 steps', () => {
    expect(decades(0.001, 10)).toEqual([0.001, 0.01, 0.1, 1, 10]);
    expect(decades(1e-8, 1)).toEqual([1e-8, 1e-6, 1e-4, 0.01, 1]);
    expect(oneTwoFive(1, 100)).toEqual([1, 2, 5, 10, 20, 50, 100]);
    expect(formatTick(1000)).toBe('1k');
    expect(formatTick(0.01)).toBe('0.01');
    expect(formatTick(2e6)).toBe('2M');
    expect(formatTick(1e-4)).toBe('10⁻⁴');
  });

  it('names the compliance unit as the inverse of the stiffness unit', () => {
    expect(inverseUnit('N/mm')).toBe('mm/N');
    expect(inverseUnit('lbf/in')).toBe('in/lbf');
  });
});

describe('TransmissibilityChart', () => {
  it('draws the curve, the isolation region, the target and a labelled line per disturbing frequency', () => {
    const { container } = render(
      <TransmissibilityChart naturalFrequencyHz={3.15} damping={viscousDamping(0.05)} markers={MARKERS} targetTransmissibility={0.1} />,
    );
    expect(container.querySelector('svg')).not.toBeNull();
    expect(screen.getByText('isolation (T < 1)')).toBeInTheDocument();
    expect(screen.getByText('target T 0.1')).toBeInTheDocument();
    for (const marker of MARKERS) expect(screen.getByText(marker.label)).toBeInTheDocument();
    expect(screen.getByText('fn')).toBeInTheDocument();
    expect(screen.getByText('Transmissibility T')).toBeInTheDocument();
  });

  it('draws an undamped curve without breaking at resonance', () => {
    const { container } = render(<TransmissibilityChart naturalFrequencyHz={5} markers={[]} samples={999} />);
    const paths = Array.from(container.querySelectorAll('path')).map((p) => p.getAttribute('d') ?? '');
    expect(paths.some((d) => d.length > 1000)).toBe(true);
    expect(paths.join(' ')).not.toMatch(/NaN|Infinity/);
  });
});

describe('FrfChart', () => {
  it('draws receptance magnitude, phase and dynamic stiffness in the user’s units', () => {
    render(
      <AppProvider queryClient={createTestQueryClient()}>
        <FrfChart massKg={1000} stiffnessNPerM={4e5} damping={hystereticDamping(0.1)} naturalFrequencyHz={3.18} markers={MARKERS} />
      </AppProvider>,
    );
    expect(screen.getByText('|receptance| (mm/N)')).toBeInTheDocument();
    expect(screen.getByText('phase (°)')).toBeInTheDocument();
    expect(screen.getByText('|dynamic stiffness| (N/mm)')).toBeInTheDocument();
    expect(screen.getByText('Frequency (Hz)')).toBeInTheDocument();
  });
});
