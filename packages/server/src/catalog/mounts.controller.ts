import { Body, Controller, Delete, Get, Param, ParseIntPipe, Patch, Post, Query, StreamableFile } from '@nestjs/common';
import {
  ApiBadRequestResponse,
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiNotFoundResponse,
  ApiOkResponse,
  ApiProduces,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { CatalogExportService } from './catalog-export.service.js';
import { CreateMountDto } from './dto/create-mount.dto.js';
import { ExportQueryDto } from './dto/export-query.dto.js';
import { MountDto, MountPageDto } from './dto/mount.dto.js';
import { SearchMountsQueryDto } from './dto/search-mounts-query.dto.js';
import { UpdateMountDto } from './dto/update-mount.dto.js';
import { MountsService } from './mounts.service.js';

/** The mount catalog: any signed-in role reads it; catalog managers and admins change it. */
@ApiTags('catalog')
@ApiBearerAuth()
@Controller('mounts')
export class MountsController {
  constructor(
    private readonly mounts: MountsService,
    private readonly exporter: CatalogExportService,
  ) {}

  @Get()
  @ApiOkResponse({ type: MountPageDto })
  @ApiBadRequestResponse({ description: 'A query parameter is not valid (field errors)' })
  async search(@Query() query: SearchMountsQueryDto): Promise<MountPageDto> {
    const { items, total } = await this.mounts.search(query);
    return { items: items.map((mount) => MountDto.from(mount)), total };
  }

  @Get('export.csv')
  @ApiProduces('text/csv')
  @ApiOkResponse({
    schema: { type: 'string', format: 'binary' },
    description:
      "The active catalog in the import format (catalog/FORMAT.md), in the columns of `units` (default: the reader's unit system)",
  })
  @ApiBadRequestResponse({ description: '`units` is not SI, US or both' })
  export(@CurrentUser() user: User, @Query() query: ExportQueryDto): StreamableFile {
    return new StreamableFile(this.exporter.stream(query.units ?? user.unitSystem), {
      type: 'text/csv; charset=utf-8',
      disposition: `attachment; filename="${this.exporter.fileName()}"`,
    });
  }

  @Post()
  @Roles('catalog_manager', 'admin')
  @ApiCreatedResponse({ type: MountDto })
  @ApiBadRequestResponse({ description: 'Invalid fields, an unknown supplier, or not exactly one of dampingRatio and lossFactor' })
  @ApiConflictResponse({ description: 'The supplier already has a mount with this part number' })
  async create(@Body() dto: CreateMountDto): Promise<MountDto> {
    return MountDto.from(await this.mounts.create(dto));
  }

  @Get(':id')
  @ApiOkResponse({ type: MountDto })
  @ApiNotFoundResponse({ description: 'Mount not found' })
  async findOne(@Param('id', ParseIntPipe) id: number): Promise<MountDto> {
    return MountDto.from(await this.mounts.findOne(id));
  }

  @Patch(':id')
  @Roles('catalog_manager', 'admin')
  @ApiOkResponse({ type: MountDto })
  @ApiBadRequestResponse({ description: 'Invalid fields' })
  @ApiConflictResponse({ description: 'The supplier already has a mount with this part number' })
  async update(@Param('id', ParseIntPipe) id: number, @Body() dto: UpdateMountDto): Promise<MountDto> {
    return MountDto.from(await this.mounts.update(id, dto));
  }

  @Delete(':id')
  @Roles('catalog_manager', 'admin')
  @ApiOkResponse({ type: MountDto, description: 'The mount, now retired (rows are never deleted; PATCH active:true restores)' })
  async retire(@Param('id', ParseIntPipe) id: number): Promise<MountDto> {
    return MountDto.from(await this.mounts.retire(id));
  }
}
