/** Helpers for the import API tests: upload over HTTP, wait for the background import, snapshot the state. */
import { readdir } from 'node:fs/promises';
import { expect } from 'vitest';
import { DbService } from '../../../db/db.service.js';
import { sql } from 'drizzle-orm';
import type { TestApp } from '../../../testing/test-app.js';
import { PageStoreRepository } from '../storage/page-store.repository.js';
import { uploadDirOf } from '../upload/upload-dir.js';

export interface ImportKit {
  docSetId: string;
  token: string;
  upload(bytes: Buffer, fileName?: string): Promise<{ status: number; body: any }>;
  waitFor(snapshotId: string, timeoutMs?: number): Promise<any>;
  importAndWait(bytes: Buffer): Promise<any>;
  /** What must not change after a rejected or failed upload (docs/threats.md "Nothing lost"). */
  state(): Promise<StoredState>;
  rows(snapshotId: string): Promise<{ pages: number; links: number; assets: number }>;
  pagePaths(snapshotId: string): Promise<string[]>;
}

export interface StoredState {
  snapshotIds: string[];
  unfinished: number;
  latestReady: { id: string; pages: number; links: number; assets: number } | null;
  uploadFiles: string[];
  orphanRows: number;
}

export async function createDocSet(t: TestApp, settings: Record<string, unknown> = {}, name = 'Import test'): Promise<string> {
  const token = await t.tokenFor('editor');
  const response = await t.http.post('/api/doc-sets').set('Authorization', `Bearer ${token}`).send({ name, settings });
  expect(response.status, JSON.stringify(response.body)).toBe(201);
  return response.body.id;
}

export async function importKit(t: TestApp, docSetId: string, role: 'editor' | 'admin' = 'editor'): Promise<ImportKit> {
  const token = await t.tokenFor(role);
  const auth = (r: any) => r.set('Authorization', `Bearer ${token}`);
  const kit: ImportKit = {
    docSetId,
    token,
    upload: (bytes, fileName = 'docs.zip') =>
      auth(t.http.post(`/api/doc-sets/${docSetId}/snapshots`)).attach('archive', bytes, {
        filename: fileName,
        contentType: 'application/zip',
      }),
    async waitFor(snapshotId, timeoutMs = 60_000) {
      const until = Date.now() + timeoutMs;
      for (;;) {
        const response = await auth(t.http.get(`/api/doc-sets/${docSetId}/snapshots/${snapshotId}`));
        expect(response.status).toBe(200);
        if (response.body.status === 'ready' || response.body.status === 'failed') return response.body;
        if (Date.now() > until) throw new Error(`snapshot ${snapshotId} still ${response.body.status}`);
        await new Promise((resolve) => setTimeout(resolve, 50));
      }
    },
    async importAndWait(bytes) {
      const response = await kit.upload(bytes);
      expect(response.status, JSON.stringify(response.body)).toBe(202);
      return kit.waitFor(response.body.snapshot.id);
    },
    async state() {
      const list = await auth(t.http.get(`/api/doc-sets/${docSetId}/snapshots?pageSize=500`));
      const items = list.body.items as any[];
      const ready = items.find((s) => s.status === 'ready');
      const db = t.app.get(DbService).db;
      const orphans = (await db.execute(sql`
        SELECT (SELECT count(*) FROM pages p JOIN snapshots s ON s.id = p.snapshot_id WHERE s.status <> 'ready')
             + (SELECT count(*) FROM links l JOIN snapshots s ON s.id = l.snapshot_id WHERE s.status <> 'ready') AS n`)) as unknown as {
        rows: { n: string }[];
      };
      return {
        snapshotIds: items.map((s) => s.id).sort(),
        unfinished: items.filter((s) => s.status === 'received' || s.status === 'importing').length,
        latestReady: ready ? { id: ready.id, ...(await kit.rows(ready.id)) } : null,
        uploadFiles: await readdir(uploadDirOf(t.config)).catch(() => []),
        orphanRows: Number(orphans.rows[0].n),
      };
    },
    rows: (snapshotId) => t.app.get(PageStoreRepository).rowCounts(snapshotId),
    async pagePaths(snapshotId) {
      const result = (await t.app
        .get(DbService)
        .db.execute(sql`SELECT path FROM pages WHERE snapshot_id = ${snapshotId}::uuid ORDER BY path`)) as unknown as {
        rows: { path: string }[];
      };
      return result.rows.map((row) => row.path).sort();
    },
  };
  return kit;
}
