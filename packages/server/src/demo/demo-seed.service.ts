import { Injectable, Logger, type OnApplicationBootstrap } from '@nestjs/common';
import { DiscoveryService } from '@nestjs/core';
import { DataSource } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { withStartupLock } from '../database/startup-lock.js';
import { DemoSeed, type DemoSeedStep } from './demo-seed-step.js';

/** Runs every `@DemoSeed` step, in order, when the server starts in demo mode. */
@Injectable()
export class DemoSeedService implements OnApplicationBootstrap {
  private readonly logger = new Logger(DemoSeedService.name);

  constructor(
    private readonly discovery: DiscoveryService,
    private readonly config: AppConfig,
    private readonly dataSource: DataSource,
  ) {}

  async onApplicationBootstrap(): Promise<void> {
    // Under the start-up lock: processes starting at once on one PostgreSQL seed one by one.
    if (this.config.demo) await withStartupLock(this.dataSource, () => this.seed());
  }

  /** The discovered steps, in the order they run. */
  steps(): DemoSeedStep[] {
    return this.discovery
      .getProviders({ metadataKey: DemoSeed.KEY })
      .filter((wrapper) => wrapper.instance)
      .map((wrapper) => ({
        order: this.discovery.getMetadataByDecorator(DemoSeed, wrapper)?.order ?? 0,
        name: wrapper.name as string,
        step: wrapper.instance as DemoSeedStep,
      }))
      .sort((a, b) => a.order - b.order || a.name.localeCompare(b.name))
      .map(({ step }) => step);
  }

  async seed(): Promise<void> {
    for (const step of this.steps()) {
      await step.run();
    }
    this.logger.log('Demo data is in place');
  }
}
