import { Module } from '@nestjs/common';
import { DiscoveryModule } from '@nestjs/core';
import { DemoSeedService } from './demo-seed.service.js';

/** Demo mode: runs the seed steps that feature modules provide (see demo-seed-step.ts). */
@Module({
  imports: [DiscoveryModule],
  providers: [DemoSeedService],
})
export class DemoModule {}
