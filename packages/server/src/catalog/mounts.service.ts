import { BadRequestException, ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { Brackets, In, type EntityManager, type Repository, type SelectQueryBuilder } from 'typeorm';
import { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import type { FieldError } from '../common/filters/all-exceptions.filter.js';
import { isUniqueViolation } from '../database/unique-violation.js';
import { Supplier } from '../suppliers/supplier.entity.js';
import type { CreateMountDto } from './dto/create-mount.dto.js';
import { DEFAULT_MOUNT_SORT, type MountSortField, type SearchMountsQueryDto } from './dto/search-mounts-query.dto.js';
import type { UpdateMountDto } from './dto/update-mount.dto.js';
import { Mount } from './mount.entity.js';
import { MOUNT_LIMITS, crossFieldProblems, type CrossFieldRule } from './mount-rules.js';

/** Sort keys → columns; nullable columns sort their empty values last in both directions. */
const SORT_COLUMNS: Record<MountSortField, { column: string; nullable: boolean }> = {
  partNumber: { column: 'm.partNumber', nullable: false },
  supplier: { column: 's.nameKey', nullable: false },
  series: { column: 'm.series', nullable: true },
  mountType: { column: 'm.mountType', nullable: false },
  ratedLoadN: { column: 'm.ratedLoadN', nullable: false },
  verticalStiffnessNPerM: { column: 'm.verticalStiffnessNPerM', nullable: false },
  unitPrice: { column: 'm.unitPrice', nullable: true },
  leadTimeDays: { column: 'm.leadTimeDays', nullable: true },
  updatedAt: { column: 'm.updatedAt', nullable: false },
};

const CROSS_FIELD_MESSAGES: Record<CrossFieldRule, string> = {
  damping_missing: 'give dampingRatio (viscous) or lossFactor (hysteretic)',
  damping_both: 'give dampingRatio or lossFactor, not both',
  temperature_order: 'tempMinC must be below tempMaxC',
};

/** `%`, `_` and `\` match themselves in LIKE … ESCAPE '\'. */
const escapeLike = (text: string): string => text.replace(/[\\%_]/g, (c) => `\\${c}`);

const duplicatePart = (partNumber: string) => new ConflictException(`This supplier already has a mount with part number ${partNumber}`);

const validationFailed = (errors: FieldError[]) => new BadRequestException({ message: 'Validation failed', errors });

@Injectable()
export class MountsService {
  constructor(
    @InjectRepository(Mount) private readonly mounts: Repository<Mount>,
    @InjectRepository(Supplier) private readonly suppliers: Repository<Supplier>,
    private readonly revision: CatalogRevisionService,
  ) {}

  /**
   * A filtered, sorted page of the catalog and the number of matches. Two steps: the ids of the
   * page and the total (a window function over the filtered rows) come from IDX_mount_type, which
   * covers every filter; then only those rows are read.
   */
  async search(query: SearchMountsQueryDto): Promise<{ items: Mount[]; total: number }> {
    if (query.minLoadN !== undefined && query.maxLoadN !== undefined && query.minLoadN > query.maxLoadN) {
      throw validationFailed([{ field: 'maxLoadN', message: 'The highest load must not be less than the lowest load' }]);
    }
    const page = query.page ?? 1;
    const pageSize = query.pageSize ?? 50;
    const rows = await this.sorted(this.filtered(query).innerJoin('m.supplier', 's'), query.sort ?? DEFAULT_MOUNT_SORT)
      .select('m.id', 'id')
      .addSelect('COUNT(*) OVER ()', 'total')
      .limit(pageSize)
      .offset((page - 1) * pageSize)
      .getRawMany<{ id: number; total: number | string }>();
    if (rows.length === 0) {
      // An empty result, or a page past the end: count separately.
      const total = page === 1 ? 0 : await this.filtered(query).innerJoin('m.supplier', 's').getCount();
      return { items: [], total };
    }
    const ids = rows.map((row) => Number(row.id));
    const found = await this.mounts.find({ where: { id: In(ids) }, relations: { supplier: true } });
    const byId = new Map(found.map((mount) => [mount.id, mount]));
    return { items: ids.map((id) => byId.get(id) as Mount), total: Number(rows[0].total) };
  }

  private filtered(query: SearchMountsQueryDto): SelectQueryBuilder<Mount> {
    const builder = this.mounts.createQueryBuilder('m');
    if (!query.includeRetired) {
      builder.andWhere('m.active = :active', { active: true }).andWhere('s.active = :active');
    }
    if (query.type?.length) builder.andWhere('m.mountType IN (:...types)', { types: query.type });
    if (query.supplierId?.length) builder.andWhere('m.supplierId IN (:...supplierIds)', { supplierIds: query.supplierId });
    if (query.minLoadN !== undefined) builder.andWhere('m.ratedLoadN >= :minLoadN', { minLoadN: query.minLoadN });
    if (query.maxLoadN !== undefined) builder.andWhere('m.ratedLoadN <= :maxLoadN', { maxLoadN: query.maxLoadN });
    if (query.q) {
      const pattern = `%${escapeLike(query.q.toLowerCase())}%`;
      builder.andWhere(
        new Brackets((text) =>
          text
            .where("LOWER(m.partNumber) LIKE :pattern ESCAPE '\\'", { pattern })
            .orWhere("LOWER(m.series) LIKE :pattern ESCAPE '\\'")
            .orWhere("s.nameKey LIKE :pattern ESCAPE '\\'"),
        ),
      );
    }
    return builder;
  }

  private sorted(builder: SelectQueryBuilder<Mount>, sort: string): SelectQueryBuilder<Mount> {
    for (const key of sort.split(',')) {
      const descending = key.startsWith('-');
      const { column, nullable } = SORT_COLUMNS[key.replace(/^-/, '') as MountSortField];
      builder.addOrderBy(column, descending ? 'DESC' : 'ASC', nullable ? 'NULLS LAST' : undefined);
    }
    return builder.addOrderBy('m.id', 'ASC');
  }

  async findOne(id: number): Promise<Mount> {
    const mount = await this.mounts.findOne({ where: { id }, relations: { supplier: true } });
    if (!mount) throw new NotFoundException('Mount not found');
    return mount;
  }

  async create(dto: CreateMountDto): Promise<Mount> {
    const values = {
      supplierId: dto.supplierId,
      partNumber: dto.partNumber,
      series: dto.series ?? null,
      mountType: dto.mountType,
      ratedLoadN: dto.ratedLoadN,
      verticalStiffnessNPerM: dto.verticalStiffnessNPerM,
      horizontalStiffnessNPerM: dto.horizontalStiffnessNPerM ?? null,
      dynamicStiffnessRatio: dto.dynamicStiffnessRatio ?? null,
      dampingRatio: dto.dampingRatio ?? null,
      lossFactor: dto.lossFactor ?? null,
      maxDeflectionMm: dto.maxDeflectionMm ?? null,
      tempMinC: dto.tempMinC ?? null,
      tempMaxC: dto.tempMaxC ?? null,
      heightMm: dto.heightMm ?? null,
      restraintCapacityN: dto.restraintCapacityN ?? null,
      upliftCapacityN: dto.upliftCapacityN ?? null,
      unitPrice: dto.unitPrice ?? null,
      currency: dto.currency ?? MOUNT_LIMITS.defaultCurrency,
      leadTimeDays: dto.leadTimeDays ?? null,
      active: true,
    };
    this.assertConsistent(values);
    await this.assertSupplierExists(values.supplierId);
    if (await this.mounts.existsBy({ supplierId: values.supplierId, partNumber: values.partNumber })) {
      throw duplicatePart(values.partNumber);
    }
    const saved = await this.writeOrConflict(values.partNumber, () =>
      this.write((manager) => manager.save(Mount, manager.create(Mount, values))),
    );
    return this.findOne(saved.id);
  }

  async update(id: number, dto: UpdateMountDto): Promise<Mount> {
    const mount = await this.findOne(id);
    const changes: Partial<Mount> = Object.fromEntries(Object.entries(dto).filter(([, value]) => value !== undefined));
    // Setting one damping figure alone switches the damping model.
    if (typeof dto.dampingRatio === 'number' && dto.lossFactor === undefined) changes.lossFactor = null;
    if (typeof dto.lossFactor === 'number' && dto.dampingRatio === undefined) changes.dampingRatio = null;
    const next = { ...mount, ...changes };
    this.assertConsistent(next);
    if (changes.supplierId !== undefined && changes.supplierId !== mount.supplierId) {
      await this.assertSupplierExists(changes.supplierId);
    }
    if (
      (changes.supplierId !== undefined || changes.partNumber !== undefined) &&
      (next.supplierId !== mount.supplierId || next.partNumber !== mount.partNumber) &&
      (await this.mounts.existsBy({ supplierId: next.supplierId, partNumber: next.partNumber }))
    ) {
      throw duplicatePart(next.partNumber);
    }
    if (Object.keys(changes).length > 0) {
      await this.writeOrConflict(next.partNumber, () => this.write((manager) => manager.update(Mount, { id }, changes)));
    }
    return this.findOne(id);
  }

  /** DELETE retires: rows are never deleted (released designs keep their own snapshot). */
  async retire(id: number): Promise<Mount> {
    await this.findOne(id);
    await this.write((manager) => manager.update(Mount, { id }, { active: false }));
    return this.findOne(id);
  }

  /** A change to the catalog, in one transaction with the catalog revision it makes. */
  private write<T>(change: (manager: EntityManager) => Promise<T>): Promise<T> {
    return this.mounts.manager.transaction(async (manager) => {
      const result = await change(manager);
      await this.revision.bump(manager);
      return result;
    });
  }

  private assertConsistent(values: Pick<Mount, 'dampingRatio' | 'lossFactor' | 'tempMinC' | 'tempMaxC'>): void {
    const problems = crossFieldProblems(values);
    if (problems.length > 0) {
      throw validationFailed(problems.map(({ field, rule }) => ({ field, message: CROSS_FIELD_MESSAGES[rule] })));
    }
  }

  private async assertSupplierExists(supplierId: number): Promise<void> {
    if (!(await this.suppliers.existsBy({ id: supplierId }))) {
      throw validationFailed([{ field: 'supplierId', message: `Supplier number ${supplierId} does not exist` }]);
    }
  }

  private async writeOrConflict<T>(partNumber: string, write: () => Promise<T>): Promise<T> {
    try {
      return await write();
    } catch (error) {
      // Two writes of the same (supplier, part number) at once: the unique index decides.
      if (isUniqueViolation(error)) throw duplicatePart(partNumber);
      throw error;
    }
  }
}
