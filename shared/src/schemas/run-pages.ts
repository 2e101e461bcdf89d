import { z } from 'zod';
import { isoDateTime, named, pagedShape, recordId } from './contract.js';

/** A page of a run as the page list and the page detail return it (docs/api.md "Runs"). */
export const runPageItemSchema = named(
  'RunPageItem',
  z.object({
    path: z.string(),
    title: z.string(),
    stationaryScore: z.number().nonnegative(),
    timesAverage: z.number().nonnegative(),
    rank: z.int().positive(),
    inboundCount: z.int().nonnegative(),
    outboundCount: z.int().nonnegative(),
    /** Link steps from the nearest entry page; null when no entry page reaches it. */
    depth: z.int().nonnegative().nullable(),
    reachable: z.boolean(),
    orphan: z.boolean(),
    deadEnd: z.boolean(),
    deep: z.boolean(),
    island: z.boolean(),
    /** Which island the page belongs to (the same number groups the islands list); null when on none. */
    islandId: z.int().nullable(),
    brokenLinkCount: z.int().nonnegative(),
    wordCount: z.int().nonnegative(),
  }),
);
export type RunPageItem = z.infer<typeof runPageItemSchema>;

export const runPageListSchema = named(
  'RunPageList',
  z.object({ ...pagedShape(runPageItemSchema), runId: recordId }),
  "A page of the run's pages; `runId` names the run that `latest` resolved to.",
);

const linkedPageSchema = z.object({ path: z.string(), title: z.string(), line: z.int().nonnegative() });

export const pageBrokenLinkSchema = z.object({
  line: z.int().nonnegative(),
  column: z.int().nonnegative(),
  href: z.string(),
  targetPath: z.string().nullable(),
  anchor: z.string().nullable(),
  /** Only the two broken kinds are listed here; the links list has every status. */
  status: z.enum(['broken', 'broken-anchor']),
  reason: z.string().nullable(),
});

export const neighbourhoodSchema = z.object({
  nodes: z.array(
    z.object({
      path: z.string(),
      title: z.string(),
      stationaryScore: z.number().nonnegative(),
      flags: z.array(z.string()),
      /** Link steps from the page in the centre: 0, 1 or 2. */
      distance: z.int().min(0).max(2),
    }),
  ),
  edges: z.array(z.object({ source: z.string(), target: z.string() })),
});

export const suggestedSourceSchema = z.object({
  path: z.string(),
  title: z.string(),
  /** How much the target's stationary score would rise with a link from this page. */
  scoreGain: z.number(),
  reason: z.string(),
});

/** One page of a run with its links, findings, suggestions, history and neighbourhood. */
export const pageDetailSchema = named(
  'PageDetail',
  runPageItemSchema.extend({
    inbound: z.array(linkedPageSchema),
    outbound: z.array(linkedPageSchema),
    brokenLinks: z.array(pageBrokenLinkSchema),
    anchors: z.array(z.string()),
    headings: z.array(z.object({ depth: z.int(), text: z.string(), slug: z.string(), line: z.int() })),
    frontMatter: z.record(z.string(), z.unknown()),
    unlinkedMentions: z.array(z.object({ path: z.string(), title: z.string() })),
    suggestedSources: z.array(suggestedSourceSchema),
    scoreHistory: z.array(z.object({ runId: recordId, finishedAt: isoDateTime, stationaryScore: z.number().nonnegative() })),
    neighbourhood: neighbourhoodSchema,
  }),
);

export type PageDetail = z.infer<typeof pageDetailSchema>;
export type LinkedPage = z.infer<typeof linkedPageSchema>;
export type PageBrokenLink = z.infer<typeof pageBrokenLinkSchema>;
export type SuggestedSource = z.infer<typeof suggestedSourceSchema>;
export type Neighbourhood = z.infer<typeof neighbourhoodSchema>;
export type NeighbourNode = Neighbourhood['nodes'][number];
export type ScorePoint = PageDetail['scoreHistory'][number];
export type RunPageList = z.infer<typeof runPageListSchema>;

/** Finding flags a page can carry, in the words the API uses (`flags=` of the page list, `flags` of nodes). */
export const PAGE_FLAGS = ['orphan', 'dead-end', 'unreachable', 'deep', 'island'] as const;
export type PageFlag = (typeof PAGE_FLAGS)[number];

/** The flags of a page, in `PAGE_FLAGS` order. */
export function pageFlags(page: Pick<RunPageItem, 'orphan' | 'deadEnd' | 'reachable' | 'deep' | 'island'>): PageFlag[] {
  const flags: PageFlag[] = [];
  if (page.orphan) flags.push('orphan');
  if (page.deadEnd) flags.push('dead-end');
  if (!page.reachable) flags.push('unreachable');
  if (page.deep) flags.push('deep');
  if (page.island) flags.push('island');
  return flags;
}
