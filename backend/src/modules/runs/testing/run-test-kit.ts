import { runSchema, type Run } from '@linkloom/shared';
import { DbService } from '../../../db/db.service.js';
import type { TestApp } from '../../../testing/test-app.js';
import { writeSnapshot, type FixtureLink, type FixturePage } from './snapshot-writer.js';

/** Small helpers for the run API tests: a doc set, a written snapshot, and waiting for a run to end. */
export async function createDocSet(t: TestApp, name: string, settings: Record<string, unknown> = {}): Promise<string> {
  const editor = await t.tokenFor('editor');
  const response = await t.http.post('/api/doc-sets').set('Authorization', `Bearer ${editor}`).send({ name, settings });
  if (response.status !== 201) throw new Error(`doc set not created: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body.id as string;
}

export function snapshotOf(t: TestApp, docSetId: string, pages: readonly FixturePage[], links: readonly FixtureLink[]) {
  return writeSnapshot(t.app.get(DbService).db, docSetId, pages, links);
}

export async function startRun(t: TestApp, docSetId: string, settings?: Record<string, unknown>): Promise<string> {
  const response = await t.http
    .post(`/api/doc-sets/${docSetId}/runs`)
    .set('Authorization', `Bearer ${await t.tokenFor('editor')}`)
    .send(settings ? { settings } : {});
  if (response.status !== 202) throw new Error(`run not started: ${response.status} ${JSON.stringify(response.body)}`);
  return response.body.run.id as string;
}

export async function waitForRun(t: TestApp, docSetId: string, runId: string, timeoutMs = 60_000): Promise<Run> {
  const token = await t.tokenFor('viewer');
  const deadline = Date.now() + timeoutMs;
  for (;;) {
    const response = await t.http.get(`/api/doc-sets/${docSetId}/runs/${runId}`).set('Authorization', `Bearer ${token}`);
    if (response.body.status === 'finished' || response.body.status === 'failed') return runSchema.parse(response.body);
    if (Date.now() > deadline) throw new Error(`run ${runId} still ${response.body.status}`);
    await new Promise((resolve) => setTimeout(resolve, 50));
  }
}

/** GET as a viewer (every role may read run results). */
export async function read(t: TestApp, url: string) {
  return t.http.get(url).set('Authorization', `Bearer ${await t.tokenFor('viewer')}`);
}
