import { BadRequestException, ConflictException, Injectable, NotFoundException, UnprocessableEntityException } from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, type Repository } from 'typeorm';
import type { Design } from '../designs/design.entity.js';
import { DesignsService } from '../designs/designs.service.js';
import { MailSendError } from '../mail/mail.errors.js';
import { MailService } from '../mail/mail.service.js';
import type { BomLine } from '../selection/selection.types.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import type { User } from '../users/user.entity.js';
import { bomCsv, exportFileName } from './bom-export.js';
import { RfqDto, type CreateRfqDto, type UpdateRfqDto } from './dto/rfq.dto.js';
import { PurchasingService, headingOf } from './purchasing.service.js';
import { RfqEvent } from './rfq-event.entity.js';
import { RFQ_PROGRESS, type RfqStatus } from './rfq-status.js';
import { Rfq } from './rfq.entity.js';

export const RFQ_MESSAGES = {
  releasedOnly: 'Requests for quotation are sent for released designs only',
  noEmail: (name: string) => `Supplier ${name} has no contact e-mail`,
  notInBom: (name: string) => `Supplier ${name} has no lines in this design's bill of materials`,
  retryFailedOnly: 'Only a request whose e-mail failed is sent again',
  retryFirst: 'Send this request again before recording its progress',
  forwardOnly: (from: RfqStatus, to: RfqStatus) => `A request for quotation cannot go from ${from} to ${to}`,
  quotedPrice: 'A quote needs its price (quotedPrice)',
} as const;

/** Requests for quotation: e-mailed to a supplier with its BOM lines, then tracked to delivery. */
@Injectable()
export class RfqsService {
  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Rfq) private readonly rfqs: Repository<Rfq>,
    @InjectRepository(RfqEvent) private readonly events: Repository<RfqEvent>,
    @InjectRepository(Supplier) private readonly suppliers: Repository<Supplier>,
    private readonly designs: DesignsService,
    private readonly purchasing: PurchasingService,
    private readonly mail: MailService,
  ) {}

  /** Records the request first, then sends it: a failed send leaves it `failed` with the reason (201 either way). */
  async create(user: User, designId: number, dto: CreateRfqDto): Promise<RfqDto> {
    const design = await this.designs.getVisible(user, designId);
    if (design.status !== 'released') throw new ConflictException(RFQ_MESSAGES.releasedOnly);
    const supplier = await this.suppliers.findOneBy({ id: dto.supplierId });
    if (!supplier) throw new UnprocessableEntityException(`Supplier ${dto.supplierId} does not exist`);
    const lines = supplierLines(design, supplier.id);
    if (lines.length === 0) throw new UnprocessableEntityException(RFQ_MESSAGES.notInBom(supplier.name));
    if (!supplier.contactEmail) throw new UnprocessableEntityException(RFQ_MESSAGES.noEmail(supplier.name));

    const message = dto.message?.trim() || null;
    const rfq = await this.rfqs.save(
      this.rfqs.create({
        designId,
        supplierId: supplier.id,
        status: 'requested',
        messageId: null,
        failureReason: null,
        quotedPrice: null,
        quotedAt: null,
        createdById: user.id,
      }),
    );
    await this.deliver(rfq, design, supplier, user, message, message);
    return this.get(rfq.id);
  }

  async retry(user: User, id: number): Promise<RfqDto> {
    const rfq = await this.visible(user, id);
    if (rfq.status !== 'failed') throw new ConflictException(RFQ_MESSAGES.retryFailedOnly);
    const design = await this.designs.getVisible(user, rfq.designId);
    const supplier = await this.suppliers.findOneByOrFail({ id: rfq.supplierId });
    if (!supplier.contactEmail) throw new UnprocessableEntityException(RFQ_MESSAGES.noEmail(supplier.name));
    const first = await this.events.findOne({ where: { rfqId: id }, order: { id: 'ASC' } });
    await this.deliver(rfq, design, supplier, user, first?.note ?? null, 'Sent again');
    return this.get(id);
  }

  async listForDesign(user: User, designId: number): Promise<RfqDto[]> {
    await this.designs.getVisible(user, designId);
    const rfqs = await this.rfqs.find({ where: { designId }, order: { id: 'ASC' } });
    return Promise.all(rfqs.map((rfq) => this.get(rfq.id)));
  }

  /** Quoted, ordered, received: forward only, a quote with its price. */
  async update(user: User, id: number, dto: UpdateRfqDto): Promise<RfqDto> {
    const rfq = await this.visible(user, id);
    if (rfq.status === 'failed') throw new ConflictException(RFQ_MESSAGES.retryFirst);
    const rank = (status: RfqStatus) => (RFQ_PROGRESS as readonly RfqStatus[]).indexOf(status);
    if (rank(dto.status) <= rank(rfq.status)) throw new ConflictException(RFQ_MESSAGES.forwardOnly(rfq.status, dto.status));
    if (dto.status === 'quoted' && dto.quotedPrice === undefined) {
      throw new BadRequestException({
        message: 'Validation failed',
        errors: [{ field: 'quotedPrice', message: RFQ_MESSAGES.quotedPrice }],
      });
    }
    const changes: Partial<Rfq> = { status: dto.status };
    if (dto.quotedPrice !== undefined) changes.quotedPrice = dto.quotedPrice;
    if (dto.quotedAt) changes.quotedAt = dto.quotedAt;
    else if (dto.status === 'quoted' || (dto.quotedPrice !== undefined && !rfq.quotedAt)) changes.quotedAt = new Date();
    await this.dataSource.transaction(async (em) => {
      const result = await em
        .createQueryBuilder()
        .update(Rfq)
        .set(changes)
        .where('id = :id AND status = :from', { id, from: rfq.status })
        .execute();
      if (!result.affected) throw new ConflictException('This request was changed by someone else; reload it');
      await em.insert(RfqEvent, { rfqId: id, status: dto.status, userId: user.id, note: dto.note?.trim() || null });
    });
    return this.get(id);
  }

  /**
   * E-mails the request (outside any transaction: network I/O) and records the outcome:
   * `requested` with the Message-ID, or `failed` with the mail server's reason.
   */
  private async deliver(
    rfq: Rfq,
    design: Design,
    supplier: Supplier,
    user: User,
    message: string | null,
    note: string | null,
  ): Promise<void> {
    const heading = headingOf(design);
    const lines = supplierLines(design, supplier.id);
    const subject = `Request for quotation: ${design.name} rev ${design.revision} (${design.project.name})`;
    const text = [
      `Hello ${supplier.name},`,
      '',
      `Please quote the resilient mounts below for ${design.project.name}, design ${design.name}, revision ${design.revision}.`,
      ...(message ? ['', message] : []),
      '',
      ...lines.map((line) => `- ${line.partNumber}: ${line.quantity} pcs (mount points ${line.mountPoints.join(', ')})`),
      '',
      'The lines are attached as CSV, with the calculation report.',
      `Please reply to ${user.name} <${user.email}>, quoting reference RFQ-${rfq.id}.`,
    ].join('\n');
    let outcome: Partial<Rfq>;
    let event: { status: RfqStatus; note: string | null };
    try {
      const report = await this.purchasing.reportOf(design);
      const sent = await this.mail.send({
        to: supplier.contactEmail!,
        subject,
        text,
        attachments: [
          { filename: exportFileName(heading, 'bom.csv'), content: bomCsv(lines, false), contentType: 'text/csv' },
          { filename: exportFileName(heading, 'report.pdf'), content: report, contentType: 'application/pdf' },
        ],
      });
      outcome = { status: 'requested', messageId: sent.messageId, failureReason: null };
      event = { status: 'requested', note };
    } catch (error) {
      const reason = error instanceof MailSendError ? error.reason : (error as Error).message;
      outcome = { status: 'failed', failureReason: reason.slice(0, 2000) };
      event = { status: 'failed', note: note ?? null };
    }
    await this.dataSource.transaction(async (em) => {
      await em.update(Rfq, { id: rfq.id }, outcome);
      await em.insert(RfqEvent, { rfqId: rfq.id, status: event.status, userId: user.id, note: event.note });
    });
  }

  private async visible(user: User, id: number): Promise<Rfq> {
    const rfq = await this.rfqs.findOneBy({ id });
    if (!rfq) throw new NotFoundException('Request for quotation not found');
    await this.designs.getVisible(user, rfq.designId);
    return rfq;
  }

  private async get(id: number): Promise<RfqDto> {
    const rfq = await this.rfqs.findOneOrFail({ where: { id }, relations: { supplier: true, createdBy: true } });
    const events = await this.events.find({ where: { rfqId: id }, relations: { user: true }, order: { id: 'ASC' } });
    return RfqDto.from(rfq, events);
  }
}

function supplierLines(design: Design, supplierId: number): BomLine[] {
  return (design.bom ?? []).filter((line) => line.supplier.id === supplierId);
}
