import { ConflictException, Injectable, NotFoundException } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import { In, type Repository } from 'typeorm';
import { Mount } from '../catalog/mount.entity.js';
import { CatalogRevisionService } from '../catalog-revision/catalog-revision.service.js';
import { isUniqueViolation } from '../database/unique-violation.js';
import type { CreateSupplierDto } from './dto/create-supplier.dto.js';
import type { UpdateSupplierDto } from './dto/update-supplier.dto.js';
import { cleanSupplierName, supplierNameKey } from './supplier-name.js';
import { Supplier } from './supplier.entity.js';

/** A supplier with the number of its active mounts. */
export interface SupplierWithCount {
  supplier: Supplier;
  mountCount: number;
}

/** Contact details of a supplier to create when missing (demo seeding). */
export interface SupplierSeed {
  name: string;
  contactEmail: string | null;
  phone: string | null;
}

const DUPLICATE_NAME = 'A supplier with this name already exists';

@Injectable()
export class SuppliersService {
  constructor(
    @InjectRepository(Supplier) private readonly suppliers: Repository<Supplier>,
    @InjectRepository(Mount) private readonly mounts: Repository<Mount>,
    private readonly revision: CatalogRevisionService,
  ) {}

  /** Every supplier (retired ones too), sorted by name regardless of case. */
  async findAll(): Promise<SupplierWithCount[]> {
    const suppliers = await this.suppliers.find({ order: { nameKey: 'ASC' } });
    const counts = await this.mountCounts();
    return suppliers.map((supplier) => ({ supplier, mountCount: counts.get(supplier.id) ?? 0 }));
  }

  async findOne(id: number): Promise<SupplierWithCount> {
    const supplier = await this.suppliers.findOneBy({ id });
    if (!supplier) throw new NotFoundException('Supplier not found');
    return { supplier, mountCount: (await this.mountCounts([id])).get(id) ?? 0 };
  }

  async create(dto: CreateSupplierDto): Promise<SupplierWithCount> {
    const nameKey = supplierNameKey(dto.name);
    if (await this.suppliers.existsBy({ nameKey })) throw new ConflictException(DUPLICATE_NAME);
    const supplier = this.suppliers.create({
      name: cleanSupplierName(dto.name),
      nameKey,
      contactEmail: dto.contactEmail ?? null,
      phone: dto.phone ?? null,
      notes: dto.notes ?? null,
      active: true,
    });
    const saved = await this.saveOrConflict(supplier);
    return { supplier: saved, mountCount: 0 };
  }

  async update(id: number, dto: UpdateSupplierDto): Promise<SupplierWithCount> {
    const { supplier } = await this.findOne(id);
    if (dto.name !== undefined) {
      const nameKey = supplierNameKey(dto.name);
      if (nameKey !== supplier.nameKey && (await this.suppliers.existsBy({ nameKey }))) {
        throw new ConflictException(DUPLICATE_NAME);
      }
      supplier.name = cleanSupplierName(dto.name);
      supplier.nameKey = nameKey;
    }
    if (dto.contactEmail !== undefined) supplier.contactEmail = dto.contactEmail;
    if (dto.phone !== undefined) supplier.phone = dto.phone;
    if (dto.notes !== undefined) supplier.notes = dto.notes;
    if (dto.active !== undefined) supplier.active = dto.active;
    await this.saveOrConflict(supplier);
    return this.findOne(id);
  }

  /** Creates the suppliers whose names do not exist yet; returns how many were created. */
  async createMissing(seeds: readonly SupplierSeed[]): Promise<number> {
    const existing = new Set((await this.suppliers.find({ select: { nameKey: true } })).map((s) => s.nameKey));
    const missing = new Map<string, SupplierSeed>();
    for (const seed of seeds) {
      const nameKey = supplierNameKey(seed.name);
      if (nameKey && !existing.has(nameKey) && !missing.has(nameKey)) missing.set(nameKey, seed);
    }
    if (missing.size === 0) return 0;
    await this.suppliers
      .createQueryBuilder()
      .insert()
      .into(Supplier)
      .values(
        [...missing].map(([nameKey, seed]) => ({
          name: cleanSupplierName(seed.name),
          nameKey,
          contactEmail: seed.contactEmail,
          phone: seed.phone,
          notes: null,
          active: true,
        })),
      )
      .orIgnore() // another instance seeding at the same moment
      .execute();
    return missing.size;
  }

  /** Active mounts per supplier (all suppliers, or the given ones). */
  private async mountCounts(supplierIds?: number[]): Promise<Map<number, number>> {
    const builder = this.mounts
      .createQueryBuilder('m')
      .select('m.supplierId', 'supplierId')
      .addSelect('COUNT(*)', 'count')
      .where('m.active = :active', { active: true })
      .groupBy('m.supplierId');
    if (supplierIds) builder.andWhere({ supplierId: In(supplierIds) });
    const rows: Array<{ supplierId: number; count: number | string }> = await builder.getRawMany();
    return new Map(rows.map((row) => [Number(row.supplierId), Number(row.count)]));
  }

  private async saveOrConflict(supplier: Supplier): Promise<Supplier> {
    try {
      // with the catalog revision: retiring a supplier takes its mounts out of the selection
      return await this.suppliers.manager.transaction(async (manager) => {
        const saved = await manager.save(Supplier, supplier);
        await this.revision.bump(manager);
        return saved;
      });
    } catch (error) {
      if (isUniqueViolation(error)) throw new ConflictException(DUPLICATE_NAME);
      throw error;
    }
  }
}
