import type { Type } from '@nestjs/common';
import { ApiTokensModule } from './modules/api-tokens/api-tokens.module.js';
import { DocSetsModule } from './modules/doc-sets/doc-sets.module.js';
import { IngestModule } from './modules/ingest/ingest.module.js';
import { MailModule } from './modules/mail/mail.module.js';
import { NotificationsModule } from './modules/notifications/notifications.module.js';
import { RunsModule } from './modules/runs/runs.module.js';
import { TasksModule } from './modules/tasks/tasks.module.js';
import { PruningModule } from './modules/pruning/pruning.module.js';
import { LinkMapModule } from './modules/link-map/link-map.module.js';
import { NightlyScheduleModule } from './modules/schedule/schedule.module.js';
import { DigestModule } from './modules/digest/digest.module.js';

/** The product's capability modules (doc sets, imports, runs, work, mail...), listed once. */
export const FEATURE_MODULES: Type[] = [
  MailModule,
  NotificationsModule,
  DocSetsModule,
  IngestModule,
  RunsModule,
  TasksModule,
  PruningModule,
  DigestModule,
  NightlyScheduleModule,
  LinkMapModule,
  ApiTokensModule,
];
