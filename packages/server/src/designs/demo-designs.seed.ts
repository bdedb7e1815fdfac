import { Injectable, Logger } from '@nestjs/common';
import { InjectRepository } from '@nestjs/typeorm';
import type { Repository } from 'typeorm';
import { DEMO_SEED_ORDER, DemoSeed, type DemoSeedStep } from '../demo/demo-seed-step.js';
import { Project } from '../projects/project.entity.js';
import type { DesignInput } from '../selection/dto/design-input.dto.js';
import { SelectionCatalogReader } from '../selection/selection-catalog.reader.js';
import { SelectionService, type CandidateChoice } from '../selection/selection.service.js';
import { DesignTransition } from '../review/design-transition.entity.js';
import { User } from '../users/user.entity.js';
import type { DesignStatus } from './design-status.js';
import { Design } from './design.entity.js';
import { DesignsService } from './designs.service.js';

/** The invented demo scenario: a chilled-water plant with two pump skids. */
export const DEMO_PROJECT = {
  name: 'North Loop Chilled Water Plant',
  site: 'Harbour Street Energy Centre',
  client: 'Brellowin Utilities Cooperative',
  description: 'Invented demo project: end-suction chilled-water pumps on steel base frames, isolated from a plant-room slab.',
} as const;

const CORNERS = [
  { label: 'A', x: 0.8, y: 0.45, z: 0 },
  { label: 'B', x: 0.8, y: -0.45, z: 0 },
  { label: 'C', x: -0.8, y: 0.45, z: 0 },
  { label: 'D', x: -0.8, y: -0.45, z: 0 },
];

/** Pump 300 kg, motor 450 kg, base frame 250 kg: the skid of docs/engineering/check-values.md CV-14. */
export const DEMO_P2_INPUT: DesignInput = {
  components: [
    { name: 'End-suction pump', massKg: 300, cg: { x: 0.65, y: 0.05, z: 0.5 } },
    { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
    { name: 'Steel base frame', massKg: 250, cg: { x: 0, y: 0, z: 0.1 } },
  ],
  mountPoints: CORNERS,
  operating: { speedRpm: 1480, orders: [1, 2], vaneCount: 6, lineFrequencyHz: 50 },
  criteria: { minIsolationPct: 90, minUtilization: 0.5, maxUtilization: 1.0 },
};

/** The same kind of skid with a larger impeller and casing (invented figures). */
export const DEMO_P3_INPUT: DesignInput = {
  ...DEMO_P2_INPUT,
  components: [
    { name: 'End-suction pump', massKg: 360, cg: { x: 0.66, y: 0.05, z: 0.52 } },
    { name: 'Motor', massKg: 450, cg: { x: -0.3, y: 0, z: 0.45 } },
    { name: 'Steel base frame', massKg: 260, cg: { x: 0, y: 0, z: 0.1 } },
  ],
};

interface DemoDesign {
  name: string;
  input: DesignInput;
  status: DesignStatus;
  withChecker: boolean;
}

const DEMO_DESIGNS: DemoDesign[] = [
  { name: 'CHW pump P-2 skid', input: DEMO_P2_INPUT, status: 'released', withChecker: true },
  { name: 'CHW pump P-3 skid', input: DEMO_P3_INPUT, status: 'draft', withChecker: false },
];

/**
 * The demo project and its designs, each with the best passing candidate of a real selection
 * over the demo catalog (skipped while the catalog is empty; filled in at a later start).
 * Idempotent: creates what is missing and never touches a design someone has edited.
 */
@Injectable()
@DemoSeed({ order: DEMO_SEED_ORDER.projects })
export class DemoDesignsSeed implements DemoSeedStep {
  private readonly logger = new Logger(DemoDesignsSeed.name);

  constructor(
    @InjectRepository(Project) private readonly projects: Repository<Project>,
    @InjectRepository(Design) private readonly designs: Repository<Design>,
    @InjectRepository(User) private readonly users: Repository<User>,
    private readonly designService: DesignsService,
    private readonly selection: SelectionService,
    private readonly catalog: SelectionCatalogReader,
  ) {}

  async run(): Promise<void> {
    const author = await this.users.findOneBy({ email: 'engineer@tacet.test' });
    const checker = await this.users.findOneBy({ email: 'checker@tacet.test' });
    if (!author || !checker) return; // the demo accounts come first; nothing to attach the project to
    let project = await this.projects.findOneBy({ name: DEMO_PROJECT.name });
    if (!project) {
      project = await this.projects.save(this.projects.create({ ...DEMO_PROJECT, ownerId: author.id, archived: false }));
      this.logger.log(`Created the demo project "${project.name}"`);
    }
    const catalogReady = await this.catalog.hasActiveMounts();
    for (const demo of DEMO_DESIGNS) {
      const existing = await this.designs.findOneBy({ projectId: project.id, name: demo.name, revision: 1 });
      if (existing && (existing.chosen || existing.version > 1)) continue;
      const chosen = catalogReady ? await this.bestChoice(demo.input) : null;
      if (existing) {
        if (chosen) await this.designs.update({ id: existing.id, version: 1 }, chosen);
        continue;
      }
      const saved = await this.designs.save(
        this.designs.create({
          projectId: project.id,
          name: demo.name,
          revision: 1,
          status: demo.status,
          input: demo.input,
          chosen: null,
          bom: null,
          snapshot: null,
          ...chosen,
          authorId: author.id,
          checkerId: demo.withChecker ? checker.id : null,
        }),
      );
      if (demo.status === 'released') {
        // the review trail the demo release would have left (the entity belongs to review/)
        await this.designs.manager.insert(DesignTransition, [
          { designId: saved.id, userId: author.id, from: 'draft', to: 'in_review', comment: null },
          { designId: saved.id, userId: checker.id, from: 'in_review', to: 'released', comment: null },
        ]);
      }
      this.logger.log(`Created the demo design "${demo.name}" (${demo.status}${chosen ? '' : ', no candidate chosen yet'})`);
    }
  }

  /** The best passing candidate of the selection, chosen as an engineer would (or null). */
  private async bestChoice(input: DesignInput) {
    const result = await this.selection.selectForDesign(input, 1);
    const best = result.candidates.find((candidate) => candidate.passes);
    if (!best) return null;
    const choice: CandidateChoice = best.kind === 'uniform' ? { mountId: best.mountId! } : { seriesId: best.seriesId! };
    return this.designService.choose(input, choice);
  }
}
