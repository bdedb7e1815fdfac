import { Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, Not, type Repository } from 'typeorm';
import { Design } from '../designs/design.entity.js';
import { Rfq } from '../purchasing/rfq.entity.js';
import { DesignTransition } from '../review/design-transition.entity.js';
import type { User } from '../users/user.entity.js';
import type { MyWorkDto, WorkItemDto } from './dto/my-work.dto.js';

/** How far back "recently released" reaches for roles that do not buy. */
export const RECENTLY_RELEASED_DAYS = 30;
/** Longest list of released designs. */
const RELEASED_LIMIT = 50;

const newestFirst = (a: WorkItemDto, b: WorkItemDto) => b.updatedAt.localeCompare(a.updatedAt) || b.designId - a.designId;

/**
 * Each person's work list (PRODUCT.md, "Hand-offs between people"): what waits for them to
 * check, what came back to them, their drafts, and what was released — for purchasers, what
 * still waits for a request for quotation.
 */
@Injectable()
export class MyWorkService {
  constructor(
    @InjectRepository(Design) private readonly designs: Repository<Design>,
    @InjectRepository(DesignTransition) private readonly transitions: Repository<DesignTransition>,
    @InjectRepository(Rfq) private readonly rfqs: Repository<Rfq>,
  ) {}

  async forUser(user: User, now = new Date()): Promise<MyWorkDto> {
    const designer = user.role === 'engineer' || user.role === 'admin';
    const buyer = user.role === 'purchaser' || user.role === 'admin';
    const relations = { project: true, author: true } as const;
    const [inCheck, ownDrafts, released] = await Promise.all([
      designer ? this.designs.find({ where: { status: 'in_review', authorId: Not(user.id) }, relations }) : [],
      designer ? this.designs.find({ where: { status: 'draft', authorId: user.id }, relations }) : [],
      this.designs.find({ where: { status: 'released' }, relations }),
    ]);
    const latest = await this.latestEntries([...inCheck, ...ownDrafts, ...released].map((design) => design.id));
    const item = (design: Design): WorkItemDto => {
      const entry = latest.get(design.id);
      return {
        designId: design.id,
        projectId: design.projectId,
        projectName: design.project.name,
        name: design.name,
        revision: design.revision,
        status: design.status,
        updatedAt: design.updatedAt.toISOString(),
        author: { id: design.author.id, name: design.author.name },
        requestedChecker:
          design.status === 'in_review' && entry?.requestedChecker
            ? { id: entry.requestedChecker.id, name: entry.requestedChecker.name }
            : null,
        lastComment: entry ? (entry.to === 'in_review' ? entry.note : entry.comment) : null,
      };
    };
    const wasReturned = (design: Design) => {
      const entry = latest.get(design.id);
      return entry?.from === 'in_review' && entry.to === 'draft';
    };

    const askedOfMe = (item: WorkItemDto) => Number(latest.get(item.designId)?.requestedCheckerId === user.id);
    const toCheck = inCheck.map(item).sort((a, b) => askedOfMe(b) - askedOfMe(a) || newestFirst(a, b));

    let releasedItems: Design[];
    if (buyer) {
      const asked = await this.designsWithRequests(released.map((design) => design.id));
      releasedItems = released.filter((design) => !asked.has(design.id));
    } else {
      const since = now.getTime() - RECENTLY_RELEASED_DAYS * 86_400_000;
      releasedItems = released.filter((design) => (latest.get(design.id)?.at ?? design.updatedAt).getTime() >= since);
    }

    return {
      toCheck,
      returned: ownDrafts.filter(wasReturned).map(item).sort(newestFirst),
      drafts: ownDrafts
        .filter((design) => !wasReturned(design))
        .map(item)
        .sort(newestFirst),
      released: releasedItems.map(item).sort(newestFirst).slice(0, RELEASED_LIMIT),
    };
  }

  /** The latest record entry of each design. */
  private async latestEntries(designIds: number[]): Promise<Map<number, DesignTransition>> {
    const latest = new Map<number, DesignTransition>();
    if (designIds.length === 0) return latest;
    const entries = await this.transitions.find({
      where: { designId: In(designIds) },
      relations: { requestedChecker: true },
      order: { at: 'ASC', id: 'ASC' },
    });
    for (const entry of entries) latest.set(entry.designId, entry);
    return latest;
  }

  /** Designs with a request for quotation that went out (a failed send does not count). */
  private async designsWithRequests(designIds: number[]): Promise<Set<number>> {
    if (designIds.length === 0) return new Set();
    const rows = await this.rfqs.find({ select: { designId: true }, where: { designId: In(designIds), status: Not('failed') } });
    return new Set(rows.map((row) => row.designId));
  }
}
