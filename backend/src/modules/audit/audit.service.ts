import { Injectable } from '@nestjs/common';
import type { AuditEntry, ListResult } from '@linkloom/shared';
import type { AuthUser } from '../../common/auth.decorators.js';
import type { Executor } from '../../db/database.js';
import { AuditRepository } from './audit.repository.js';

/** An audit entry as the API lists it (the shared response shape). */
export type AuditItem = AuditEntry;

/** Records who did what to which entity; pass the transaction handle when the change itself is transactional. */
@Injectable()
export class AuditService {
  constructor(private readonly repository: AuditRepository) {}

  async record(
    actor: Pick<AuthUser, 'id' | 'email'> | null,
    action: string,
    entityType: string,
    entityId: string,
    details: Record<string, unknown> = {},
    options: { docSetId?: string; executor?: Executor } = {},
  ): Promise<void> {
    await this.repository.insert(
      {
        actorId: actor?.id ?? null,
        actorEmail: actor?.email ?? 'system',
        action,
        entityType,
        entityId,
        details,
        docSetId: options.docSetId ?? null,
      },
      options.executor,
    );
  }

  async list(
    filter: { entityType?: string; entityId?: string; docSetId?: string },
    page: number,
    pageSize: number,
  ): Promise<ListResult<AuditItem>> {
    const { rows, total } = await this.repository.list(filter, (page - 1) * pageSize, pageSize);
    return {
      items: rows.map((r) => ({ ...r, at: r.at.toISOString() })),
      total,
      page,
      pageSize,
    };
  }
}
