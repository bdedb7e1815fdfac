import { Body, Controller, HttpCode, Post } from '@nestjs/common';
import { ApiBadRequestResponse, ApiBearerAuth, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SelectionCurvesRequestDto, SelectionRequestDto } from './dto/selection-request.dto.js';
import { SelectionCurvesResponseDto, SelectionResponseDto } from './dto/selection-response.dto.js';
import type { SelectionCurves, SelectionResult } from './selection.types.js';
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

  /** Transmissibility against speed per source of one candidate, over its stiffness band (for the chart). Nothing is stored. */
  @Post('curves')
  @HttpCode(200)
  @Roles('engineer', 'admin')
  @ApiOkResponse({
    type: SelectionCurvesResponseDto,
    description: 'Per source: speeds, frequencies, transmissibility at the nominal stiffness and both band ends',
  })
  @ApiBadRequestResponse({ description: 'Input the calculation cannot use, or a candidate not in the catalog, with the field named' })
  curves(@Body() dto: SelectionCurvesRequestDto): Promise<SelectionCurves> {
    const { mountId, seriesId, ...body } = dto;
    return this.selection.curves(body, mountId !== undefined ? { mountId } : { seriesId: seriesId as string });
  }
}
