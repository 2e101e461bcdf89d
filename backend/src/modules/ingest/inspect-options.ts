import type { DocSetSettings } from '@linkloom/shared';
import { DEFAULT_ARCHIVE_LIMITS, type InspectOptions } from './archive/index.js';

/** The archive reader's options from a doc set's settings (which files are pages, what is ignored). */
export function inspectOptions(settings: DocSetSettings): InspectOptions {
  return {
    limits: DEFAULT_ARCHIVE_LIMITS,
    pageExtensions: settings.extensions,
    ignoreGlobs: settings.ignore,
    stripTopFolder: settings.stripTopFolder,
  };
}
