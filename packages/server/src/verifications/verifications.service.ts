import { extname } from 'node:path';
import { BadRequestException, ConflictException, Injectable, Logger, UnprocessableEntityException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { isVibrationInputError } from '@tacet/vibration';
import type { Repository } from 'typeorm';
import { PURCHASER_VISIBLE_STATUSES } from '../designs/design-status.js';
import type { Design } from '../designs/design.entity.js';
import { DesignsService } from '../designs/designs.service.js';
import type { User } from '../users/user.entity.js';
import { DEFAULT_TOLERANCE_PCT, VerificationDto, type CreateVerificationDto } from './dto/verification.dto.js';
import { NoResonanceError, analyseTapTest, predictionOf } from './tap-test-analysis.js';
import { TapTestFileError, readTapTestFile, type FrfQuantity, type VerificationKind } from './tap-test-file.js';
import { Verification } from './verification.entity.js';
import { TAP_TEST_UPLOAD_FIELD } from './verification-upload.js';

/** File names accepted (the content must be UTF-8 CSV text as well). */
const CSV_EXTENSIONS = new Set(['.csv', '.txt']);

export const VERIFICATION_MESSAGES = {
  notReleased: 'Only released or superseded designs can be verified: a tap test checks what was built from a released design',
  noPrediction: 'This design holds no predicted natural frequency to compare with (no mounts were chosen)',
  quantityNeeded: 'Say what the FRF file holds: quantity accelerance, mobility or receptance',
  quantityForImpact: 'A raw record gives accelerance: leave quantity out or set it to accelerance',
} as const;

/** The part of an uploaded file the service needs (multer's `Express.Multer.File`). */
export interface UploadedTapTest {
  path: string;
  originalname: string;
}

/** What one measurement is, apart from its file. */
export interface VerificationRequest {
  kind: VerificationKind;
  quantity: FrfQuantity;
  tolerancePct: number;
  note: string | null;
  fileName: string;
}

/** As-built verification: tap-test uploads on released designs, their analysis and history. */
@Injectable()
export class VerificationsService {
  private readonly logger = new Logger(VerificationsService.name);

  constructor(
    @InjectRepository(Verification) private readonly verifications: Repository<Verification>,
    private readonly designs: DesignsService,
  ) {}

  /** Every measurement of a design the caller may see, newest first. */
  async list(user: User, designId: number): Promise<VerificationDto[]> {
    await this.designs.getVisible(user, designId);
    const rows = await this.listOf(designId);
    return rows.map((row) => VerificationDto.from(row));
  }

  /** The measurements of a design (already checked as visible), newest first — also for the report. */
  listOf(designId: number): Promise<Verification[]> {
    return this.verifications.find({ where: { designId }, relations: { user: true }, order: { createdAt: 'DESC', id: 'DESC' } });
  }

  async create(user: User, designId: number, dto: CreateVerificationDto, file: UploadedTapTest | undefined): Promise<VerificationDto> {
    const design = await this.designs.getVisible(user, designId);
    if (!PURCHASER_VISIBLE_STATUSES.includes(design.status)) throw new ConflictException(VERIFICATION_MESSAGES.notReleased);
    if (!file) throw new BadRequestException(`Attach the measurement as the multipart field "${TAP_TEST_UPLOAD_FIELD}"`);
    const fileName = (file.originalname || 'tap-test.csv').slice(0, 255);
    if (!CSV_EXTENSIONS.has(extname(fileName).toLowerCase())) {
      throw new UnprocessableEntityException({
        message: `The file must be a CSV file (.csv or .txt); ${fileName} is not`,
        errors: [{ row: 0, column: '', message: 'not a CSV file' }],
      });
    }
    if (dto.kind === 'frf' && !dto.quantity) {
      throw new BadRequestException({
        message: 'Validation failed',
        errors: [{ field: 'quantity', message: VERIFICATION_MESSAGES.quantityNeeded }],
      });
    }
    if (dto.kind === 'impact' && dto.quantity && dto.quantity !== 'accelerance') {
      throw new BadRequestException({
        message: 'Validation failed',
        errors: [{ field: 'quantity', message: VERIFICATION_MESSAGES.quantityForImpact }],
      });
    }
    const saved = await this.record(design, user, file.path, {
      kind: dto.kind,
      quantity: dto.quantity ?? 'accelerance',
      tolerancePct: dto.tolerancePct ?? DEFAULT_TOLERANCE_PCT,
      note: dto.note?.trim() || null,
      fileName,
    });
    return VerificationDto.from(saved);
  }

  /**
   * Reads, analyses and stores one measurement of a released design (the upload and the demo
   * seed). Nothing is stored when the file or the analysis fails: 422 with the problems.
   */
  async record(design: Design, user: User, path: string, request: VerificationRequest): Promise<Verification> {
    const prediction = predictionOf(design);
    if (!prediction) throw new ConflictException(VERIFICATION_MESSAGES.noPrediction);
    let outcome;
    try {
      const data = readTapTestFile(path, request.kind);
      outcome = analyseTapTest({ data, quantity: request.quantity, prediction, tolerancePct: request.tolerancePct });
    } catch (error) {
      if (error instanceof TapTestFileError) throw new UnprocessableEntityException({ message: error.message, errors: error.problems });
      if (error instanceof NoResonanceError) {
        throw new UnprocessableEntityException({ message: error.message, errors: [{ row: 0, column: '', message: error.message }] });
      }
      if (isVibrationInputError(error)) {
        const message = `The measurement cannot be analysed: ${error.message.replace(/^[^:]+: /, '')}`;
        throw new UnprocessableEntityException({ message, errors: [{ row: 0, column: '', message }] });
      }
      throw error;
    }
    const saved = await this.verifications.save(
      this.verifications.create({
        designId: design.id,
        userId: user.id,
        kind: request.kind,
        quantity: request.quantity,
        fileName: request.fileName,
        note: request.note,
        tolerancePct: request.tolerancePct,
        naturalFrequencyHz: outcome.identified.naturalFrequencyHz,
        predictedFrequencyHz: outcome.predicted.naturalFrequencyHz,
        deviationPct: outcome.deviationPct,
        verdict: outcome.verdict,
        outcome,
      }),
    );
    this.logger.log(
      `Verification #${saved.id} of design #${design.id}: ${outcome.identified.naturalFrequencyHz.toFixed(3)} Hz measured, ` +
        `${outcome.predicted.naturalFrequencyHz.toFixed(3)} Hz predicted (${outcome.verdict})`,
    );
    const found = await this.verifications.findOneOrFail({ where: { id: saved.id }, relations: { user: true } });
    return found;
  }
}
