import 'reflect-metadata';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';

describe('doc sets', () => {
  let t: TestApp;
  beforeAll(async () => {
    t = await createTestApp();
  });
  afterAll(async () => t?.close());

  it('creates a doc set with the documented defaults and lets every role read it', async () => {
    const editor = await t.tokenFor('editor');
    const created = await t.http.post('/api/doc-sets').set('Authorization', `Bearer ${editor}`).send({ name: 'Field guide' });
    expect(created.status).toBe(201);
    expect(created.body.settings).toMatchObject({
      extensions: ['.md', '.mdx', '.markdown'],
      indexFileNames: ['index.md', 'README.md', '_index.md'],
      caseInsensitive: false,
      wikiLinks: true,
      damping: 0.85,
      teleport: 'uniform',
      depthThreshold: 3,
      relativeTo: 'file',
    });
    const viewer = await t.tokenFor('viewer');
    const read = await t.http.get(`/api/doc-sets/${created.body.id}`).set('Authorization', `Bearer ${viewer}`);
    expect(read.status).toBe(200);
    expect(read.body.name).toBe('Field guide');
  });

  it('refuses writers and viewers who try to create or change a doc set', async () => {
    for (const role of ['writer', 'viewer'] as const) {
      const response = await t.http
        .post('/api/doc-sets')
        .set('Authorization', `Bearer ${await t.tokenFor(role)}`)
        .send({ name: 'Nope' });
      expect(response.status, role).toBe(403);
    }
  });

  it('validates settings with messages a person can act on and keeps the stored ones on failure', async () => {
    const editor = await t.tokenFor('editor');
    const created = await t.http
      .post('/api/doc-sets')
      .set('Authorization', `Bearer ${editor}`)
      .send({ name: 'Valid', settings: { damping: 0.9 } });
    for (const settings of [
      { damping: 1 },
      { damping: 0 },
      { depthThreshold: 0 },
      { teleport: 'random' },
      { extensions: ['md'] },
      { unknownSetting: true },
    ]) {
      const response = await t.http.patch(`/api/doc-sets/${created.body.id}`).set('Authorization', `Bearer ${editor}`).send({ settings });
      expect(response.status, JSON.stringify(settings)).toBe(400);
      expect(response.body.message).toMatch(/^The request is not valid\. settings/);
    }
    const read = await t.http.get(`/api/doc-sets/${created.body.id}`).set('Authorization', `Bearer ${editor}`);
    expect(read.body.settings.damping).toBe(0.9);
    const patched = await t.http
      .patch(`/api/doc-sets/${created.body.id}`)
      .set('Authorization', `Bearer ${editor}`)
      .send({ settings: { entryPages: ['start.md'], pruning: { staleDays: 90 } } });
    expect(patched.status).toBe(200);
    expect(patched.body.settings).toMatchObject({ damping: 0.9, entryPages: ['start.md'], pruning: { staleDays: 90, thinWordCount: 80 } });
  });

  it('lets only an admin set a server folder, and only when SOURCE_ROOT allows it', async () => {
    const editor = await t.tokenFor('editor');
    const created = await t.http.post('/api/doc-sets').set('Authorization', `Bearer ${editor}`).send({ name: 'Folder' });
    const byEditor = await t.http
      .patch(`/api/doc-sets/${created.body.id}`)
      .set('Authorization', `Bearer ${editor}`)
      .send({ settings: { sourceFolder: 'docs' } });
    expect(byEditor.status).toBe(403);
    const byAdmin = await t.http
      .patch(`/api/doc-sets/${created.body.id}`)
      .set('Authorization', `Bearer ${await t.tokenFor('admin')}`)
      .send({ settings: { sourceFolder: 'docs' } });
    expect(byAdmin.status).toBe(422);
    expect(byAdmin.body.code).toBe('SOURCE_ROOT_NOT_SET');
  });

  it('answers 404 for an unknown doc set and 400 for a malformed id', async () => {
    const viewer = await t.tokenFor('viewer');
    expect((await t.http.get('/api/doc-sets/00000000-0000-4000-8000-000000000000').set('Authorization', `Bearer ${viewer}`)).status).toBe(
      404,
    );
    expect((await t.http.get('/api/doc-sets/not-an-id').set('Authorization', `Bearer ${viewer}`)).status).toBe(400);
  });
});
