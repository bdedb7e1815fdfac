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
  @ApiProperty({ description: 'load / rated load, without the weight margin (the basis of the lower utilisation check)' })
  utilization: number;
  @ApiPropertyOptional({
    description:
      'load × (1 + weightMarginPct/100) / rated load: the basis of the upper utilisation check, the figure to show beside the ' +
      'allowed window (equal to utilization without a margin; absent on candidates stored before it was given)',
  })
  utilizationWithMargin?: number;
  @ApiProperty({ description: "the mount's own static deflection, mm" }) staticDeflectionMm: number;
  @ApiPropertyOptional({ description: 'deflection of the flexible support under the point, mm (where supportStiffnessNPerMm is given)' })
  supportDeflectionMm?: number;
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

export class AltCasePointDto {
  @ApiProperty() label: string;
  @ApiProperty({ description: 'N' }) loadN: number;
  @ApiProperty({ description: 'load / rated load' }) utilization: number;
  @ApiProperty() staticDeflectionMm: number;
}

export class AltCaseIsolationDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty() transmissibility: number;
  @ApiProperty() efficiencyPct: number;
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

export class CandidateAltMassCaseDto {
  @ApiProperty({ description: 'kg' }) massKg: number;
  @ApiProperty({ type: Vec3Dto }) cg: Vec3Dto;
  @ApiProperty({ description: 'bounce estimate with the second mass, Hz' }) verticalNaturalFrequencyHz: number;
  @ApiProperty({ type: [AltCasePointDto] }) perPoint: AltCasePointDto[];
  @ApiProperty({ type: [AltCaseIsolationDto], description: 'bounce estimate at the disturbing frequencies with the second mass' })
  isolation: AltCaseIsolationDto[];
  @ApiPropertyOptional({
    type: WholeMachineWorstDto,
    description: 'the whole-machine worst point with the second mass (absent when the inertia is unknown)',
  })
  wholeMachineWorst?: WholeMachineWorstDto;
  @ApiProperty({ description: 'the second mass case meets every check' }) passes: boolean;
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

export class CandidatePassageDto {
  @ApiProperty({ description: 'the mode by its motion, as the crossings name it' }) mode: string;
  @ApiProperty() modeFrequencyHz: number;
  @ApiProperty({ description: 'n = 60·f/order of the unbalance that crosses the mode, below the lowest running speed, rpm' })
  speedRpm: number;
  @ApiProperty({
    description: 'steady peak motion at the mounts there, mm: the largest over the mounts and the unbalance sources at that speed',
  })
  motionMm: number;
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
  @ApiPropertyOptional({
    type: CandidateAltMassCaseDto,
    description: 'the second mass case (components[].altMassKg), when given; the verdict covers it',
  })
  altMassCase?: CandidateAltMassCaseDto;
  @ApiPropertyOptional({
    type: [CandidatePassageDto],
    description:
      'start-up and coast-down: each rigid-body mode an unbalance source crosses below the lowest running speed, lowest speed first ' +
      '([] when nothing is passed or there is no unbalance; absent without the whole-machine verdict)',
  })
  passage?: CandidatePassageDto[];
  @ApiPropertyOptional({
    description: 'the largest motion the passage is checked against, mm (the criteria’s maxResonantMotionMm or the default)',
  })
  passageLimitMm?: number;
  @ApiProperty({ description: 'follows the whole-machine verdict (both mass cases), with the load, deflection, mode and restraint checks' })
  passes: boolean;
  @ApiProperty({ type: [String] }) reasons: string[];
  @ApiProperty({ type: [String], description: 'remarks and warnings that do not fail the candidate' }) notes: string[];
  @ApiPropertyOptional({
    type: [String],
    description:
      'every value that did not come from the catalog or the input and the value used, the unfavourable one for the check it feeds ' +
      '(absent in candidates chosen before it was kept)',
  })
  assumptions?: string[];
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
