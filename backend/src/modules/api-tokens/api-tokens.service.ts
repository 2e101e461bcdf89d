import { createHash, randomBytes } from 'node:crypto';
import { Injectable } from '@nestjs/common';
import { notFound } from '../../common/app-error.js';
import type { AuthUser } from '../../common/auth.decorators.js';
import { API_TOKEN_PREFIX, type ApiTokenVerifier } from '../../common/auth.guard.js';
import { AuditService } from '../audit/audit.service.js';
import { DocSetsService } from '../doc-sets/doc-sets.service.js';
import { ApiTokensRepository } from './api-tokens.repository.js';

const hash = (token: string): string => createHash('sha256').update(token).digest('hex');

/**
 * Doc-set tokens for CI jobs: 256 random bits, kept only as a hash. A token acts as an editor of its own
 * doc set and nothing else (the guard refuses every route outside that doc set).
 */
@Injectable()
export class ApiTokensService implements ApiTokenVerifier {
  constructor(
    private readonly repository: ApiTokensRepository,
    private readonly docSets: DocSetsService,
    private readonly audit: AuditService,
  ) {}

  async create(actor: AuthUser, docSetId: string, name: string): Promise<{ id: string; name: string; token: string }> {
    await this.docSets.get(docSetId);
    const token = `${API_TOKEN_PREFIX}${randomBytes(32).toString('base64url')}`;
    const row = await this.repository.insert({ docSetId, name, tokenHash: hash(token), createdBy: actor.id });
    await this.audit.record(actor, 'api-token.created', 'api-token', row.id, { name }, { docSetId });
    return { id: row.id, name: row.name, token };
  }

  async list(docSetId: string) {
    await this.docSets.get(docSetId);
    const rows = await this.repository.list(docSetId);
    const items = rows.map((r) => ({ ...r, createdAt: r.createdAt.toISOString(), lastUsedAt: r.lastUsedAt?.toISOString() ?? null }));
    // Every list has the paged shape (docs/api.md "Lists"); a doc set has a handful of tokens, all on one page.
    return { items, total: items.length, page: 1, pageSize: items.length };
  }

  async revoke(actor: AuthUser, docSetId: string, id: string): Promise<void> {
    if (!(await this.repository.revoke(docSetId, id))) throw notFound('The API token');
    await this.audit.record(actor, 'api-token.revoked', 'api-token', id, {}, { docSetId });
  }

  async verify(token: string): Promise<AuthUser | null> {
    const row = await this.repository.findActive(hash(token));
    if (!row || row.disabled) return null;
    await this.repository.touch(row.id);
    return { id: row.userId, email: row.email, name: `API token "${row.name}"`, role: 'editor', apiTokenDocSetId: row.docSetId };
  }
}
