/** `/doc-sets/:id/runs/:runId` with both parts encoded; every per-run API file builds on it. */
export function runPath(docSetId: string, runId: string): string {
  return `/doc-sets/${encodeURIComponent(docSetId)}/runs/${encodeURIComponent(runId)}`;
}
