import { DiscoveryService } from '@nestjs/core';

/**
 * One step of the demo seeding. A feature module adds its own step by providing a class
 * decorated with `@DemoSeed({ order })` that implements this interface; `DemoSeedService`
 * finds every such provider and runs them in ascending `order` at application bootstrap
 * (demo mode only). A step must be idempotent: it runs at every start of a demo server and
 * creates only what is missing.
 */
export interface DemoSeedStep {
  run(): Promise<void>;
}

export interface DemoSeedOptions {
  /** Lower runs first; see DEMO_SEED_ORDER. */
  order: number;
}

/** Marks a provider as a demo seed step. */
export const DemoSeed = DiscoveryService.createDecorator<DemoSeedOptions>();

/** Order of the known steps (leave gaps so later steps fit in between). */
export const DEMO_SEED_ORDER = {
  users: 100,
  suppliers: 200,
  catalog: 300,
  projects: 400,
  verifications: 500,
} as const;
