import { requireFinite } from '../errors/validate.js';
import { VibrationInputError } from '../errors/vibration-input-error.js';
import { PURE_MODE_SHARE, RIGID_BODY_DOFS, type RigidBodyDof } from './rigid-body-modes.js';

/** One coordinate's share of a mode's kinetic energy. */
export interface ModeParticipant {
  dof: RigidBodyDof;
  /** e_j, the coordinate's share of the kinetic energy (0…1). */
  share: number;
}

/** How a mode moves, in the coordinates that carry it. */
export interface ModeMotion {
  /** The coordinates that together carry at least {@link PURE_MODE_SHARE} of the energy, largest share first. */
  participants: ModeParticipant[];
  /** More than one coordinate is needed (the mode is coupled). */
  mixed: boolean;
  /** "bounce", or "roll + yaw (mixed)": the participants in order, joined. */
  name: string;
}

/**
 * The coordinates that carry a rigid-body mode: its kinetic-energy shares e_j sorted largest
 * first, taken until together they reach `share` of the energy (docs/engineering/rigid-body-modes.md §6).
 * A share that comes out slightly negative (products of inertia) counts as none.
 * @param energyFractions e_j per coordinate (as {@link rigidBodyModes} returns them), summing to 1
 * @param share the part of the energy the participants must carry together (default 0.9)
 * @throws VibrationInputError when a share is missing or not finite, or `share` is outside (0, 1]
 */
export function modeParticipants(energyFractions: Readonly<Record<RigidBodyDof, number>>, share = PURE_MODE_SHARE): ModeParticipant[] {
  requireFinite('share', share);
  if (!(share > 0 && share <= 1)) throw new VibrationInputError('share', `must lie between 0 and 1 (got ${share})`, 'out-of-range');
  const all = RIGID_BODY_DOFS.map((dof) => ({ dof, share: Math.max(0, requireFinite(`energyFractions.${dof}`, energyFractions?.[dof])) }));
  all.sort((a, b) => b.share - a.share);
  const out: ModeParticipant[] = [];
  let sum = 0;
  for (const participant of all) {
    out.push(participant);
    sum += participant.share;
    // the same comparison as `coupled` in rigidBodyModes: one coordinate with ≥ 0.9 is a pure mode
    if (sum >= share) break;
  }
  return out;
}

/**
 * A rigid-body mode described by the motion that carries it: "bounce" when one coordinate
 * carries at least 90 % of the kinetic energy, else every coordinate needed to reach 90 %,
 * largest share first, e.g. "roll + yaw (mixed)" (docs/engineering/rigid-body-modes.md §6).
 * @param energyFractions e_j per coordinate, summing to 1
 */
export function describeModeMotion(energyFractions: Readonly<Record<RigidBodyDof, number>>): ModeMotion {
  const participants = modeParticipants(energyFractions);
  const mixed = participants.length > 1;
  const names = participants.map((p) => p.dof).join(' + ');
  return { participants, mixed, name: mixed ? `${names} (mixed)` : names };
}
