import { ApiProperty, PickType } from '@nestjs/swagger';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { DesignInputDto } from '../../selection/dto/design-input.dto.js';
import { CandidateDto, SelectionResponseDto, SupplierRefDto } from '../../selection/dto/selection-response.dto.js';
import type { DesignInput } from '../../selection/dto/design-input.dto.js';
import type { BomLine, Candidate, LabelledFrequency, SelectionResult } from '../../selection/selection.types.js';
import { DESIGN_STATUSES, type DesignStatus } from '../design-status.js';
import type { Design } from '../design.entity.js';

export class LabelledFrequencyDto {
  @ApiProperty() frequencyHz: number;
  @ApiProperty({ example: '1× shaft at 1480 rpm' }) label: string;
}

export class BomLineDto {
  @ApiProperty({ type: SupplierRefDto }) supplier: SupplierRefDto;
  @ApiProperty() partNumber: string;
  @ApiProperty() mountId: number;
  @ApiProperty() quantity: number;
  @ApiProperty({ type: [String] }) mountPoints: string[];
  @ApiProperty({ type: Number, nullable: true }) unitPrice: number | null;
  @ApiProperty({ type: Number, nullable: true }) extendedPrice: number | null;
  @ApiProperty() currency: string;
  @ApiProperty({ type: Number, nullable: true }) leadTimeDays: number | null;
}

/** The last selection run on the design's current input (see DesignSelection). */
export class StoredSelectionDto {
  @ApiProperty({ type: String, format: 'date-time' }) ranAt: string;
  @ApiProperty({ type: UserRefDto, nullable: true, description: 'who ran it (null when that account is gone)' }) ranBy: UserRefDto | null;
  @ApiProperty({ description: 'the most candidates the run asked for' }) limit: number;
  @ApiProperty({ description: 'mounts or suppliers were added, changed or retired since the run' }) catalogChanged: boolean;
  @ApiProperty({ type: SelectionResponseDto, description: 'as POST /api/designs/:id/selection returned it' }) result: SelectionResult;
}

export class DesignDto {
  @ApiProperty() id: number;
  @ApiProperty() projectId: number;
  @ApiProperty() projectName: string;
  @ApiProperty() name: string;
  @ApiProperty() revision: number;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus' }) status: DesignStatus;
  @ApiProperty({ description: 'optimistic lock: send it back with PUT' }) version: number;
  @ApiProperty({ type: DesignInputDto }) input: DesignInput;
  @ApiProperty({ type: [LabelledFrequencyDto], description: 'derived from input.operating, lowest first' })
  disturbingFrequencies: LabelledFrequency[];
  @ApiProperty({ type: CandidateDto, nullable: true }) chosen: Candidate | null;
  @ApiProperty({ type: [BomLineDto], description: 'empty until a candidate is chosen' }) bom: BomLine[];
  @ApiProperty({
    type: StoredSelectionDto,
    nullable: true,
    description: 'the last selection run on this input; null when none was run since the input last changed',
  })
  lastSelection: StoredSelectionDto | null;
  @ApiProperty({ type: UserRefDto }) author: UserRefDto;
  @ApiProperty({ type: UserRefDto, nullable: true }) checker: UserRefDto | null;
  @ApiProperty({ type: String, format: 'date-time' }) createdAt: string;
  @ApiProperty({ type: String, format: 'date-time' }) updatedAt: string;

  static from(design: Design, disturbingFrequencies: LabelledFrequency[], lastSelection: StoredSelectionDto | null = null): DesignDto {
    return Object.assign(new DesignDto(), {
      id: design.id,
      projectId: design.projectId,
      projectName: design.project.name,
      name: design.name,
      revision: design.revision,
      status: design.status,
      version: design.version,
      input: design.input,
      disturbingFrequencies,
      chosen: design.chosen ?? null,
      bom: design.bom ?? [],
      lastSelection,
      author: { id: design.author.id, name: design.author.name },
      checker: design.checker ? { id: design.checker.id, name: design.checker.name } : null,
      createdAt: design.createdAt.toISOString(),
      updatedAt: design.updatedAt.toISOString(),
    });
  }
}

/** A design in a project's list: the summary fields of the full design. */
export class DesignListItemDto extends PickType(DesignDto, ['id', 'name', 'revision', 'status', 'updatedAt', 'author'] as const) {
  static from(design: Design): DesignListItemDto {
    return Object.assign(new DesignListItemDto(), {
      id: design.id,
      name: design.name,
      revision: design.revision,
      status: design.status,
      updatedAt: design.updatedAt.toISOString(),
      author: { id: design.author.id, name: design.author.name },
    });
  }
}
