import { labelWidth, layoutMarkerLabels, logAxisX, type PlacedMarkerLabel } from './marker-labels';

const OPTIONS = { left: 64, right: 656, charWidth: 6, gap: 6, maxRows: 3 };

/** Two labels in one row overlap when their extents, widened by the gap, intersect. */
function overlaps(a: PlacedMarkerLabel, b: PlacedMarkerLabel, gap = OPTIONS.gap): boolean {
  return a.row === b.row && a.x - a.width / 2 < b.x + b.width / 2 + gap && b.x - b.width / 2 < a.x + a.width / 2 + gap;
}

function expectNoOverlap(placed: readonly PlacedMarkerLabel[]) {
  const collisions: string[] = [];
  for (let i = 0; i < placed.length; i++) {
    for (let j = i + 1; j < placed.length; j++)
      if (overlaps(placed[i]!, placed[j]!)) collisions.push(`${placed[i]!.text} / ${placed[j]!.text}`);
  }
  expect(collisions).toEqual([]);
}

describe('layoutMarkerLabels', () => {
  it('keeps labels that have room in one row, each centred over its line', () => {
    const layout = layoutMarkerLabels(
      [
        { key: 'a', x: 200, text: '1× shaft' },
        { key: 'b', x: 400, text: '2× line' },
      ],
      OPTIONS,
    );
    expect(layout.rows).toBe(1);
    expect(layout.unplaced).toEqual([]);
    expect(layout.placed.map((p) => [p.key, p.x, p.row])).toEqual([
      ['a', 200, 0],
      ['b', 400, 0],
    ]);
  });

  it('moves a label that would collide into the next row: 2× shaft at 49.3 Hz and 2× line at 50 Hz', () => {
    const span = [1, 1000] as const;
    const x = (hz: number) => logAxisX(hz, span, OPTIONS.left, OPTIONS.right);
    const layout = layoutMarkerLabels(
      [
        { key: '1x', x: x(24.67), text: '1× shaft', priority: true },
        { key: '2x', x: x(49.33), text: '2× shaft' },
        { key: 'line', x: x(100), text: '2× line' },
        { key: 'vane', x: x(148), text: 'vane pass' },
        { key: 'line50', x: x(50), text: '2× line (50 Hz)' },
      ],
      OPTIONS,
    );
    expect(layout.unplaced).toEqual([]);
    expectNoOverlap(layout.placed);
    const row = (key: string) => layout.placed.find((p) => p.key === key)!.row;
    expect(row('2x')).not.toBe(row('line50'));
    expect(row('1x')).toBe(0);
    expect(layout.rows).toBeGreaterThan(1);
  });

  it('leaves off the labels that find no room in any row and says which', () => {
    const items = Array.from({ length: 6 }, (_, i) => ({ key: `m${i}`, x: 300 + i, text: `marker ${i}` }));
    const layout = layoutMarkerLabels(items, OPTIONS);
    expect(layout.placed).toHaveLength(3);
    expect(layout.unplaced).toEqual(['m3', 'm4', 'm5']);
    expect(layout.rows).toBe(3);
    expectNoOverlap(layout.placed);
  });

  it('places the governing frequency first, so crowding never hides it', () => {
    const items = Array.from({ length: 5 }, (_, i) => ({ key: `m${i}`, x: 300 + i, text: `marker ${i}`, priority: i === 4 }));
    const layout = layoutMarkerLabels(items, { ...OPTIONS, maxRows: 2 });
    expect(layout.placed.map((p) => p.key)).toContain('m4');
    expect(layout.placed.find((p) => p.key === 'm4')!.row).toBe(0);
  });

  it('moves a label inwards at the edges, keeping the line where it is', () => {
    const layout = layoutMarkerLabels([{ key: 'edge', x: 650, text: 'vane pass' }], OPTIONS);
    const [label] = layout.placed;
    expect(label!.lineX).toBe(650);
    expect(label!.x + label!.width / 2).toBeLessThanOrEqual(OPTIONS.right);
    expect(label!.width).toBe(labelWidth('vane pass', 6));
  });

  it('maps a value onto a log axis', () => {
    expect(logAxisX(10, [1, 100], 0, 200)).toBeCloseTo(100, 12);
    expect(logAxisX(1, [1, 100], 50, 250)).toBe(50);
  });
});
