// Number formats shared by the page screens. Stationary scores sum to 1 over the doc set, so they are tiny.
const integer = new Intl.NumberFormat();
const times = new Intl.NumberFormat(undefined, { maximumFractionDigits: 2 });

export function formatScore(score: number | null | undefined): string {
  if (score == null || !Number.isFinite(score)) return '—';
  if (score === 0) return '0';
  return score >= 0.001 ? score.toFixed(4) : score.toExponential(2);
}

export function formatTimesAverage(value: number | null | undefined): string {
  return value == null || !Number.isFinite(value) ? '—' : `${times.format(value)}×`;
}

export function formatCount(value: number | null | undefined): string {
  return value == null ? '—' : integer.format(value);
}

/** Where a page's detail screen lives, for links and row clicks. */
export function pageDetailHref(docSetId: string, path: string, runId = 'latest'): string {
  const run = runId === 'latest' ? '' : `&run=${encodeURIComponent(runId)}`;
  return `/doc-sets/${encodeURIComponent(docSetId)}/page?path=${encodeURIComponent(path)}${run}`;
}
