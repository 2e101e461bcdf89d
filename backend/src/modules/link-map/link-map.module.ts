import { Module } from '@nestjs/common';
import { RunsModule } from '../runs/runs.module.js';
import { LinkMapController } from './link-map.controller.js';
import { LinkMapRepository } from './link-map.repository.js';
import { LinkMapService } from './link-map.service.js';

@Module({ imports: [RunsModule], controllers: [LinkMapController], providers: [LinkMapRepository, LinkMapService] })
export class LinkMapModule {}
