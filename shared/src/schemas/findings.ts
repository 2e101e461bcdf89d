import { z } from 'zod';
import { listOf, named, pagedShape, recordId } from './contract.js';

/** How a link resolved (docs/api.md "Runs"); the links list filters by it with `status=`. */
export const LINK_STATUSES = ['broken', 'broken-anchor', 'unsafe', 'ambiguous', 'redirected', 'out-of-scope', 'external', 'ok'] as const;
export const linkStatusSchema = z.enum(LINK_STATUSES);
export type LinkStatus = z.infer<typeof linkStatusSchema>;

export const linkItemSchema = named(
  'LinkItem',
  z.object({
    sourcePath: z.string(),
    line: z.int().nonnegative(),
    column: z.int().nonnegative(),
    /** The href as a link target, or null when it is not safe to follow (unsafe scheme): show `hrefText` instead. */
    href: z.string().nullable(),
    /** The raw text of the href, always as text, never as a link. */
    hrefText: z.string(),
    targetPath: z.string().nullable(),
    anchor: z.string().nullable(),
    kind: z.string(),
    status: linkStatusSchema,
    reason: z.string().nullable(),
  }),
);
export const linkListSchema = listOf('LinkList', linkItemSchema);

/** One missing target with the pages that link to it: fixing (or creating) it repairs every link in the row. */
export const linkTargetGroupSchema = named(
  'LinkTargetGroup',
  z.object({
    /** The resolved path that does not exist, or the raw href when it resolved to no path. */
    targetPath: z.string(),
    linkCount: z.int().positive(),
    sourcePageCount: z.int().positive(),
    /** The first link of each source page, in path order; at most LINK_TARGET_SOURCES of them. */
    sources: z.array(z.object({ sourcePath: z.string(), line: z.int().nonnegative(), column: z.int().nonnegative() })),
  }),
);
/** Source pages listed per missing target; `sourcePageCount` tells how many there are in all. */
export const LINK_TARGET_SOURCES = 100;
export const linkTargetGroupListSchema = named(
  'LinkTargetGroupList',
  z.object({ ...pagedShape(linkTargetGroupSchema), groupBy: z.literal('target') }),
  'The links list with `groupBy=target`: one row per missing target.',
);

export const islandSchema = named(
  'Island',
  z.object({
    islandId: z.int(),
    pageCount: z.int().positive(),
    /** The island's pages by rank, at most 200 of them (`pageCount` counts all). */
    pages: z.array(z.object({ path: z.string(), title: z.string(), stationaryScore: z.number().nonnegative() })),
  }),
  'A group of pages linked among themselves that no entry page reaches.',
);
export const islandListSchema = listOf('IslandList', islandSchema);

const share = z.number().min(0);
export const scoreDistributionSchema = named(
  'ScoreDistribution',
  z.object({
    /** Share of the total score held by each tenth of the ranking, best pages first. */
    buckets: z.array(z.object({ fromRank: z.int().positive(), toRank: z.int().positive(), share })),
    topShares: z.object({ top1: share, top10: share, top50: share }),
  }),
);

const pageChange = z.object({ path: z.string(), title: z.string() });
const linkChange = z.object({ sourcePath: z.string(), href: z.string() });
const changes = <T extends z.ZodType>(item: T) => {
  const list = z.object({ total: z.int().nonnegative(), items: z.array(item) });
  return z.object({ appeared: list, disappeared: list });
};
const pageChanges = changes(pageChange);
const linkChanges = changes(linkChange);

/** What appeared in a run and disappeared since another, per finding kind; totals are exact, item lists capped. */
export const runDiffSchema = named(
  'RunDiff',
  z.object({
    runId: recordId,
    againstRunId: recordId,
    kinds: z.object({
      /** Pages added to the doc set (appeared) and removed from it (disappeared), by path. */
      pages: pageChanges,
      orphans: pageChanges,
      deadEnds: pageChanges,
      unreachable: pageChanges,
      deepPages: pageChanges,
      islandPages: pageChanges,
      brokenLinks: linkChanges,
      brokenAnchors: linkChanges,
      unsafeLinks: linkChanges,
      ambiguousLinks: linkChanges,
    }),
    /** The largest score changes of pages present in both runs. */
    scoreMoves: z.array(z.object({ path: z.string(), title: z.string(), before: z.number(), after: z.number(), change: z.number() })),
  }),
);

export type LinkItem = z.infer<typeof linkItemSchema>;
export type LinkTargetGroup = z.infer<typeof linkTargetGroupSchema>;
export type Island = z.infer<typeof islandSchema>;
export type ScoreDistribution = z.infer<typeof scoreDistributionSchema>;
export type RunDiff = z.infer<typeof runDiffSchema>;
export type RunDiffKind = keyof RunDiff['kinds'];

/** The links route answers either shape; the grouped one first, as only it carries `groupBy`. */
export const linkListOrGroupsSchema = named('LinkListOrGroups', z.union([linkTargetGroupListSchema, linkListSchema]));
