/**
 * Walks a server folder (a doc set's `sourceFolder`) into the same EntryRecords the ZIP reader produces,
 * so one rule set judges both. Names are read as raw bytes and decoded as strict UTF-8; symbolic links are
 * reported, never followed; sockets, FIFOs and devices are listed as ignored and never opened.
 */
import { lstat, readdir } from 'node:fs/promises';
import { archiveError } from './archive-error.js';
import type { ArchiveLimits } from './archive-types.js';
import type { EntryRecord } from './build-plan.js';
import { checkText, nameLabel, normaliseEntryPath, type DecodedName } from './entry-name.js';

export interface WalkedFile {
  record: EntryRecord;
  /** Absolute path as bytes, exactly as the file system spells it. */
  diskPath: Buffer;
}

const SLASH = Buffer.from('/');
const strictUtf8 = new TextDecoder('utf-8', { fatal: true });

export async function walkFolder(root: string, limits: ArchiveLimits): Promise<WalkedFile[]> {
  const files: WalkedFile[] = [];
  const queue: Array<{ disk: Buffer; rel: Buffer | null; depth: number }> = [{ disk: Buffer.from(root), rel: null, depth: 0 }];
  while (queue.length > 0) {
    const dir = queue.shift()!;
    for (const dirent of await readdir(dir.disk, { withFileTypes: true, encoding: 'buffer' })) {
      const rel = dir.rel ? Buffer.concat([dir.rel, SLASH, dirent.name]) : dirent.name;
      const disk = Buffer.concat([dir.disk, SLASH, dirent.name]);
      if (dirent.isDirectory()) {
        // One level past the limit is enough for the depth check to name the folder; deeper is not walked.
        if (dir.depth + 1 <= limits.maxDepth) queue.push({ disk, rel, depth: dir.depth + 1 });
        else files.push({ diskPath: disk, record: folderRecord(Buffer.concat([rel, SLASH, Buffer.from('x')]), 0) });
        continue;
      }
      const size = dirent.isFile() ? (await lstat(disk)).size : 0;
      const record = folderRecord(rel, size);
      record.isSymlink = dirent.isSymbolicLink();
      if (!dirent.isFile() && !dirent.isSymbolicLink()) record.ignoredReason = 'not a regular file';
      files.push({ diskPath: disk, record });
      if (files.length > limits.maxEntries) {
        throw archiveError('ARCHIVE_TOO_MANY_ENTRIES', [`the folder has more than ${limits.maxEntries} files`]);
      }
    }
  }
  return files;
}

function folderRecord(rel: Buffer, size: number): EntryRecord {
  const name = decodeFolderName(rel);
  return {
    label: nameLabel(name, rel),
    name,
    isSymlink: false,
    isEncrypted: false,
    method: 0,
    size,
    compressedSize: size,
  };
}

function decodeFolderName(raw: Buffer): DecodedName {
  try {
    return checkText(strictUtf8.decode(raw));
  } catch {
    return { ok: false, problem: 'invalid UTF-8' };
  }
}

/** The plan path of a walked file, or null when its name was refused during inspection. */
export function walkedPlanPath(file: WalkedFile, top: string | null): string | null {
  if (!file.record.name.ok) return null;
  const normalised = normaliseEntryPath(file.record.name.name);
  if (!normalised.ok) return null;
  const { segments } = normalised;
  return (top !== null && segments[0] === top ? segments.slice(1) : segments).join('/');
}
