/**
 * Pass 1 of docs/threats.md, "Import pipeline": magic bytes, entry count, then one pass over central-directory records.
 * Inflates nothing and never opens a read stream, so every bomb is refused from its declared metadata.
 */
import { archiveError } from './archive-error.js';
import type { ArchivePlan, InspectOptions } from './archive-types.js';
import { buildPlan, type EntryRecord } from './build-plan.js';
import { assertZipMagic, centralDirectory, openZip, toEntryRecord } from './zip-file.js';

export async function inspectArchive(file: string, options: InspectOptions): Promise<ArchivePlan> {
  await assertZipMagic(file);
  const zip = await openZip(file);
  try {
    if (zip.entryCount > options.limits.maxEntries) {
      throw archiveError('ARCHIVE_TOO_MANY_ENTRIES', [
        `the archive has ${zip.entryCount} entries; the limit is ${options.limits.maxEntries}`,
      ]);
    }
    const records: EntryRecord[] = [];
    for await (const entry of centralDirectory(zip)) records.push(toEntryRecord(entry));
    return buildPlan(records, options);
  } finally {
    zip.close();
  }
}
