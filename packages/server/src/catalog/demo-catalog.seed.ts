import { join } from 'node:path';
import { Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { DEMO_SEED_ORDER, DemoSeed, type DemoSeedStep } from '../demo/demo-seed-step.js';
import { User } from '../users/user.entity.js';
import { DEMO_IMPORT_USER_EMAIL, DEMO_MOUNTS_FILE, demoCatalogDir } from './demo-catalog-files.js';
import { CatalogImportService } from './import/catalog-import.service.js';
import { Mount } from './mount.entity.js';

/**
 * Imports the invented demo catalog (catalog/demo-mounts.csv) through the import engine, as
 * the demo admin, when the catalog has no mounts yet.
 */
@Injectable()
@DemoSeed({ order: DEMO_SEED_ORDER.catalog })
export class DemoCatalogSeed implements DemoSeedStep {
  private readonly logger = new Logger(DemoCatalogSeed.name);

  constructor(
    private readonly engine: CatalogImportService,
    @InjectRepository(Mount) private readonly mounts: Repository<Mount>,
    @InjectRepository(User) private readonly users: Repository<User>,
  ) {}

  async run(): Promise<void> {
    if ((await this.mounts.count()) > 0) return;
    const admin =
      (await this.users.findOneBy({ email: DEMO_IMPORT_USER_EMAIL })) ??
      (await this.users.findOne({ where: { role: 'admin', active: true }, order: { id: 'ASC' } }));
    if (!admin) throw new Error('The demo catalog needs an admin to record its import');
    const result = await this.engine.importFile({
      filePath: join(demoCatalogDir(), DEMO_MOUNTS_FILE),
      fileName: DEMO_MOUNTS_FILE,
      userId: admin.id,
      dryRun: false,
      mode: 'all_or_nothing',
    });
    this.logger.log(`Imported ${result.created} demo mounts`);
  }
}
