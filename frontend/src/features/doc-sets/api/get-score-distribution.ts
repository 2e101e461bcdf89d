import { queryOptions, useQuery } from '@tanstack/react-query';
import { scoreDistributionSchema, type ScoreDistribution } from '@linkloom/shared';
import { ApiError, apiFetch } from '../../../lib/api-client.js';
import { docSetQueryKey } from './get-doc-set.js';

/** `null` when the server has no distribution for the run (404): the overview then simply leaves the chart out. */
export async function getScoreDistribution(docSetId: string, runId: string, signal?: AbortSignal): Promise<ScoreDistribution | null> {
  try {
    return await apiFetch(
      `/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}/score-distribution`,
      scoreDistributionSchema,
      { signal },
    );
  } catch (error) {
    if (error instanceof ApiError && (error.status === 404 || error.status === 501)) return null;
    throw error;
  }
}

export function scoreDistributionQueryOptions(docSetId: string, runId: string) {
  return queryOptions({
    queryKey: [...docSetQueryKey(docSetId), 'runs', runId, 'score-distribution'] as const,
    queryFn: ({ signal }) => getScoreDistribution(docSetId, runId, signal),
  });
}

export function useScoreDistribution(docSetId: string, runId: string | null) {
  return useQuery({ ...scoreDistributionQueryOptions(docSetId, runId ?? ''), enabled: Boolean(runId) });
}
