/** Sort strings follow the API: `key` ascending, `-key` descending, '' for the server's default order. */
export interface SortSpec {
  key: string;
  desc: boolean;
}

export function parseSort(sort: string): SortSpec | null {
  if (!sort) return null;
  return sort.startsWith('-') ? { key: sort.slice(1), desc: true } : { key: sort, desc: false };
}

export function formatSort(spec: SortSpec | null): string {
  if (!spec) return '';
  return spec.desc ? `-${spec.key}` : spec.key;
}

/** Clicking the sorted column flips it; clicking another starts at its natural first direction. */
export function nextSort(current: string, key: string, descFirst: boolean): string {
  const spec = parseSort(current);
  if (spec && spec.key === key) return formatSort({ key, desc: !spec.desc });
  return formatSort({ key, desc: descFirst });
}
