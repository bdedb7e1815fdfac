import { render, screen } from '@testing-library/react';
import { hystereticDamping, viscousDamping } from '@tacet/vibration';

import { AppProvider } from '@/app/provider';
import { createTestQueryClient } from '@/testing/render';

import { decades, formatTick, oneTwoFive } from './chart-style';
import { FrfChart, inverseUnit } from './frf-chart';
import { frequencySpan, markerLabelLayout, TransmissibilityChart } from './transmissibility-chart';

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

  it('labels close disturbing frequencies without overlap: 2× shaft at 49.3 Hz beside 2× line at 50 Hz', () => {
    const markers = [...MARKERS, { frequencyHz: 50, label: '2× line (50 Hz)' }, { frequencyHz: 148, label: 'vane pass' }];
    const layout = markerLabelLayout(markers, [1, 1000]);
    expect(layout.unplaced).toEqual([]);
    const byText = new Map(layout.placed.map((p) => [p.text, p]));
    expect(byText.get('2× shaft')!.row).not.toBe(byText.get('2× line (50 Hz)')!.row);
    const { container } = render(<TransmissibilityChart naturalFrequencyHz={3.15} damping={viscousDamping(0.05)} markers={markers} />);
    const labels = Array.from(container.querySelectorAll('.tc-marker-labels text')).map((t) => t.textContent);
    expect(labels.sort()).toEqual(markers.map((m) => m.label).sort());
    expect(screen.queryByTestId('unlabelled-markers')).toBeNull();
  });

  it('lists the labels it has no room for under the chart', () => {
    const crowded = Array.from({ length: 8 }, (_, i) => ({ frequencyHz: 100 + i * 0.5, label: `harmonic ${i + 1}` }));
    render(<TransmissibilityChart naturalFrequencyHz={3.15} damping={viscousDamping(0.05)} markers={crowded} />);
    expect(screen.getByTestId('unlabelled-markers')).toHaveTextContent(/Also marked, not labelled for want of room: harmonic 4 \(102 Hz\)/);
  });

  it('overlays several curves in their colours with the line T = 1 and no single-curve shading', () => {
    const { container } = render(
      <TransmissibilityChart
        curves={[
          { key: 'a', naturalFrequencyHz: 3, damping: viscousDamping(0.05), color: '#111111' },
          { key: 'b', naturalFrequencyHz: 6, damping: hystereticDamping(0.2), color: '#222222' },
        ]}
        markers={MARKERS}
        targetTransmissibility={0.1}
      />,
    );
    const strokes = Array.from(container.querySelectorAll('path')).map((p) => p.getAttribute('style') ?? '');
    // jsdom writes the colours as rgb()
    expect(strokes.some((s) => s.includes('stroke: rgb(17, 17, 17)'))).toBe(true);
    expect(strokes.some((s) => s.includes('stroke: rgb(34, 34, 34)'))).toBe(true);
    expect(screen.getByText('T = 1')).toBeInTheDocument();
    expect(screen.queryByText('isolation (T < 1)')).toBeNull();
    expect(screen.queryByText('fn')).toBeNull();
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
