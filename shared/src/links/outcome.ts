/** The resolution part of a ResolvedLink, before the link's own position is added. */
import type { ResolvedLink } from './types.js';

export type Outcome = Omit<ResolvedLink, 'sourcePath' | 'line' | 'column' | 'href' | 'kind'>;

export function outcome(status: ResolvedLink['status'], fields: Partial<Outcome> = {}): Outcome {
  return { status, targetPath: null, targetIsAsset: false, anchor: null, flags: [], reason: null, ...fields };
}
