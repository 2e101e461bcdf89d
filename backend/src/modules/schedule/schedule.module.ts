import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { IngestModule } from '../ingest/ingest.module.js';
import { DigestModule } from '../digest/digest.module.js';
import { RunsModule } from '../runs/runs.module.js';
import { JobLeaseRepository } from './job-lease.repository.js';
import { NightlyJobService } from './nightly-job.service.js';
import { ScheduleController } from './schedule.controller.js';

@Module({
  imports: [DocSetsModule, IngestModule, RunsModule, DigestModule],
  controllers: [ScheduleController],
  providers: [JobLeaseRepository, NightlyJobService],
  exports: [NightlyJobService],
})
export class NightlyScheduleModule {}
