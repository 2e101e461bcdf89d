import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { TasksModule } from '../tasks/tasks.module.js';
import { UsersModule } from '../users/users.module.js';
import { PruningRefreshService } from './pruning-refresh.service.js';
import { PruningController } from './pruning.controller.js';
import { PruningRepository } from './pruning.repository.js';
import { PruningService } from './pruning.service.js';

@Module({
  imports: [DocSetsModule, UsersModule, TasksModule, NotificationsModule],
  controllers: [PruningController],
  providers: [PruningRepository, PruningService, PruningRefreshService],
  exports: [PruningService],
})
export class PruningModule {}
