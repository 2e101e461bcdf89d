import { Inject, Injectable } from '@nestjs/common';
import {
  defaultDocSetSettings,
  docSetSettingsSchema,
  type CreateDocSetInput,
  type DocSet,
  type DocSetSettings,
  type DocSetSettingsPatch,
  type UpdateDocSetInput,
} from '@linkloom/shared';
import { isAbsolute, relative, resolve } from 'node:path';
import { APP_CONFIG, type AppConfig } from '../../config/app-config.js';
import { AppError, notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsRepository, toDocSet } from './doc-sets.repository.js';

@Injectable()
export class DocSetsService {
  constructor(
    private readonly repository: DocSetsRepository,
    private readonly audit: AuditService,
    @Inject(APP_CONFIG) private readonly config: AppConfig,
  ) {}

  async list(): Promise<DocSet[]> {
    return (await this.repository.list()).map(toDocSet);
  }

  async get(id: string): Promise<DocSet> {
    const row = await this.repository.findById(id);
    if (!row) throw notFound('The doc set');
    return toDocSet(row);
  }

  async create(actor: AuthUser, input: CreateDocSetInput): Promise<DocSet> {
    const settings = this.checkSettings(actor, this.merge(defaultDocSetSettings(), input.settings), null);
    const row = await this.repository.insert({ name: input.name, description: input.description, settings, createdBy: actor.id });
    await this.audit.record(actor, 'doc-set.created', 'doc-set', row.id, { name: row.name }, { docSetId: row.id });
    return toDocSet(row);
  }

  async update(actor: AuthUser, id: string, input: UpdateDocSetInput): Promise<DocSet> {
    const current = await this.get(id);
    const settings = input.settings ? this.checkSettings(actor, this.merge(current.settings, input.settings), current.settings) : undefined;
    const row = await this.repository.update(id, { name: input.name, description: input.description, settings });
    if (!row) throw notFound('The doc set');
    await this.audit.record(
      actor,
      'doc-set.updated',
      'doc-set',
      id,
      {
        changed: Object.keys(input.settings ?? {}).concat(
          input.name ? ['name'] : [],
          input.description !== undefined ? ['description'] : [],
        ),
      },
      { docSetId: id },
    );
    return toDocSet(row);
  }

  merge(current: DocSetSettings, patch: DocSetSettingsPatch): DocSetSettings {
    return docSetSettingsSchema.parse({ ...current, ...patch, pruning: { ...current.pruning, ...(patch.pruning ?? {}) } });
  }

  /** A server folder may only be set by an admin, and only under the configured SOURCE_ROOT. */
  private checkSettings(actor: AuthUser, settings: DocSetSettings, previous: DocSetSettings | null): DocSetSettings {
    if (settings.sourceFolder === (previous?.sourceFolder ?? null) || settings.sourceFolder === null) return settings;
    if (actor.role !== 'admin') throw new AppError(403, 'FORBIDDEN', 'Only an admin can set the server folder of a doc set.');
    const root = this.config.sourceRoot;
    if (!root) {
      throw new AppError(
        422,
        'SOURCE_ROOT_NOT_SET',
        'Server folders are turned off: set SOURCE_ROOT on the server to the folder that may hold doc sets, then try again.',
      );
    }
    const folder = resolve(root, settings.sourceFolder);
    const inside = relative(root, folder);
    if (inside.startsWith('..') || isAbsolute(inside)) {
      throw new AppError(422, 'SOURCE_FOLDER_OUTSIDE_ROOT', `The folder must sit under ${root}.`);
    }
    return { ...settings, sourceFolder: folder };
  }
}
