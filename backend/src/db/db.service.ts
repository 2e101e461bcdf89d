import type { PGlite } from '@electric-sql/pglite';
import { Inject, Injectable, Logger, type OnApplicationShutdown } from '@nestjs/common';
import { sql } from 'drizzle-orm';
import { drizzle as drizzleNodePg } from 'drizzle-orm/node-postgres';
import { migrate as migrateNodePg } from 'drizzle-orm/node-postgres/migrator';
import { drizzle as drizzlePglite } from 'drizzle-orm/pglite';
import { migrate as migratePglite } from 'drizzle-orm/pglite/migrator';
import { mkdirSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import pg from 'pg';
import { APP_CONFIG, type AppConfig } from '../config/app-config.js';
import { acquireDataDirLock } from './data-dir-lock.js';
import type { Database, DatabaseKind } from './database.js';
import { openPglite } from './pglite-opener.js';
import * as schema from './schema/index.js';

/** Same path from src/db and dist/db. */
export const MIGRATIONS_DIR = fileURLToPath(new URL('../../../drizzle', import.meta.url));

/**
 * Opens the database (embedded PGlite in DATA_DIR, or PostgreSQL when DATABASE_URL is set), applies the
 * migrations and closes it last on shutdown. Nothing outside this folder needs to know which one runs.
 */
@Injectable()
export class DbService implements OnApplicationShutdown {
  private readonly logger = new Logger('Database');
  private pglite: PGlite | null = null;
  private pool: pg.Pool | null = null;
  private releaseLock: (() => void) | null = null;
  db!: Database;
  kind!: DatabaseKind;

  constructor(@Inject(APP_CONFIG) private readonly config: AppConfig) {}

  async open(): Promise<void> {
    if (this.config.databaseUrl) {
      this.kind = 'postgres';
      this.pool = new pg.Pool({ connectionString: this.config.databaseUrl, max: 10 });
      const db = drizzleNodePg({ client: this.pool, schema });
      await migrateNodePg(db, { migrationsFolder: MIGRATIONS_DIR });
      this.db = db as unknown as Database;
    } else {
      this.kind = 'pglite';
      if (this.config.inMemoryDatabase) {
        const { PGlite } = await import('@electric-sql/pglite');
        this.pglite = new PGlite();
      } else {
        mkdirSync(this.config.dataDir, { recursive: true });
        this.releaseLock = acquireDataDirLock(this.config.dataDir);
        try {
          this.pglite = await openPglite(join(this.config.dataDir, 'pglite'));
        } catch (error) {
          this.releaseLock();
          throw error;
        }
      }
      const db = drizzlePglite({ client: this.pglite, schema });
      await migratePglite(db, { migrationsFolder: MIGRATIONS_DIR });
      this.db = db as unknown as Database;
    }
    this.logger.log(`Database ready (${this.kind})`);
  }

  /** Writes a compressed copy of the embedded data folder (PGlite only). */
  async backup(file: string): Promise<void> {
    if (!this.pglite) throw new Error('Backups of a PostgreSQL server are made with pg_dump, not by Linkloom.');
    await this.db.execute(sql`CHECKPOINT`);
    const dump = await this.pglite.dumpDataDir('gzip');
    writeFileSync(file, Buffer.from(await dump.arrayBuffer()), { mode: 0o600 });
  }

  async onApplicationShutdown(): Promise<void> {
    await this.close();
  }

  async close(): Promise<void> {
    try {
      if (this.pglite && !this.pglite.closed) {
        await this.pglite.query('CHECKPOINT').catch(() => undefined);
        await this.pglite.close();
      }
      if (this.pool) await this.pool.end();
    } finally {
      this.pglite = null;
      this.pool = null;
      this.releaseLock?.();
      this.releaseLock = null;
    }
  }
}
