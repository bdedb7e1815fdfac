import { dampingRatioFromLossFactor, naturalFrequencyFromStaticDeflection, staticDeflection } from '@tacet/vibration';

import type { DampingModel, Mount } from '../types';

type MountStiffness = Pick<Mount, 'ratedLoadN' | 'verticalStiffnessNPerM' | 'dynamicStiffnessRatio'>;

/** `fn(...)`, or NaN where the calculation refuses the input (shown as "—"). */
function orNaN(fn: () => number): number {
  try {
    return fn();
  } catch {
    return Number.NaN;
  }
}

/** Static deflection under a load [m] (δ = W/k, from `@tacet/vibration`). */
export function deflectionAtLoad(mount: Pick<Mount, 'verticalStiffnessNPerM'>, loadN: number): number {
  return orNaN(() => staticDeflection(loadN, mount.verticalStiffnessNPerM));
}

/** Static deflection at the rated load [m]. */
export function ratedDeflection(mount: MountStiffness): number {
  return deflectionAtLoad(mount, mount.ratedLoadN);
}

/**
 * Vertical natural frequency [Hz] of a mass that loads the mount with `loadN`, from the static
 * deflection and the dynamic-to-static stiffness ratio (`@tacet/vibration`).
 */
export function naturalFrequencyAtLoad(mount: MountStiffness, loadN: number): number {
  return orNaN(() =>
    naturalFrequencyFromStaticDeflection(staticDeflection(loadN, mount.verticalStiffnessNPerM), mount.dynamicStiffnessRatio || 1),
  );
}

/** Vertical natural frequency [Hz] at the rated load. */
export function ratedNaturalFrequency(mount: MountStiffness): number {
  return naturalFrequencyAtLoad(mount, mount.ratedLoadN);
}

export interface DampingFigure {
  model: DampingModel;
  /** ζ for viscous, η for hysteretic. */
  symbol: 'ζ' | 'η';
  value: number;
  /** For a loss factor, the damping ratio with the same resonant amplification (ζ = η/2). */
  equivalentDampingRatio: number;
}

/** The damping a mount is computed with, named by its model. `null` when the row has none. */
export function dampingOf(mount: Pick<Mount, 'dampingRatio' | 'lossFactor'>): DampingFigure | null {
  if (mount.dampingRatio !== null && mount.dampingRatio !== undefined) {
    return {
      model: 'viscous',
      symbol: 'ζ',
      value: mount.dampingRatio,
      equivalentDampingRatio: mount.dampingRatio,
    };
  }
  if (mount.lossFactor !== null && mount.lossFactor !== undefined) {
    const lossFactor = mount.lossFactor;
    return {
      model: 'hysteretic',
      symbol: 'η',
      value: lossFactor,
      equivalentDampingRatio: orNaN(() => dampingRatioFromLossFactor(lossFactor)),
    };
  }
  return null;
}
