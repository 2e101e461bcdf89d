// Pure mapping between the explorer's URL state and the pages query: no React, easy to test.
import { PAGE_FLAGS, type PageFlag } from '@linkloom/shared';
import type { PagesQuery } from '../api/get-pages.js';

/** Defaults of every explorer setting kept in the URL; ranges are strings so an empty box means "any". */
export const EXPLORER_DEFAULTS = {
  page: 1,
  pageSize: 50,
  sort: '-stationaryScore',
  q: '',
  flags: [] as string[],
  minScore: '',
  maxScore: '',
  minDepth: '',
  maxDepth: '',
  /** Column ids the reader has hidden. */
  hide: [] as string[],
};

export type ExplorerState = typeof EXPLORER_DEFAULTS;

/** A number typed into a range box, or null for blank or unreadable input (which then filters nothing). */
export function parseBound(raw: string): number | null {
  if (raw.trim() === '') return null;
  const value = Number(raw);
  return Number.isFinite(value) ? value : null;
}

/** Only flags the API knows; a hand-edited URL with others would earn a 400. */
export function knownFlags(flags: string[]): PageFlag[] {
  return flags.filter((f): f is PageFlag => (PAGE_FLAGS as readonly string[]).includes(f));
}

export function toPagesQuery(state: ExplorerState): PagesQuery {
  return {
    page: state.page,
    pageSize: state.pageSize,
    sort: state.sort,
    q: state.q,
    flags: knownFlags(state.flags),
    minScore: parseBound(state.minScore),
    maxScore: parseBound(state.maxScore),
    minDepth: parseBound(state.minDepth),
    maxDepth: parseBound(state.maxDepth),
  };
}

export function toggleFlag(flags: string[], flag: PageFlag): string[] {
  return flags.includes(flag) ? flags.filter((f) => f !== flag) : [...flags, flag];
}

/** Whether any filter narrows the list, to word the empty state. */
export function isFiltered(state: ExplorerState): boolean {
  return state.q !== '' || state.flags.length > 0 || [state.minScore, state.maxScore, state.minDepth, state.maxDepth].some((v) => v !== '');
}
