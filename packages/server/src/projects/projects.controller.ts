import { Body, Controller, Delete, Get, HttpCode, Param, ParseIntPipe, Patch, Post } from '@nestjs/common';
import {
  ApiBearerAuth,
  ApiConflictResponse,
  ApiCreatedResponse,
  ApiForbiddenResponse,
  ApiNoContentResponse,
  ApiOkResponse,
  ApiTags,
} from '@nestjs/swagger';
import { CurrentUser } from '../common/decorators/current-user.decorator.js';
import { Roles } from '../common/decorators/roles.decorator.js';
import type { User } from '../users/user.entity.js';
import { CreateProjectDto } from './dto/create-project.dto.js';
import { ProjectDto } from './dto/project.dto.js';
import { UpdateProjectDto } from './dto/update-project.dto.js';
import { ProjectsService } from './projects.service.js';

/** Projects; the visibility rule is in project-access.ts. */
@ApiTags('projects')
@ApiBearerAuth()
@Controller('projects')
export class ProjectsController {
  constructor(private readonly projects: ProjectsService) {}

  @Get()
  @ApiOkResponse({ type: [ProjectDto], description: 'Every project, open ones first, then by name' })
  findAll(@CurrentUser() user: User): Promise<ProjectDto[]> {
    return this.projects.findAll(user);
  }

  @Post()
  @Roles('engineer', 'admin')
  @ApiCreatedResponse({ type: ProjectDto })
  create(@CurrentUser() user: User, @Body() dto: CreateProjectDto): Promise<ProjectDto> {
    return this.projects.create(user, dto);
  }

  @Get(':id')
  @ApiOkResponse({ type: ProjectDto })
  findOne(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<ProjectDto> {
    return this.projects.findOne(user, id);
  }

  @Patch(':id')
  @Roles('engineer', 'admin')
  @ApiOkResponse({ type: ProjectDto })
  @ApiForbiddenResponse({ description: 'Only the owner or an admin changes a project' })
  update(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number, @Body() dto: UpdateProjectDto): Promise<ProjectDto> {
    return this.projects.update(user, id, dto);
  }

  @Delete(':id')
  @HttpCode(204)
  @Roles('engineer', 'admin')
  @ApiNoContentResponse({ description: 'Deleted with its designs' })
  @ApiConflictResponse({ description: 'The project holds a released design' })
  async remove(@CurrentUser() user: User, @Param('id', ParseIntPipe) id: number): Promise<void> {
    await this.projects.remove(user, id);
  }
}
