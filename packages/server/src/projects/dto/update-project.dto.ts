import { ApiPropertyOptional } from '@nestjs/swagger';
import { IsBoolean, IsNotEmpty, IsOptional, IsString, MaxLength } from 'class-validator';
import { PresentOptional } from '../../common/decorators/present-optional.decorator.js';
import { Trim } from '../../users/dto/dto-transforms.js';

/** A partial change; `null` clears site, client or description (name and archived cannot be cleared). */
export class UpdateProjectDto {
  @ApiPropertyOptional({ maxLength: 200 })
  @PresentOptional()
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name?: string;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 200 })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(200)
  site?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 200 })
  @IsOptional()
  @Trim()
  @IsString()
  @MaxLength(200)
  client?: string | null;

  @ApiPropertyOptional({ type: String, nullable: true, maxLength: 4000 })
  @IsOptional()
  @IsString()
  @MaxLength(4000)
  description?: string | null;

  @ApiPropertyOptional()
  @PresentOptional()
  @IsBoolean()
  archived?: boolean;
}
