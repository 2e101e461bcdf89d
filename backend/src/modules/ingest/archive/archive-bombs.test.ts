/**
 * docs/threats.md checks 10, 11, 13-16 and 19 (2^40 declared): every bomb is refused from declared
 * metadata. Asserted: the code, the details, zero inflaters created, zero entries opened, and (check 15)
 * not one central-directory record read. Wall time and RSS growth are measured and printed, not asserted.
 */
import { existsSync } from 'node:fs';
import yauzl from 'yauzl';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import * as kit from '../../../testing/zip/hostile-archives.js';
import { attemptImport } from '../../../testing/zip/archive-test-harness.js';
import { measure, probeInflation } from '../../../testing/zip/inflation-probe.js';
import { tempArchives, type TempArchives } from '../../../testing/zip/well-formed-zip.js';

let temp: TempArchives;
const figures: string[] = [];
beforeAll(async () => {
  temp = await tempArchives();
});
afterAll(async () => {
  console.info(`archive bomb figures (module level):\n${figures.join('\n')}`);
  await temp.cleanup();
  expect(existsSync(temp.dir)).toBe(false);
});

async function refusedWithoutInflating(archive: kit.HostileArchive) {
  const file = await temp.write('bomb.zip', archive.bytes);
  const openReadStream = vi.spyOn(yauzl.ZipFile.prototype, 'openReadStream');
  const probe = probeInflation();
  try {
    const run = await measure(() => attemptImport(file));
    const attempt = run.result!;
    figures.push(
      `check ${archive.check} ${archive.label}: ${attempt.error?.code}, ${(archive.bytes.length / 1024).toFixed(0)} KiB file, ` +
        `${run.ms.toFixed(1)} ms, rss delta ${run.rssDeltaMb.toFixed(1)} MB, inflated ${probe.bytes} bytes`,
    );
    expect(attempt.error?.code, archive.label).toBe(archive.code);
    expect(attempt.error?.status).toBe(422);
    expect(probe.inflaters).toBe(0);
    expect(probe.bytes).toBe(0);
    expect(openReadStream).not.toHaveBeenCalled();
    expect(attempt.meter).toEqual({ bytesRead: 0, entriesOpened: 0 });
    return attempt.error!;
  } finally {
    probe.restore();
    openReadStream.mockRestore();
  }
}

describe('bombs are refused before anything is inflated', () => {
  it('check 10: honest 200 MiB bomb -> ARCHIVE_ENTRY_TOO_LARGE', async () => {
    const archive = await kit.honestBomb();
    // Deflate tops out near 1032:1 (Fifield, "A better zip bomb"): 200 MiB of zeros is about 200 KB.
    expect(archive.bytes.length).toBeGreaterThan(190_000);
    expect(archive.bytes.length).toBeLessThan(260_000);
    const error = await refusedWithoutInflating(archive);
    expect(error.details).toEqual(['docs/zeros.md is 200 MiB; the limit is 5 MiB']);
  });

  it('check 11: 4 MiB entry compressed to ~4 KiB -> ARCHIVE_RATIO_EXCEEDED', async () => {
    const error = await refusedWithoutInflating(await kit.ratioBomb());
    expect(error.details[0]).toMatch(/^docs\/flat\.md expands \d+:1; the limit is 100:1$/);
  });

  it('check 13: 500 records on one local entry -> ARCHIVE_OVERLAPPING_ENTRIES', async () => {
    const error = await refusedWithoutInflating(await kit.overlapBomb());
    expect(error.details).toHaveLength(20);
    expect(error.message).toContain('500 entries are affected; the first 20 are listed.');
  });

  it('check 14: 60 honest 4 MiB entries -> ARCHIVE_UNCOMPRESSED_TOO_LARGE', async () => {
    const error = await refusedWithoutInflating(await kit.totalCap());
    expect(error.details).toEqual(['the archive unpacks to 240 MiB; the limit is 200 MiB']);
  });

  it('check 15: 50,000 one-byte entries -> ARCHIVE_TOO_MANY_ENTRIES before any record is read', async () => {
    const readEntry = vi.spyOn(yauzl.ZipFile.prototype, 'readEntry');
    try {
      const error = await refusedWithoutInflating(kit.manyEntries());
      expect(error.details).toEqual(['the archive has 50000 entries; the limit is 10000']);
      expect(readEntry).not.toHaveBeenCalled();
    } finally {
      readEntry.mockRestore();
    }
  });

  it('check 16: one 200 MB Markdown file, deflated -> the documented sentence', async () => {
    const error = await refusedWithoutInflating(await kit.hugeMarkdown());
    expect(error.details).toEqual(['docs/huge.md is 200 MB; the limit is 5 MiB']);
  });

  it('check 19: ZIP64 entry declaring 2^40 bytes -> refused by the caps', async () => {
    const error = await refusedWithoutInflating(await kit.zip64Huge());
    expect(error.details).toEqual(['docs/tera.md is 1 TiB; the limit is 5 MiB']);
  });
});
