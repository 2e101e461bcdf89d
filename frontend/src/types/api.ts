// Types of the HTTP contract (/work/shared/API.md) as the front end reads them.
import type { DocSetSettings, ListResult, Role, RunCounts } from '@linkloom/shared';

export type { DocSetSettings, ListResult, Role, RunCounts };

export interface User {
  id: string;
  email: string;
  name: string;
  role: Role;
  disabled?: boolean;
  createdAt?: string;
  lastSignInAt?: string | null;
}

export interface SignInResult {
  accessToken: string;
  expiresAt: string;
  user: Pick<User, 'id' | 'email' | 'name' | 'role'>;
}

export type RunStatus = 'queued' | 'running' | 'finished' | 'failed';
export type RunTrigger = 'import' | 'manual' | 'nightly';

export interface Run {
  id: string;
  /** 1, 2, 3... per doc set (shared `runViewSchema`); absent in older fixtures. */
  number?: number | null;
  snapshotId: string;
  status: RunStatus | string;
  trigger: RunTrigger;
  settings: Partial<DocSetSettings>;
  startedAt: string | null;
  finishedAt: string | null;
  iterations: number | null;
  residual: number | null;
  counts: RunCounts | null;
  error?: string | null;
  createdAt?: string;
  durationMs?: number | null;
}

export interface DocSet {
  id: string;
  name: string;
  description?: string | null;
  settings: DocSetSettings;
  createdAt?: string;
  /** Summary fields the list may carry; the card falls back to the runs list when absent. */
  latestRun?: Run | null;
  previousRun?: Run | null;
}

export type SnapshotStatus = 'received' | 'importing' | 'ready' | 'failed';

export interface SnapshotWarning {
  path: string;
  code: string;
  message: string;
}

export interface Snapshot {
  id: string;
  status: SnapshotStatus;
  progress: { done: number; total: number };
  error: string | null;
  pageCount: number | null;
  linkCount: number | null;
  assetCount: number | null;
  warnings: SnapshotWarning[];
  createdAt: string;
  createdBy: string | null;
  archiveSha256: string | null;
}

export type { RunPageItem as PageItem } from '@linkloom/shared';

export interface ScoreDistribution {
  buckets: Array<{ fromRank: number; toRank: number; share: number }>;
  topShares: { top1: number; top10: number; top50: number };
}

export interface ApiToken {
  id: string;
  name: string;
  createdAt: string;
  lastUsedAt?: string | null;
  createdBy?: string | null;
}

export interface Health {
  status: 'ok' | string;
  database: 'pglite' | 'postgres' | string;
  version: string;
  demo?: boolean;
}
