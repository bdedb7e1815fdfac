import { BadRequestException, ConflictException, ForbiddenException, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, Not, type Repository } from 'typeorm';
import { isUniqueViolation } from '../database/unique-violation.js';
import type { DesignStatus } from '../designs/design-status.js';
import { Design } from '../designs/design.entity.js';
import { DesignsService, STALE_VERSION } from '../designs/designs.service.js';
import type { DesignDto } from '../designs/dto/design.dto.js';
import { MailService } from '../mail/mail.service.js';
import { User } from '../users/user.entity.js';
import { DesignTransition } from './design-transition.entity.js';
import { HistoryEntryDto, type TransitionDto } from './dto/transition.dto.js';
import { REVIEW_MESSAGES, checkTransition } from './review-rules.js';

/** Review and sign-off of designs: the state machine, revisions, the audit trail and notices. */
@Injectable()
export class ReviewService {
  private readonly logger = new Logger(ReviewService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(DesignTransition) private readonly transitions: Repository<DesignTransition>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly designs: DesignsService,
    private readonly mail: MailService,
  ) {}

  async transition(user: User, id: number, dto: TransitionDto): Promise<DesignDto> {
    const design = await this.designs.getVisible(user, id);
    const from = design.status;
    const to: DesignStatus = dto.to;
    const verdict = checkTransition(user, { status: from, authorId: design.authorId, hasChosen: !!design.chosen }, to, dto.comment);
    if (!verdict.ok) {
      if (verdict.kind === 'forbidden') throw new ForbiddenException(verdict.message);
      if (verdict.kind === 'bad-request') {
        throw new BadRequestException({ message: 'Validation failed', errors: [{ field: 'comment', message: verdict.message }] });
      }
      throw new ConflictException(verdict.message);
    }
    const comment = dto.comment?.trim() || null;

    // Database calls only inside the transaction (see DEVELOPERS.md, transactions on SQLite).
    await this.dataSource.transaction(async (em) => {
      const changes: Partial<Design> = { status: to };
      if (to === 'released') changes.checkerId = user.id;
      if (to === 'draft') changes.checkerId = null;
      const result = await em
        .createQueryBuilder()
        .update(Design)
        .set({ ...changes, version: () => '"version" + 1' })
        .where('id = :id AND status = :from', { id, from })
        .execute();
      if (!result.affected) throw new ConflictException(STALE_VERSION);
      if (to === 'released') {
        const older = await em.find(Design, {
          where: { projectId: design.projectId, name: design.name, status: 'released', id: Not(id) },
        });
        for (const old of older) {
          await em
            .createQueryBuilder()
            .update(Design)
            .set({ status: 'superseded', version: () => '"version" + 1' })
            .where('id = :id', { id: old.id })
            .execute();
          await em.insert(DesignTransition, {
            designId: old.id,
            userId: user.id,
            from: 'released',
            to: 'superseded',
            comment: `Superseded by revision ${design.revision}`,
          });
        }
      }
      await em.insert(DesignTransition, { designId: id, userId: user.id, from, to, comment });
    });

    await this.notify(design, to);
    return this.designs.findOne(user, id);
  }

  /** A new draft revision copying the input and the chosen mounts of a released or superseded one. */
  async startRevision(user: User, id: number): Promise<DesignDto> {
    const source = await this.designs.getVisible(user, id);
    if (source.status !== 'released' && source.status !== 'superseded') throw new ConflictException(REVIEW_MESSAGES.revisionFrom);
    const designs = this.dataSource.getRepository(Design);
    const latest = await designs.findOne({
      where: { projectId: source.projectId, name: source.name },
      order: { revision: 'DESC' },
    });
    const revision = (latest?.revision ?? source.revision) + 1;
    let newId: number;
    try {
      newId = await this.dataSource.transaction(async (em) => {
        const inserted = await em.insert(Design, {
          projectId: source.projectId,
          name: source.name,
          revision,
          status: 'draft',
          input: source.input,
          chosen: source.chosen,
          bom: source.bom,
          snapshot: source.snapshot,
          authorId: user.id,
          checkerId: null,
        });
        const createdId = Number(inserted.identifiers[0].id);
        await em.insert(DesignTransition, {
          designId: createdId,
          userId: user.id,
          from: null,
          to: 'draft',
          comment: `Revision ${revision} started from revision ${source.revision}`,
        });
        return createdId;
      });
    } catch (error) {
      if (isUniqueViolation(error)) throw new ConflictException('Someone started this revision at the same moment; reload the project');
      throw error;
    }
    return this.designs.findOne(user, newId);
  }

  async history(user: User, id: number): Promise<HistoryEntryDto[]> {
    await this.designs.getVisible(user, id);
    const entries = await this.transitions.find({ where: { designId: id }, relations: { user: true }, order: { at: 'ASC', id: 'ASC' } });
    return entries.map((entry) => HistoryEntryDto.from(entry));
  }

  /** When a design was released (the latest release entry), or null. */
  async releasedAt(designIds: number[]): Promise<Map<number, Date>> {
    if (designIds.length === 0) return new Map();
    const entries = await this.transitions.find({ where: { designId: In(designIds), to: 'released' } });
    const latest = new Map<number, Date>();
    for (const entry of entries) {
      const seen = latest.get(entry.designId);
      if (!seen || entry.at > seen) latest.set(entry.designId, entry.at);
    }
    return latest;
  }

  /** Mail to the people who act next; a failed send is logged and never undoes the transition. */
  private async notify(design: Design, to: DesignStatus): Promise<void> {
    let recipients: User[] = [];
    let subject = '';
    let text = '';
    const title = `${design.name} rev ${design.revision}`;
    if (to === 'in_review') {
      recipients = (await this.users.find({ where: { role: 'engineer', active: true } })).filter((u) => u.id !== design.authorId);
      subject = `Design ${design.name} rev ${design.revision} is ready for check`;
      text = `Design ${title} in project ${design.project.name} was sent for check by its author, ${design.author.name}.\nAn engineer other than the author checks and releases it.`;
    } else if (to === 'released') {
      recipients = await this.users.find({ where: { role: 'purchaser', active: true } });
      subject = `Design ${design.name} rev ${design.revision} is released`;
      text = `Design ${title} in project ${design.project.name} is released: its bill of materials and report are ready for purchasing.`;
    }
    for (const recipient of recipients) {
      try {
        await this.mail.send({ to: recipient.email, subject, text });
      } catch (error) {
        this.logger.warn(`Notice "${subject}" to ${recipient.email} was not sent: ${(error as Error).message}`);
      }
    }
  }
}
