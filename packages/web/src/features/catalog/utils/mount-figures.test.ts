import { STANDARD_GRAVITY } from '@tacet/vibration';

import { makeMount } from '@/testing/catalog-fakes';

import { dampingOf, naturalFrequencyAtLoad, ratedDeflection, ratedNaturalFrequency } from './mount-figures';

describe('figures of a catalog mount', () => {
  it('gives the static deflection at the rated load as W/k', () => {
    // Hooke's law: 2,400 N on 72,500 N/m deflects 0.0331 m.
    expect(ratedDeflection(makeMount({ ratedLoadN: 2400, verticalStiffnessNPerM: 72_500 }))).toBeCloseTo(2400 / 72_500, 12);
  });

  it('gives the natural frequency of the mass that loads the mount to its rating', () => {
    // Closed form for a mass m = W/g on a spring k·n_d: fn = (1/2π)·√(n_d·k/m).
    const mount = makeMount({ ratedLoadN: 1500, verticalStiffnessNPerM: 250_000, dynamicStiffnessRatio: 1.4 });
    const mass = 1500 / STANDARD_GRAVITY;
    const expected = Math.sqrt((1.4 * 250_000) / mass) / (2 * Math.PI);
    expect(ratedNaturalFrequency(mount)).toBeCloseTo(expected, 10);
    expect(ratedNaturalFrequency(mount)).toBeCloseTo(7.613, 3);
  });

  it('falls as the load rises (fn ∝ 1/√W at fixed stiffness)', () => {
    const mount = makeMount({ verticalStiffnessNPerM: 72_500, dynamicStiffnessRatio: 1 });
    const light = naturalFrequencyAtLoad(mount, 600);
    const heavy = naturalFrequencyAtLoad(mount, 2400);
    expect(light / heavy).toBeCloseTo(2, 10);
  });

  it('gives NaN, shown as a dash, where the catalog values cannot give a figure', () => {
    expect(ratedDeflection(makeMount({ verticalStiffnessNPerM: 0 }))).toBeNaN();
    expect(ratedNaturalFrequency(makeMount({ ratedLoadN: 0 }))).toBeNaN();
  });

  it('names the damping model: ζ for viscous, η for hysteretic with ζ ≈ η/2 at resonance', () => {
    expect(dampingOf({ dampingRatio: 0.05, lossFactor: null })).toMatchObject({ model: 'viscous', symbol: 'ζ', value: 0.05 });
    // Equal resonant amplification: 1/(2ζ) = 1/η (common practice).
    expect(dampingOf({ dampingRatio: null, lossFactor: 0.15 })).toMatchObject({
      model: 'hysteretic',
      symbol: 'η',
      value: 0.15,
      equivalentDampingRatio: 0.075,
    });
    expect(dampingOf({ dampingRatio: null, lossFactor: null })).toBeNull();
  });
});
