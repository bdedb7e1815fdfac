import { ApiPropertyOptional, PartialType } from '@nestjs/swagger';
import { IsBoolean } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { CreateProjectDto } from './create-project.dto.js';

/**
 * A partial change: every field of a new project, optional; `null` clears site, client or
 * description (their own `@IsOptional()`), and is refused for name and archived
 * (`skipNullProperties: false` makes the others optional only when absent).
 */
export class UpdateProjectDto extends PartialType(CreateProjectDto, { skipNullProperties: false }) {
  @ApiPropertyOptional()
  @PresentOptional()
  @IsBoolean()
  archived?: boolean;
}
