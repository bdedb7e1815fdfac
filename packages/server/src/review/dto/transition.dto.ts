import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { IsId } from '../../common/decorators/is-id.decorator.js';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { DESIGN_STATUSES, type DesignStatus } from '../../designs/design-status.js';
import type { UnitSystem } from '@tacet/vibration';
import type { DesignTransition } from '../design-transition.entity.js';
import { formatInputChange, type InputChange } from '../input-changes.js';

export const TRANSITION_TARGETS = ['in_review', 'draft', 'released'] as const;
export type TransitionTarget = (typeof TRANSITION_TARGETS)[number];

export class TransitionDto {
  @ApiProperty({ enum: TRANSITION_TARGETS, enumName: 'TransitionTarget' })
  @IsIn(TRANSITION_TARGETS)
  to: TransitionTarget;

  @ApiPropertyOptional({
    description: 'Sending for check: the author’s note to the checker, or reply to the comment when sending again',
    maxLength: 2000,
  })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  note?: string;

  @ApiPropertyOptional({
    description: 'The checker’s words: required when a design in check goes back to draft; release notes when releasing',
    maxLength: 2000,
  })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  comment?: string;

  @ApiPropertyOptional({ description: 'Sending for check: the engineer asked to check it (an engineer or admin other than the author)' })
  @IsOptional()
  @IsId()
  checkerId?: number;
}

/** One changed field, with its values as stored (SI) and as the caller reads them (their units). */
export class InputChangeDto {
  @ApiProperty({ description: 'Where the value sits in the design input, e.g. mountPoints[B].x' }) field: string;
  @ApiProperty({ example: 'Mount point B: x position' }) label: string;
  @ApiProperty({
    type: String,
    nullable: true,
    description:
      'mass, force, position, deflection, stiffness, frequency, speed, temperature (SI values), percent, inertia (kg·m²), count; null for text',
  })
  quantity: string | null;
  @ApiProperty({ type: Number, nullable: true, description: 'SI (speed in Hz), percent as percent; null when absent or text' })
  before: number | null;
  @ApiProperty({ type: Number, nullable: true }) after: number | null;
  @ApiProperty({ description: 'Before, in the caller’s units, e.g. "31.5 in"; "—" when it was absent', example: '0.8 m' })
  beforeText: string;
  @ApiProperty({ example: '0.85 m' }) afterText: string;

  static from(change: InputChange, system: UnitSystem): InputChangeDto {
    const shown = formatInputChange(change, system);
    return Object.assign(new InputChangeDto(), {
      field: change.field,
      label: change.label,
      quantity: change.quantity,
      before: change.before,
      after: change.after,
      beforeText: shown.before,
      afterText: shown.after,
    });
  }
}

export class SubmissionChangesDto {
  @ApiProperty({ type: Number, nullable: true, description: 'null: since this revision was last sent for check; else since that revision' })
  sinceRevision: number | null;
  @ApiProperty({ type: [InputChangeDto] }) items: InputChangeDto[];
}

export class HistoryEntryDto {
  @ApiProperty() id: number;
  @ApiProperty({ type: String, format: 'date-time' }) at: string;
  @ApiProperty({ type: UserRefDto }) user: UserRefDto;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus', nullable: true, description: 'null when the entry starts a revision' })
  from: DesignStatus | null;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus' }) to: DesignStatus;
  @ApiProperty({ type: String, nullable: true, description: 'The checker’s comment (a return to draft) or release notes' })
  comment: string | null;
  @ApiProperty({ type: String, nullable: true, description: 'The author’s note or reply when sending for check' })
  note: string | null;
  @ApiProperty({ type: UserRefDto, nullable: true, description: 'The engineer the author asked to check' })
  requestedChecker: UserRefDto | null;
  @ApiProperty({
    type: SubmissionChangesDto,
    nullable: true,
    description: 'Sending for check again (or a later revision): what changed in the input, in the caller’s units',
  })
  changes: SubmissionChangesDto | null;

  static from(entry: DesignTransition, system: UnitSystem): HistoryEntryDto {
    return Object.assign(new HistoryEntryDto(), {
      id: entry.id,
      at: entry.at.toISOString(),
      user: { id: entry.user.id, name: entry.user.name },
      from: entry.from,
      to: entry.to,
      comment: entry.comment,
      note: entry.note ?? null,
      requestedChecker: entry.requestedChecker ? { id: entry.requestedChecker.id, name: entry.requestedChecker.name } : null,
      changes: entry.changes
        ? { sinceRevision: entry.changes.sinceRevision, items: entry.changes.items.map((item) => InputChangeDto.from(item, system)) }
        : null,
    });
  }
}
