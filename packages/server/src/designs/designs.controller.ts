import { Body, Controller, Get, HttpCode, Param, ParseIntPipe, Post, Put } from '@nestjs/common';
import { ApiBearerAuth, ApiConflictResponse, ApiCreatedResponse, ApiForbiddenResponse, ApiOkResponse, ApiTags } from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import { SelectionResponseDto } from '../selection/dto/selection-response.dto.js';
import type { SelectionResult } from '../selection/selection.types.js';
import type { User } from '../users/user.entity.js';
import { DesignsService } from './designs.service.js';
import { CreateDesignDto } from './dto/create-design.dto.js';
import { DesignDto, DesignListItemDto } from './dto/design.dto.js';
import { RunDesignSelectionDto } from './dto/run-design-selection.dto.js';
import { UpdateDesignDto } from './dto/update-design.dto.js';

/** Designs; the visibility rule is in projects/project-access.ts. */
@ApiTags('designs')
@ApiBearerAuth()
@Controller()
export class DesignsController {
  constructor(private readonly designs: DesignsService) {}

  @Get('projects/:id/designs')
  @ApiOkResponse({ type: [DesignListItemDto], description: 'Purchasers see released and superseded designs only' })
  list(@CurrentUser() user: User, @Param('id', ParseIntPipe) projectId: number): Promise<DesignListItemDto[]> {
    return this.designs.listForProject(user, projectId);
  }

  @Post('projects/:id/designs')
  @Roles('engineer', 'admin')
  @ApiCreatedResponse({ type: DesignDto, description: 'Revision 1, draft, version 1' })
  @ApiConflictResponse({ description: 'Archived project, or the name is taken' })
  create(@CurrentUser() user: User, @Param('id', ParseIntPipe) projectId: number, @Body() dto: CreateDesignDto): Promise<DesignDto> {
    return this.designs.create(user, projectId, dto);
  }

  @Get('designs/:id')
  @ApiOkResponse({ type: DesignDto })
  findOne(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<DesignDto> {
    return this.designs.findOne(user, id);
  }

  @Put('designs/:id')
  @Roles('engineer', 'admin')
  @ApiOkResponse({ type: DesignDto, description: 'Saved; version + 1' })
  @ApiForbiddenResponse({ description: 'Only the author or an admin edits a draft' })
  @ApiConflictResponse({ description: 'Stale version, or the design is not a draft' })
  update(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateDesignDto): Promise<DesignDto> {
    return this.designs.update(user, id, dto);
  }

  @Post('designs/:id/selection')
  @HttpCode(200)
  @Roles('engineer', 'admin')
  @ApiOkResponse({ type: SelectionResponseDto, description: 'Selection over the saved input' })
  runSelection(
    @CurrentUser() user: User,
    @Param('id', ParseIntPipe) id: number,
    @Body() dto: RunDesignSelectionDto,
  ): Promise<SelectionResult> {
    return this.designs.runSelection(user, id, dto.limit);
  }
}
