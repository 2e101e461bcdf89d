/**
 * Front matter as data, never as code: YAML through eemeli/yaml with the core schema (no custom tags,
 * nothing executes) and an alias budget against expansion bombs; TOML through smol-toml. The result is
 * copied into fresh objects without `__proto__` / `constructor` / `prototype` keys, depth-capped.
 */
import { parseDocument } from 'yaml';
import { parse as parseToml } from 'smol-toml';

export const FRONT_MATTER_MAX_BYTES = 64 * 1024;
export const FRONT_MATTER_MAX_ALIASES = 50;
export const FRONT_MATTER_MAX_DEPTH = 20;

export type FrontMatterResult = { ok: true; data: Record<string, unknown> } | { ok: false; message: string; lineInBody?: number };

const FORBIDDEN_KEYS = new Set(['__proto__', 'constructor', 'prototype']);

class TooDeep extends Error {}

/** Copies plain data; throws TooDeep past the depth cap so a hostile tree is rejected, not truncated. */
function sanitise(value: unknown, depth: number): unknown {
  if (depth > FRONT_MATTER_MAX_DEPTH) throw new TooDeep();
  if (value instanceof Date) return Number.isNaN(value.getTime()) ? null : value.toISOString();
  if (Array.isArray(value)) return value.map((v) => sanitise(v, depth + 1));
  if (value !== null && typeof value === 'object') {
    const out: Record<string, unknown> = {};
    for (const [key, v] of Object.entries(value)) {
      if (!FORBIDDEN_KEYS.has(key)) out[key] = sanitise(v, depth + 1);
    }
    return out;
  }
  return value;
}

/** Nesting of flow collections (`[`, `{`) outside quotes; checked before parsing so 5,000-deep input is cheap. */
function flowDepth(body: string): number {
  let depth = 0;
  let max = 0;
  let quote = '';
  for (const ch of body) {
    if (quote) {
      if (ch === quote) quote = '';
    } else if (ch === '"' || ch === "'") quote = ch;
    else if (ch === '[' || ch === '{') max = Math.max(max, ++depth);
    else if (ch === ']' || ch === '}') depth = Math.max(0, depth - 1);
    else if (ch === '\n') quote = '';
  }
  return max;
}

function parseYaml(body: string): FrontMatterResult {
  const doc = parseDocument(body, {
    schema: 'core',
    customTags: [],
    uniqueKeys: true,
    strict: true,
  });
  const error = doc.errors[0];
  if (error) return { ok: false, message: error.message.split('\n')[0]!, lineInBody: error.linePos?.[0].line };
  return { ok: true, data: doc.toJS({ maxAliasCount: FRONT_MATTER_MAX_ALIASES }) as Record<string, unknown> };
}

function parseTomlBody(body: string): FrontMatterResult {
  try {
    return { ok: true, data: parseToml(body) as Record<string, unknown> };
  } catch (e) {
    const line = (e as { line?: number }).line;
    return { ok: false, message: (e as Error).message.split('\n')[0]!, lineInBody: line };
  }
}

export function parseFrontMatter(kind: 'yaml' | 'toml', body: string): FrontMatterResult {
  if (new TextEncoder().encode(body).length > FRONT_MATTER_MAX_BYTES) {
    return { ok: false, message: `front matter is larger than ${FRONT_MATTER_MAX_BYTES / 1024} KiB` };
  }
  if (flowDepth(body) > FRONT_MATTER_MAX_DEPTH) {
    return { ok: false, message: `front matter is nested deeper than ${FRONT_MATTER_MAX_DEPTH} levels` };
  }
  let parsed: FrontMatterResult;
  try {
    parsed = kind === 'yaml' ? parseYaml(body) : parseTomlBody(body);
  } catch (e) {
    // yaml throws a ReferenceError when the alias budget is spent (an expansion bomb).
    return { ok: false, message: `front matter could not be read: ${(e as Error).message}` };
  }
  if (!parsed.ok) return parsed;
  const data = parsed.data;
  if (data === null || typeof data !== 'object' || Array.isArray(data) || data instanceof Date) {
    return { ok: false, message: 'front matter must be a mapping of keys to values', lineInBody: 1 };
  }
  try {
    return { ok: true, data: sanitise(data, 0) as Record<string, unknown> };
  } catch (e) {
    if (e instanceof TooDeep) return { ok: false, message: `front matter is nested deeper than ${FRONT_MATTER_MAX_DEPTH} levels` };
    throw e;
  }
}
