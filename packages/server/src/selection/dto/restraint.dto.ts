import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, Max, Min } from 'class-validator';
import { SEISMIC_INPUT_LIMITS, VIBRATION_ISOLATED_COEFFICIENTS } from '@tacet/vibration';
import { IsFiniteNumber } from './validators.js';
import { measure } from '../../common/units/reader-words.js';

/** The component importance factors of ASCE 7-16 §13.1.3. */
export const IMPORTANCE_FACTORS = [1, 1.5] as const;

/** Largest nominal gap accepted, mm (a gap wider than a restraint's travel means no restraint). */
export const MAX_SNUBBER_GAP_MM = 100;

const L = SEISMIC_INPUT_LIMITS;

/**
 * Seismic restraint of the machine, ASCE 7-16 §13.3.1 (docs/engineering/seismic-restraint.md).
 * With it in the input, every candidate is checked against its mounts' restraint ratings.
 */
export class RestraintInputDto {
  @ApiProperty({ example: 1.0, description: 'S_DS, design spectral response acceleration at short periods, in g (from the site)' })
  @IsFiniteNumber({ message: 'S_DS must be a number (in g)' })
  @Min(0.001, { message: 'S_DS must be more than zero (in g)' })
  @Max(L.sdsG.max, { message: `S_DS must be at most ${L.sdsG.max} g: give it in g, not in % of g` })
  sdsG: number;

  @ApiProperty({
    example: 1.0,
    enum: IMPORTANCE_FACTORS,
    enumName: 'ImportanceFactor',
    description: 'I_p, component importance factor: 1.0, or 1.5 for life-safety and hazardous components',
  })
  @IsIn(IMPORTANCE_FACTORS, { message: 'The importance factor I_p is 1.0 or 1.5' })
  importanceFactor: number;

  @ApiProperty({ example: 0, description: 'z/h, height of the attachment over the roof height of the building, 0 (grade) … 1 (roof)' })
  @IsFiniteNumber({ message: 'z/h must be a number from 0 to 1' })
  @Min(0, { message: 'z/h must be from 0 (at grade) to 1 (at the roof)' })
  @Max(1, { message: 'z/h must be from 0 (at grade) to 1 (at the roof)' })
  zOverH: number;

  @ApiPropertyOptional({
    example: VIBRATION_ISOLATED_COEFFICIENTS.ap,
    description: 'a_p, component amplification factor (default 2.5, Table 13.6-1, vibration-isolated)',
  })
  @IsOptional()
  @IsFiniteNumber({ message: 'a_p must be a number' })
  @Min(L.ap.min, { message: `a_p must be from ${L.ap.min} to ${L.ap.max}` })
  @Max(L.ap.max, { message: `a_p must be from ${L.ap.min} to ${L.ap.max}` })
  ap?: number;

  @ApiPropertyOptional({
    example: VIBRATION_ISOLATED_COEFFICIENTS.rp,
    description: 'R_p, component response modification factor (default 2.0, Table 13.6-1, vibration-isolated)',
  })
  @IsOptional()
  @IsFiniteNumber({ message: 'R_p must be a number' })
  @Min(L.rp.min, { message: `R_p must be from ${L.rp.min} to ${L.rp.max}` })
  @Max(L.rp.max, { message: `R_p must be from ${L.rp.min} to ${L.rp.max}` })
  rp?: number;

  @ApiPropertyOptional({
    example: 6,
    description: 'nominal gap between the machine and its restraints, mm; above 6.35 mm (0.25 in), or not given, the design force doubles',
  })
  @IsOptional()
  @IsFiniteNumber({ message: 'The gap to the restraints must be a number of millimetres' })
  @Min(0, { message: 'The gap to the restraints cannot be negative' })
  @Max(MAX_SNUBBER_GAP_MM, {
    message: `The gap to the restraints must be at most ${measure('deflection', MAX_SNUBBER_GAP_MM / 1000)}`,
  })
  snubberGapMm?: number;
}

/** The plain shape. */
export type RestraintInput = Omit<RestraintInputDto, never>;

export const SEISMIC_FORCE_LIMITS = ['formula', 'minimum', 'maximum'] as const;
export const RESTRAINT_CHECK_KINDS = ['shear', 'tension'] as const;

/** One mount point's seismic demand (strength level, the worst over every horizontal direction) against its ratings. */
export class RestraintPointDto {
  @ApiProperty({ example: 'A' }) label: string;
  @ApiProperty({ example: 'QM-R1-05050' }) partNumber: string;
  @ApiProperty({ description: 'dead load D_i on the mount, N (negative: it lifts under its own weight)' }) deadLoadN: number;
  @ApiProperty({ description: 'largest horizontal force on the mount, N' }) shearN: number;
  @ApiProperty({ description: 'plan direction of the design force giving shearN, degrees from +x towards +y, 0 ≤ θ < 180 (either sense)' })
  shearDirectionDeg: number;
  @ApiProperty({ description: 'largest uplift max(0, −(0.9 − 0.2·S_DS)·D_i − ΔR_i), N' }) tensionN: number;
  @ApiProperty({ description: 'plan direction of the design force giving the most uplift, degrees, 0 ≤ θ < 360' })
  tensionDirectionDeg: number;
  @ApiProperty({ description: 'largest compression (1.2 + 0.2·S_DS)·D_i + ΔR_i, N' }) compressionN: number;
  @ApiProperty({ description: 'plan direction of the design force giving compressionN, degrees, 0 ≤ θ < 360' })
  compressionDirectionDeg: number;
  @ApiProperty({ type: Number, nullable: true, description: 'the mount’s horizontal restraint rating, N (null: none in the catalog)' })
  restraintCapacityN: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'the mount’s uplift rating, N (null: none in the catalog)' })
  upliftCapacityN: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'shearN / restraintCapacityN (null without a rating)' })
  shearUtilization: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'tensionN / upliftCapacityN (null without uplift or without a rating)' })
  tensionUtilization: number | null;
  @ApiProperty({ description: 'the demand at this point is within its ratings' }) passes: boolean;
}

/** The check that governs, and the direction of the design force that produces it. */
export class RestraintGoverningDto {
  @ApiProperty({ example: 'B', description: 'mount point' }) label: string;
  @ApiProperty({
    enum: RESTRAINT_CHECK_KINDS,
    enumName: 'RestraintCheckKind',
    description: 'horizontal restraint (shear) or uplift (tension)',
  })
  kind: (typeof RESTRAINT_CHECK_KINDS)[number];
  @ApiProperty({ description: 'N' }) demandN: number;
  @ApiProperty({ type: Number, nullable: true, description: 'N; null without a rating' }) capacityN: number | null;
  @ApiProperty({ type: Number, nullable: true, description: 'demand / rating; null without a rating' }) utilization: number | null;
  @ApiProperty({ description: 'plan direction of the design force, degrees from +x towards +y' }) directionDeg: number;
}

/** The seismic restraint figures of one candidate (ASCE 7-16 §13.3.1; docs/engineering/seismic-restraint.md). */
export class CandidateRestraintDto {
  @ApiProperty({ example: 'ASCE 7-16' }) codeEdition: string;
  @ApiProperty({ description: 'a_p used' }) ap: number;
  @ApiProperty({ description: 'R_p used' }) rp: number;
  @ApiProperty({ description: '0.4·a_p·S_DS·W_p·(1 + 2z/h)/(R_p/I_p), N' }) fpFormulaN: number;
  @ApiProperty({ description: 'lower limit 0.3·S_DS·I_p·W_p, N' }) fpMinN: number;
  @ApiProperty({ description: 'upper limit 1.6·S_DS·I_p·W_p, N' }) fpMaxN: number;
  @ApiProperty({ description: 'F_p within its limits, N' }) fpN: number;
  @ApiProperty({ enum: SEISMIC_FORCE_LIMITS, enumName: 'SeismicForceLimit', description: 'which of formula, minimum or maximum gives F_p' })
  limit: (typeof SEISMIC_FORCE_LIMITS)[number];
  @ApiProperty({ description: 'the design force is 2·F_p (gap above 0.25 in, or not given)' }) doubled: boolean;
  @ApiProperty({ description: 'horizontal design force at the CG, any direction, N' }) designForceN: number;
  @ApiProperty({ description: 'vertical seismic effect E_v = 0.2·S_DS·D on the whole machine, N' }) verticalForceN: number;
  @ApiProperty({ description: 'height of the CG above the mount plane used for overturning, m' }) cgHeightM: number;
  @ApiProperty({ type: RestraintGoverningDto }) governing: RestraintGoverningDto;
  @ApiProperty({ type: [RestraintPointDto], description: 'in the order of the mount points' })
  perPoint: RestraintPointDto[];
  @ApiProperty({ description: 'every point within its ratings' }) passes: boolean;
}
