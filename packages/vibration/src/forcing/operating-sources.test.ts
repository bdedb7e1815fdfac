import { describe, expect, it } from 'vitest';
import { sourceAmplitudeN, sourceFrequencyHz } from '../whole-machine/speed-sweep.js';
import { resolveOperatingSources, verticalSourcesAt } from './operating-sources.js';

const CG = { x: 0.1, y: 0, z: 0.4 };
const TWO_PI = 2 * Math.PI;

describe('resolveOperatingSources (docs/engineering/forcing.md §7)', () => {
  it('an unbalance is m_r·G·ω²/Ω_max with Ω_max the rotor’s highest speed (ISO 21940-11: G = e·Ω, closed form)', () => {
    const { sources, speedRangeRpm } = resolveOperatingSources(
      {
        speedRangeRpm: { min: 900, max: 1500 },
        sources: [
          { label: 'Impeller', kind: 'unbalance', at: { x: 0.5, y: 0, z: 0.6 }, axis: 'x', rotorMassKg: 40 },
          { label: 'Gear', kind: 'unbalance', at: { x: 0, y: 0, z: 0.6 }, axis: 'x', rotorMassKg: 10, order: 2, balanceGradeMmPerS: 2.5 },
        ],
      },
      CG,
    );
    expect(speedRangeRpm).toEqual({ min: 900, max: 1500 });
    const [impeller, gear] = sources;
    expect(impeller).toMatchObject({ kind: 'rotating', axis: 'x', order: 1, unitForce: false, inputIndex: 0 });
    // G6.3 by default: e = 6.3e-3 / (2π·1500/60) m; at 900 rpm F = 40·e·(2π·15)²
    const e = 6.3e-3 / ((TWO_PI * 1500) / 60);
    expect(sourceAmplitudeN(impeller, 900, 1500)).toBeCloseTo(40 * e * (TWO_PI * 15) ** 2, 9);
    // the rotor turns at 2× shaft: Ω_max = 2π·2·1500/60, ω = 2π·2·n/60
    const eGear = 2.5e-3 / ((TWO_PI * 2 * 1500) / 60);
    expect(sourceFrequencyHz(gear, 1200)).toBeCloseTo(40, 12);
    expect(sourceAmplitudeN(gear, 1200, 1500)).toBeCloseTo(10 * eGear * (TWO_PI * 40) ** 2, 9);
    // at the top speed the unbalance force is m_r·G·Ω_max (closed form)
    expect(sourceAmplitudeN(gear, 1500, 1500)).toBeCloseTo(10 * 2.5e-3 * ((TWO_PI * 2 * 1500) / 60), 9);
  });

  it('a force acts at order × shaft speed or at its fixed frequency; with motor poles on a drive the force at twice the supply follows the speed', () => {
    const base = {
      speedRangeRpm: { min: 600, max: 1500 },
      lineFrequencyHz: 50,
      sources: [
        {
          label: 'Magnetic',
          kind: 'force' as const,
          at: { x: -0.3, y: 0, z: 0.45 },
          axis: 'z' as const,
          amplitudeN: 200,
          frequencyHz: 100,
        },
        { label: 'Blade', kind: 'force' as const, at: { x: 0, y: 0, z: 1 }, axis: 'y' as const, amplitudeN: 50, order: 7 },
      ],
    };
    const line = resolveOperatingSources(base, CG).sources;
    expect(line[0]).toMatchObject({ kind: 'directional', frequencyHz: 100, followsOrder: null, amplitudeN: 200 });
    expect(sourceFrequencyHz(line[1], 1200)).toBeCloseTo(140, 12);
    const drive = resolveOperatingSources({ ...base, motorPoles: 4 }, CG).sources;
    // 2·p·n/120 Hz (forcing.md §3): 4 poles at 1200 rpm → 80 Hz
    expect(drive[0].frequencyHz).toBeUndefined();
    expect(sourceFrequencyHz(drive[0], 1200)).toBeCloseTo((2 * 4 * 1200) / 120, 12);
  });

  it('without sources: a unit vertical force at the CG at each order, the vane pass, 2× line and extra frequencies', () => {
    const { sources } = resolveOperatingSources(
      { speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50, extraFrequenciesHz: [37] },
      CG,
    );
    expect(sources.map((s) => s.label)).toEqual([
      'Vertical force through the CG, 1× shaft',
      'Vertical force through the CG, 2× shaft',
      'Vertical force through the CG, vane pass (6 vanes)',
      'Vertical force through the CG, 2× line (50 Hz supply)',
      'Vertical force through the CG, 37 Hz',
    ]);
    for (const s of sources) expect(s).toMatchObject({ at: CG, axis: 'z', kind: 'directional', amplitudeN: 1, unitForce: true });
    expect(sources.map((s) => sourceFrequencyHz(s, 1480))).toEqual([1480 / 60, 2960 / 60, (6 * 1480) / 60, 100, 37]);
  });

  it('a source turning with the shaft needs a speed; nothing at all is refused', () => {
    expect(() => resolveOperatingSources({ sources: [{ label: 'I', kind: 'unbalance', at: CG, axis: 'x', rotorMassKg: 1 }] }, CG)).toThrow(
      /operating.sources\[0\]: turns with the shaft/,
    );
    expect(() => resolveOperatingSources({ orders: [1] }, CG)).toThrow(/gives no source/);
  });

  it('bare disturbing frequencies become unit vertical forces through the CG', () => {
    const { sources, speedRangeRpm } = verticalSourcesAt([25, 50], CG);
    expect(speedRangeRpm).toBeNull();
    expect(sources.map((s) => s.frequencyHz)).toEqual([25, 50]);
  });
});
