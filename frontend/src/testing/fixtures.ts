// Fixtures typed from the shared response schemas: a field the server renames breaks the build here, and
// `parsed()` runs each through its schema, as the API client does, so a wrong value fails the test.
import {
  defaultDocSetSettings,
  docSetSchema,
  runCountsSchema,
  runSchema,
  snapshotSchema,
  taskItemSchema,
  type DocSet,
  type Role,
  type Run,
  type RunCounts,
  type Snapshot,
  type TaskItem,
} from '@linkloom/shared';
import type { z, ZodType } from 'zod';
import { setSession } from '../lib/session.js';

/** The fixture after the schema's own parse: what a screen receives from the API client. */
export function parsed<S extends ZodType>(schema: S, value: z.input<S>): z.output<S> {
  return schema.parse(value);
}

/** `{ items, total, page, pageSize }` as every list route answers. */
export function pagedList<T>(items: T[], page = 1, pageSize = 50) {
  return { items, total: items.length, page, pageSize };
}

export function counts(overrides: Partial<RunCounts> = {}): RunCounts {
  return parsed(runCountsSchema, {
    pages: 120,
    links: 900,
    internalLinks: 700,
    externalLinks: 200,
    brokenLinks: 9,
    brokenAnchors: 3,
    brokenAssets: 1,
    unsafeLinks: 0,
    ambiguousLinks: 0,
    redirectedLinks: 0,
    outOfScopeLinks: 0,
    orphans: 7,
    deadEnds: 4,
    unreachable: 2,
    deepPages: 5,
    islands: 1,
    ...overrides,
  });
}

export function run(id: string, day: number, overrides: Partial<Run> = {}): Run {
  const start = `2026-11-${String(day).padStart(2, '0')}T10:00:00Z`;
  return parsed(runSchema, {
    id,
    number: null,
    docSetId: 'd1',
    snapshotId: `s-${id}`,
    status: 'finished',
    trigger: 'import',
    settings: defaultDocSetSettings(),
    createdAt: start,
    startedAt: start,
    finishedAt: `2026-11-${String(day).padStart(2, '0')}T10:00:02Z`,
    iterations: 40,
    residual: 1e-9,
    durationMs: 2000,
    counts: counts(),
    warnings: [],
    error: null,
    createdBy: null,
    ...overrides,
  });
}

export function docSet(id: string, name: string, overrides: Partial<DocSet> = {}): DocSet {
  return parsed(docSetSchema, {
    id,
    name,
    description: '',
    settings: defaultDocSetSettings(),
    createdAt: '2026-11-01T09:00:00Z',
    updatedAt: '2026-11-01T09:00:00Z',
    ...overrides,
  });
}

export function snapshot(id: string, overrides: Partial<Snapshot> = {}): Snapshot {
  return parsed(snapshotSchema, {
    id,
    docSetId: 'd1',
    status: 'ready',
    source: 'upload',
    label: null,
    progress: { done: 0, total: 0 },
    error: null,
    errorCode: null,
    pageCount: 0,
    linkCount: 0,
    assetCount: 0,
    reusedPageCount: 0,
    warnings: [],
    ignored: [],
    createdAt: '2026-11-01T09:00:00Z',
    createdBy: null,
    finishedAt: null,
    archiveSha256: null,
    archiveBytes: null,
    importMs: null,
    ...overrides,
  });
}

/** A fix task as the tasks API answers it (the home screen lists them as well as the tasks screens). */
export function task(id: string, overrides: Partial<TaskItem> = {}): TaskItem {
  return parsed(taskItemSchema, {
    id,
    docSetId: 'd1',
    docSetName: 'Handbook',
    pagePath: 'index.md',
    kind: 'add-inbound-links',
    title: 'Link to this page',
    details: '',
    finding: {},
    assignee: null,
    priority: 'normal',
    dueDate: null,
    overdue: false,
    status: 'open',
    verification: null,
    verifiedAt: null,
    check: null,
    createdAt: '2026-11-30T09:00:00Z',
    updatedAt: '2026-11-30T09:00:00Z',
    ...overrides,
  });
}

export function signInAs(role: Role): void {
  setSession({
    accessToken: 'test-token',
    expiresAt: '2999-01-01T00:00:00Z',
    user: { id: 'u1', email: 'ada@example.test', name: 'Ada', role },
  });
}
