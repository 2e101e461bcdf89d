import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { runPageListSchema, type PageFlag, type RunPageList } from '@linkloom/shared';
import { apiFetch, type Query } from '../../../lib/api-client.js';
import { runQueryKey } from './get-run.js';
import { runPath } from '../../../lib/run-path.js';

export interface PagesQuery {
  page: number;
  pageSize: number;
  sort: string;
  q?: string;
  flags?: PageFlag[];
  minScore?: number | null;
  maxScore?: number | null;
  minDepth?: number | null;
  maxDepth?: number | null;
}

/** The query string of the pages list; the CSV export sends the same filters. */
export function pagesQueryParams(query: PagesQuery): Query {
  return {
    page: query.page,
    pageSize: query.pageSize,
    sort: query.sort,
    q: query.q?.trim(),
    flags: query.flags,
    minScore: query.minScore,
    maxScore: query.maxScore,
    minDepth: query.minDepth,
    maxDepth: query.maxDepth,
  };
}

export function getPages(docSetId: string, runId: string, query: PagesQuery, signal?: AbortSignal): Promise<RunPageList> {
  return apiFetch(`${runPath(docSetId, runId)}/pages`, runPageListSchema, { query: pagesQueryParams(query), signal });
}

export function pagesQueryOptions(docSetId: string, runId: string, query: PagesQuery) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'pages', pagesQueryParams(query)] as const,
    queryFn: ({ signal }) => getPages(docSetId, runId, query, signal),
    // Keep the old page on screen while the next one loads, so paging through 100,000 rows does not flash.
    placeholderData: keepPreviousData,
  });
}

export function usePages(docSetId: string, runId: string, query: PagesQuery) {
  return useQuery(pagesQueryOptions(docSetId, runId, query));
}
