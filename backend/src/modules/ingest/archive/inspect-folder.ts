/**
 * `sourceFolder` re-reads: the same plan and the same checks as an uploaded archive. Reading re-walks the
 * folder (names on disk may be NFD while plan paths are NFC), opens each page with O_NOFOLLOW, checks the
 * folder it sits in still resolves inside the root, and reads at most the inspected size plus one byte.
 */
import { constants } from 'node:fs';
import { open, realpath } from 'node:fs/promises';
import { dirname, sep } from 'node:path';
import { archiveError, type ArchiveError } from './archive-error.js';
import type { ArchiveLimits, ArchivePlan, InspectOptions, PageBytes, ReadMeter } from './archive-types.js';
import { buildPlan } from './build-plan.js';
import { walkedPlanPath, walkFolder, type WalkedFile } from './folder-walk.js';

export async function inspectFolder(root: string, options: InspectOptions): Promise<ArchivePlan> {
  const files = await walkFolder(root, options.limits);
  return buildPlan(
    files.map((file) => file.record),
    options,
  );
}

export async function* readFolderPages(
  root: string,
  plan: ArchivePlan,
  limits: ArchiveLimits,
  meter?: ReadMeter,
): AsyncGenerator<PageBytes> {
  const realRoot = await realpath(root);
  const byPath = new Map<string, WalkedFile>();
  for (const file of await walkFolder(root, limits)) {
    const path = walkedPlanPath(file, plan.topFolderStripped);
    if (path !== null && !file.record.isSymlink) byPath.set(path, file);
  }
  for (const info of plan.entries) {
    if (info.kind !== 'page') continue;
    const file = byPath.get(info.path);
    if (!file) throw changed(info.path, 'is missing or is no longer a regular file');
    if (info.size > limits.maxEntryBytes) throw changed(info.path, 'is larger than the limit');
    const bytes = await readPinned(file.diskPath, info.size, realRoot, info.path);
    if (meter) {
      meter.entriesOpened += 1;
      meter.bytesRead += bytes.length;
    }
    yield { path: info.path, bytes };
  }
}

async function readPinned(diskPath: Buffer, size: number, realRoot: string, path: string): Promise<Buffer> {
  let handle;
  try {
    handle = await open(diskPath, constants.O_RDONLY | constants.O_NOFOLLOW);
  } catch {
    throw changed(path, 'cannot be opened (missing, or replaced by a link)');
  }
  try {
    const stat = await handle.stat();
    // latin1 maps bytes one to one, so the parent folder's bytes survive the string round trip.
    const parent = await realpath(Buffer.from(dirname(diskPath.toString('latin1')), 'latin1'));
    if (!stat.isFile() || stat.size !== size) throw changed(path, 'changed since it was inspected');
    if (parent !== realRoot && !parent.startsWith(realRoot + sep)) throw changed(path, 'now resolves outside the folder');
    const buffer = Buffer.alloc(size + 1);
    const { bytesRead } = await handle.read(buffer, 0, size + 1, 0);
    if (bytesRead !== size) throw changed(path, 'changed since it was inspected');
    return buffer.subarray(0, size);
  } finally {
    await handle.close();
  }
}

function changed(path: string, reason: string): ArchiveError {
  return archiveError('ARCHIVE_CORRUPT', [`${path} ${reason}`]);
}
