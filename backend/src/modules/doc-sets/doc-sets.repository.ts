import { Injectable } from '@nestjs/common';
import { asc, eq } from 'drizzle-orm';
import type { DocSet } from '@linkloom/shared';
import { DbService } from '../../db/db.service.js';
import { docSets, type DocSetRow } from '../../db/schema/index.js';

export function toDocSet(row: DocSetRow): DocSet {
  return {
    id: row.id,
    name: row.name,
    description: row.description,
    settings: row.settings,
    createdAt: row.createdAt.toISOString(),
    updatedAt: row.updatedAt.toISOString(),
  };
}

@Injectable()
export class DocSetsRepository {
  constructor(private readonly database: DbService) {}

  async list(): Promise<DocSetRow[]> {
    return this.database.db.select().from(docSets).orderBy(asc(docSets.name)).limit(1000);
  }

  async findById(id: string): Promise<DocSetRow | null> {
    const [row] = await this.database.db.select().from(docSets).where(eq(docSets.id, id)).limit(1);
    return row ?? null;
  }

  async insert(values: Pick<DocSetRow, 'name' | 'description' | 'settings' | 'createdBy'>): Promise<DocSetRow> {
    const [row] = await this.database.db.insert(docSets).values(values).returning();
    return row;
  }

  async update(id: string, values: Partial<Pick<DocSetRow, 'name' | 'description' | 'settings'>>): Promise<DocSetRow | null> {
    const [row] = await this.database.db
      .update(docSets)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(docSets.id, id))
      .returning();
    return row ?? null;
  }
}
