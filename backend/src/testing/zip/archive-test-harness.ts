/**
 * Shared set-up for module-level archive tests: a private temp folder, default inspect options, and a
 * helper that runs inspection (and, when asked, page reading) and returns the ArchiveError it raised.
 */
import { readdir } from 'node:fs/promises';
import { join } from 'node:path';
import {
  ArchiveError,
  DEFAULT_ARCHIVE_LIMITS,
  inspectArchive,
  readPageEntries,
  type ArchivePlan,
  type InspectOptions,
  type PageBytes,
  type ReadMeter,
} from '../../modules/ingest/archive/index.js';

export const defaultOptions = (overrides: Partial<InspectOptions> = {}): InspectOptions => ({
  limits: DEFAULT_ARCHIVE_LIMITS,
  pageExtensions: ['.md', '.markdown'],
  ignoreGlobs: [],
  stripTopFolder: true,
  ...overrides,
});

export interface ImportAttempt {
  plan?: ArchivePlan;
  pages: PageBytes[];
  error?: ArchiveError;
  meter: ReadMeter;
}

/** Inspection then reading, as the import pipeline will do; any non-ArchiveError is rethrown (a 500). */
export async function attemptImport(file: string, options: InspectOptions = defaultOptions()): Promise<ImportAttempt> {
  const attempt: ImportAttempt = { pages: [], meter: { bytesRead: 0, entriesOpened: 0 } };
  try {
    attempt.plan = await inspectArchive(file, options);
    for await (const page of readPageEntries(file, attempt.plan, options.limits, attempt.meter)) attempt.pages.push(page);
  } catch (error) {
    if (!(error instanceof ArchiveError)) throw error;
    attempt.error = error;
  }
  return attempt;
}

/** Every path under `root`, recursively, sorted: a before/after listing shows files appearing anywhere. */
export async function listTree(root: string): Promise<string[]> {
  const entries = await readdir(root, { recursive: true, withFileTypes: true });
  return entries.map((entry) => join(entry.parentPath ?? entry.path, entry.name)).sort();
}
