import { Module } from '@nestjs/common';
import { DocSetsModule } from '../doc-sets/doc-sets.module.js';
import { UsersModule } from '../users/users.module.js';
import { RunFindingsRepository } from './run-findings.repository.js';
import { TaskVerifierService } from './task-verifier.service.js';
import { TasksController } from './tasks.controller.js';
import { TasksRepository } from './tasks.repository.js';
import { TasksService } from './tasks.service.js';

@Module({
  imports: [DocSetsModule, UsersModule],
  controllers: [TasksController],
  providers: [TasksRepository, RunFindingsRepository, TasksService, TaskVerifierService],
  exports: [TasksService, RunFindingsRepository],
})
export class TasksModule {}
