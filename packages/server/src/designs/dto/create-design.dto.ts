import { ApiProperty, ApiPropertyOptional } from '@nestjs/swagger';
import { Type } from 'class-transformer';
import { IsNotEmpty, IsOptional, IsString, MaxLength, ValidateNested } from 'class-validator';
import { DesignInputDto } from '../../selection/dto/design-input.dto.js';
import { Trim } from '../../users/dto/dto-transforms.js';

export class CreateDesignDto {
  @ApiProperty({ example: 'CHW pump P-2 skid', maxLength: 200 })
  @Trim()
  @IsString()
  @IsNotEmpty()
  @MaxLength(200)
  name: string;

  @ApiPropertyOptional({ type: DesignInputDto, description: 'a starting template when omitted' })
  @IsOptional()
  @ValidateNested()
  @Type(() => DesignInputDto)
  input?: DesignInputDto;
}
