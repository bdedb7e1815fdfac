import { ApiProperty } from '@nestjs/swagger';
import type { Project } from '../project.entity.js';

export class UserRefDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
}

/** How many of a project's designs (that the caller may see) are in each state. */
export class DesignStatusCountsDto {
  @ApiProperty() draft: number;
  @ApiProperty({ description: 'in check' }) in_review: number;
  @ApiProperty() released: number;
  @ApiProperty() superseded: number;
}

/** A project as the API shows it. */
export class ProjectDto {
  @ApiProperty() id: number;
  @ApiProperty() name: string;
  @ApiProperty({ type: String, nullable: true }) site: string | null;
  @ApiProperty({ type: String, nullable: true }) client: string | null;
  @ApiProperty({ type: String, nullable: true }) description: string | null;
  @ApiProperty({ type: UserRefDto }) owner: UserRefDto;
  @ApiProperty() archived: boolean;
  @ApiProperty({ description: 'designs the caller may see' }) designCount: number;
  @ApiProperty({ type: DesignStatusCountsDto, description: 'the designs the caller may see, by state' })
  statusCounts: DesignStatusCountsDto;
  @ApiProperty({ type: String, format: 'date-time' }) createdAt: string;
  @ApiProperty({ type: String, format: 'date-time' }) updatedAt: string;

  static from(project: Project, statusCounts: DesignStatusCountsDto): ProjectDto {
    const designCount = Object.values(statusCounts).reduce((sum, count) => sum + count, 0);
    return Object.assign(new ProjectDto(), {
      id: project.id,
      name: project.name,
      site: project.site,
      client: project.client,
      description: project.description,
      owner: { id: project.owner.id, name: project.owner.name },
      archived: project.archived,
      designCount,
      statusCounts,
      createdAt: project.createdAt.toISOString(),
      updatedAt: project.updatedAt.toISOString(),
    });
  }
}
