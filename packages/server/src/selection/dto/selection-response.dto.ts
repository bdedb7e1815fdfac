import { CandidateRestraintDto } from './restraint.dto.js';
import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { RIGID_BODY_DOFS } from '@tacet/vibration';
import { Vec3Dto } from './design-input.dto.js';

/* Response shapes, for the OpenAPI document (the service returns plain objects of these shapes). */

export class SupplierRefDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

export class CandidatePointDto {
  @ApiProperty() label: string;
  @ApiProperty() mountId: number;
  @ApiProperty() partNumber: string;
  @ApiProperty({ description: 'N' }) loadN: number;
  @ApiProperty({ description: 'load / rated load' }) utilization: number;
  @ApiProperty() staticDeflectionMm: number;
}

export class CandidateIsolationDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty() transmissibility: number;
  @ApiProperty() efficiencyPct: number;
  @ApiProperty() dB: number;
}

export class ModeEnergyFractionsDto {
  @ApiProperty() surge: number;
  @ApiProperty() sway: number;
  @ApiProperty() bounce: number;
  @ApiProperty() roll: number;
  @ApiProperty() pitch: number;
  @ApiProperty() yaw: number;
}

export class CandidateModeDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ enum: RIGID_BODY_DOFS, enumName: 'RigidBodyMode', description: 'the coordinate with the largest share' }) dominant: string;
  @ApiProperty({ description: 'no coordinate carries 90 % of the kinetic energy' }) coupled: boolean;
  @ApiPropertyOptional({
    type: ModeEnergyFractionsDto,
    description: 'share of the kinetic energy per coordinate, summing to 1 (absent in candidates chosen before it was kept)',
  })
  energyFractions?: ModeEnergyFractionsDto;
}

export class ScoreTermsDto {
  @ApiProperty() isolation: number;
  @ApiProperty() utilization: number;
  @ApiProperty() level: number;
  @ApiProperty() price: number;
  @ApiProperty() leadTime: number;
}

export class WholeMachineWorstDto {
  @ApiProperty({ description: 'worst whole-machine transmissibility: Σ peak mount force / peak applied force' }) transmissibility: number;
  @ApiProperty({ description: '(1 − transmissibility)·100' }) efficiencyPct: number;
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ type: Number, nullable: true, description: 'rpm; null for a fixed frequency when no speed is given' }) speedRpm:
    number | null;
  @ApiProperty({ description: 'label of the source that governs' }) source: string;
  @ApiProperty({ description: 'stiffness factor that governs: 1 − tol, 1 or 1 + tol' }) stiffnessFactor: number;
}

export class PointForceDto {
  @ApiProperty() label: string;
  @ApiProperty({ description: 'peak dynamic force through the mount, N (per newton for the default vertical force)' }) forceN: number;
}

export class WholeMachineFrequencyDto {
  @ApiProperty() source: string;
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ type: Number, nullable: true }) speedRpm: number | null;
  @ApiProperty() transmissibility: number;
  @ApiProperty({ description: "the source's amplitude there, N (1 for the default vertical force)" }) amplitudeN: number;
  @ApiProperty({ type: [PointForceDto], description: 'in the order of mountPoints' }) perPoint: PointForceDto[];
}

export class CandidateWholeMachineDto {
  @ApiProperty({ type: WholeMachineWorstDto }) worst: WholeMachineWorstDto;
  @ApiProperty({ description: 'stiffness band applied, ± % (the criteria’s or the default of the mount type)' })
  stiffnessTolerancePct: number;
  @ApiProperty({
    type: [WholeMachineFrequencyDto],
    description: 'per source: at the fixed frequency, or at the range ends, each crossing and the worst point (governing stiffness)',
  })
  perFrequency: WholeMachineFrequencyDto[];
}

export class CandidateCrossingDto {
  @ApiProperty({ description: 'the mode by its motion, e.g. "pitch" or "roll + sway (mixed)"' }) mode: string;
  @ApiProperty() modeFrequencyHz: number;
  @ApiProperty({ description: 'label of the source' }) source: string;
  @ApiProperty() order: number;
  @ApiProperty() speedRpm: number;
}

export class CandidateDto {
  @ApiProperty({ enum: ['uniform', 'series'], enumName: 'CandidateKind' }) kind: 'uniform' | 'series';
  @ApiPropertyOptional() mountId?: number;
  @ApiPropertyOptional({ description: '`${supplierId}:${series}`' }) seriesId?: string;
  @ApiProperty() label: string;
  @ApiProperty({ type: SupplierRefDto }) supplier: SupplierRefDto;
  @ApiProperty({ type: [CandidatePointDto], description: 'in the order of mountPoints' }) perPoint: CandidatePointDto[];
  @ApiPropertyOptional({
    description:
      'allowance on the weight the checks applied, %: the upper utilisation and deflection checks use utilization × (1 + weightMarginPct/100) ' +
      '(absent in candidates chosen before it was kept)',
  })
  weightMarginPct?: number;
  @ApiProperty({ description: '√(Σ n_d·k_v / m)/2π' }) verticalNaturalFrequencyHz: number;
  @ApiProperty({
    type: [CandidateIsolationDto],
    description: 'the bounce estimate (quick figures) at the disturbing frequencies, in their order; the verdict is wholeMachine',
  })
  isolation: CandidateIsolationDto[];
  @ApiProperty({ description: 'transmissibility at resonance' }) resonanceAmplification: number;
  @ApiProperty() levelErrorMm: number;
  @ApiProperty({ type: Number, nullable: true }) totalPrice: number | null;
  @ApiProperty() currency: string;
  @ApiProperty({ type: Number, nullable: true }) maxLeadTimeDays: number | null;
  @ApiPropertyOptional({ type: [CandidateModeDto], description: 'the six coupled rigid-body modes, where computed' })
  modes?: CandidateModeDto[];
  @ApiPropertyOptional({ type: CandidateRestraintDto, description: 'seismic restraint figures, when the input asks for restraint' })
  restraint?: CandidateRestraintDto;
  @ApiPropertyOptional({
    type: CandidateWholeMachineDto,
    description: 'the whole-machine verdict over the running range and the stiffness band (absent when the inertia is unknown)',
  })
  wholeMachine?: CandidateWholeMachineDto;
  @ApiPropertyOptional({
    type: [CandidateCrossingDto],
    description: 'crossings of the source orders with the modes inside the running range',
  })
  crossings?: CandidateCrossingDto[];
  @ApiProperty({ description: 'follows the whole-machine verdict, with the load, deflection, mode and restraint checks' }) passes: boolean;
  @ApiProperty({ type: [String] }) reasons: string[];
  @ApiProperty({ type: [String], description: 'assumptions and remarks that do not fail the candidate' }) notes: string[];
  @ApiProperty() score: number;
  @ApiProperty({ type: ScoreTermsDto }) scoreTerms: ScoreTermsDto;
}

export class SelectionResponseDto {
  @ApiProperty({ type: [CandidateDto], description: 'passing best first, then failing best first' })
  candidates: CandidateDto[];
  @ApiProperty({ description: 'candidates evaluated' }) considered: number;
  @ApiProperty({ description: 'server-side time, ms' }) elapsedMs: number;
  @ApiProperty() totalMassKg: number;
  @ApiProperty({ type: Vec3Dto }) cg: Vec3Dto;
  @ApiProperty({ type: [Number], description: 'equal-stiffness loads, N (first guess)' }) pointLoadsN: number[];
  @ApiProperty({ type: [Number] }) disturbingFrequenciesHz: number[];
}

export class SpeedBandDto {
  @ApiProperty({ description: 'rpm' }) min: number;
  @ApiProperty({ description: 'rpm' }) max: number;
}

export class CurvesCandidateDto {
  @ApiProperty({ enum: ['uniform', 'series'], enumName: 'CandidateKind' }) kind: 'uniform' | 'series';
  @ApiPropertyOptional() mountId?: number;
  @ApiPropertyOptional() seriesId?: string;
  @ApiProperty() label: string;
  @ApiProperty() passes: boolean;
}

export class CurvesRequirementDto {
  @ApiProperty() minIsolationPct: number;
  @ApiProperty({ description: 'the highest transmissibility the requirement allows' }) transmissibility: number;
}

export class CurvesModeDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ enum: RIGID_BODY_DOFS, enumName: 'RigidBodyMode' }) dominant: string;
  @ApiProperty() coupled: boolean;
}

export class SourceCurveDto {
  @ApiProperty() label: string;
  @ApiProperty({ type: Number, nullable: true, description: 'shaft order it follows; null at a fixed frequency' }) order: number | null;
  @ApiProperty({ type: Number, nullable: true }) fixedFrequencyHz: number | null;
  @ApiProperty({ type: [Number], description: 'ascending, ≤ 0.5 % steps, with the range ends, skip-band edges and crossings' })
  speedRpm: number[];
  @ApiProperty({ type: [Number] }) frequencyHz: number[];
  @ApiProperty({ type: [Number], description: 'whole-machine transmissibility at the nominal stiffness' }) transmissibility: number[];
  @ApiProperty({ type: [Number], nullable: true, description: 'at the soft end of the band (1 − tol); null without a band' })
  softEnd: number[] | null;
  @ApiProperty({ type: [Number], nullable: true, description: 'at the stiff end of the band (1 + tol); null without a band' })
  stiffEnd: number[] | null;
}

export class SelectionCurvesResponseDto {
  @ApiProperty({ type: CurvesCandidateDto }) candidate: CurvesCandidateDto;
  @ApiProperty({
    type: SpeedBandDto,
    nullable: true,
    description: 'running range, rpm; null when only fixed frequencies force the machine',
  })
  speedRangeRpm: SpeedBandDto | null;
  @ApiProperty({ type: [SpeedBandDto] }) skipBandsRpm: SpeedBandDto[];
  @ApiProperty({ type: CurvesRequirementDto }) requirement: CurvesRequirementDto;
  @ApiProperty({ description: '± %' }) stiffnessTolerancePct: number;
  @ApiProperty({ type: [CurvesModeDto], description: 'modes at the nominal stiffness' }) modes: CurvesModeDto[];
  @ApiProperty({ type: [CandidateCrossingDto] }) crossings: CandidateCrossingDto[];
  @ApiProperty({ type: WholeMachineWorstDto, nullable: true }) worst: WholeMachineWorstDto | null;
  @ApiProperty({ type: [SourceCurveDto] }) sources: SourceCurveDto[];
}
