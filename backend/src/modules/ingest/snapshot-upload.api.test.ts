/**
 * docs/threats.md checks 1-25 over HTTP: every hostile archive is refused with its status and code, and
 * "nothing lost" holds afterwards (same snapshot list, same rows in the previous ready snapshot, no import
 * left running, no orphan rows, upload folder empty). Archive builders: backend/src/testing/zip.
 */
import 'reflect-metadata';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createTestApp, type TestApp } from '../../testing/test-app.js';
import * as hostile from '../../testing/zip/hostile-archives.js';
import { listTree } from '../../testing/zip/archive-test-harness.js';
import { probeInflation } from '../../testing/zip/inflation-probe.js';
import { createDocSet, importKit, type ImportKit, type StoredState } from './testing/ingest-test-kit.js';
import { uploadDirOf } from './upload/upload-dir.js';

describe('snapshot upload: hostile input (docs/threats.md checks 1-25)', () => {
  let t: TestApp;
  let kit: ImportKit;
  let baseline: StoredState;

  beforeAll(async () => {
    t = await createTestApp();
    kit = await importKit(t, await createDocSet(t));
    const first = await kit.importAndWait(
      await hostile.wellFormedZip({
        'docs/index.md': '# Welcome\n\nSee [guide](guide.md).\n',
        'docs/guide.md': '# Guide\n\n[Home](index.md)\n',
      }),
    );
    expect(first.status, JSON.stringify(first)).toBe('ready');
    baseline = await kit.state();
    expect(baseline.latestReady).toMatchObject({ pages: 2, links: 2 });
  });
  afterAll(async () => t?.close());

  async function expectRefused(bytes: Buffer, status: number, code: string, label: string) {
    const response = await kit.upload(bytes);
    expect(response.status, `${label}: ${JSON.stringify(response.body)}`).toBe(status);
    expect(response.body.code, label).toBe(code);
    expect(JSON.stringify(response.body), label).not.toMatch(/\/tmp\/|\/work\/|at .*\.ts:\d+/);
    expect(await kit.state(), label).toEqual(baseline);
    return response;
  }

  it('1: a zero-byte upload is 400 UPLOAD_EMPTY', async () => {
    const response = await expectRefused(Buffer.alloc(0), 400, 'UPLOAD_EMPTY', 'empty');
    expect(response.body.message).toBe('The uploaded file is empty.');
  });

  it('2: no file part, a wrong field name and two files are 400', async () => {
    const auth = { Authorization: `Bearer ${kit.token}` };
    const url = `/api/doc-sets/${kit.docSetId}/snapshots`;
    const zip = await hostile.wellFormedZip({ 'a.md': '# A\n' });
    const cases = [
      ['no file part', t.http.post(url).set(auth).field('note', 'x')],
      ['wrong field name', t.http.post(url).set(auth).attach('file', zip, 'a.zip')],
      ['two files', t.http.post(url).set(auth).attach('archive', zip, 'a.zip').attach('archive', zip, 'b.zip')],
    ] as const;
    for (const [label, request] of cases) {
      const response = await request;
      expect(response.status, label).toBe(400);
      expect(response.body.code, label).toMatch(/^UPLOAD_(MISSING|UNEXPECTED)_FILE$/);
    }
    expect(await kit.state()).toEqual(baseline);
  });

  it('3: empty field name, missing boundary and a body cut mid-part are 400, and the server keeps answering', async () => {
    const url = `/api/doc-sets/${kit.docSetId}/snapshots`;
    const raw = (contentType: string, body: string) =>
      t.http.post(url).set('Authorization', `Bearer ${kit.token}`).set('Content-Type', contentType).send(body);
    const b = 'XyZboundary';
    const part = (name: string) =>
      `--${b}\r\nContent-Disposition: form-data; name="${name}"; filename="a.zip"\r\nContent-Type: application/zip\r\n\r\nPK\u0003\u0004abc\r\n`;
    const cases: Array<[string, string, string]> = [
      // multer CVE-2025-48997 (GHSA-g5hg-p3ph-g8qg): an empty field name crashed the process before 2.0.1.
      ['empty field name', `multipart/form-data; boundary=${b}`, `${part('')}--${b}--\r\n`],
      ['missing boundary', 'multipart/form-data', `${part('archive')}--${b}--\r\n`],
      ['body cut mid-part', `multipart/form-data; boundary=${b}`, part('archive').slice(0, -6)],
    ];
    for (const [label, contentType, body] of cases) {
      const response = await raw(contentType, body);
      expect(response.status, `${label}: ${JSON.stringify(response.body)}`).toBe(400);
      const health = await t.http.get('/api/health');
      expect(health.status, label).toBe(200);
    }
    expect(await kit.state()).toEqual(baseline);
  });

  it('4: 50 MiB + 1 byte is 413 "File too large" and leaves the upload folder empty', async () => {
    const bytes = Buffer.alloc(50 * 1024 * 1024 + 1);
    bytes.write('PK\u0003\u0004', 'latin1');
    const response = await expectRefused(bytes, 413, 'UPLOAD_TOO_LARGE', '50 MiB + 1');
    expect(response.body.message).toMatch(/^File too large/);
  });

  it('5: anything that is not a ZIP is 415 ARCHIVE_NOT_ZIP, whatever its Content-Type says', async () => {
    for (const archive of (await hostile.notZip()).filter((a) => a.bytes.length > 0)) {
      const response = await expectRefused(archive.bytes, 415, 'ARCHIVE_NOT_ZIP', archive.label);
      expect(response.body.message).toBe('Only .zip archives are accepted.');
    }
  });

  it('6, 8, 9, 11, 13-15, 17, 18, 20-22, 24: archive-level violations are refused with their code', async () => {
    const archives = [
      ...(await hostile.truncated()),
      hostile.zipSlip(),
      hostile.symlinks(),
      await hostile.ratioBomb(),
      await hostile.overlapBomb(),
      await hostile.totalCap(),
      ...hostile.encrypted(),
      ...hostile.unsupportedMethods(),
      ...hostile.badNames(),
      hostile.duplicates(),
      ...hostile.deepAndLong(),
      ...(await hostile.emptyArchives()),
    ];
    const before = await listTree(t.config.dataDir);
    for (const archive of archives) {
      const response = await expectRefused(archive.bytes, 422, archive.code!, `check ${archive.check}: ${archive.label}`);
      expect(response.body.details?.length ?? 0, archive.label).toBeLessThanOrEqual(20);
      if (archive.check === 8) expect(response.body.details.join(' ')).toContain('../x.md');
    }
    // Check 8: nothing was written beside or above the upload folder.
    expect(await listTree(t.config.dataDir)).toEqual(before);
    for (const escaped of ['x.md', '../x.md', '../../outside/escape.md', 'abs.md'])
      expect(existsSync(join(uploadDirOf(t.config), escaped))).toBe(false);
  });

  it('10, 16: bombs refused from declared sizes: nothing inflated, quick, memory flat', async () => {
    for (const archive of [await hostile.honestBomb(), await hostile.hugeMarkdown()]) {
      const probe = probeInflation();
      try {
        const rss = process.memoryUsage().rss;
        // Refused from the declared sizes: proven by nothing being inflated, not by a wall-clock bound.
        const response = await expectRefused(archive.bytes, 422, 'ARCHIVE_ENTRY_TOO_LARGE', archive.label);
        expect(probe.bytes, archive.label).toBe(0);
        expect((process.memoryUsage().rss - rss) / 2 ** 20, archive.label).toBeLessThan(50);
        if (archive.check === 16) expect(response.body.details[0]).toBe('docs/huge.md is 200 MB; the limit is 5 MiB');
      } finally {
        probe.restore();
      }
    }
  });

  it('15: 50,000 entries are refused from the entry count, before any entry is inflated', async () => {
    const archive = hostile.manyEntries();
    const probe = probeInflation();
    try {
      await expectRefused(archive.bytes, 422, 'ARCHIVE_TOO_MANY_ENTRIES', archive.label);
      expect(probe.bytes).toBe(0);
    } finally {
      probe.restore();
    }
  });

  it('7, 12: damage found while reading fails the import atomically (ARCHIVE_CORRUPT, no rows kept)', async () => {
    for (const archive of [hostile.badDeflate(), hostile.badCrc(), await hostile.lyingSizes()]) {
      const probe = probeInflation();
      try {
        const response = await kit.upload(archive.bytes);
        expect(response.status, archive.label).toBe(202);
        const done = await kit.waitFor(response.body.snapshot.id);
        expect(done.status, archive.label).toBe('failed');
        expect(done.errorCode, archive.label).toBe('ARCHIVE_CORRUPT');
        expect(await kit.rows(done.id)).toEqual({ pages: 0, links: 0, assets: 0 });
        // Check 12: inflation stops within one chunk past the declared 1 KiB, far below the 100 MiB bomb.
        if (archive.check === 12) expect(probe.bytes).toBeLessThan(1024 * 1024);
      } finally {
        probe.restore();
      }
      const after = await kit.state();
      expect(after.latestReady, archive.label).toEqual(baseline.latestReady);
      expect(after.unfinished).toBe(0);
      expect(after.orphanRows).toBe(0);
      expect(after.uploadFiles).toEqual([]);
    }
  });

  it('19, 20, 23: ZIP64, CP437 names and mixed content are accepted; nested archives and programs are only listed', async () => {
    const other = await importKit(t, await createDocSet(t, {}, 'Accepted archives'), 'admin');
    const cases = [...(await hostile.zip64Small()), hostile.cp437Name(), await hostile.mixedContent()];
    for (const archive of cases) {
      const done = await other.importAndWait(archive.bytes);
      expect(done.status, `${archive.label}: ${done.error}`).toBe('ready');
      if (archive.check === 20) expect(await other.pagePaths(done.id)).toEqual(['index.md', '\u00fcber.md']);
      if (archive.check === 23) {
        expect(done.pageCount).toBe(1);
        expect(done.assetCount).toBe(1);
        const ignored = done.ignored.map((i: { path: string }) => i.path);
        expect(ignored).toEqual(expect.arrayContaining(['inner.zip', 'tools/setup.exe']));
      }
    }
    const zip64Huge = await hostile.zip64Huge();
    await other.upload(zip64Huge.bytes).then((r) => expect([r.status, r.body.code]).toEqual([422, 'ARCHIVE_ENTRY_TOO_LARGE']));
  });

  it('25: hygiene sweep: upload folder empty, nothing running, no orphan rows, server healthy', async () => {
    const state = await kit.state();
    expect(state.uploadFiles).toEqual([]);
    expect(state.unfinished).toBe(0);
    expect(state.orphanRows).toBe(0);
    expect(state.latestReady).toEqual(baseline.latestReady);
    expect((await t.http.get('/api/health')).status).toBe(200);
  });
});
