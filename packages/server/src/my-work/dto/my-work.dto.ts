import { ApiProperty } from '@nestjs/swagger';
import { DESIGN_STATUSES, type DesignStatus } from '../../designs/design-status.js';
import { UserRefDto } from '../../projects/dto/project.dto.js';

/** One design on someone's work list. */
export class WorkItemDto {
  @ApiProperty() designId: number;
  @ApiProperty() projectId: number;
  @ApiProperty() projectName: string;
  @ApiProperty() name: string;
  @ApiProperty() revision: number;
  @ApiProperty({ enum: DESIGN_STATUSES, enumName: 'DesignStatus' }) status: DesignStatus;
  @ApiProperty({ type: String, format: 'date-time' }) updatedAt: string;
  @ApiProperty({ type: UserRefDto }) author: UserRefDto;
  @ApiProperty({ type: UserRefDto, nullable: true, description: 'In check: the engineer the author asked to check it' })
  requestedChecker: UserRefDto | null;
  @ApiProperty({
    type: String,
    nullable: true,
    description: 'The last words on it: the checker’s comment (returned), the author’s note (in check) or the release notes',
  })
  lastComment: string | null;
}

/** What the caller has to do (each list newest first). */
export class MyWorkDto {
  @ApiProperty({
    type: [WorkItemDto],
    description: 'Designs in check that the caller may release (not their own); asked of the caller first',
  })
  toCheck: WorkItemDto[];
  @ApiProperty({ type: [WorkItemDto], description: 'The caller’s designs sent back to draft with a comment' })
  returned: WorkItemDto[];
  @ApiProperty({ type: [WorkItemDto], description: 'The caller’s other drafts' })
  drafts: WorkItemDto[];
  @ApiProperty({
    type: [WorkItemDto],
    description: 'Purchasers and admins: released designs with no request for quotation yet; others: designs released in the last 30 days',
  })
  released: WorkItemDto[];
}
