/**
 * Which pages a run starts from (docs/metrics.md: entry pages are set per doc set; default the root
 * index page). Without any, reachability and click depth cannot be judged: the engine then treats every
 * page as reachable and flags no unreachable or deep pages rather than flagging them all, and the run
 * carries a warning that says how to fix it.
 */
export interface RunWarning {
  code: string;
  message: string;
}

export interface EntryPageChoice {
  /** Paths of the entry pages found among the snapshot's pages. */
  paths: string[];
  warnings: RunWarning[];
}

export function chooseEntryPages(
  pagePaths: ReadonlySet<string>,
  entryPages: readonly string[],
  indexFileNames: readonly string[],
): EntryPageChoice {
  const warnings: RunWarning[] = [];
  if (entryPages.length > 0) {
    const found = entryPages.map(normalisePath).filter((p) => pagePaths.has(p));
    const missing = entryPages.filter((p) => !pagePaths.has(normalisePath(p)));
    if (missing.length > 0) {
      warnings.push({
        code: 'ENTRY_PAGE_MISSING',
        message: `These entry pages are not in the snapshot: ${missing.slice(0, 10).join(', ')}.`,
      });
    }
    if (found.length > 0) return { paths: [...new Set(found)], warnings };
  }
  const rootIndex = indexFileNames.find((name) => pagePaths.has(name));
  if (rootIndex) return { paths: [rootIndex], warnings };
  warnings.push({
    code: 'NO_ENTRY_PAGE',
    message:
      `No entry page: none is set and there is no ${indexFileNames.join(', ')} at the root. ` +
      'Reachability and click depth were not judged; islands are measured from the largest connected group. Set entry pages in the doc-set settings.',
  });
  return { paths: [], warnings };
}

function normalisePath(path: string): string {
  return path.trim().replace(/^\.?\/+/, '');
}
