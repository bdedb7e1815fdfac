import {
  BadRequestException,
  ConflictException,
  Injectable,
  Logger,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { InjectDataSource, InjectRepository } from '@nestjs/typeorm';
import { DataSource, type Repository } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { publicLinks } from '../config/public-links.js';
import type { Design } from '../designs/design.entity.js';
import { DesignsService } from '../designs/designs.service.js';
import { MailSendError } from '../mail/mail.errors.js';
import { MailService, type MailAttachment, type OutgoingMail } from '../mail/mail.service.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import type { User } from '../users/user.entity.js';
import { exportFileName, quoteBomCsv, quoteBomXlsx, type QuoteLine } from './bom-export.js';
import { RfqDto, RfqLineDto, type CreateRfqDto, type RfqPreviewDto, type UpdateRfqDto } from './dto/rfq.dto.js';
import { PurchasingService, headingOf } from './purchasing.service.js';
import { RfqEvent } from './rfq-event.entity.js';
import { RfqLine } from './rfq-line.entity.js';
import { RFQ_PROGRESS, type RfqStatus } from './rfq-status.js';
import { Rfq } from './rfq.entity.js';
import { rfqCopyNotice, rfqNotice } from './rfq-mail.js';

export const RFQ_MESSAGES = {
  releasedOnly: 'Requests for quotation are sent for released designs only',
  noEmail: (name: string) => `Supplier ${name} has no contact e-mail`,
  notInBom: (name: string) => `Supplier ${name} has no lines in this design's bill of materials`,
  retryFailedOnly: 'Only a request whose e-mail failed is sent again',
  retryFirst: 'Send this request again before recording its progress',
  forwardOnly: (from: RfqStatus, to: RfqStatus) => `A request for quotation cannot go from ${from} to ${to}`,
  quoteLines: 'A quote needs a unit price for every line of the request',
  unknownLine: (id: number) => `Line ${id} is not a line of this request`,
  quoteOnly: 'Unit prices, the reference, the validity date and the currency go with recording a quote',
} as const;

const badRequest = (field: string, message: string) => new BadRequestException({ message, errors: [{ field, message }] });
const toCents = (value: number) => Math.round(value * 100) / 100;

/** Everything one request for quotation sends, built before anything is recorded or sent. */
interface RfqPack {
  design: Design;
  supplier: Supplier;
  machineCount: number;
  lines: QuoteLine[];
  mail: OutgoingMail;
}

/** Requests for quotation: e-mailed to a supplier with its BOM lines (no prices of ours), then tracked to delivery. */
@Injectable()
export class RfqsService {
  private readonly logger = new Logger(RfqsService.name);

  constructor(
    @InjectDataSource() private readonly dataSource: DataSource,
    @InjectRepository(Rfq) private readonly rfqs: Repository<Rfq>,
    @InjectRepository(RfqEvent) private readonly events: Repository<RfqEvent>,
    @InjectRepository(RfqLine) private readonly lines: Repository<RfqLine>,
    @InjectRepository(Supplier) private readonly suppliers: Repository<Supplier>,
    private readonly designs: DesignsService,
    private readonly purchasing: PurchasingService,
    private readonly mail: MailService,
    private readonly config: AppConfig,
  ) {}

  /** What `create` would send, for the purchaser to confirm: recipient, text, lines and attachments. Nothing is recorded. */
  async preview(user: User, designId: number, dto: CreateRfqDto): Promise<RfqPreviewDto> {
    const pack = await this.pack(user, designId, dto, null);
    return {
      supplier: { id: pack.supplier.id, name: pack.supplier.name },
      to: pack.supplier.contactEmail!,
      replyTo: user.email,
      subject: pack.mail.subject,
      text: pack.mail.text,
      machineCount: pack.machineCount,
      lines: pack.lines.map((line) =>
        Object.assign(new RfqLineDto(), { id: 0, ...line, mountPoints: [...line.mountPoints], unitPrice: null, leadTimeDays: null }),
      ),
      attachments: (pack.mail.attachments ?? []).map((a) => ({
        filename: a.filename,
        contentType: a.contentType,
        size: Buffer.byteLength(a.content),
      })),
    };
  }

  /** Records the request and its lines first, then sends it: a failed send leaves it `failed` with the reason (201 either way). */
  async create(user: User, designId: number, dto: CreateRfqDto): Promise<RfqDto> {
    const draft = await this.pack(user, designId, dto, null);
    const rfqId = await this.dataSource.transaction(async (em) => {
      const inserted = await em.insert(Rfq, {
        designId,
        supplierId: draft.supplier.id,
        status: 'requested',
        machineCount: draft.machineCount,
        messageId: null,
        failureReason: null,
        quotedPrice: null,
        quotedAt: null,
        createdById: user.id,
      });
      const id = Number(inserted.identifiers[0].id);
      await em.insert(
        RfqLine,
        draft.lines.map((line, position) => ({
          rfqId: id,
          position,
          partNumber: line.partNumber,
          quantityPerMachine: line.quantityPerMachine,
          quantity: line.quantity,
          mountPoints: [...line.mountPoints],
          unitPrice: null,
          leadTimeDays: null,
        })),
      );
      return id;
    });
    const pack = await this.pack(user, designId, dto, rfqId);
    await this.deliver(rfqId, pack, user, dto.message?.trim() || null);
    return this.get(rfqId);
  }

  async retry(user: User, id: number): Promise<RfqDto> {
    const rfq = await this.visible(user, id);
    if (rfq.status !== 'failed') throw new ConflictException(RFQ_MESSAGES.retryFailedOnly);
    const first = await this.events.findOne({ where: { rfqId: id }, order: { id: 'ASC' } });
    const message = first?.note ?? undefined;
    const pack = await this.pack(user, rfq.designId, { supplierId: rfq.supplierId, message, machineCount: rfq.machineCount }, id);
    await this.deliver(id, pack, user, 'Sent again');
    return this.get(id);
  }

  async listForDesign(user: User, designId: number): Promise<RfqDto[]> {
    await this.designs.getVisible(user, designId);
    const rfqs = await this.rfqs.find({ where: { designId }, order: { id: 'ASC' } });
    return Promise.all(rfqs.map((rfq) => this.get(rfq.id)));
  }

  /** Quoted (every line's unit price, with reference and validity), ordered, received: forward only. */
  async update(user: User, id: number, dto: UpdateRfqDto): Promise<RfqDto> {
    const { rfq, design } = await this.visibleWithDesign(user, id);
    if (rfq.status === 'failed') throw new ConflictException(RFQ_MESSAGES.retryFirst);
    const rank = (status: RfqStatus) => (RFQ_PROGRESS as readonly RfqStatus[]).indexOf(status);
    if (rank(dto.status) <= rank(rfq.status)) throw new ConflictException(RFQ_MESSAGES.forwardOnly(rfq.status, dto.status));
    const quoteFields = (['lines', 'reference', 'validUntil', 'currency'] as const).filter((field) => dto[field] !== undefined);
    if (dto.status !== 'quoted' && quoteFields.length) throw badRequest(quoteFields[0], RFQ_MESSAGES.quoteOnly);

    const changes: Partial<Rfq> = { status: dto.status };
    const lines = await this.lines.find({ where: { rfqId: id }, order: { position: 'ASC' } });
    const quoted = new Map<number, { unitPrice: number; leadTimeDays: number | null }>();
    if (dto.status === 'quoted') {
      for (const line of dto.lines ?? []) {
        if (!lines.some((own) => own.id === line.lineId)) throw badRequest('lines', RFQ_MESSAGES.unknownLine(line.lineId));
        quoted.set(line.lineId, { unitPrice: line.unitPrice, leadTimeDays: line.leadTimeDays ?? null });
      }
      if (lines.some((line) => !quoted.has(line.id))) throw badRequest('lines', RFQ_MESSAGES.quoteLines);
      changes.quotedPrice = toCents(lines.reduce((sum, line) => sum + quoted.get(line.id)!.unitPrice * line.quantity, 0));
      changes.quoteReference = dto.reference?.trim() || null;
      changes.quoteValidUntil = dto.validUntil ?? null;
      changes.quoteCurrency = dto.currency ?? design.bom?.find((line) => line.supplier.id === rfq.supplierId)?.currency ?? 'USD';
      changes.quotedAt = dto.quotedAt ?? new Date();
    }
    if (dto.status === 'ordered') changes.orderedAt = new Date();
    await this.dataSource.transaction(async (em) => {
      const result = await em
        .createQueryBuilder()
        .update(Rfq)
        .set(changes)
        .where('id = :id AND status = :from', { id, from: rfq.status })
        .execute();
      if (!result.affected) throw new ConflictException('This request was changed by someone else; reload it');
      for (const [lineId, quote] of quoted) await em.update(RfqLine, { id: lineId, rfqId: id }, quote);
      await em.insert(RfqEvent, { rfqId: id, status: dto.status, userId: user.id, note: dto.note?.trim() || null });
    });
    return this.get(id);
  }

  /**
   * The request as it goes out: the supplier's lines of the BOM for `machineCount` machines, the
   * e-mail, and the attachments — a BOM for quoting (CSV and XLSX) and the report, all without
   * our prices. `rfqId` null: not recorded yet (a preview).
   */
  private async pack(user: User, designId: number, dto: CreateRfqDto, rfqId: number | null): Promise<RfqPack> {
    const design = await this.designs.getVisible(user, designId);
    if (design.status !== 'released') throw new ConflictException(RFQ_MESSAGES.releasedOnly);
    const supplier = await this.suppliers.findOneBy({ id: dto.supplierId });
    if (!supplier) throw new UnprocessableEntityException(`Supplier ${dto.supplierId} does not exist`);
    const machineCount = dto.machineCount ?? 1;
    const lines: QuoteLine[] = (design.bom ?? [])
      .filter((line) => line.supplier.id === supplier.id)
      .map((line) => ({
        supplierName: supplier.name,
        partNumber: line.partNumber,
        quantityPerMachine: line.quantity,
        quantity: line.quantity * machineCount,
        mountPoints: line.mountPoints,
      }));
    if (lines.length === 0) throw new UnprocessableEntityException(RFQ_MESSAGES.notInBom(supplier.name));
    if (!supplier.contactEmail) throw new UnprocessableEntityException(RFQ_MESSAGES.noEmail(supplier.name));
    const heading = { ...headingOf(design), draft: false };
    const notice = rfqNotice({
      supplier: supplier.name,
      design: { name: design.name, revision: design.revision, projectName: design.project.name },
      message: dto.message?.trim() || null,
      machineCount,
      lines,
      reference: rfqId === null ? null : `RFQ-${rfqId}`,
      sender: { name: user.name, email: user.email },
    });
    const attachments: MailAttachment[] = [
      { filename: exportFileName(heading, 'quote-list.csv'), content: quoteBomCsv(lines, machineCount), contentType: 'text/csv' },
      {
        filename: exportFileName(heading, 'quote-list.xlsx'),
        content: await quoteBomXlsx(lines, heading, machineCount),
        contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      },
      {
        filename: exportFileName(heading, 'report.pdf'),
        content: await this.purchasing.reportOf(design, true, { machineCount }, user.unitSystem),
        contentType: 'application/pdf',
      },
    ];
    return {
      design,
      supplier,
      machineCount,
      lines,
      mail: { to: supplier.contactEmail, replyTo: user.email, subject: notice.subject, text: notice.text, attachments },
    };
  }

  /**
   * E-mails the request (outside any transaction: network I/O) and records the outcome:
   * `requested` with the Message-ID, or `failed` with the mail server's reason. Once sent, the
   * sender gets a copy with a link to the design's purchasing page.
   */
  private async deliver(rfqId: number, pack: RfqPack, user: User, note: string | null): Promise<void> {
    let outcome: Partial<Rfq>;
    let status: RfqStatus;
    try {
      const sent = await this.mail.send(pack.mail);
      outcome = { status: 'requested', messageId: sent.messageId, failureReason: null };
      status = 'requested';
    } catch (error) {
      const reason = error instanceof MailSendError ? error.reason : (error as Error).message;
      outcome = { status: 'failed', failureReason: reason.slice(0, 2000) };
      status = 'failed';
    }
    await this.dataSource.transaction(async (em) => {
      await em.update(Rfq, { id: rfqId }, outcome);
      await em.insert(RfqEvent, { rfqId, status, userId: user.id, note });
    });
    if (status !== 'requested') return;
    const copy = rfqCopyNotice({
      recipient: user.name,
      supplier: pack.supplier.name,
      to: pack.supplier.contactEmail!,
      reference: `RFQ-${rfqId}`,
      sentText: pack.mail.text,
      attachments: (pack.mail.attachments ?? []).map((a) => a.filename),
      link: publicLinks(this.config).purchasing(pack.design.id),
    });
    try {
      await this.mail.send({ to: user.email, subject: copy.subject, text: copy.text });
    } catch (error) {
      this.logger.warn(`The copy of RFQ-${rfqId} to ${user.email} was not sent: ${(error as Error).message}`);
    }
  }

  private async visible(user: User, id: number): Promise<Rfq> {
    return (await this.visibleWithDesign(user, id)).rfq;
  }

  private async visibleWithDesign(user: User, id: number): Promise<{ rfq: Rfq; design: Design }> {
    const rfq = await this.rfqs.findOneBy({ id });
    if (!rfq) throw new NotFoundException('Request for quotation not found');
    return { rfq, design: await this.designs.getVisible(user, rfq.designId) };
  }

  private async get(id: number): Promise<RfqDto> {
    const rfq = await this.rfqs.findOneOrFail({ where: { id }, relations: { supplier: true, createdBy: true } });
    const events = await this.events.find({ where: { rfqId: id }, relations: { user: true }, order: { id: 'ASC' } });
    const lines = await this.lines.find({ where: { rfqId: id }, order: { position: 'ASC' } });
    return RfqDto.from(rfq, events, lines);
  }
}
