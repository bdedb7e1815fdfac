import { Injectable, Module } from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { Test } from '@nestjs/testing';
import { DataSource } from 'typeorm';
import { AppConfig } from '../config/app-config.js';
import { DemoSeed, type DemoSeedStep } from './demo-seed-step.js';
import { DemoSeedService } from './demo-seed.service.js';

const ran: string[] = [];

@Injectable()
@DemoSeed({ order: 300 })
class ProjectsSeed implements DemoSeedStep {
  async run() {
    ran.push('projects');
  }
}

@Injectable()
@DemoSeed({ order: 100 })
class AccountsSeed implements DemoSeedStep {
  async run() {
    ran.push('accounts');
  }
}

@Injectable()
class NotASeed {
  async run() {
    ran.push('not a seed');
  }
}

/** Steps live in their own feature modules, as they will in the app. */
@Module({ providers: [ProjectsSeed, NotASeed] })
class ProjectsModule {}

@Module({ providers: [AccountsSeed] })
class AccountsModule {}

async function boot(demo: boolean) {
  const moduleRef = await Test.createTestingModule({
    imports: [DiscoveryModule, ProjectsModule, AccountsModule],
    providers: [
      DemoSeedService,
      { provide: AppConfig, useValue: new AppConfig({ demo } as AppConfig) },
      // SQLite: the start-up lock just runs the steps
      { provide: DataSource, useValue: { options: { type: 'better-sqlite3' } } },
    ],
  }).compile();
  const app = moduleRef.createNestApplication({ logger: false });
  await app.init(); // onApplicationBootstrap
  return app;
}

describe('DemoSeedService', () => {
  beforeEach(() => ran.splice(0));

  it('runs every @DemoSeed step of every module, in ascending order, in demo mode', async () => {
    const app = await boot(true);
    expect(ran).toEqual(['accounts', 'projects']);
    await app.close();
  });

  it('does nothing outside demo mode', async () => {
    const app = await boot(false);
    expect(ran).toEqual([]);
    await app.close();
  });
});
