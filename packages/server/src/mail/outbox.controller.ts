import { Controller, Get, Param, ParseIntPipe, Res, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiNotFoundResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import type { Response } from 'express';
import { Roles } from '../common/decorators/roles.decorator.js';
import { OutboxMessageDto, OutboxMessageSummaryDto } from './dto/outbox-message.dto.js';
import { OUTBOX_UNAVAILABLE, OutboxService } from './outbox.service.js';

/** The mail that demo and test mode caught instead of sending (admins only). */
@ApiTags('outbox')
@ApiBearerAuth()
@Roles('admin')
@Controller('outbox')
export class OutboxController {
  constructor(private readonly outbox: OutboxService) {}

  @Get()
  @ApiOkResponse({ type: [OutboxMessageSummaryDto], description: 'The last 500 messages, newest first' })
  @ApiNotFoundResponse({ description: OUTBOX_UNAVAILABLE })
  list(): OutboxMessageSummaryDto[] {
    return this.outbox.list();
  }

  @Get(':id')
  @ApiOkResponse({ type: OutboxMessageDto })
  @ApiNotFoundResponse({ description: `No such message, or: ${OUTBOX_UNAVAILABLE}` })
  findOne(@Param('id', ParseIntPipe) id: number): OutboxMessageDto {
    return this.outbox.findOne(id);
  }

  @Get(':id/attachments/:index')
  @ApiProduces('application/octet-stream')
  @ApiOkResponse({
    schema: { type: 'string', format: 'binary' },
    description: 'The attachment (0-based index) with its own content type, as a download',
  })
  @ApiNotFoundResponse({ description: `No such message or attachment, or: ${OUTBOX_UNAVAILABLE}` })
  attachment(
    @Param('id', ParseIntPipe) id: number,
    @Param('index', ParseIntPipe) index: number,
    @Res({ passthrough: true }) response: Response,
  ): StreamableFile {
    const { filename, contentType, content } = this.outbox.attachment(id, index);
    // Express writes Content-Disposition with the RFC 6266 filename / filename* encoding.
    response.attachment(filename);
    response.setHeader('Content-Type', contentType);
    return new StreamableFile(content, { length: content.length });
  }
}
