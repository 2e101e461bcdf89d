// Runs the front end's own API files in the test process, against a running server, exactly as the screens
// call them: the real api-client (fetch, XHR upload, download), the real session, the real response parsers.
// Needs vitest's jsdom environment for what a browser provides (localStorage, XMLHttpRequest, FormData, File).
import { readdirSync } from 'node:fs';
import { dirname, join, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';

declare const jsdom: { reconfigure(options: { url: string }): void; window: { _origin: string } };

// From the file path, not `new URL(..., import.meta.url)`: under jsdom `URL` is the page's, not Node's.
export const FEATURES_DIR = resolve(dirname(fileURLToPath(import.meta.url)), '../../frontend/src/features');

/** Every API file of the front end, as `feature/api/file.ts`: one file per call (DEVELOPERS.md). */
export function frontEndApiFiles(): string[] {
  return readdirSync(FEATURES_DIR, { withFileTypes: true })
    .filter((entry) => entry.isDirectory())
    .flatMap((feature) => {
      const apiDir = join(FEATURES_DIR, feature.name, 'api');
      try {
        return readdirSync(apiDir)
          .filter((file) => file.endsWith('.ts') && !file.endsWith('.test.ts'))
          .map((file) => `${feature.name}/api/${file}`);
      } catch {
        return [];
      }
    })
    .sort();
}

export interface Download {
  name: string;
  blob: Blob;
}

export interface FrontEndTraffic {
  /** `METHOD /api/path` of every fetch the front end made. */
  requests: string[];
  /** Files the front end handed to the browser to save. */
  downloads: Download[];
}

/**
 * Makes the jsdom page an origin of the server (so relative `/api/...` URLs and the XHR upload reach it, as in
 * the browser), records every request, and catches downloads instead of navigating to them.
 */
export function pointFrontEndAt(baseUrl: string): FrontEndTraffic {
  jsdom.reconfigure({ url: `${baseUrl}/` });
  // jsdom 29 moves the document to the new origin but XMLHttpRequest reads the window's, which `reconfigure`
  // leaves at the old one; without this the upload would be a cross-origin request the server never allows.
  jsdom.window._origin = new URL(baseUrl).origin;
  const traffic: FrontEndTraffic = { requests: [], downloads: [] };
  const nodeFetch = globalThis.fetch;
  globalThis.fetch = (input: RequestInfo | URL, init?: RequestInit) => {
    const url = new URL(String(input), window.location.href);
    traffic.requests.push(`${(init?.method ?? 'GET').toUpperCase()} ${url.pathname}`);
    return nodeFetch(url, init);
  };
  const blobs = new Map<string, Blob>();
  URL.createObjectURL = (blob: Blob) => {
    const url = `blob:${baseUrl}/${blobs.size + 1}`;
    blobs.set(url, blob);
    return url;
  };
  URL.revokeObjectURL = (url: string) => void blobs.delete(url);
  HTMLAnchorElement.prototype.click = function saveInsteadOfNavigate(this: HTMLAnchorElement) {
    const blob = blobs.get(this.href);
    if (!blob) throw new Error(`the front end clicked a link that is not a download: ${this.href}`);
    traffic.downloads.push({ name: this.download, blob });
  };
  return traffic;
}
