/** `sourceFolder` re-reads: the same rules as archives, symlinks refused, changes after inspection caught. */
import { mkdir, mkdtemp, rm, symlink, writeFile } from 'node:fs/promises';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterEach, beforeEach, describe, expect, it } from 'vitest';
import { ArchiveError } from './archive-error.js';
import { DEFAULT_ARCHIVE_LIMITS, type InspectOptions, type PageBytes } from './archive-types.js';
import { inspectFolder, readFolderPages } from './inspect-folder.js';

let sandbox: string;
let root: string;
const options: InspectOptions = { limits: DEFAULT_ARCHIVE_LIMITS, pageExtensions: ['md'], ignoreGlobs: [], stripTopFolder: true };

beforeEach(async () => {
  sandbox = await mkdtemp(join(tmpdir(), 'linkloom-folder-'));
  root = join(sandbox, 'source');
  await mkdir(join(root, 'site', 'docs'), { recursive: true });
  await writeFile(join(root, 'site', 'index.md'), '# Home\n');
  await writeFile(join(root, 'site', 'docs', 'guide.md'), '# Guide\n');
  await writeFile(join(root, 'site', 'logo.png'), Buffer.alloc(16));
});
afterEach(() => rm(sandbox, { recursive: true, force: true }));

async function readAll(plan: Awaited<ReturnType<typeof inspectFolder>>): Promise<PageBytes[]> {
  const pages: PageBytes[] = [];
  for await (const page of readFolderPages(root, plan, DEFAULT_ARCHIVE_LIMITS)) pages.push(page);
  return pages;
}

async function codeOf(run: () => Promise<unknown>): Promise<ArchiveError> {
  const error = await run().then(
    () => undefined,
    (caught: unknown) => caught,
  );
  expect(error).toBeInstanceOf(ArchiveError);
  return error as ArchiveError;
}

describe('inspectFolder / readFolderPages', () => {
  it('plans and reads a folder like an archive, NFD names included', async () => {
    await writeFile(join(root, 'site', 'cafe\u0301.md'), '# Caf\u00e9\n');
    const plan = await inspectFolder(root, options);
    expect(plan.topFolderStripped).toBe('site');
    expect(plan.entries.map((e) => [e.path, e.kind]).sort()).toEqual([
      ['caf\u00e9.md', 'page'],
      ['docs/guide.md', 'page'],
      ['index.md', 'page'],
      ['logo.png', 'asset'],
    ]);
    const pages = await readAll(plan);
    expect(pages.map((p) => [p.path, p.bytes.toString()]).sort()).toEqual([
      ['caf\u00e9.md', '# Caf\u00e9\n'],
      ['docs/guide.md', '# Guide\n'],
      ['index.md', '# Home\n'],
    ]);
  });

  it('refuses symbolic links, inside or pointing outside', async () => {
    await writeFile(join(sandbox, 'secret.md'), 'secret');
    await symlink(join(sandbox, 'secret.md'), join(root, 'site', 'leak.md'));
    const error = await codeOf(() => inspectFolder(root, options));
    expect([error.code, error.details]).toEqual(['ARCHIVE_SYMLINK', ['site/leak.md']]);
  });

  it('refuses names that are not valid UTF-8', async () => {
    await writeFile(Buffer.concat([Buffer.from(join(root, 'site') + '/'), Buffer.from([0xff, 0x2e, 0x6d, 0x64])]), 'x');
    expect((await codeOf(() => inspectFolder(root, options))).code).toBe('ARCHIVE_BAD_NAME');
  });

  it('stops walking past maxEntries', async () => {
    const limits = { ...DEFAULT_ARCHIVE_LIMITS, maxEntries: 2 };
    expect((await codeOf(() => inspectFolder(root, { ...options, limits }))).code).toBe('ARCHIVE_TOO_MANY_ENTRIES');
  });

  it('fails with ARCHIVE_CORRUPT when a page grows after inspection', async () => {
    const plan = await inspectFolder(root, options);
    await writeFile(join(root, 'site', 'index.md'), '# Home, now longer\n');
    const error = await codeOf(() => readAll(plan));
    expect([error.code, error.details]).toEqual(['ARCHIVE_CORRUPT', ['index.md changed since it was inspected']]);
  });

  it('does not follow a page swapped for a symlink after inspection', async () => {
    const plan = await inspectFolder(root, options);
    await writeFile(join(sandbox, 'outside.md'), '# Home\n');
    await rm(join(root, 'site', 'index.md'));
    await symlink(join(sandbox, 'outside.md'), join(root, 'site', 'index.md'));
    const error = await codeOf(() => readAll(plan));
    expect(error.code).toBe('ARCHIVE_CORRUPT');
    expect(error.details[0]).toMatch(/^index\.md /);
  });
});
