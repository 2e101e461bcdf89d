/**
 * The front-matter keys Linkloom understands. Names follow common static-site and note-taking
 * conventions (common practice): `title`, `aliases`, `tags`, `owner`/`author`, `redirect_from`, and
 * the first review-like date. Protection from pruning: `linkloom: { protect: true }` (our own key),
 * also `protect: true` or `prune: false`, so teams can mark a page without learning a new key.
 */
import type { FrontMatter, PageWarning } from './types.js';

export const MAX_PAGE_ALIASES = 50;
const DATE_KEYS = ['reviewed', 'last_reviewed', 'updated', 'last_updated', 'date'];

function asString(value: unknown): string | undefined {
  if (typeof value === 'string') return value.trim() || undefined;
  if (typeof value === 'number' || typeof value === 'boolean') return String(value);
  return undefined;
}

function asList(value: unknown): string[] {
  if (Array.isArray(value)) return value.map(asString).filter((v): v is string => v !== undefined);
  const one = asString(value);
  return one === undefined ? [] : [one];
}

/** YAML core schema leaves dates as strings and TOML dates arrive as ISO strings after sanitising. */
function isoDate(value: unknown): string | undefined {
  const text = asString(value);
  if (!text) return undefined;
  const time = Date.parse(text);
  return Number.isNaN(time) ? undefined : new Date(time).toISOString().slice(0, 10);
}

function isProtected(data: Record<string, unknown>): boolean | undefined {
  const own = data['linkloom'];
  if (own && typeof own === 'object' && (own as Record<string, unknown>)['protect'] === true) return true;
  if (data['protect'] === true || data['prune'] === false) return true;
  return undefined;
}

export function emptyFrontMatter(): FrontMatter {
  return { aliases: [], tags: [], redirectFrom: [], raw: {} };
}

export function frontMatterFields(data: Record<string, unknown>, warnings: PageWarning[]): FrontMatter {
  let aliases = asList(data['aliases'] ?? data['alias']);
  if (aliases.length > MAX_PAGE_ALIASES) {
    warnings.push({
      code: 'FRONT_MATTER_INVALID',
      line: 1,
      message: `More than ${MAX_PAGE_ALIASES} aliases; only the first ${MAX_PAGE_ALIASES} are used.`,
    });
    aliases = aliases.slice(0, MAX_PAGE_ALIASES);
  }
  const tags = asList(data['tags'] ?? data['tag'])
    .flatMap((t) => t.split(',').map((s) => s.trim()))
    .filter(Boolean);
  const reviewed = DATE_KEYS.map((k) => isoDate(data[k])).find((d) => d !== undefined);
  const result: FrontMatter = {
    aliases,
    tags,
    redirectFrom: asList(data['redirect_from'] ?? data['redirectFrom']),
    raw: data,
  };
  const title = asString(data['title']);
  const owner = asString(data['owner'] ?? data['author']);
  const protectedFlag = isProtected(data);
  if (title !== undefined) result.title = title;
  if (owner !== undefined) result.owner = owner;
  if (reviewed !== undefined) result.reviewed = reviewed;
  if (protectedFlag !== undefined) result.protected = protectedFlag;
  return result;
}
