import { Injectable } from '@nestjs/common';
import { and, desc, eq, isNull } from 'drizzle-orm';
import { DbService } from '../../db/db.service.js';
import { apiTokens, users } from '../../db/schema/index.js';

@Injectable()
export class ApiTokensRepository {
  constructor(private readonly database: DbService) {}

  async insert(values: { docSetId: string; name: string; tokenHash: string; createdBy: string }) {
    const [row] = await this.database.db.insert(apiTokens).values(values).returning();
    return row;
  }

  async list(docSetId: string) {
    return this.database.db
      .select({
        id: apiTokens.id,
        name: apiTokens.name,
        createdAt: apiTokens.createdAt,
        lastUsedAt: apiTokens.lastUsedAt,
        createdBy: users.name,
      })
      .from(apiTokens)
      .leftJoin(users, eq(users.id, apiTokens.createdBy))
      .where(and(eq(apiTokens.docSetId, docSetId), isNull(apiTokens.revokedAt)))
      .orderBy(desc(apiTokens.createdAt));
  }

  async revoke(docSetId: string, id: string): Promise<boolean> {
    const rows = await this.database.db
      .update(apiTokens)
      .set({ revokedAt: new Date() })
      .where(and(eq(apiTokens.id, id), eq(apiTokens.docSetId, docSetId), isNull(apiTokens.revokedAt)))
      .returning({ id: apiTokens.id });
    return rows.length === 1;
  }

  /** The live token with this hash and the user who made it (still enabled). */
  async findActive(tokenHash: string) {
    const [row] = await this.database.db
      .select({
        id: apiTokens.id,
        docSetId: apiTokens.docSetId,
        name: apiTokens.name,
        userId: users.id,
        email: users.email,
        disabled: users.disabled,
      })
      .from(apiTokens)
      .innerJoin(users, eq(users.id, apiTokens.createdBy))
      .where(and(eq(apiTokens.tokenHash, tokenHash), isNull(apiTokens.revokedAt)))
      .limit(1);
    return row ?? null;
  }

  async touch(id: string): Promise<void> {
    await this.database.db.update(apiTokens).set({ lastUsedAt: new Date() }).where(eq(apiTokens.id, id));
  }
}
