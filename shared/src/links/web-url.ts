/**
 * `http(s)` URLs against the doc set's site base URLs (docs/link-rules.md rules 2 and 9): under a base URL the link is
 * internal and continues as a site path; the same host outside it is another site of the team
 * (`out-of-scope`); anything else is external. Parsed with the WHATWG URL parser (`URL`).
 */
import type { DocSetSettings } from '../schemas/doc-set-settings.js';
import { stripSitePrefixes } from './redirects.js';

export type WebUrlClass =
  { type: 'internal'; path: string; fragment: string | null } | { type: 'external' } | { type: 'out-of-scope'; reason: string };

function decodeOrKeep(text: string): string {
  try {
    return decodeURIComponent(text);
  } catch {
    return text;
  }
}

export function classifyWebUrl(href: string, settings: DocSetSettings): WebUrlClass {
  let url: URL;
  try {
    url = new URL(href);
  } catch {
    return { type: 'external' };
  }
  let sameHost = false;
  for (const baseText of settings.siteBaseUrls) {
    const base = new URL(baseText);
    if (base.hostname !== url.hostname || base.port !== url.port) continue;
    sameHost = true;
    const root = base.pathname.replace(/\/+$/, '');
    if (url.pathname !== root && !url.pathname.startsWith(root + '/')) continue;
    let path = url.pathname.slice(root.length) || '/';
    // A base URL at the host root still carries the doc set's base path and locale in its links.
    const withoutPrefixes = root === '' ? stripSitePrefixes(path, settings) : stripSitePrefixes(path, { ...settings, basePath: '' });
    if (withoutPrefixes === null) continue;
    path = decodeOrKeep(withoutPrefixes);
    const fragment = url.hash.length > 1 ? decodeOrKeep(url.hash.slice(1)) : null;
    return { type: 'internal', path, fragment };
  }
  if (sameHost) return { type: 'out-of-scope', reason: `${href} is on this doc set's site but outside its base URL.` };
  return { type: 'external' };
}
