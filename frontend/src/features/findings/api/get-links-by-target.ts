import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { linkTargetGroupListSchema, type LinkTargetGroup, type ListResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../../lib/run-path.js';
import { linksQueryParams, type LinksQuery } from './get-links.js';

/** The same links, one row per missing target with the pages that point at it. */
export function getLinksByTarget(
  docSetId: string,
  runId: string,
  query: LinksQuery,
  signal?: AbortSignal,
): Promise<ListResult<LinkTargetGroup>> {
  return apiFetch(`${runPath(docSetId, runId)}/links`, linkTargetGroupListSchema, { query: linksQueryParams(query, 'target'), signal });
}

export function linksByTargetQueryOptions(docSetId: string, runId: string, query: LinksQuery) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'links', linksQueryParams(query, 'target')] as const,
    queryFn: ({ signal }) => getLinksByTarget(docSetId, runId, query, signal),
    placeholderData: keepPreviousData,
  });
}

export function useLinksByTarget(docSetId: string, runId: string, query: LinksQuery, enabled = true) {
  return useQuery({ ...linksByTargetQueryOptions(docSetId, runId, query), enabled });
}
