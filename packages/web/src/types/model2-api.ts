/**
 * The whole-machine additions to the design input and the selection result ("Model 2" in the
 * product spec), as the web reads and sends them. SI units (m, kg, N, Hz; speeds in rpm).
 *
 * The input side aliases the generated types; the result side is written from the spec while
 * the server's response DTOs are being built, and becomes aliases of the generated types once
 * `schema.gen.ts` carries them (`npm run api-types`). Every result field is optional so that a
 * result stored before the whole-machine model still reads.
 */
import { sourceAxisValues, sourceKindValues, type ApiSchemas } from '@/api/schema';

export const SOURCE_KINDS = sourceKindValues;
export type SourceKind = ApiSchemas['SourceKind'];
export const SOURCE_AXES = sourceAxisValues;
export type SourceAxis = ApiSchemas['SourceAxis'];

/**
 * One disturbing source: a rotating unbalance (rotor mass and balance grade, normal to `axis`) or
 * a harmonic force (amplitude along `axis`), at an order of the shaft speed or a fixed frequency.
 * Position in m; balance grade G in mm/s (ISO 21940-11, default 6.3).
 */
export type OperatingSource = ApiSchemas['OperatingSourceDto'];

/** A speed band the drive skips [rpm]. */
export type SkipBand = ApiSchemas['SkipBandDto'];

/** What the whole-machine model adds to the operating conditions. */
export interface Model2Operating {
  sources?: OperatingSource[];
  skipBandsRpm?: SkipBand[];
  /** Motor poles: the magnetic force follows the drive (2·poles·n/120). */
  motorPoles?: number;
}

/** The whole machine at one frequency of one source: T and the peak force per mount [N]. */
export type WholeMachinePoint = ApiSchemas['WholeMachineFrequencyDto'];
/** The worst point over the running range (and the stiffness band), which the verdict is checked against. */
export type WholeMachineWorst = ApiSchemas['WholeMachineWorstDto'];
export type WholeMachine = ApiSchemas['CandidateWholeMachineDto'];
/** A speed where an order of a source meets a rigid-body mode (mode named by its motion). */
export type Crossing = ApiSchemas['CandidateCrossingDto'];
/** `POST /api/selection/curves`: T against speed per source of one candidate, nominal and both band ends. */
export type SelectionCurves = ApiSchemas['SelectionCurvesResponseDto'];

/** Start-up and coast-down: steady motion at a mode below the running range. */
export interface PassagePoint {
  /** The mode: its number in the modes table (1-based) or its name. */
  mode: number | string;
  modeFrequencyHz: number;
  speedRpm: number;
  motionMm: number;
}

/** What the whole-machine model adds to a candidate. */
export interface Model2Candidate {
  wholeMachine?: WholeMachine;
  crossings?: Crossing[];
  passage?: PassagePoint[];
  assumptions?: string[];
}

/** Whole-machine additions to the criteria. */
export interface Model2Criteria {
  stiffnessTolerancePct?: number;
  maxResonantMotionMm?: number;
}

/**
 * One source's transmissibility against speed over the running range, as the chart reads it:
 * T at the nominal stiffness and, with a stiffness band, at its two ends (from `SelectionCurves`).
 */
export interface SpeedCurve {
  source: string;
  points: { speedRpm: number; transmissibility: number; low?: number; high?: number }[];
}
