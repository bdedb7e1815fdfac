import { renderHook } from '@testing-library/react';

import { unitsFor } from '@/lib/units';
import { demoInput } from '@/testing/design-fakes';

import { toFormValues } from '../schemas/design-form';
import { computeDesignFigures, shareUnchanged, useDesignFigures } from './use-design-figures';

const SI = unitsFor('SI');

describe('live design figures', () => {
  it('gives the mass and CG of CV-14 (docs/engineering/check-values.md CV-14)', () => {
    const figures = computeDesignFigures(toFormValues(demoInput(), SI), SI);
    expect(figures.mass!.massKg).toBeCloseTo(1000, 9);
    expect(figures.mass!.cg.x).toBeCloseTo(0.06, 9);
    expect(figures.mass!.cg.y).toBeCloseTo(0.015, 9);
    expect(figures.mass!.cg.z).toBeCloseTo(0.3775, 9);
    expect(figures.mass!.weightN).toBeCloseTo(9806.65, 6);
  });

  it('gives the rigid-frame loads of CV-15, not the lever-rule ones', () => {
    const { loads } = computeDesignFigures(toFormValues(demoInput(), SI), SI);
    // CV-15: 2717.3 / 2553.8 / 2349.5 / 2186.1 N (lever rule would give 2723.4 / 2547.7 / 2343.4 / 2192.2).
    expect(loads!.loadsN.map((f) => Math.round(f * 10) / 10)).toEqual([2717.3, 2553.8, 2349.5, 2186.1]);
    expect(loads!.loadsN.reduce((a, b) => a + b, 0)).toBeCloseTo(9806.65, 6);
  });

  it('lists the disturbing frequencies of CV-13, the lowest governing', () => {
    const { frequencies, governing } = computeDesignFigures(toFormValues(demoInput(), SI), SI);
    expect(frequencies!.map((f) => Math.round(f.frequencyHz * 100) / 100)).toEqual([24.67, 49.33, 100, 148]);
    expect(governing!.frequencyHz).toBeCloseTo(1480 / 60, 9);
    expect(frequencies!.filter((f) => f.governing)).toHaveLength(1);
  });

  it('derives the target transmissibility from the minimum isolation', () => {
    expect(computeDesignFigures(toFormValues(demoInput(), SI), SI).targetTransmissibility).toBeCloseTo(0.1, 12);
  });

  it('reports collinear mounts and lift-off as warnings instead of failing', () => {
    const values = toFormValues(demoInput(), SI);
    values.mountPoints = values.mountPoints.map((p, i) => ({ ...p, y: '0', x: String(i) }));
    expect(computeDesignFigures(values, SI).layoutWarnings.map((w) => w.code)).toEqual(['collinear-mounts']);

    const offset = toFormValues(demoInput(), SI);
    offset.components[0]!.x = '5'; // x_G = (1500 − 135)/1000 = 1.365 m, beyond the mounts at 0.8 m
    const warnings = computeDesignFigures(offset, SI).layoutWarnings.map((w) => w.code);
    expect(warnings).toContain('cg-outside-mount-polygon');
    expect(warnings).toContain('mount-lift-off');
  });

  it('waits for complete rows instead of showing half-computed figures', () => {
    const values = toFormValues(demoInput(), SI);
    values.components[1]!.mass = '';
    const figures = computeDesignFigures(values, SI);
    expect(figures.mass).toBeNull();
    expect(figures.massProblem).toMatch(/Complete every row/);
    expect(figures.loads).toBeNull();
  });
});

describe('sharing unchanged parts', () => {
  it('keeps the previous objects when only a name changed, and new ones when a figure changed', () => {
    const values = toFormValues(demoInput(), SI);
    const first = computeDesignFigures(values, SI);

    const renamed = structuredClone(values);
    renamed.components[0]!.name = 'Pump P-3';
    const second = shareUnchanged(first, computeDesignFigures(renamed, SI));
    expect(second.frequencies).toBe(first.frequencies);
    expect(second.mass).toBe(first.mass);
    expect(second.loads).toBe(first.loads);
    expect(second.components).not.toBe(first.components);

    const heavier = structuredClone(values);
    heavier.components[0]!.mass = '310';
    const third = shareUnchanged(first, computeDesignFigures(heavier, SI));
    expect(third.mass).not.toBe(first.mass);
    expect(third.frequencies).toBe(first.frequencies);
  });

  it('does so from one render of the hook to the next, and keeps the figures while the input is the same', () => {
    const values = toFormValues(demoInput(), SI);
    const { result, rerender } = renderHook(({ input }) => useDesignFigures(input, SI), { initialProps: { input: values } });
    const first = result.current;
    rerender({ input: values });
    expect(result.current).toBe(first);

    const renamed = structuredClone(values);
    renamed.components[0]!.name = 'Pump P-3';
    rerender({ input: renamed });
    expect(result.current).not.toBe(first);
    expect(result.current.components![0]!.name).toBe('Pump P-3');
    expect(result.current.mass).toBe(first.mass);
    expect(result.current.frequencies).toBe(first.frequencies);
    expect(result.current.loads).toBe(first.loads);
  });
});
