import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiOkResponse,
  ApiTags,
  ApiUnprocessableEntityResponse,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { CreateRfqDto, RfqDto, RfqPreviewDto, UpdateRfqDto } from './dto/rfq.dto.js';
import { RfqsService } from './rfqs.service.js';

/** Requests for quotation of released designs. */
@ApiTags('purchasing')
@ApiBearerAuth()
@Roles('purchaser', 'admin')
@Controller()
export class RfqsController {
  constructor(private readonly rfqs: RfqsService) {}

  @Post('designs/:id/rfqs/preview')
  @HttpCode(200)
  @ApiOkResponse({
    type: RfqPreviewDto,
    description: 'What would be sent (recipient, text, lines, attachments); nothing is recorded or sent',
  })
  @ApiConflictResponse({ description: 'The design is not released' })
  @ApiUnprocessableEntityResponse({ description: 'The supplier has no contact e-mail or no line in the BOM' })
  preview(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: CreateRfqDto): Promise<RfqPreviewDto> {
    return this.rfqs.preview(user, id, dto);
  }

  @Post('designs/:id/rfqs')
  @ApiCreatedResponse({ type: RfqDto, description: 'Sent (requested), or failed with failureReason; nothing is lost' })
  @ApiConflictResponse({ description: 'The design is not released' })
  @ApiUnprocessableEntityResponse({ description: 'The supplier has no contact e-mail or no line in the BOM' })
  create(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: CreateRfqDto): Promise<RfqDto> {
    return this.rfqs.create(user, id, dto);
  }

  @Get('designs/:id/rfqs')
  @ApiOkResponse({ type: [RfqDto] })
  list(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<RfqDto[]> {
    return this.rfqs.listForDesign(user, id);
  }

  @Patch('rfqs/:id')
  @ApiOkResponse({ type: RfqDto })
  @ApiConflictResponse({ description: 'Statuses move forward only (requested → quoted → ordered → received)' })
  @ApiBadRequestResponse({ description: 'A quote without a unit price for every line, or quote fields with another status' })
  update(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateRfqDto): Promise<RfqDto> {
    return this.rfqs.update(user, id, dto);
  }

  @Post('rfqs/:id/retry')
  @HttpCode(200)
  @ApiOkResponse({ type: RfqDto, description: 'Sent again: requested, or still failed with the new reason' })
  @ApiConflictResponse({ description: 'Only a failed request is sent again' })
  retry(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<RfqDto> {
    return this.rfqs.retry(user, id);
  }
}
