import { BadRequestException, ConflictException, ForbiddenException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { isVibrationInputError } from '@tacet/vibration';
import { In, type Repository } from 'typeorm';
import { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import { isUniqueViolation } from '../database/unique-violation.js';
import { ProjectsService, visibleStatuses } from '../projects/projects.service.js';
import { SELECTION_LIMITS, type DesignInput } from '../selection/dto/design-input.dto.js';
import { designFrequencies } from '../selection/selection-problem.js';
import { SelectionCatalogReader } from '../selection/selection-catalog.reader.js';
import { SelectionService, type CandidateChoice } from '../selection/selection.service.js';
import type { LabelledFrequency, SelectionResult } from '../selection/selection.types.js';
import type { User } from '../users/user.entity.js';
import { buildBom } from './bom.js';
import { defaultDesignInput } from './default-design-input.js';
import { DesignSelection } from './design-selection.entity.js';
import { Design } from './design.entity.js';
import { DesignDto, DesignListItemDto, type StoredSelectionDto } from './dto/design.dto.js';
import { inputFingerprint } from './input-fingerprint.js';
import type { CreateDesignDto } from './dto/create-design.dto.js';
import type { UpdateDesignDto } from './dto/update-design.dto.js';

export const STALE_VERSION = 'This design was changed by someone else; reload it';
export const FROZEN = 'Released designs are frozen; start a new revision';
export const IN_REVIEW = 'This design is in check; it can be changed again once it is back in draft';
const DUPLICATE_NAME = 'A design with this name and revision already exists in this project';

/** A DTO instance as the plain JSON that is stored (drops undefined fields and class prototypes). */
const plain = <T>(value: T): T => JSON.parse(JSON.stringify(value)) as T;

/** The columns a design write may change. */
type DesignChanges = Partial<Pick<Design, 'name' | 'input' | 'chosen' | 'bom' | 'snapshot'>>;

/** Designs of a project: revisions of one selection, with the optimistic lock on every write. */
@Injectable()
export class DesignsService {
  constructor(
    @InjectRepository(Design) private readonly designs: Repository<Design>,
    @InjectRepository(DesignSelection) private readonly selections: Repository<DesignSelection>,
    private readonly projects: ProjectsService,
    private readonly selection: SelectionService,
    private readonly catalog: SelectionCatalogReader,
    private readonly catalogRevision: CatalogRevisionService,
  ) {}

  async listForProject(user: User, projectId: number): Promise<DesignListItemDto[]> {
    await this.projects.get(projectId);
    const designs = await this.designs.find({
      where: { projectId, status: In([...visibleStatuses(user)]) },
      relations: { author: true },
      order: { name: 'ASC', revision: 'ASC', id: 'ASC' },
    });
    return designs.map((design) => DesignListItemDto.from(design));
  }

  async create(user: User, projectId: number, dto: CreateDesignDto): Promise<DesignDto> {
    const project = await this.projects.get(projectId);
    if (project.archived) throw new ConflictException('This project is archived; restore it before adding designs');
    const input = plain(dto.input ?? defaultDesignInput());
    this.selection.assertComputable(input);
    if (await this.designs.existsBy({ projectId, name: dto.name, revision: 1 })) throw new ConflictException(DUPLICATE_NAME);
    let saved: Design;
    try {
      saved = await this.designs.save(
        this.designs.create({
          projectId,
          name: dto.name,
          revision: 1,
          status: 'draft',
          input,
          chosen: null,
          bom: null,
          snapshot: null,
          authorId: user.id,
          checkerId: null,
        }),
      );
    } catch (error) {
      if (isUniqueViolation(error)) throw new ConflictException(DUPLICATE_NAME);
      throw error;
    }
    return this.findOne(user, saved.id);
  }

  async findOne(user: User, id: number): Promise<DesignDto> {
    const design = await this.getVisible(user, id);
    return DesignDto.from(design, frequenciesOrNone(design.input), await this.lastSelection(design));
  }

  /** The last selection run on the design's current input, or null (none, or run on another input). */
  private async lastSelection(design: Design): Promise<StoredSelectionDto | null> {
    // find, not findOne: findOne's LIMIT 1 with a join makes TypeORM run two queries (the ids
    // first); designId is the key, so one query without a limit does (DEVELOPERS.md "Queries on hot paths")
    const [stored] = await this.selections.find({ where: { designId: design.id }, relations: { ranBy: true } });
    if (!stored || stored.inputFingerprint !== inputFingerprint(design.input)) return null;
    return {
      ranAt: stored.ranAt.toISOString(),
      ranBy: stored.ranBy ? { id: stored.ranBy.id, name: stored.ranBy.name } : null,
      limit: stored.candidateLimit,
      catalogChanged: stored.catalogRevision !== (await this.catalogRevision.current()),
      result: stored.result,
    };
  }

  /**
   * Changes a draft with the optimistic lock: everything is computed first, then one
   * `UPDATE … SET …, version = version + 1 WHERE id = ? AND version = ?`; no row changed means
   * someone else saved in between (409) and nothing was written.
   */
  async update(user: User, id: number, dto: UpdateDesignDto): Promise<DesignDto> {
    const design = await this.getVisible(user, id);
    if (!(user.role === 'admin' || design.authorId === user.id)) {
      throw new ForbiddenException('Only the author of this design or an admin can change it');
    }
    if (design.status === 'in_review') throw new ConflictException(IN_REVIEW);
    if (design.status !== 'draft') throw new ConflictException(FROZEN);
    if (dto.version !== design.version) throw new ConflictException(STALE_VERSION);

    const changes: DesignChanges = {};
    if (dto.name !== undefined) changes.name = dto.name;
    const input = dto.input ? plain(dto.input) : design.input;
    // the same values sent again (e.g. a save that changed only the name) are no change
    const inputChanged = dto.input !== undefined && inputFingerprint(input) !== inputFingerprint(design.input);
    if (inputChanged) {
      this.selection.assertComputable(input);
      changes.input = input;
    }
    const choice = choiceOf(dto);
    if (choice) {
      Object.assign(changes, await this.choose(input, choice));
    } else if (dto.chosenMountId === null || dto.chosenSeriesId === null || inputChanged) {
      // an explicit clear, or a changed input that makes the old choice stale
      Object.assign(changes, { chosen: null, bom: null, snapshot: null });
    }

    let affected: number | undefined;
    try {
      const result = await this.designs
        .createQueryBuilder()
        .update(Design)
        .set({ ...changes, version: () => '"version" + 1' })
        .where('id = :id AND version = :version AND status = :status', { id, version: dto.version, status: 'draft' })
        .execute();
      affected = result.affected;
    } catch (error) {
      if (isUniqueViolation(error)) throw new ConflictException(DUPLICATE_NAME);
      throw error;
    }
    if (!affected) throw new ConflictException(STALE_VERSION);
    // the last selection belongs to the old input (GET would no longer return it anyway)
    if (!inputChanged) return this.findOne(user, id);
    await this.selections.delete({ designId: id });
    const saved = await this.getVisible(user, id);
    return DesignDto.from(saved, frequenciesOrNone(saved.input), null);
  }

  /**
   * Selection over the saved input (any engineer may run it). The answer is kept with the design,
   * with the fingerprint of the input it ran on, so that the design page shows it again until the
   * input changes; the design itself (and its version) is not touched.
   */
  async runSelection(user: User, id: number, limit: number = SELECTION_LIMITS.limit.default): Promise<SelectionResult> {
    const design = await this.getVisible(user, id);
    const catalogRevision = await this.catalogRevision.current();
    const result = await this.selection.selectForDesign(design.input, limit);
    await this.selections.upsert(
      {
        designId: id,
        inputFingerprint: inputFingerprint(design.input),
        catalogRevision,
        candidateLimit: limit,
        result,
        ranById: user.id,
        ranAt: new Date(),
      },
      ['designId'],
    );
    return result;
  }

  /** The chosen candidate, its bill of materials and the snapshot of its catalog data and figures. */
  async choose(input: DesignInput, choice: CandidateChoice): Promise<Required<Pick<DesignChanges, 'chosen' | 'bom' | 'snapshot'>>> {
    const { candidate, problem, frequencies, curves } = await this.selection.evaluateChoice(input, choice);
    const mounts = await this.catalog.snapshots(candidate.perPoint.map((p) => p.mountId));
    return {
      chosen: candidate,
      bom: buildBom(candidate, mounts),
      snapshot: {
        takenAt: new Date().toISOString(),
        mounts,
        candidate,
        massProperties: { massKg: problem.massKg, weightN: problem.weightN, cg: problem.cg, inertia: problem.inertia },
        pointLoadsN: Array.from(problem.equalLoadsN),
        disturbingFrequencies: frequencies,
        criteria: input.criteria,
        operating: input.operating,
        ...(candidate.wholeMachine && curves
          ? {
              wholeMachine: {
                worst: candidate.wholeMachine.worst,
                stiffnessTolerancePct: candidate.wholeMachine.stiffnessTolerancePct,
                crossings: candidate.crossings ?? [],
                passes: candidate.passes,
                reasons: candidate.reasons,
                curves: curves.sources,
                speedRangeRpm: problem.forcing.speedRangeRpm,
                skipBandsRpm: problem.forcing.skipBandsRpm,
                requirementTransmissibility: problem.transmissibilityTarget,
                ...(candidate.passage ? { passage: candidate.passage, passageLimitMm: candidate.passageLimitMm } : {}),
              },
            }
          : {}),
      },
    };
  }

  /** The design with its project and people, or 404 (also for a purchaser and an unreleased design). */
  async getVisible(user: User, id: number): Promise<Design> {
    // one query by the primary key (findOne with relations would run two; see lastSelection)
    const [design] = await this.designs.find({ where: { id }, relations: { project: true, author: true, checker: true } });
    if (!design || !visibleStatuses(user).includes(design.status)) throw new NotFoundException('Design not found');
    return design;
  }
}

function choiceOf(dto: UpdateDesignDto): CandidateChoice | null {
  if (dto.chosenMountId !== undefined && dto.chosenMountId !== null) return { mountId: dto.chosenMountId };
  if (dto.chosenSeriesId !== undefined && dto.chosenSeriesId !== null) {
    if (!/^\d+:.+$/.test(dto.chosenSeriesId)) {
      throw new BadRequestException({
        message: 'Validation failed',
        errors: [
          { field: 'chosenSeriesId', message: 'The chosen series must be given as the supplier number, a colon and the series name' },
        ],
      });
    }
    return { seriesId: dto.chosenSeriesId };
  }
  return null;
}

/** A stored input's disturbing frequencies (an input stored before a rule changed shows none rather than failing). */
function frequenciesOrNone(input: DesignInput): LabelledFrequency[] {
  try {
    return designFrequencies(input.operating);
  } catch (error) {
    if (isVibrationInputError(error)) return [];
    throw error;
  }
}
