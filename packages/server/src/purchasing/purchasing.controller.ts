import { Controller, Get, Param, ParseIntPipe, StreamableFile } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiForbiddenResponse, ApiOkResponse, ApiProduces, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { PurchasingDesignDto } from './dto/rfq.dto.js';
import { PurchasingService, type ExportFile } from './purchasing.service.js';

const download = (file: ExportFile) =>
  new StreamableFile(file.content, { type: file.contentType, disposition: `attachment; filename="${file.fileName}"` });

/** The purchasing queue and the design exports (BOM CSV / XLSX, PDF report). */
@ApiTags('purchasing')
@ApiBearerAuth()
@Controller()
export class PurchasingController {
  constructor(private readonly purchasing: PurchasingService) {}

  @Get('purchasing/designs')
  @Roles('purchaser', 'admin')
  @ApiOkResponse({ type: [PurchasingDesignDto], description: 'Released designs, newest release first' })
  queue(): Promise<PurchasingDesignDto[]> {
    return this.purchasing.queue();
  }

  @Get('designs/:id/bom.csv')
  @Roles('purchaser', 'engineer', 'admin')
  @ApiProduces('text/csv')
  @ApiOkResponse({
    schema: { type: 'string', format: 'binary' },
    description: 'supplier,part_number,quantity,mount_points,unit_price,extended_price,currency,lead_time_days',
  })
  @ApiConflictResponse({ description: 'Not released (only its author or an admin exports a draft, marked DRAFT)' })
  async bomCsv(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    return download(await this.purchasing.bomCsv(user, id));
  }

  @Get('designs/:id/bom.xlsx')
  @Roles('purchaser', 'engineer', 'admin')
  @ApiProduces('application/vnd.openxmlformats-officedocument.spreadsheetml.sheet')
  @ApiOkResponse({ schema: { type: 'string', format: 'binary' }, description: 'Title row, header row with units, lines, totals row' })
  @ApiConflictResponse({ description: 'Not released (only its author or an admin exports a draft, marked DRAFT)' })
  async bomXlsx(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    return download(await this.purchasing.bomXlsx(user, id));
  }

  @Get('designs/:id/report.pdf')
  @ApiProduces('application/pdf')
  @ApiOkResponse({
    schema: { type: 'string', format: 'binary' },
    description: 'Calculation report; unreleased designs carry a DRAFT watermark',
  })
  @ApiForbiddenResponse({ description: 'An unreleased design, asked for by a role other than engineer or admin' })
  async report(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<StreamableFile> {
    return download(await this.purchasing.report(user, id));
  }
}
