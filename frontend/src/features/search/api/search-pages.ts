import { keepPreviousData, queryOptions, useQuery } from '@tanstack/react-query';
import { searchResultSchema, type SearchMode, type SearchResult } from '@linkloom/shared';
import { apiFetch } from '../../../lib/api-client.js';
import { runQueryKey } from '../../pages/api/get-run.js';
import { runPath } from '../../../lib/run-path.js';

export function searchPages(docSetId: string, runId: string, q: string, mode: SearchMode, signal?: AbortSignal): Promise<SearchResult> {
  return apiFetch(`${runPath(docSetId, runId)}/search`, searchResultSchema, { query: { q, mode }, signal });
}

export function searchQueryOptions(docSetId: string, runId: string, q: string, mode: SearchMode) {
  return queryOptions({
    queryKey: [...runQueryKey(docSetId, runId), 'search', { q, mode }] as const,
    queryFn: ({ signal }) => searchPages(docSetId, runId, q, mode, signal),
    placeholderData: keepPreviousData,
  });
}

export function useSearchPages(docSetId: string, runId: string, q: string, mode: SearchMode) {
  return useQuery({ ...searchQueryOptions(docSetId, runId, q.trim(), mode), enabled: q.trim() !== '' });
}
