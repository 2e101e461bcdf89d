import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { RunsModule } from '../runs/runs.module.js';
import { DigestFactsRepository } from './digest-facts.repository.js';
import { DigestService } from './digest.service.js';
import { SubscriptionsController } from './subscriptions.controller.js';
import { SubscriptionsRepository } from './subscriptions.repository.js';
import { SubscriptionsService } from './subscriptions.service.js';

@Module({
  imports: [DocSetsModule, RunsModule],
  controllers: [SubscriptionsController],
  providers: [SubscriptionsRepository, SubscriptionsService, DigestFactsRepository, DigestService],
  exports: [SubscriptionsService, SubscriptionsRepository, DigestService],
})
export class NotificationsModule {}
