import { ConflictException, ForbiddenException, Injectable } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { cautionLines, isVibrationInputError, type UnitSystem } from '@tacet/vibration';
import { In, type Repository } from 'typeorm';
import { PURCHASER_VISIBLE_STATUSES } from '../designs/design-status.js';
import { Design } from '../designs/design.entity.js';
import { DesignsService } from '../designs/designs.service.js';
import { ReviewService } from '../review/review.service.js';
import { designFrequencies } from '../selection/selection-problem.js';
import type { User } from '../users/user.entity.js';
import { VerificationsService } from '../verifications/verifications.service.js';
import { bomCsv, bomTotals, bomXlsx, exportFileName, type BomHeading } from './bom-export.js';
import { designReportPdf } from './design-report.js';
import { dueBy, type OpenRfqDto, type PurchasingDesignDto } from './dto/rfq.dto.js';
import { RfqLine } from './rfq-line.entity.js';
import { RFQ_STATUSES, type RfqStatus } from './rfq-status.js';
import { Rfq } from './rfq.entity.js';

export const EXPORT_MESSAGES = {
  releasedOnly:
    'The bill of materials of an unreleased design goes only to its author, an admin, and engineers while the design is in check',
  chooseFirst: 'Choose mounts before exporting the bill of materials',
  draftReport: 'Reports of unreleased designs are for engineers and admins',
} as const;

export interface ExportFile {
  fileName: string;
  contentType: string;
  content: Buffer;
}

/** The caution lines of a design's files (the seismic one when it asks for a restraint check). */
const designCautions = (design: Pick<Design, 'input'>) => cautionLines('design', { restraint: !!design.input.restraint });

const isReleased = (design: Pick<Design, 'status'>) => PURCHASER_VISIBLE_STATUSES.includes(design.status);

/** Bills of materials, calculation reports and the purchasing queue of released designs. */
@Injectable()
export class PurchasingService {
  constructor(
    @InjectRepository(Design) private readonly designRepo: Repository<Design>,
    @InjectRepository(Rfq) private readonly rfqs: Repository<Rfq>,
    @InjectRepository(RfqLine) private readonly rfqLines: Repository<RfqLine>,
    private readonly designs: DesignsService,
    private readonly review: ReviewService,
    private readonly verifications: VerificationsService,
  ) {}

  async bomCsv(user: User, id: number): Promise<ExportFile> {
    const { design, heading } = await this.exportable(user, id);
    return {
      fileName: exportFileName(heading, 'bom.csv'),
      contentType: 'text/csv; charset=utf-8',
      content: Buffer.from(bomCsv(design.bom ?? [], heading.draft, designCautions(design)), 'utf8'),
    };
  }

  async bomXlsx(user: User, id: number): Promise<ExportFile> {
    const { design, heading } = await this.exportable(user, id);
    return {
      fileName: exportFileName(heading, 'bom.xlsx'),
      contentType: 'application/vnd.openxmlformats-officedocument.spreadsheetml.sheet',
      content: await bomXlsx(design.bom ?? [], { ...heading, cautions: designCautions(design) }),
    };
  }

  /** Any role that reads the design; unreleased ones only for engineers and admins (watermarked). */
  async report(user: User, id: number): Promise<ExportFile> {
    const design = await this.designs.getVisible(user, id);
    if (!isReleased(design) && user.role !== 'engineer' && user.role !== 'admin') throw new ForbiddenException(EXPORT_MESSAGES.draftReport);
    return {
      fileName: exportFileName(headingOf(design), 'report.pdf'),
      contentType: 'application/pdf',
      content: await this.reportOf(design, true, undefined, user.unitSystem),
    };
  }

  /**
   * The PDF of a design already loaded with its project and people. `forSupplier`: the copy sent
   * with a request for quotation, without our prices. `units`: the reader's unit system (the sender's for a supplier's copy).
   */
  async reportOf(design: Design, compress = true, forSupplier?: { machineCount: number }, units: UnitSystem = 'SI'): Promise<Buffer> {
    const release = isReleased(design) ? await this.review.releaseOf(design.id) : null;
    const verifications = await this.verifications.listOf(design.id);
    return designReportPdf(design, {
      disturbingFrequencies: frequenciesOrNone(design),
      releasedAt: release?.at ?? null,
      releaseNotes: release?.notes ?? null,
      verifications,
      compress,
      prices: !forSupplier,
      machineCount: forSupplier?.machineCount,
      units,
    });
  }

  /** Released designs (status released), newest release first, with their RFQ counts. */
  async queue(): Promise<PurchasingDesignDto[]> {
    const designs = await this.designRepo.find({ where: { status: 'released' }, relations: { project: true } });
    const ids = designs.map((design) => design.id);
    const releasedAt = await this.review.releasedAt(ids);
    const counts = await this.rfqCounts(ids);
    const open = await this.openRequests(ids);
    const items = designs.map((design): PurchasingDesignDto => {
      const lines = design.bom ?? [];
      const totals = bomTotals(lines);
      const at = releasedAt.get(design.id) ?? design.updatedAt;
      return {
        designId: design.id,
        projectId: design.projectId,
        projectName: design.project.name,
        name: design.name,
        revision: design.revision,
        status: design.status,
        releasedAt: at.toISOString(),
        lineCount: lines.length,
        total: totals.length === 1 ? totals[0].amount : totals.length === 0 ? 0 : null,
        currency: totals.length === 1 ? totals[0].currency : null,
        rfqs: counts.get(design.id) ?? emptyCounts(),
        openRequests: open.get(design.id) ?? [],
      };
    });
    return items.sort((a, b) => (b.releasedAt ?? '').localeCompare(a.releasedAt ?? '') || b.designId - a.designId);
  }

  /**
   * Who may export a BOM: released and superseded designs for every role the route admits;
   * a draft only for its author or an admin, a design in check also for any engineer (its
   * checker) — marked DRAFT.
   */
  private async exportable(user: User, id: number): Promise<{ design: Design; heading: BomHeading }> {
    const design = await this.designs.getVisible(user, id);
    if (!isReleased(design) && !mayExportUnreleased(user, design)) throw new ConflictException(EXPORT_MESSAGES.releasedOnly);
    if (!design.bom?.length) throw new ConflictException(EXPORT_MESSAGES.chooseFirst);
    return { design, heading: headingOf(design) };
  }

  /** Per design: requests waiting for a quote, quoted, or ordered and not received, oldest first. */
  private async openRequests(designIds: number[]): Promise<Map<number, OpenRfqDto[]>> {
    const result = new Map<number, OpenRfqDto[]>();
    if (designIds.length === 0) return result;
    const rfqs = await this.rfqs.find({
      where: { designId: In(designIds), status: In(['requested', 'quoted', 'ordered']) },
      relations: { supplier: true },
      order: { id: 'ASC' },
    });
    const lines = rfqs.length ? await this.rfqLines.find({ where: { rfqId: In(rfqs.map((rfq) => rfq.id)) } }) : [];
    for (const rfq of rfqs) {
      const list = result.get(rfq.designId) ?? [];
      list.push({
        rfqId: rfq.id,
        supplier: { id: rfq.supplier.id, name: rfq.supplier.name },
        status: rfq.status,
        requestedAt: rfq.createdAt.toISOString(),
        quotedPrice: rfq.quotedPrice,
        quoteCurrency: rfq.quoteCurrency,
        quoteReference: rfq.quoteReference,
        quoteValidUntil: rfq.quoteValidUntil,
        dueBy: dueBy(
          rfq,
          lines.filter((line) => line.rfqId === rfq.id),
        ),
      });
      result.set(rfq.designId, list);
    }
    return result;
  }

  private async rfqCounts(designIds: number[]): Promise<Map<number, Record<RfqStatus, number>>> {
    const result = new Map<number, Record<RfqStatus, number>>();
    if (designIds.length === 0) return result;
    const rows = await this.rfqs
      .createQueryBuilder('r')
      .select('r.designId', 'designId')
      .addSelect('r.status', 'status')
      .addSelect('COUNT(*)', 'count')
      .where('r.designId IN (:...ids)', { ids: designIds })
      .groupBy('r.designId')
      .addGroupBy('r.status')
      .getRawMany<{ designId: number; status: RfqStatus; count: number | string }>();
    for (const row of rows) {
      const counts = result.get(Number(row.designId)) ?? emptyCounts();
      counts[row.status] = Number(row.count);
      result.set(Number(row.designId), counts);
    }
    return result;
  }
}

/** An unreleased design's BOM: its author, an admin, or while it is in check any engineer (who checks it). */
export function mayExportUnreleased(user: Pick<User, 'id' | 'role'>, design: Pick<Design, 'authorId' | 'status'>): boolean {
  return user.role === 'admin' || design.authorId === user.id || (design.status === 'in_review' && user.role === 'engineer');
}

export function headingOf(design: Design): BomHeading {
  return { projectName: design.project.name, designName: design.name, revision: design.revision, draft: !isReleased(design) };
}

function emptyCounts(): Record<RfqStatus, number> {
  return Object.fromEntries(RFQ_STATUSES.map((status) => [status, 0])) as Record<RfqStatus, number>;
}

function frequenciesOrNone(design: Design) {
  try {
    return designFrequencies(design.input.operating);
  } catch (error) {
    if (isVibrationInputError(error)) return [];
    throw error;
  }
}
