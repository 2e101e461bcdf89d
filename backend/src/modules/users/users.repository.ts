import { Injectable } from '@nestjs/common';
import { and, asc, count, eq, ne, sql } from 'drizzle-orm';
import type { UserDetails } from '@linkloom/shared';
import { DbService } from '../../db/db.service.js';
import { users, type UserRow } from '../../db/schema/index.js';

export function toUserDetails(row: UserRow): UserDetails {
  return {
    id: row.id,
    email: row.email,
    name: row.name,
    role: row.role,
    disabled: row.disabled,
    createdAt: row.createdAt.toISOString(),
    lastSignInAt: row.lastSignInAt?.toISOString() ?? null,
  };
}

@Injectable()
export class UsersRepository {
  constructor(private readonly database: DbService) {}

  private get db() {
    return this.database.db;
  }

  async findById(id: string): Promise<UserRow | null> {
    const [row] = await this.db.select().from(users).where(eq(users.id, id)).limit(1);
    return row ?? null;
  }

  async findByEmail(email: string): Promise<UserRow | null> {
    const [row] = await this.db.select().from(users).where(eq(users.email, email.toLowerCase())).limit(1);
    return row ?? null;
  }

  async list(offset: number, limit: number): Promise<{ rows: UserRow[]; total: number }> {
    const rows = await this.db.select().from(users).orderBy(asc(users.email)).offset(offset).limit(limit);
    const [{ value }] = await this.db.select({ value: count() }).from(users);
    return { rows, total: value };
  }

  async findByIds(ids: string[]): Promise<UserRow[]> {
    if (ids.length === 0) return [];
    return this.db
      .select()
      .from(users)
      .where(sql`${users.id} in ${ids}`);
  }

  async count(): Promise<number> {
    const [{ value }] = await this.db.select({ value: count() }).from(users);
    return value;
  }

  async countActiveAdminsExcept(id: string): Promise<number> {
    const [{ value }] = await this.db
      .select({ value: count() })
      .from(users)
      .where(and(eq(users.role, 'admin'), eq(users.disabled, false), ne(users.id, id)));
    return value;
  }

  async insert(values: Pick<UserRow, 'email' | 'name' | 'role' | 'passwordHash'>): Promise<UserRow> {
    const [row] = await this.db
      .insert(users)
      .values({ ...values, email: values.email.toLowerCase() })
      .returning();
    return row;
  }

  async update(
    id: string,
    values: Partial<Pick<UserRow, 'role' | 'disabled' | 'name' | 'passwordHash' | 'lastSignInAt'>>,
  ): Promise<UserRow | null> {
    const [row] = await this.db
      .update(users)
      .set({ ...values, updatedAt: new Date() })
      .where(eq(users.id, id))
      .returning();
    return row ?? null;
  }

  /** Revokes every access token of the user (sign-out, password change, disabling). */
  async bumpTokenVersion(id: string): Promise<void> {
    await this.db
      .update(users)
      .set({ tokenVersion: sql`${users.tokenVersion} + 1` })
      .where(eq(users.id, id));
  }
}
