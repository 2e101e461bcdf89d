import { join } from 'node:path';
import type { AppConfig } from '../../../config/app-config.js';

/** The dedicated folder for uploads in flight; it is emptied at start, so nothing else may live there. */
export const uploadDirOf = (config: AppConfig): string => join(config.dataDir, 'tmp', 'uploads');

/** Scratch folders for imports of generated files (the demo doc set). */
export const scratchDirOf = (config: AppConfig): string => join(config.dataDir, 'tmp', 'scratch');
