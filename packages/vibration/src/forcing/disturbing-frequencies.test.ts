import { describe, expect, it } from 'vitest';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { expectRounded } from '../testing/expect-rounded.js';
import { disturbingFrequencies, governingFrequency } from './disturbing-frequencies.js';

// Model: docs/engineering/forcing.md §1–§4; check values: docs/engineering/check-values.md.
describe('disturbing frequencies', () => {
  it('CV-13 [CF]: 1480 rpm, 6 vanes, 50 Hz → 24.67, 49.33, 100, 148.0 Hz', () => {
    const list = disturbingFrequencies({ speedRpm: 1480, vaneCount: 6, lineFrequencyHz: 50 });
    expect(list.map((f) => f.label)).toEqual([
      '1× shaft at 1480 rpm',
      '2× shaft at 1480 rpm',
      '2× line (50 Hz supply)',
      'vane pass (6 vanes) at 1480 rpm',
    ]);
    expectRounded(list[0].frequencyHz, '24.67');
    expectRounded(list[1].frequencyHz, '49.33');
    expect(list[2].frequencyHz).toBe(100);
    expectRounded(list[3].frequencyHz, '148.0');
    expect(list.map((f) => f.source)).toEqual(['shaft', 'shaft', 'electrical', 'vane-pass']);
    expect(governingFrequency(list)).toBe(list[0]);
  });

  it('a speed range is evaluated at both ends (and at sweep points); the minimum speed governs [CP]', () => {
    const list = disturbingFrequencies({ speedRangeRpm: { min: 900, max: 1800 }, orders: [1], sweepPoints: 4 });
    expect(list.map((f) => f.speedRpm)).toEqual([900, 1200, 1500, 1800]);
    expect(list[0].label).toBe('1× shaft at 900 rpm (minimum speed)');
    expect(list[3].label).toBe('1× shaft at 1800 rpm (maximum speed)');
    expect(governingFrequency(list).frequencyHz).toBe(15);
  });

  it('fan blade pass with harmonics, and 2× drive output on a variable-speed drive [CF]', () => {
    const list = disturbingFrequencies({
      speedRangeRpm: { min: 750, max: 1500 },
      orders: [1],
      bladeCount: 8,
      passHarmonics: [1, 2],
      motorPoles: 4,
      lineFrequencyHz: 50,
    });
    const electrical = list.filter((f) => f.source === 'electrical');
    // 4-pole motor at 1500 rpm ↔ 50 Hz drive output → 100 Hz; at 750 rpm → 50 Hz (no separate 2× line entry)
    expect(electrical.map((f) => f.frequencyHz)).toEqual([50, 100]);
    expect(electrical[0].label).toBe('2× drive output (25 Hz, 4-pole motor) at 750 rpm (minimum speed)');
    const blade = list.filter((f) => f.source === 'blade-pass').map((f) => f.frequencyHz);
    expect(blade).toEqual([100, 200, 200, 400]);
    expect(list.find((f) => f.label.startsWith('2× blade pass'))?.order).toBe(2);
  });

  it('rejects missing, negative or contradictory machine data', () => {
    expect(() => disturbingFrequencies({})).toThrow(VibrationInputError);
    expect(() => disturbingFrequencies({ speedRpm: -10 })).toThrow(/speedRpm/);
    expect(() => disturbingFrequencies({ speedRpm: 1480, speedRangeRpm: { min: 1, max: 2 } })).toThrow(/speedRpm/);
    expect(() => disturbingFrequencies({ speedRangeRpm: { min: 1500, max: 900 } })).toThrow(/speedRangeRpm.max/);
    expect(() => disturbingFrequencies({ speedRpm: 1480, vaneCount: 5.5 })).toThrow(/vaneCount/);
    expect(() => disturbingFrequencies({ speedRpm: 1480, orders: [0] })).toThrow(/orders\[0\]/);
    expect(() => governingFrequency([])).toThrow(/frequencies/);
  });

  it('a line frequency alone still gives the 2× line entry', () => {
    expect(disturbingFrequencies({ lineFrequencyHz: 60 })).toEqual([
      { frequencyHz: 120, label: '2× line (60 Hz supply)', source: 'electrical', order: 2 },
    ]);
  });
});
