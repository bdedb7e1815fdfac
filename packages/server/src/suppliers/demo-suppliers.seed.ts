import { readFileSync } from 'node:fs';
import { join } from 'node:path';
import { Injectable, Logger } from '@nestjs/common';
import { parse } from 'csv-parse/sync';
import { DEMO_SUPPLIERS_FILE, demoCatalogDir } from '../catalog/demo-catalog-files.js';
import { DEMO_SEED_ORDER, DemoSeed, type DemoSeedStep } from '../demo/demo-seed-step.js';
import { SuppliersService, type SupplierSeed } from './suppliers.service.js';

/** Reads demo-suppliers.csv (`name,contact_email,phone`, a few lines). */
export function readDemoSuppliers(path: string): SupplierSeed[] {
  const rows: Array<Record<string, string>> = parse(readFileSync(path), {
    bom: true,
    columns: (header: string[]) => header.map((name) => name.trim().toLowerCase()),
    skip_empty_lines: true,
    trim: true,
  });
  return rows
    .filter((row) => row.name)
    .map((row) => ({ name: row.name, contactEmail: row.contact_email || null, phone: row.phone || null }));
}

/** Creates the invented demo suppliers (catalog/demo-suppliers.csv) that do not exist yet. */
@Injectable()
@DemoSeed({ order: DEMO_SEED_ORDER.suppliers })
export class DemoSuppliersSeed implements DemoSeedStep {
  private readonly logger = new Logger(DemoSuppliersSeed.name);

  constructor(private readonly suppliers: SuppliersService) {}

  async run(): Promise<void> {
    const created = await this.suppliers.createMissing(readDemoSuppliers(join(demoCatalogDir(), DEMO_SUPPLIERS_FILE)));
    if (created > 0) this.logger.log(`Created ${created} demo supplier(s)`);
  }
}
