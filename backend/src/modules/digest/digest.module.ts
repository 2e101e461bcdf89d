import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { PruningModule } from '../pruning/pruning.module.js';
import { RunsModule } from '../runs/runs.module.js';
import { TasksModule } from '../tasks/tasks.module.js';
import { DigestDeliveriesRepository } from './digest-deliveries.repository.js';
import { DigestService } from './digest.service.js';

/** The digest of what changed since each reader's last one; the nightly job sends it. */
@Module({
  imports: [DocSetsModule, NotificationsModule, RunsModule, TasksModule, PruningModule],
  providers: [DigestDeliveriesRepository, DigestService],
  exports: [DigestService],
})
export class DigestModule {}
