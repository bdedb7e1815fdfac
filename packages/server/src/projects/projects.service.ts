import { ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type Repository } from 'typeorm';
import { Design } from '../designs/design.entity.js';
import { DESIGN_STATUSES, PURCHASER_VISIBLE_STATUSES, type DesignStatus } from '../designs/design-status.js';
import type { User } from '../users/user.entity.js';
import type { CreateProjectDto } from './dto/create-project.dto.js';
import { ProjectDto, type DesignStatusCountsDto } from './dto/project.dto.js';
import type { UpdateProjectDto } from './dto/update-project.dto.js';
import { canManageProject } from './project-access.js';
import { Project } from './project.entity.js';

/** The design statuses a user may see. */
export function visibleStatuses(user: Pick<User, 'role'>): readonly DesignStatus[] {
  return user.role === 'purchaser' ? PURCHASER_VISIBLE_STATUSES : DESIGN_STATUSES;
}

const noDesigns = (): DesignStatusCountsDto => ({ draft: 0, in_review: 0, released: 0, superseded: 0 });

/** '' and whitespace-only become null. */
const optionalText = (value: string | null | undefined): string | null | undefined =>
  value === undefined ? undefined : value === null ? null : value.trim() || null;

@Injectable()
export class ProjectsService {
  constructor(
    @InjectRepository(Project) private readonly projects: Repository<Project>,
    @InjectRepository(Design) private readonly designs: Repository<Design>,
  ) {}

  /** Every project, open ones first, then by name. */
  async findAll(user: User): Promise<ProjectDto[]> {
    const projects = await this.projects.find({ relations: { owner: true }, order: { archived: 'ASC', name: 'ASC', id: 'ASC' } });
    const counts = await this.designCounts(
      user,
      projects.map((p) => p.id),
    );
    return projects.map((project) => ProjectDto.from(project, counts.get(project.id) ?? noDesigns()));
  }

  /** The project entity (404 when it does not exist). */
  async get(id: number): Promise<Project> {
    const project = await this.projects.findOne({ where: { id }, relations: { owner: true } });
    if (!project) throw new NotFoundException('Project not found');
    return project;
  }

  async findOne(user: User, id: number): Promise<ProjectDto> {
    const project = await this.get(id);
    const counts = await this.designCounts(user, [id]);
    return ProjectDto.from(project, counts.get(id) ?? noDesigns());
  }

  async create(user: User, dto: CreateProjectDto): Promise<ProjectDto> {
    const saved = await this.projects.save(
      this.projects.create({
        name: dto.name,
        site: optionalText(dto.site) ?? null,
        client: optionalText(dto.client) ?? null,
        description: optionalText(dto.description) ?? null,
        ownerId: user.id,
        archived: false,
      }),
    );
    return this.findOne(user, saved.id);
  }

  async update(user: User, id: number, dto: UpdateProjectDto): Promise<ProjectDto> {
    const project = await this.get(id);
    this.assertCanManage(user, project);
    const changes: Partial<Project> = {};
    if (dto.name !== undefined) changes.name = dto.name;
    for (const key of ['site', 'client', 'description'] as const) {
      const value = optionalText(dto[key]);
      if (value !== undefined) changes[key] = value;
    }
    if (dto.archived !== undefined) changes.archived = dto.archived;
    if (Object.keys(changes).length > 0) await this.projects.update({ id }, changes);
    return this.findOne(user, id);
  }

  /** Deletes a project and its designs, unless one of them was ever released. */
  async remove(user: User, id: number): Promise<void> {
    const project = await this.get(id);
    this.assertCanManage(user, project);
    await this.projects.manager.transaction(async (manager) => {
      const signedOff = await manager.countBy(Design, { projectId: id, status: In(['released', 'superseded']) });
      if (signedOff > 0) {
        throw new ConflictException('A project with a released design cannot be deleted; archive it instead');
      }
      await manager.delete(Design, { projectId: id });
      await manager.delete(Project, { id });
    });
  }

  assertCanManage(user: User, project: Project): void {
    if (!canManageProject(user, project)) {
      throw new ForbiddenException('Only the owner of this project or an admin can change it');
    }
  }

  private async designCounts(user: User, projectIds: number[]): Promise<Map<number, DesignStatusCountsDto>> {
    const counts = new Map<number, DesignStatusCountsDto>();
    if (projectIds.length === 0) return counts;
    const rows = await this.designs
      .createQueryBuilder('d')
      .select('d.projectId', 'projectId')
      .addSelect('d.status', 'status')
      .addSelect('COUNT(*)', 'count')
      .where('d.projectId IN (:...projectIds)', { projectIds })
      .andWhere('d.status IN (:...statuses)', { statuses: visibleStatuses(user) })
      .groupBy('d.projectId')
      .addGroupBy('d.status')
      .getRawMany<{ projectId: number; status: DesignStatus; count: number | string }>();
    for (const row of rows) {
      const entry = counts.get(Number(row.projectId)) ?? noDesigns();
      entry[row.status] = Number(row.count);
      counts.set(Number(row.projectId), entry);
    }
    return counts;
  }
}
