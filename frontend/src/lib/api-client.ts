import { describeIssues, type ApiErrorBody } from '@linkloom/shared';
import type { z, ZodType } from 'zod';
import { clearSession, getSession } from './session.js';

/** A failed API call, carrying the server's `{ statusCode, code, message, details }`. */
export class ApiError extends Error {
  readonly status: number;
  readonly code: string;
  readonly details: unknown[];

  constructor(status: number, code: string, message: string, details: unknown[] = []) {
    super(message);
    this.name = 'ApiError';
    this.status = status;
    this.code = code;
    this.details = details;
  }
}

export type QueryValue = string | number | boolean | null | undefined | Array<string | number>;
export type Query = Record<string, QueryValue>;

export interface ApiFetchOptions {
  method?: 'GET' | 'POST' | 'PUT' | 'PATCH' | 'DELETE';
  body?: unknown;
  query?: Query;
  signal?: AbortSignal;
}

/** Where a 401 sends the user; replaceable in tests. */
let onUnauthorized = (): void => {
  const here = window.location.pathname + window.location.search;
  if (window.location.pathname.startsWith('/sign-in')) return;
  window.location.assign(`/sign-in?next=${encodeURIComponent(here)}`);
};

export function setUnauthorizedHandler(handler: () => void): void {
  onUnauthorized = handler;
}

/** `/doc-sets` and `/api/doc-sets` both mean the same route. */
export function apiUrl(path: string, query?: Query): string {
  const base = path.startsWith('/api/') || path === '/api' ? path : `/api${path.startsWith('/') ? '' : '/'}${path}`;
  const params = new URLSearchParams();
  for (const [key, value] of Object.entries(query ?? {})) {
    if (value === undefined || value === null || value === '') continue;
    if (Array.isArray(value)) {
      if (value.length > 0) params.set(key, value.join(','));
    } else params.set(key, String(value));
  }
  const search = params.toString();
  return search ? `${base}?${search}` : base;
}

function authHeaders(): Record<string, string> {
  const token = getSession()?.accessToken;
  return token ? { Authorization: `Bearer ${token}` } : {};
}

async function toApiError(response: Response): Promise<ApiError> {
  let body: Partial<ApiErrorBody> = {};
  try {
    body = (await response.json()) as Partial<ApiErrorBody>;
  } catch {
    // Not JSON (a proxy page, an empty body): fall back to the status line.
  }
  return new ApiError(
    body.statusCode ?? response.status,
    body.code ?? `HTTP_${response.status}`,
    body.message ?? describeStatus(response.status),
    Array.isArray(body.details) ? body.details : [],
  );
}

function describeStatus(status: number): string {
  if (status === 0 || status >= 502) return 'The Linkloom server cannot be reached right now. Try again in a moment.';
  if (status === 403) return 'Your role does not allow this. Ask an admin if you need it.';
  if (status === 404) return 'This item does not exist (any more).';
  if (status === 429) return 'Too many requests. Wait a minute and try again.';
  return `The request failed (HTTP ${status}).`;
}

function handleUnauthorized(status: number): void {
  // A 401 on sign-in itself means wrong credentials, which the form shows; anywhere else the token is stale.
  if (status === 401 && getSession()) {
    clearSession();
    onUnauthorized();
  }
}

/**
 * The answer parsed with the route's shared response schema. A field the screen needs that is missing or of
 * another type fails here, in words, instead of as a crash deep in a component (docs/api.md).
 */
export function parseResponse<S extends ZodType>(schema: S, body: unknown, route: string, status: number): z.output<S> {
  const result = schema.safeParse(body);
  if (result.success) return result.data;
  const problems = describeIssues(result.error.issues, 3);
  throw new ApiError(
    status,
    'RESPONSE_SHAPE',
    `The server's answer to ${route} is not what this screen expects (${problems.join('; ')}). ` +
      'Reload the page; if this stays, the server and the app are out of step: tell whoever runs Linkloom.',
    problems,
  );
}

/** The one JSON client every API hook uses; `schema` is the route's response schema from `@linkloom/shared`. */
export async function apiFetch<S extends ZodType>(path: string, schema: S, options: ApiFetchOptions = {}): Promise<z.output<S>> {
  const { method = 'GET', body, query, signal } = options;
  const headers: Record<string, string> = { Accept: 'application/json', ...authHeaders() };
  if (body !== undefined) headers['Content-Type'] = 'application/json';
  const url = apiUrl(path, query);
  let response: Response;
  try {
    response = await fetch(url, { method, headers, body: body === undefined ? undefined : JSON.stringify(body), signal });
  } catch (error) {
    if ((error as Error).name === 'AbortError') throw error;
    throw new ApiError(0, 'NETWORK', describeStatus(0));
  }
  if (!response.ok) {
    handleUnauthorized(response.status);
    throw await toApiError(response);
  }
  const text = response.status === 204 ? '' : await response.text();
  return parseResponse(schema, text ? parseJson(text, response.status) : undefined, `${method} ${url.split('?')[0]}`, response.status);
}

function parseJson(text: string, status: number): unknown {
  try {
    return JSON.parse(text);
  } catch {
    throw new ApiError(status, 'RESPONSE_NOT_JSON', 'The server answered with something that is not JSON. Reload the page and try again.');
  }
}

/** Multipart upload with real progress (fetch cannot report upload progress; XHR can). */
export function apiUpload<S extends ZodType>(
  path: string,
  schema: S,
  formData: FormData,
  onProgress?: (fraction: number) => void,
): Promise<z.output<S>> {
  return new Promise((resolve, reject) => {
    const url = apiUrl(path);
    const xhr = new XMLHttpRequest();
    xhr.open('POST', url);
    xhr.setRequestHeader('Accept', 'application/json');
    const token = getSession()?.accessToken;
    if (token) xhr.setRequestHeader('Authorization', `Bearer ${token}`);
    xhr.upload.onprogress = (event) => {
      if (event.lengthComputable && onProgress) onProgress(event.loaded / event.total);
    };
    xhr.onerror = () => reject(new ApiError(0, 'NETWORK', describeStatus(0)));
    xhr.onload = () => {
      let body: unknown;
      try {
        body = xhr.responseText ? JSON.parse(xhr.responseText) : undefined;
      } catch {
        body = undefined;
      }
      if (xhr.status >= 200 && xhr.status < 300) {
        try {
          return resolve(parseResponse(schema, body, `POST ${url}`, xhr.status));
        } catch (error) {
          return reject(error);
        }
      }
      handleUnauthorized(xhr.status);
      const err = (body ?? {}) as Partial<ApiErrorBody>;
      reject(new ApiError(xhr.status, err.code ?? `HTTP_${xhr.status}`, err.message ?? describeStatus(xhr.status), err.details ?? []));
    };
    xhr.send(formData);
  });
}

/** Fetches a file (e.g. a CSV export) with the token and hands it to the browser as a download. */
export async function apiDownload(path: string, query?: Query, fallbackName = 'export.csv'): Promise<void> {
  const response = await fetch(apiUrl(path, query), { headers: authHeaders() });
  if (!response.ok) {
    handleUnauthorized(response.status);
    throw await toApiError(response);
  }
  const disposition = response.headers.get('Content-Disposition') ?? '';
  const name = /filename="?([^";]+)"?/i.exec(disposition)?.[1] ?? fallbackName;
  const url = URL.createObjectURL(await response.blob());
  const anchor = document.createElement('a');
  anchor.href = url;
  anchor.download = name;
  document.body.appendChild(anchor);
  anchor.click();
  anchor.remove();
  // Revoking at once can cancel the download before the browser has read the blob.
  setTimeout(() => URL.revokeObjectURL(url), 60_000);
}

/** A sentence for any thrown value, for error panels and snackbars. */
export function errorMessage(error: unknown): string {
  if (error instanceof ApiError) return error.message;
  if (error instanceof Error) return error.message;
  return 'Something went wrong.';
}
