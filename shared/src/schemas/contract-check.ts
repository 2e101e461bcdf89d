import type { ZodType, core } from 'zod';

/** `items.3.pageCount: Invalid input: expected number, received undefined` for each issue, at most `limit`. */
export function describeIssues(issues: readonly core.$ZodIssue[], limit = 5): string[] {
  const lines = issues.slice(0, limit).map((issue) => `${issue.path.length ? issue.path.join('.') : '(whole body)'}: ${issue.message}`);
  if (issues.length > limit) lines.push(`and ${issues.length - limit} more`);
  return lines;
}

/**
 * What is wrong with a response body against its contract: the schema's issues, else the fields the body
 * carries that the schema does not describe. Clients parse leniently (unknown fields are dropped, so a newer
 * server does not break an older screen); the server is held to the exact shape it documents.
 */
export function contractProblems(schema: ZodType, body: unknown): string[] {
  const result = schema.safeParse(body);
  if (!result.success) return describeIssues(result.error.issues);
  return undocumentedFields(body, result.data).map((path) => `${path}: not described by the schema`);
}

/** Paths present in what was sent but dropped by the parse (a strip-mode object kept only the known keys). */
export function undocumentedFields(sent: unknown, kept: unknown, path: string[] = []): string[] {
  if (Array.isArray(sent) && Array.isArray(kept)) {
    return sent.flatMap((item, i) => undocumentedFields(item, kept[i], [...path, String(i)]));
  }
  if (!isPlainObject(sent) || !isPlainObject(kept)) return [];
  return Object.keys(sent).flatMap((key) =>
    key in kept ? undocumentedFields(sent[key], kept[key], [...path, key]) : [[...path, key].join('.')],
  );
}

function isPlainObject(value: unknown): value is Record<string, unknown> {
  return typeof value === 'object' && value !== null && !Array.isArray(value);
}
