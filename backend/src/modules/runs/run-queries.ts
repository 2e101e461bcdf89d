/**
 * Query contracts of the run routes. Sort keys and flags go through allowlists (docs/threats.md check 40):
 * the SQL column is looked up here, never taken from the request; unknown keys are a 400 naming the
 * allowed values. Objects are strict, so `sort[]=a` or `q[$ne]=1` (check 41) are rejected too.
 */
import { docSetSettingsPatchSchema, MAX_PAGE_SIZE } from '@linkloom/shared';
import { z } from 'zod';

const paging = {
  page: z.coerce.number().int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(MAX_PAGE_SIZE).default(50),
};

/** API sort key -> column; the score keys sort by rank, whose index gives the same order. */
export const PAGE_SORT_COLUMNS = {
  stationaryScore: { column: 'rank', invert: true },
  timesAverage: { column: 'rank', invert: true },
  rank: { column: 'rank', invert: false },
  path: { column: 'path', invert: false },
  title: { column: 'title', invert: false },
  inboundCount: { column: 'inbound_count', invert: false },
  outboundCount: { column: 'outbound_count', invert: false },
  depth: { column: 'depth', invert: false },
  brokenLinkCount: { column: 'broken_link_count', invert: false },
  wordCount: { column: 'word_count', invert: false },
} as const;
export type PageSortKey = keyof typeof PAGE_SORT_COLUMNS;
const SORT_VALUES = Object.keys(PAGE_SORT_COLUMNS).flatMap((k) => [k, `-${k}`]);

export const PAGE_FLAGS = {
  orphan: 'orphan',
  'dead-end': 'dead_end',
  unreachable: 'not reachable',
  deep: 'deep',
  island: 'island_id is not null',
} as const;
export type PageFlag = keyof typeof PAGE_FLAGS;

const finite = z.coerce.number().refine(Number.isFinite, 'must be a number');
const depth = z.coerce.number().int().min(0).max(1_000);

export const pageListQuerySchema = z
  .object({
    ...paging,
    sort: z
      .string()
      .default('-stationaryScore')
      .refine((v) => SORT_VALUES.includes(v), { message: `must be one of: ${SORT_VALUES.join(', ')}` }),
    q: z.string().max(200).optional(),
    flags: z
      .string()
      .max(200)
      .optional()
      .transform((v) =>
        v
          ? v
              .split(',')
              .map((f) => f.trim())
              .filter(Boolean)
          : [],
      )
      .refine((list) => list.every((f) => f in PAGE_FLAGS), {
        message: `flags must be a comma-separated list of: ${Object.keys(PAGE_FLAGS).join(', ')}`,
      })
      .transform((list) => [...new Set(list)] as PageFlag[]),
    minScore: finite.optional(),
    maxScore: finite.optional(),
    minDepth: depth.optional(),
    maxDepth: depth.optional(),
  })
  .strict();
export type PageListQuery = z.infer<typeof pageListQuerySchema>;

export const pageDetailQuerySchema = z.object({ path: z.string().min(1).max(1024) }).strict();

export const LINK_STATUSES = ['ok', 'broken', 'broken-anchor', 'unsafe', 'external', 'ambiguous', 'redirected', 'out-of-scope'] as const;
/**
 * The links list takes the source page as `page=<path>` too (docs/api.md, "Runs"), while lists page with
 * `page=<number>`: a whole number is the list page, anything else the source page's path; `source=<path>`
 * says it without ambiguity.
 */
export const linkListQuerySchema = z
  .object({
    page: z.string().max(1024).optional(),
    pageSize: paging.pageSize,
    source: z.string().min(1).max(1024).optional(),
    status: z.enum(LINK_STATUSES).optional(),
    groupBy: z.enum(['target']).optional(),
  })
  .strict()
  .transform(({ page, source, ...rest }) => {
    const isNumber = page !== undefined && /^[0-9]{1,7}$/.test(page) && Number(page) >= 1;
    return { ...rest, page: isNumber ? Number(page) : 1, source: source ?? (page && !isNumber ? page : undefined) };
  });
export type LinkListQuery = z.infer<typeof linkListQuerySchema>;

export const runListQuerySchema = z.object(paging).strict();
export const islandsQuerySchema = z.object(paging).strict();

export const searchQuerySchema = z
  .object({
    ...paging,
    q: z.string().trim().min(1).max(200),
    mode: z.enum(['blend', 'subgraph']).default('blend'),
  })
  .strict();

export const diffQuerySchema = z.object({ against: z.union([z.literal('latest'), z.uuid()]) }).strict();

export const EXPORT_VIEWS = ['pages', 'links', 'broken', 'orphans', 'dead-ends', 'unreachable', 'deep', 'islands'] as const;
/** A view plus, for page views, the page list's filters (so "export" gives the rows on screen); `sort` is accepted but rows stream by rank. */
export const exportQuerySchema = pageListQuerySchema
  .omit({ page: true, pageSize: true })
  .extend({ view: z.enum(EXPORT_VIEWS).default('pages') })
  .strict();
export type ExportQuery = z.infer<typeof exportQuerySchema>;

export const startRunSchema = z.object({ settings: docSetSettingsPatchSchema.optional() }).strict();
export type StartRunInput = z.infer<typeof startRunSchema>;
