import { z } from 'zod';
import { named, pagedShape } from './contract.js';

export const SEARCH_MODES = ['blend', 'subgraph'] as const;
export type SearchMode = (typeof SEARCH_MODES)[number];

export const searchHitSchema = named(
  'SearchHit',
  z.object({
    path: z.string(),
    title: z.string(),
    /** Text around the matches; the server wraps each match in MATCH_OPEN ... MATCH_CLOSE. */
    snippet: z.string(),
    textRank: z.number().nonnegative(),
    stationaryScore: z.number().nonnegative(),
    score: z.number().nonnegative(),
    /** One line on why the hit ranks where it does. */
    why: z.string(),
  }),
);

export const searchResultSchema = named(
  'SearchResult',
  z.object({
    ...pagedShape(searchHitSchema),
    mode: z.enum(SEARCH_MODES),
    /** True when more pages matched than are ranked; narrow the words. */
    capped: z.boolean(),
    /** How `score` was computed, in a sentence. */
    explanation: z.string(),
  }),
);

export type SearchHit = z.infer<typeof searchHitSchema>;
export type SearchResult = z.infer<typeof searchResultSchema>;
