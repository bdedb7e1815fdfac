import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Transform } from 'class-transformer';
import { IsIn, IsNumber, IsOptional, IsString, Max, MaxLength, Min } from 'class-validator';
import { DAMPING_MODELS } from '../../catalog/mount-rules.js';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { FRF_QUANTITIES, VERIFICATION_KINDS, type FrfQuantity, type VerificationKind } from '../tap-test-file.js';
import type { TapTestOutcome } from '../tap-test-analysis.js';
import type { Verification } from '../verification.entity.js';

export const VERIFICATION_VERDICTS = ['agrees', 'stiffer', 'softer'] as const;
export const DEFAULT_TOLERANCE_PCT = 10;

/** A multipart text field as a number ('' and absent → undefined; anything else stays text for the validator to refuse). */
const toNumber = ({ value }: { value: unknown }) => {
  if (value === undefined || value === '') return undefined;
  if (typeof value === 'string' && /^\s*[+-]?(?:\d+(?:\.\d*)?|\.\d+)(?:[eE][+-]?\d+)?\s*$/.test(value)) return Number(value);
  return value;
};

/** The text fields of the multipart upload (the file itself is the field `file`). */
export class CreateVerificationDto {
  @ApiProperty({ enum: VERIFICATION_KINDS, enumName: 'VerificationKind', description: 'frf: a measured FRF; impact: a raw hammer record' })
  @IsIn(VERIFICATION_KINDS, { message: 'kind must be frf (a measured FRF) or impact (a raw hammer record)' })
  kind: VerificationKind;

  @ApiPropertyOptional({
    enum: FRF_QUANTITIES,
    enumName: 'FrfQuantity',
    description:
      'What an FRF file holds (SI): accelerance m/s²/N, mobility m/s/N, receptance m/N. Required for kind=frf; a raw record gives accelerance',
  })
  @IsOptional()
  @IsIn(FRF_QUANTITIES, { message: 'quantity must be accelerance, mobility or receptance' })
  quantity?: FrfQuantity;

  @ApiPropertyOptional({
    description: 'Accepted deviation of the natural frequency, % (default 10)',
    minimum: 1,
    maximum: 50,
    default: DEFAULT_TOLERANCE_PCT,
  })
  @IsOptional()
  @Transform(toNumber)
  @IsNumber({ allowNaN: false, allowInfinity: false }, { message: 'The tolerance must be a number of per cent' })
  @Min(1, { message: 'The tolerance must be at least 1 %' })
  @Max(50, { message: 'The tolerance must be at most 50 %' })
  tolerancePct?: number;

  @ApiPropertyOptional({ description: 'Where and how it was measured (hit and accelerometer positions, direction)', maxLength: 500 })
  @IsOptional()
  @IsString()
  @MaxLength(500)
  note?: string;
}

/** One problem of a refused file; row 0 is the file as a whole, the header is row 1. */
export class TapTestProblemDto {
  @ApiProperty({ example: 7 }) row: number;
  @ApiProperty({ description: 'The column as the file names it; empty for the whole row or file', example: 'frequency_hz' }) column: string;
  @ApiProperty({ example: 'frequencies must increase: 5.2 Hz follows 5.3 Hz' }) message: string;
}

export class TapTestRejectedDto {
  @ApiProperty({ example: 422 }) statusCode: number;
  @ApiProperty() message: string;
  @ApiProperty({ type: [TapTestProblemDto] }) errors: TapTestProblemDto[];
}

export class HalfPowerBandDto {
  @ApiProperty({ description: 'Hz' }) lower: number;
  @ApiProperty({ description: 'Hz' }) upper: number;
}

export class IdentifiedFiguresDto {
  @ApiProperty({ description: 'Undamped natural frequency fn = f_p/√(1 − 2ζ²), Hz' }) naturalFrequencyHz: number;
  @ApiProperty({
    type: Number,
    nullable: true,
    description: 'ζ after the exponential-window correction; null when it could not be identified',
  })
  dampingRatio: number | null;
  @ApiProperty({ description: 'k = m·(2π·fn)² with the design mass, N/m (an apparent stiffness)' }) stiffnessNPerM: number;
  @ApiProperty({ description: 'Receptance peak, Hz' }) peakFrequencyHz: number;
  @ApiProperty({ type: Number, nullable: true, description: 'ζ from the half-power bandwidth before the window correction' })
  measuredDampingRatio: number | null;
  @ApiProperty({ description: 'Δζ = 1/(ωn·τ) taken off for the exponential window (0 without one)' }) windowDampingCorrection: number;
  @ApiProperty({ type: HalfPowerBandDto, nullable: true }) halfPowerHz: HalfPowerBandDto | null;
  @ApiProperty({ type: Number, nullable: true, description: 'Mean coherence γ² over the half-power band (averaged hits)' })
  meanCoherence: number | null;
  @ApiProperty({ enum: ['good', 'fair'], enumName: 'IdentificationQuality' }) quality: 'good' | 'fair';
}

export class PredictedDampingDto {
  @ApiProperty({ enum: DAMPING_MODELS, enumName: 'DampingModel' }) model: 'viscous' | 'hysteretic';
  @ApiProperty({ description: 'ζ (viscous) or η (hysteretic)' }) value: number;
}

export class PredictedFiguresDto {
  @ApiProperty({ description: 'The design mode nearest the measured one, Hz' }) naturalFrequencyHz: number;
  @ApiProperty({ example: 'bounce', description: 'The mode: its dominant motion (surge, sway, bounce, roll, pitch, yaw)' }) mode: string;
  @ApiProperty() coupled: boolean;
  @ApiProperty({ enum: ['rigid-body modes', 'bounce estimate'], enumName: 'PredictionSource' }) source:
    'rigid-body modes' | 'bounce estimate';
  @ApiProperty({ description: 'Design mass, kg' }) massKg: number;
  @ApiProperty({ description: 'm·(2π·f)² for the predicted mode, N/m' }) stiffnessNPerM: number;
  @ApiProperty({ type: PredictedDampingDto, nullable: true, description: 'The chosen mounts’ catalog damping' })
  damping: PredictedDampingDto | null;
}

export class FrequencyBandDto {
  @ApiProperty({ description: 'Hz' }) min: number;
  @ApiProperty({ description: 'Hz' }) max: number;
}

export class ImpactProcessingDto {
  @ApiProperty() sampleRateHz: number;
  @ApiProperty() hitsFound: number;
  @ApiProperty() hitsAveraged: number;
  @ApiProperty({ type: [Number] }) hitTimesS: number[];
  @ApiProperty() blockDurationS: number;
  @ApiProperty() resolutionHz: number;
  @ApiProperty() preTriggerS: number;
  @ApiProperty() forceWindowS: number;
  @ApiProperty({ type: Number, nullable: true }) exponentialTimeConstantS: number | null;
  @ApiProperty({ type: FrequencyBandDto }) usableBandHz: FrequencyBandDto;
}

export class MeasuredCurveDto {
  @ApiProperty({ enum: FRF_QUANTITIES, enumName: 'FrfQuantity' }) quantity: FrfQuantity;
  @ApiProperty({ type: [Number] }) frequencyHz: number[];
  @ApiProperty({ type: [Number], description: 'in SI units of the quantity' }) magnitude: number[];
  @ApiProperty({ type: [Number] }) phaseDeg: number[];
  @ApiProperty({ type: [Number], nullable: true, description: 'γ² per point (averaged hits), null otherwise' }) coherence: number[] | null;
}

/** One as-built measurement of a design and how it compares with the prediction. */
export class VerificationDto {
  @ApiProperty() id: number;
  @ApiProperty() designId: number;
  @ApiProperty({ enum: VERIFICATION_KINDS, enumName: 'VerificationKind' }) kind: VerificationKind;
  @ApiProperty({ enum: FRF_QUANTITIES, enumName: 'FrfQuantity' }) quantity: FrfQuantity;
  @ApiProperty() fileName: string;
  @ApiProperty({ type: String, nullable: true }) note: string | null;
  @ApiProperty({ type: UserRefDto, description: 'Who uploaded it' }) measuredBy: UserRefDto;
  @ApiProperty({ type: String, format: 'date-time' }) createdAt: string;
  @ApiProperty({ description: '%' }) tolerancePct: number;
  @ApiProperty({ type: IdentifiedFiguresDto }) identified: IdentifiedFiguresDto;
  @ApiProperty({ type: PredictedFiguresDto }) predicted: PredictedFiguresDto;
  @ApiProperty({ description: '(measured − predicted)/predicted × 100, %' }) deviationPct: number;
  @ApiProperty({ description: '((measured/predicted)² − 1) × 100 at the same mass, %' }) stiffnessDeviationPct: number;
  @ApiProperty({ enum: VERIFICATION_VERDICTS, enumName: 'VerificationVerdict' }) verdict: TapTestOutcome['verdict'];
  @ApiProperty({ type: [String], description: 'The verdict in words, likely causes, remarks' }) notes: string[];
  @ApiProperty({ type: [String], description: 'What makes the measurement doubtful (clipping, double hits, short record, low coherence…)' })
  warnings: string[];
  @ApiProperty({ type: ImpactProcessingDto, nullable: true, description: 'How a raw record was processed; null for an FRF file' })
  processing: ImpactProcessingDto | null;
  @ApiProperty({ type: MeasuredCurveDto }) measured: MeasuredCurveDto;

  static from(row: Verification): VerificationDto {
    const o = row.outcome;
    return Object.assign(new VerificationDto(), {
      id: row.id,
      designId: row.designId,
      kind: row.kind,
      quantity: row.quantity,
      fileName: row.fileName,
      note: row.note,
      measuredBy: { id: row.user.id, name: row.user.name },
      createdAt: row.createdAt.toISOString(),
      tolerancePct: row.tolerancePct,
      identified: o.identified,
      predicted: o.predicted,
      deviationPct: o.deviationPct,
      stiffnessDeviationPct: o.stiffnessDeviationPct,
      verdict: o.verdict,
      notes: o.notes,
      warnings: o.warnings,
      processing: o.processing,
      measured: o.measured,
    });
  }
}
