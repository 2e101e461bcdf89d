import { Injectable } from '@nestjs/common';
import { and, count, desc, eq, type SQL } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import type { Executor } from '../../db/database.js';
import { auditLog } from '../../db/schema/index.js';

export type AuditEntry = typeof auditLog.$inferInsert;
export type AuditRow = typeof auditLog.$inferSelect;

@Injectable()
export class AuditRepository {
  constructor(private readonly database: DbService) {}

  async insert(entry: AuditEntry, executor: Executor = this.database.db): Promise<void> {
    await executor.insert(auditLog).values(entry);
  }

  async list(filter: { entityType?: string; entityId?: string; docSetId?: string }, offset: number, limit: number) {
    const conditions: SQL[] = [];
    if (filter.entityType) conditions.push(eq(auditLog.entityType, filter.entityType));
    if (filter.entityId) conditions.push(eq(auditLog.entityId, filter.entityId));
    if (filter.docSetId) conditions.push(eq(auditLog.docSetId, filter.docSetId));
    const where = conditions.length ? and(...conditions) : undefined;
    const db = this.database.db;
    const rows = await db.select().from(auditLog).where(where).orderBy(desc(auditLog.at), desc(auditLog.id)).offset(offset).limit(limit);
    const [{ value }] = await db.select({ value: count() }).from(auditLog).where(where);
    return { rows, total: value };
  }
}
