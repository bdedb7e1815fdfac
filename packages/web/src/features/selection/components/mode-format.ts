import { MODE_NAMES as GLOSSARY_MODE_NAMES, describeModeMotion } from '@tacet/vibration';

import type { Candidate, ModeName } from '@/types/design-api';

type CandidateMode = NonNullable<Candidate['modes']>[number];

/** A coordinate of the rigid body in words. */
export const MODE_NAMES: Record<ModeName, string> = GLOSSARY_MODE_NAMES;

const pct0 = new Intl.NumberFormat('en-US', { maximumFractionDigits: 0 });
const pct1 = new Intl.NumberFormat('en-US', { minimumFractionDigits: 1, maximumFractionDigits: 1 });

/**
 * A share of a mode's energy in whole percent — with one decimal where whole percent would reach
 * the 90 % that makes a mode pure while the share is below it (89.6 %, not "90 %").
 */
export function formatShare(share: number): string {
  const whole = Math.round(share * 100);
  return whole >= 90 && share < 0.9 ? `${pct1.format(Math.floor(share * 1000) / 10)} %` : `${pct0.format(whole)} %`;
}

export interface ModeMotionText {
  /** "bounce — vertical", or "roll + yaw (mixed)". */
  name: string;
  mixed: boolean;
  /** "roll 52 %, yaw 45 %" for a mixed mode; empty for a pure one. */
  shares: string;
}

/**
 * How a rigid-body mode moves, named by the coordinates that carry its kinetic energy
 * (`describeModeMotion`): a mode that one coordinate carries keeps that coordinate's name; a
 * mixed one names each coordinate it needs, largest share first. A candidate stored without the
 * shares falls back to its dominant coordinate.
 */
export function modeMotionText(mode: CandidateMode): ModeMotionText {
  if (!mode.energyFractions) {
    const name = MODE_NAMES[mode.dominant] ?? mode.dominant;
    return { name: mode.coupled ? `mostly ${name} (mixed)` : name, mixed: mode.coupled, shares: '' };
  }
  const motion = describeModeMotion(mode.energyFractions);
  if (!motion.mixed) {
    const dof = motion.participants[0]!.dof;
    return { name: MODE_NAMES[dof] ?? dof, mixed: false, shares: '' };
  }
  return {
    name: motion.name,
    mixed: true,
    shares: motion.participants.map((p) => `${p.dof} ${formatShare(p.share)}`).join(', '),
  };
}
