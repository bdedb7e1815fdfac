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
  @ApiProperty({ type: [CandidateIsolationDto], description: 'in the order of the disturbing frequencies' })
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
  @ApiProperty() passes: boolean;
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
