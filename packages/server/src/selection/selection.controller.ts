import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SelectionRequestDto } from './dto/selection-request.dto.js';
import { SelectionResponseDto } from './dto/selection-response.dto.js';
import type { SelectionResult } from './selection.types.js';
import { SelectionService } from './selection.service.js';

@ApiTags('selection')
@ApiBearerAuth()
@Controller('selection')
export class SelectionController {
  constructor(private readonly selection: SelectionService) {}

  /** Stateless selection: nothing is stored. */
  @Post()
  @HttpCode(200)
  @Roles('engineer', 'admin')
  @ApiOkResponse({ type: SelectionResponseDto, description: 'Ranked candidates, passing first, each with its reasons' })
  @ApiBadRequestResponse({ description: 'Input the calculation cannot use, with the field named' })
  select(@Body() dto: SelectionRequestDto): Promise<SelectionResult> {
    return this.selection.selectStateless(dto);
  }
}
