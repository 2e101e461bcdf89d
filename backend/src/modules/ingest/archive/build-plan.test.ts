import { describe, expect, it } from 'vitest';
import { ArchiveError } from './archive-error.js';
import { DEFAULT_ARCHIVE_LIMITS, type InspectOptions } from './archive-types.js';
import { buildPlan, type EntryRecord } from './build-plan.js';

const options = (overrides: Partial<InspectOptions> = {}): InspectOptions => ({
  limits: DEFAULT_ARCHIVE_LIMITS,
  pageExtensions: ['md'],
  ignoreGlobs: [],
  stripTopFolder: true,
  ...overrides,
});

function record(name: string, extra: Partial<EntryRecord> = {}): EntryRecord {
  return {
    label: name,
    name: { ok: true, name },
    isSymlink: false,
    isEncrypted: false,
    method: 8,
    size: 100,
    compressedSize: 60,
    ...extra,
  };
}

function refusal(records: EntryRecord[], opts = options()): ArchiveError {
  try {
    buildPlan(records, opts);
  } catch (error) {
    if (error instanceof ArchiveError) return error;
    throw error;
  }
  throw new Error('expected an ArchiveError');
}

describe('buildPlan', () => {
  it('reports the most severe kind: an escape attempt outranks a symlink and a size problem', () => {
    const error = refusal([record('a.md', { isSymlink: true }), record('../b.md'), record('c.md', { size: 6 * 1024 * 1024 })]);
    expect(error.code).toBe('ARCHIVE_UNSAFE_PATH');
    expect(error.details).toEqual(['../b.md: parent-folder segment']);
  });

  it('lists at most 20 offenders and says how many there were', () => {
    const error = refusal(Array.from({ length: 25 }, (_, i) => record(`x${i}.md`, { isSymlink: true })));
    expect(error.code).toBe('ARCHIVE_SYMLINK');
    expect(error.details).toHaveLength(20);
    expect(error.message).toMatch(/25 entries are affected; the first 20 are listed\.$/);
  });

  it('strips one shared top folder, ignoring __MACOSX and hidden root files', () => {
    const plan = buildPlan(
      [record('book/'), record('book/a.md'), record('book/img/x.png'), record('__MACOSX/book/._a.md'), record('.DS_Store')],
      options(),
    );
    expect(plan.topFolderStripped).toBe('book');
    expect(plan.entries.map((e) => e.path)).toEqual(['a.md', 'img/x.png']);
    expect(plan.ignored.map((e) => e.path)).toEqual(['__MACOSX/book/._a.md', '.DS_Store']);
  });

  it('does not strip when entries sit in two folders or at the root', () => {
    expect(buildPlan([record('a/x.md'), record('b/y.md')], options()).topFolderStripped).toBeNull();
    expect(buildPlan([record('a/x.md'), record('y.md')], options()).topFolderStripped).toBeNull();
  });

  it('applies ignore globs (picomatch) to the stripped path', () => {
    const plan = buildPlan([record('site/a.md'), record('site/drafts/b.md')], options({ ignoreGlobs: ['drafts/**'] }));
    expect(plan.entries.map((e) => e.path)).toEqual(['a.md']);
    expect(plan.ignored).toEqual([
      { path: 'drafts/b.md', size: 100, compressedSize: 60, kind: 'ignored', ignoredReason: 'matches an ignore pattern' },
    ]);
  });

  it('accepts page extensions with or without the dot, in any case', () => {
    const plan = buildPlan([record('a.MD'), record('b.markdown')], options({ pageExtensions: ['.md', 'Markdown'] }));
    expect(plan.entries.map((e) => e.kind)).toEqual(['page', 'page']);
  });

  it('caps assets only when maxAssetEntryBytes is set', () => {
    const big = record('photo.png', { size: 20 * 1024 * 1024, compressedSize: 19 * 1024 * 1024 });
    expect(buildPlan([record('a.md'), big], options()).entries).toHaveLength(2);
    const error = refusal([record('a.md'), big], options({ limits: { ...DEFAULT_ARCHIVE_LIMITS, maxAssetEntryBytes: 10 * 1024 * 1024 } }));
    expect(error.details).toEqual(['photo.png is 20 MiB; the limit is 10 MiB']);
  });

  it('exempts small archives from the ratio rules (ratioMinBytes)', () => {
    // 900 KiB of repetitive Markdown compressing 300:1 is ordinary, not a bomb.
    const plan = buildPlan([record('a.md', { size: 900 * 1024, compressedSize: 3 * 1024 })], options());
    expect(plan.totalBytes).toBe(900 * 1024);
  });

  it('counts ignored entries in the total', () => {
    const error = refusal([record('a.md'), record('big.bin', { size: 201 * 1024 * 1024, compressedSize: 200 * 1024 * 1024 })]);
    expect(error.code).toBe('ARCHIVE_UNCOMPRESSED_TOO_LARGE');
  });

  it('finds quoted overlaps, not only equal offsets (D. Fifield, "A better zip bomb", WOOT 2019: the quoted-overlap construction)', () => {
    const a = record('a.md', { span: { start: 0, end: 500 } });
    const b = record('b.md', { span: { start: 400, end: 900 } });
    const c = record('c.md', { span: { start: 900, end: 1000 } });
    expect(refusal([a, b, c]).details).toEqual(['b.md overlaps a.md']);
  });
});
