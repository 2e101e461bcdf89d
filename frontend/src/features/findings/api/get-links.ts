import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { linkListSchema, type LinkItem, type LinkStatus, type ListResult } from '@linkloom/shared';
import { apiFetch, type Query } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../../lib/run-path.js';

/** The links route filters by status and pages; it has no sort keys (links come in page, line order). */
export interface LinksQuery {
  status: LinkStatus;
  page: number;
  pageSize: number;
}

export function linksQueryParams(query: LinksQuery, groupBy?: 'target'): Query {
  return { status: query.status, page: query.page, pageSize: query.pageSize, groupBy };
}

export function getLinks(docSetId: string, runId: string, query: LinksQuery, signal?: AbortSignal): Promise<ListResult<LinkItem>> {
  return apiFetch(`${runPath(docSetId, runId)}/links`, linkListSchema, { query: linksQueryParams(query), signal });
}

export function linksQueryOptions(docSetId: string, runId: string, query: LinksQuery) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'links', linksQueryParams(query)] as const,
    queryFn: ({ signal }) => getLinks(docSetId, runId, query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useLinks(docSetId: string, runId: string, query: LinksQuery, enabled = true) {
  return useQuery({ ...linksQueryOptions(docSetId, runId, query), enabled });
}
