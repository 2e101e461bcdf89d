/** Public surface of the safe archive reader, used by the upload route and the import pipeline. */
export { ArchiveError, formatBytes, type ArchiveErrorCode } from './archive-error.js';
export {
  DEFAULT_ARCHIVE_LIMITS,
  type ArchiveEntryInfo,
  type ArchiveLimits,
  type ArchivePlan,
  type InspectOptions,
  type PageBytes,
  type ReadMeter,
} from './archive-types.js';
export { inspectArchive } from './inspect-archive.js';
export { readPageEntries } from './read-page-entries.js';
export { inspectFolder, readFolderPages } from './inspect-folder.js';
