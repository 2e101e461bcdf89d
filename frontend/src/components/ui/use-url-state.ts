import { useCallback, useMemo } from 'react';
import { useSearchParams } from 'react-router';

export type UrlValue = string | number | boolean | string[] | null;
export type UrlStateShape = Record<string, UrlValue>;

/** Reads one search param in the type of its default; anything unreadable falls back to the default. */
function decode(raw: string | null, fallback: UrlValue): UrlValue {
  if (raw === null) return fallback;
  if (typeof fallback === 'number') {
    const n = Number(raw);
    return Number.isFinite(n) ? n : fallback;
  }
  if (typeof fallback === 'boolean') return raw === 'true' || raw === '1';
  if (Array.isArray(fallback)) return raw === '' ? [] : raw.split(',');
  return raw;
}

function encode(value: UrlValue): string | null {
  if (value === null || value === undefined) return null;
  if (Array.isArray(value)) return value.length ? value.join(',') : null;
  return String(value);
}

function sameValue(a: UrlValue, b: UrlValue): boolean {
  return encode(a) === encode(b);
}

/**
 * Keeps view state (filters, sort, paging) in the URL search params so a view can be shared or bookmarked.
 * Values equal to their default are left out of the URL. Changing anything other than `page` sends the view
 * back to page 1 (when the shape has a `page`), since the old page number no longer means the same rows.
 * Search params not named in `defaults` are kept untouched (e.g. `path` on the page-detail route).
 */
export interface UrlStateUpdateOptions {
  /** Replace the history entry instead of adding one (e.g. while typing in a search box). */
  replace?: boolean;
}

export function useUrlState<T extends UrlStateShape>(defaults: T): [T, (patch: Partial<T>, options?: UrlStateUpdateOptions) => void] {
  const [params, setParams] = useSearchParams();
  const key = JSON.stringify(defaults);

  const state = useMemo(() => {
    const result: UrlStateShape = {};
    for (const [name, fallback] of Object.entries(defaults)) result[name] = decode(params.get(name), fallback);
    return result as T;
    // `key` stands for `defaults`, which callers usually pass as a fresh literal each render.
    // eslint-disable-next-line react-hooks/exhaustive-deps
  }, [params, key]);

  const update = useCallback(
    (patch: Partial<T>, options: UrlStateUpdateOptions = {}) => {
      setParams(
        (previous) => {
          const next = new URLSearchParams(previous);
          const resetsPage = 'page' in defaults && Object.keys(patch).some((name) => name !== 'page');
          const merged: Partial<T> = resetsPage ? { ...patch, page: defaults.page } : patch;
          for (const [name, value] of Object.entries(merged)) {
            const encoded = encode(value as UrlValue);
            if (encoded === null || sameValue(value as UrlValue, defaults[name] as UrlValue)) next.delete(name);
            else next.set(name, encoded);
          }
          return next;
        },
        { replace: options.replace ?? false },
      );
    },
    // eslint-disable-next-line react-hooks/exhaustive-deps
    [setParams, key],
  );

  return [state, update];
}

export interface TableUrlState {
  page: number;
  pageSize: number;
  sort: string;
}

/** The paging/sort trio of a server-side table, wired for `<DataTable>`'s callbacks. */
export function useTableUrlState(defaults: Partial<TableUrlState> = {}) {
  const [state, setState] = useUrlState<{ page: number; pageSize: number; sort: string }>({
    page: 1,
    pageSize: defaults.pageSize ?? 50,
    sort: defaults.sort ?? '',
  });
  return {
    ...state,
    onPageChange: (page: number) => setState({ page }),
    onPageSizeChange: (pageSize: number) => setState({ pageSize }),
    onSortChange: (sort: string) => setState({ sort }),
  };
}
