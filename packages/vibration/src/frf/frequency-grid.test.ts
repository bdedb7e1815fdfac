import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { linSpace, logSpace } from './frequency-grid.js';

describe('frequency grids', () => {
  it('logSpace has exact endpoints and a constant ratio between points', () => {
    const f = logSpace(1, 1000, 4);
    expect(Array.from(f)).toEqual([1, expect.closeTo(10, 12), expect.closeTo(100, 12), 1000]);
    const g = logSpace(0.5, 200, 101);
    for (let i = 1; i < g.length; i++) expect(g[i] / g[i - 1]).toBeCloseTo(g[1] / g[0], 12);
  });

  it('linSpace has exact endpoints and constant spacing', () => {
    expect(Array.from(linSpace(0, 1, 5))).toEqual([0, 0.25, 0.5, 0.75, 1]);
  });

  it('rejects bad ranges and counts', () => {
    expect(() => logSpace(0, 10, 5)).toThrow(VibrationInputError);
    expect(() => logSpace(10, 1, 5)).toThrow(/fMaxHz/);
    expect(() => logSpace(1, 10, 1)).toThrow(/n/);
    expect(() => linSpace(1, 10, 2.5)).toThrow(/n/);
  });
});
