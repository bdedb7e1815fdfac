import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { IsIn, IsOptional, IsString, MaxLength } from 'class-validator';
import { UserRefDto } from '../../projects/dto/project.dto.js';
import { DESIGN_STATUSES, type DesignStatus } from '../../designs/design-status.js';
import type { DesignTransition } from '../design-transition.entity.js';

export const TRANSITION_TARGETS = ['in_review', 'draft', 'released'] as const;
export type TransitionTarget = (typeof TRANSITION_TARGETS)[number];

export class TransitionDto {
  @ApiProperty({ enum: TRANSITION_TARGETS, enumName: 'TransitionTarget' })
  @IsIn(TRANSITION_TARGETS)
  to: TransitionTarget;

  @ApiPropertyOptional({ description: 'Required when a design in review goes back to draft', maxLength: 2000 })
  @IsOptional()
  @IsString()
  @MaxLength(2000)
  comment?: string;
}

export class HistoryEntryDto {
  @ApiProperty() id: number;
  @ApiProperty({ type: String, format: 'date-time' }) at: string;
  @ApiProperty({ type: UserRefDto }) user: UserRefDto;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus', nullable: true, description: 'null when the entry starts a revision' })
  from: DesignStatus | null;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus' }) to: DesignStatus;
  @ApiProperty({ type: String, nullable: true }) comment: string | null;

  static from(entry: DesignTransition): HistoryEntryDto {
    return Object.assign(new HistoryEntryDto(), {
      id: entry.id,
      at: entry.at.toISOString(),
      user: { id: entry.user.id, name: entry.user.name },
      from: entry.from,
      to: entry.to,
      comment: entry.comment,
    });
  }
}
