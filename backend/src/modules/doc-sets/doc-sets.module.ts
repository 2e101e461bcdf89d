import { Module } from '@nestjs/common';
import { DocSetsController } from './doc-sets.controller.js';
import { DocSetsRepository } from './doc-sets.repository.js';
import { DocSetsService } from './doc-sets.service.js';

@Module({ controllers: [DocSetsController], providers: [DocSetsRepository, DocSetsService], exports: [DocSetsService] })
export class DocSetsModule {}
