/**
 * Pass 2: page bytes come back exactly as written (yazl is the reference writer), assets are never opened,
 * and damage that only shows while inflating (checks 7 and 12) surfaces as ARCHIVE_CORRUPT naming the entry.
 */
import { existsSync } from 'node:fs';
import yauzl from 'yauzl';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import * as kit from '../../../testing/zip/hostile-archives.js';
import { attemptImport, defaultOptions } from '../../../testing/zip/archive-test-harness.js';
import { probeInflation } from '../../../testing/zip/inflation-probe.js';
import { tempArchives, wellFormedZip, type TempArchives } from '../../../testing/zip/well-formed-zip.js';

let temp: TempArchives;
beforeAll(async () => {
  temp = await tempArchives();
});
afterAll(async () => {
  await temp.cleanup();
  expect(existsSync(temp.dir)).toBe(false);
});

const guide = '# Guide\n\nSee [home](../index.md) and ![logo](img/logo.png).\n'.repeat(40);

describe('reading accepted archives', () => {
  it('returns page bytes unchanged, opens pages only, and the probes see real inflation', async () => {
    const bytes = await wellFormedZip({
      'site/index.md': '# Home\n',
      'site/docs/guide.md': guide,
      'site/img/logo.png': Buffer.alloc(2048, 3),
    });
    const openReadStream = vi.spyOn(yauzl.ZipFile.prototype, 'openReadStream');
    const probe = probeInflation();
    try {
      const attempt = await attemptImport(await temp.write('ok.zip', bytes));
      expect(attempt.error).toBeUndefined();
      expect(attempt.plan?.topFolderStripped).toBe('site');
      expect(attempt.plan?.entries.map((e) => [e.path, e.kind])).toEqual([
        ['index.md', 'page'],
        ['docs/guide.md', 'page'],
        ['img/logo.png', 'asset'],
      ]);
      expect(attempt.pages.map((p) => [p.path, p.bytes.toString('utf8')])).toEqual([
        ['index.md', '# Home\n'],
        ['docs/guide.md', guide],
      ]);
      // Positive control for the bomb tests: these counters do move when something is inflated.
      expect(openReadStream).toHaveBeenCalledTimes(2);
      expect(probe.inflaters).toBe(2);
      expect(probe.bytes).toBe(Buffer.byteLength('# Home\n') + Buffer.byteLength(guide));
      expect(attempt.meter).toEqual({ bytesRead: probe.bytes, entriesOpened: 2 });
    } finally {
      probe.restore();
      openReadStream.mockRestore();
    }
  });

  it('reads stored (method 0) entries and keeps the top folder when asked to', async () => {
    const bytes = await wellFormedZip({ 'site/index.md': '# Home\n' }, { store: true });
    const attempt = await attemptImport(await temp.write('stored.zip', bytes), defaultOptions({ stripTopFolder: false }));
    expect(attempt.plan?.topFolderStripped).toBeNull();
    expect(attempt.pages.map((p) => [p.path, p.bytes.toString()])).toEqual([['site/index.md', '# Home\n']]);
  });

  it('check 19: small ZIP64 archives are read', async () => {
    for (const archive of await kit.zip64Small()) {
      const attempt = await attemptImport(await temp.write('zip64.zip', archive.bytes));
      expect(attempt.error, archive.label).toBeUndefined();
      expect(attempt.pages.map((p) => p.path)).toEqual(['index.md', 'guide.md']);
      expect(attempt.pages[1].bytes.toString()).toBe('# Guide\n');
    }
  });

  it('check 20: a CP437 name (bit 11 clear, 0x81) is read as "ü"', async () => {
    const attempt = await attemptImport(await temp.write('cp437.zip', kit.cp437Name().bytes));
    // IBM code page 437: 0x81 -> U+00FC LATIN SMALL LETTER U WITH DIAERESIS (Unicode Consortium mapping
    // file VENDORS/MICSFT/PC/CP437.TXT; value from memory).
    expect(attempt.pages.map((p) => p.path)).toEqual(['index.md', '\u00fcber.md']);
    expect(attempt.pages[1].bytes.toString()).toBe('# \u00dcber\n');
  });

  it('check 23: inner zip, image and exe are listed, never opened', async () => {
    const openReadStream = vi.spyOn(yauzl.ZipFile.prototype, 'openReadStream');
    try {
      const attempt = await attemptImport(await temp.write('mixed.zip', (await kit.mixedContent()).bytes));
      expect(attempt.pages.map((p) => p.path)).toEqual(['index.md']);
      expect(openReadStream).toHaveBeenCalledTimes(1);
      expect(attempt.plan?.entries.map((e) => [e.path, e.kind])).toEqual([
        ['index.md', 'page'],
        ['img/logo.png', 'asset'],
      ]);
      expect(attempt.plan?.ignored.map((e) => [e.path, e.ignoredReason])).toEqual([
        ['inner.zip', 'nested archive (not opened)'],
        ['tools/setup.exe', 'executable (not run)'],
        ['__MACOSX/site/._index.md', 'macOS resource fork (__MACOSX)'],
        ['.DS_Store', 'hidden file or folder'],
      ]);
    } finally {
      openReadStream.mockRestore();
    }
  });
});

describe('damage found while reading -> ARCHIVE_CORRUPT naming the entry', () => {
  it('check 7: corrupted deflate bytes', async () => {
    const attempt = await attemptImport(await temp.write('deflate.zip', kit.badDeflate().bytes));
    expect(attempt.plan).toBeDefined(); // metadata is fine; the damage is inside the stream
    expect(attempt.error?.code).toBe('ARCHIVE_CORRUPT');
    // RFC 1951 section 3.2.3: block type 11 is reserved ("error"); zlib reports "invalid block type".
    expect(attempt.error?.details).toEqual(['docs/guide.md has invalid compressed data (invalid block type)']);
  });

  it('check 7: wrong CRC-32 in the central directory (yauzl does not check it; we do)', async () => {
    const attempt = await attemptImport(await temp.write('crc.zip', kit.badCrc().bytes));
    expect(attempt.error?.code).toBe('ARCHIVE_CORRUPT');
    expect(attempt.error?.details).toEqual(['docs/guide.md fails its CRC-32 check']);
  });

  it('check 12: lying sizes stop within one inflate chunk of the declared 1 KiB', async () => {
    const probe = probeInflation();
    try {
      const attempt = await attemptImport(await temp.write('liar.zip', (await kit.lyingSizes()).bytes));
      console.info(`check 12: reader saw ${attempt.meter.bytesRead} bytes, zlib inflated ${probe.bytes} bytes of 100 MiB`);
      expect(attempt.error?.code).toBe('ARCHIVE_CORRUPT');
      expect(attempt.error?.details).toEqual(['docs/liar.md inflates past its declared size']);
      // Node's zlib chunkSize default is 16 KiB (Node.js docs, zlib "Class: Options"): declared + one chunk.
      expect(attempt.meter.bytesRead).toBeLessThanOrEqual(1024 + 16 * 1024);
      expect(probe.bytes).toBeLessThanOrEqual(1024 + 4 * 16 * 1024);
    } finally {
      probe.restore();
    }
  });
});
