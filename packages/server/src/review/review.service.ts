import { BadRequestException, ConflictException, ForbiddenException, Injectable, Logger } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, In, IsNull, LessThan, Not, type EntityManager, type Repository } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { publicLinks } from '../config/public-links.js';
import { isUniqueViolation } from '../database/unique-violation.js';
import type { DesignStatus } from '../designs/design-status.js';
import { Design } from '../designs/design.entity.js';
import { DesignsService, STALE_VERSION } from '../designs/designs.service.js';
import type { DesignDto } from '../designs/dto/design.dto.js';
import { MailService } from '../mail/mail.service.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import { User } from '../users/user.entity.js';
import { DesignTransition, type SubmittedDesign } from './design-transition.entity.js';
import { HistoryEntryDto, type TransitionDto } from './dto/transition.dto.js';
import { inputChanges, type SubmissionChanges } from './input-changes.js';
import { releasedNotice, returnedNotice, sentForCheckNotice, type Notice } from './review-mail.js';
import { REVIEW_MESSAGES, canBeNamedChecker, checkTransition, misplacedFields } from './review-rules.js';

/** What a design sent for check carries: its input and the chosen mounts in words. */
export function submittedOf(design: Pick<Design, 'input' | 'chosen'>): SubmittedDesign {
  return { input: design.input, chosen: design.chosen ? `${design.chosen.label} (${design.chosen.supplier.name})` : null };
}

const badRequest = (errors: { field: string; message: string }[]) =>
  new BadRequestException({ message: errors.map((error) => error.message).join('; '), errors });

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
    private readonly config: AppConfig,
  ) {}

  async transition(user: User, id: number, dto: TransitionDto): Promise<DesignDto> {
    const design = await this.designs.getVisible(user, id);
    const from = design.status;
    const to: DesignStatus = dto.to;
    const misplaced = misplacedFields(to, dto);
    if (misplaced.length) throw badRequest(misplaced);
    const verdict = checkTransition(user, { status: from, authorId: design.authorId, hasChosen: !!design.chosen }, to, dto.comment);
    if (!verdict.ok) {
      if (verdict.kind === 'forbidden') throw new ForbiddenException(verdict.message);
      if (verdict.kind === 'bad-request') throw badRequest([{ field: 'comment', message: verdict.message }]);
      throw new ConflictException(verdict.message);
    }
    const comment = dto.comment?.trim() || null;
    const note = dto.note?.trim() || null;
    let requestedChecker: User | null = null;
    if (dto.checkerId !== undefined) {
      requestedChecker = await this.users.findOneBy({ id: dto.checkerId });
      if (!canBeNamedChecker(requestedChecker, design.authorId)) {
        throw badRequest([{ field: 'checkerId', message: REVIEW_MESSAGES.checkerNotAllowed }]);
      }
    }
    const submitted = to === 'in_review' ? submittedOf(design) : null;
    let submissionChanges: SubmissionChanges | null = null;

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
      if (submitted) submissionChanges = await this.changesSinceLastSubmission(em, design, submitted);
      await em.insert(DesignTransition, {
        designId: id,
        userId: user.id,
        from,
        to,
        comment,
        note,
        requestedCheckerId: requestedChecker?.id ?? null,
        submitted,
        changes: submissionChanges,
      });
    });

    await this.notify(design, to, { actor: user, comment, note, requestedChecker, changes: submissionChanges });
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

  /** Who may be named to check a design. */
  async checkers(user: User, id: number): Promise<{ id: number; name: string }[]> {
    const design = await this.designs.getVisible(user, id);
    const people = await this.users.find({ where: { role: In(['engineer', 'admin']), active: true }, order: { name: 'ASC', id: 'ASC' } });
    return people.filter((person) => canBeNamedChecker(person, design.authorId)).map((person) => ({ id: person.id, name: person.name }));
  }

  async history(user: User, id: number): Promise<HistoryEntryDto[]> {
    await this.designs.getVisible(user, id);
    const entries = await this.transitions.find({
      where: { designId: id },
      relations: { user: true, requestedChecker: true },
      order: { at: 'ASC', id: 'ASC' },
    });
    return entries.map((entry) => HistoryEntryDto.from(entry, user.unitSystem));
  }

  /** The latest release of a design: when, and the checker's release notes. */
  async releaseOf(designId: number): Promise<{ at: Date; notes: string | null } | null> {
    const entry = await this.transitions.findOne({ where: { designId, to: 'released' }, order: { at: 'DESC', id: 'DESC' } });
    return entry ? { at: entry.at, notes: entry.comment } : null;
  }

  /**
   * What changed since the design was last sent for check; for the first submission of a later
   * revision, since the revision before it. Null for a first submission of revision 1.
   */
  private async changesSinceLastSubmission(em: EntityManager, design: Design, now: SubmittedDesign): Promise<SubmissionChanges | null> {
    let base: SubmittedDesign | null = null;
    let sinceRevision: number | null = null;
    const last = await em.findOne(DesignTransition, {
      where: { designId: design.id, to: 'in_review', submitted: Not(IsNull()) },
      order: { at: 'DESC', id: 'DESC' },
    });
    if (last?.submitted) base = last.submitted;
    else {
      const previous = await em.findOne(Design, {
        where: { projectId: design.projectId, name: design.name, revision: LessThan(design.revision) },
        order: { revision: 'DESC' },
      });
      if (previous) {
        base = submittedOf(previous);
        sinceRevision = previous.revision;
      }
    }
    if (!base) return null;
    const ids = new Set<number>([...(base.input.criteria?.supplierIds ?? []), ...(now.input.criteria?.supplierIds ?? [])]);
    const suppliers = ids.size ? await em.find(Supplier, { where: { id: In([...ids]) } }) : [];
    const names = new Map(suppliers.map((supplier) => [supplier.id, supplier.name]));
    const items = inputChanges(base, now, { supplierName: (id) => names.get(id) ?? 'a supplier no longer in the catalog' });
    return { sinceRevision, items };
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

  /**
   * Mail to the people concerned, each in their own units and with a link to the page: the named
   * checker (or every other engineer) when sent for check; the author when returned (with the
   * comment) or released; purchasers when released. A failed send is logged and never undoes the move.
   */
  private async notify(
    design: Design,
    to: DesignStatus,
    what: { actor: User; comment: string | null; note: string | null; requestedChecker: User | null; changes: SubmissionChanges | null },
  ): Promise<void> {
    const links = publicLinks(this.config);
    const ref = { name: design.name, revision: design.revision, projectName: design.project.name };
    const notices: { to: User; notice: Notice }[] = [];
    if (to === 'in_review') {
      const recipients = what.requestedChecker
        ? [what.requestedChecker]
        : (await this.users.find({ where: { role: 'engineer', active: true } })).filter((u) => u.id !== design.authorId);
      for (const recipient of recipients) {
        notices.push({
          to: recipient,
          notice: sentForCheckNotice({
            design: ref,
            author: design.author.name,
            recipient,
            askedYou: what.requestedChecker?.id === recipient.id,
            note: what.note,
            changes: what.changes,
            link: links.design(design.id),
          }),
        });
      }
    } else if (to === 'draft') {
      if (design.author.active && design.authorId !== what.actor.id) {
        notices.push({
          to: design.author,
          notice: returnedNotice({
            design: ref,
            checker: what.actor.name,
            recipient: design.author.name,
            comment: what.comment ?? '',
            link: links.design(design.id),
          }),
        });
      }
    } else if (to === 'released') {
      const released = (recipient: User, forPurchasing: boolean) =>
        releasedNotice({
          design: ref,
          checker: what.actor.name,
          recipient: recipient.name,
          forPurchasing,
          notes: what.comment,
          link: forPurchasing ? links.purchasing(design.id) : links.design(design.id),
        });
      if (design.author.active) notices.push({ to: design.author, notice: released(design.author, false) });
      for (const purchaser of await this.users.find({ where: { role: 'purchaser', active: true } })) {
        notices.push({ to: purchaser, notice: released(purchaser, true) });
      }
    }
    for (const { to: recipient, notice } of notices) {
      try {
        await this.mail.send({ to: recipient.email, subject: notice.subject, text: notice.text });
      } catch (error) {
        this.logger.warn(`Notice "${notice.subject}" to ${recipient.email} was not sent: ${(error as Error).message}`);
      }
    }
  }
}
