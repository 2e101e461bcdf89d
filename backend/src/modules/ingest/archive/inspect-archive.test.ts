/**
 * docs/threats.md checks 5-9, 17, 18, 20-24 at the module level: each hostile archive is refused with the
 * documented code and status, names its offenders, inflates nothing and writes no file anywhere.
 */
import { existsSync } from 'node:fs';
import { mkdir } from 'node:fs/promises';
import { join } from 'node:path';
import { afterAll, afterEach, beforeAll, describe, expect, it } from 'vitest';
import * as kit from '../../../testing/zip/hostile-archives.js';
import { attemptImport, listTree } from '../../../testing/zip/archive-test-harness.js';
import { probeInflation, type InflationProbe } from '../../../testing/zip/inflation-probe.js';
import { tempArchives, type TempArchives } from '../../../testing/zip/well-formed-zip.js';

let temp: TempArchives;
let probe: InflationProbe;
beforeAll(async () => {
  temp = await tempArchives();
});
afterEach(() => probe?.restore());
afterAll(async () => {
  await temp.cleanup();
  expect(existsSync(temp.dir)).toBe(false); // check 25: no temp archive left behind
});

async function refused(archive: kit.HostileArchive) {
  probe = probeInflation();
  const attempt = await attemptImport(await temp.write('upload.zip', archive.bytes));
  probe.restore();
  expect(attempt.error?.code, archive.label).toBe(archive.code);
  expect(attempt.error?.status).toBe(archive.code === 'ARCHIVE_NOT_ZIP' ? 415 : 422);
  expect(attempt.pages).toEqual([]);
  // Refused from metadata alone: no inflater was ever created.
  expect(probe.inflaters).toBe(0);
  return attempt.error!;
}

describe('check 5: not a ZIP -> 415 ARCHIVE_NOT_ZIP', async () => {
  for (const archive of await kit.notZip()) {
    it(archive.label, async () => {
      const error = await refused(archive);
      expect(error.message).toBe('Only .zip archives are accepted.');
    });
  }
});

describe('check 6: truncated -> 422 ARCHIVE_CORRUPT', async () => {
  for (const archive of await kit.truncated()) {
    it(archive.label, async () => {
      expect((await refused(archive)).message).toBe('The archive is damaged or incomplete.');
    });
  }
});

describe('check 8: zip slip names -> ARCHIVE_UNSAFE_PATH', () => {
  it('lists all six names and creates no file anywhere in the sandbox', async () => {
    const sandbox = join(temp.dir, 'sandbox');
    await mkdir(join(sandbox, 'work'), { recursive: true });
    const before = await listTree(temp.dir);
    const error = await refused(kit.zipSlip());
    expect(error.details).toEqual([
      '../x.md: parent-folder segment',
      '../../outside/escape.md: parent-folder segment',
      '/abs.md: absolute path',
      'C:/x.md: drive letter',
      'a\\..\\..\\x.md: parent-folder segment',
      'a/./../../x.md: parent-folder segment',
    ]);
    const after = await listTree(temp.dir);
    expect(after).toEqual(before);
  });
});

describe('check 9: symlink entries -> ARCHIVE_SYMLINK', () => {
  it('names both links', async () => {
    const error = await refused(kit.symlinks());
    expect(error.details).toEqual(['docs/secret.md', 'docs/up.md']);
  });
});

describe('check 17: encrypted -> ARCHIVE_ENCRYPTED', () => {
  for (const archive of kit.encrypted()) it(archive.label, async () => void (await refused(archive)));
});

describe('check 18: methods 12, 14, 93 -> ARCHIVE_UNSUPPORTED_COMPRESSION', () => {
  for (const archive of kit.unsupportedMethods()) {
    it(archive.label, async () => {
      const error = await refused(archive);
      expect(error.details[0]).toMatch(/^docs\/packed\.md \(method (12|14|93)\)$/);
    });
  }
});

describe('check 20: bad names -> ARCHIVE_BAD_NAME, never a 500', () => {
  for (const archive of kit.badNames()) {
    it(archive.label, async () => {
      const error = await refused(archive);
      // The detail shows controls escaped, so a bidi override cannot disguise the name in the report.
      expect(error.details[0]).not.toMatch(/[\u0000-\u001f\u007f\u202e]/u);
    });
  }
});

describe('check 21: duplicates -> ARCHIVE_DUPLICATE_PATH listing the pairs', () => {
  it('exact, case-folded and NFC/NFD pairs', async () => {
    const error = await refused(kit.duplicates());
    expect(error.details).toEqual([
      'docs/same.md <-> docs/same.md',
      'docs/Guide.md <-> docs/guide.md',
      // Labels keep each name as written (NFC then NFD), so the pair is visibly two spellings (UAX #15).
      'docs/caf\u00e9.md <-> docs/cafe\u0301.md',
    ]);
  });
});

describe('check 22: deep and long paths', () => {
  for (const archive of kit.deepAndLong()) it(archive.label, async () => void (await refused(archive)));
});

describe('check 24: empty or no Markdown -> ARCHIVE_EMPTY', async () => {
  for (const archive of await kit.emptyArchives()) {
    it(archive.label, async () => {
      expect((await refused(archive)).message).toBe('No Markdown files found.');
    });
  }
});
