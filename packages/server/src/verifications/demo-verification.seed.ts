import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { demoCatalogDir } from '../catalog/demo-catalog-files.js';
import { DEMO_SEED_ORDER, DemoSeed, type DemoSeedStep } from '../demo/demo-seed-step.js';
import { Design } from '../designs/design.entity.js';
import { DEMO_PROJECT } from '../designs/demo-designs.seed.js';
import { Project } from '../projects/project.entity.js';
import { User } from '../users/user.entity.js';
import { Verification } from './verification.entity.js';
import { VerificationsService } from './verifications.service.js';

/** The invented tap-test record of the demo's released design (made by tools/tap-test/make-demo-tap-test.ts). */
export const DEMO_TAP_TEST_FILE = 'demo-tap-test.csv';
export const DEMO_VERIFIED_DESIGN = 'CHW pump P-2 skid';

/**
 * One as-built measurement on the demo's released design, analysed like an upload by the demo
 * engineer. Idempotent: nothing is added once the design has a measurement, or while the design
 * has no chosen mounts yet (an empty catalog), or when the file is missing.
 */
@Injectable()
@DemoSeed({ order: DEMO_SEED_ORDER.verifications })
export class DemoVerificationSeed implements DemoSeedStep {
  private readonly logger = new Logger(DemoVerificationSeed.name);

  constructor(
    @InjectRepository(Project) private readonly projects: Repository<Project>,
    @InjectRepository(Design) private readonly designs: Repository<Design>,
    @InjectRepository(User) private readonly users: Repository<User>,
    @InjectRepository(Verification) private readonly verifications: Repository<Verification>,
    private readonly service: VerificationsService,
  ) {}

  async run(): Promise<void> {
    const engineer = await this.users.findOneBy({ email: 'engineer@tacet.test' });
    const project = await this.projects.findOneBy({ name: DEMO_PROJECT.name });
    if (!engineer || !project) return;
    const design = await this.designs.findOneBy({ projectId: project.id, name: DEMO_VERIFIED_DESIGN, revision: 1 });
    if (!design || !design.snapshot || (design.status !== 'released' && design.status !== 'superseded')) return;
    if (await this.verifications.existsBy({ designId: design.id })) return;
    const path = join(demoCatalogDir(), DEMO_TAP_TEST_FILE);
    if (!existsSync(path)) {
      this.logger.warn(`No demo tap-test file at ${path}; the demo design has no measurement`);
      return;
    }
    const saved = await this.service.record(design, engineer, path, {
      kind: 'impact',
      quantity: 'accelerance',
      tolerancePct: 10,
      note: 'Invented demo record: five hits on the base frame above the centre of gravity, accelerometer vertical beside the hammer point.',
      fileName: DEMO_TAP_TEST_FILE,
    });
    this.logger.log(`Recorded the demo tap test of "${design.name}" (${saved.verdict}, ${saved.deviationPct.toFixed(1)} %)`);
  }
}
