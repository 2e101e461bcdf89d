import { z } from 'zod';
import { named, recordId } from './contract.js';

export const linkMapNodeSchema = named(
  'LinkMapNode',
  z.object({
    id: z.string(),
    label: z.string(),
    path: z.string(),
    /** What the picture sizes the node by: the page's score, or the sum over the folder's pages. */
    size: z.number().nonnegative(),
    stationaryScore: z.number().nonnegative(),
    /** Folder nodes only: how many pages the folder holds. */
    pageCount: z.int().nonnegative().optional(),
    flags: z.array(z.string()),
    /** Folder nodes only: how many of its pages carry each finding. */
    findingCounts: z
      .object({
        orphans: z.int().nonnegative(),
        deadEnds: z.int().nonnegative(),
        unreachable: z.int().nonnegative(),
        deep: z.int().nonnegative(),
      })
      .optional(),
  }),
);

/** The link map: the pages themselves while they fit, else one node per folder with edges weighted by link count. */
export const linkMapSchema = named(
  'LinkMap',
  z.object({
    runId: recordId,
    level: z.enum(['pages', 'folders']),
    folder: z.string(),
    totalPages: z.int().nonnegative(),
    nodes: z.array(linkMapNodeSchema),
    edges: z.array(z.object({ source: z.string(), target: z.string(), weight: z.number().positive() })),
  }),
);

export type LinkMapNode = z.infer<typeof linkMapNodeSchema>;
export type LinkMap = z.infer<typeof linkMapSchema>;
