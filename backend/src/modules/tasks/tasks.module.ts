import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { NotificationsModule } from '../notifications/notifications.module.js';
import { UsersModule } from '../users/users.module.js';
import { RunFindingsRepository } from './run-findings.repository.js';
import { TaskAssignees } from './task-assignees.service.js';
import { TaskCreationService } from './task-creation.service.js';
import { TaskMailer } from './task-mailer.service.js';
import { TaskVerifierService } from './task-verifier.service.js';
import { TasksController } from './tasks.controller.js';
import { TasksRepository } from './tasks.repository.js';
import { TasksService } from './tasks.service.js';

@Module({
  imports: [DocSetsModule, UsersModule, NotificationsModule],
  controllers: [TasksController],
  providers: [TasksRepository, RunFindingsRepository, TaskAssignees, TaskMailer, TaskCreationService, TasksService, TaskVerifierService],
  exports: [TasksService, RunFindingsRepository],
})
export class TasksModule {}
