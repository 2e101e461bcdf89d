/**
 * Converts doc-set settings to editable text fields and back, validating with the shared zod schema
 * (shared/src/schemas/doc-set-settings.ts) so the form accepts exactly what the server accepts.
 */
import { docSetSettingsSchema, type DocSetSettings } from '@linkloom/shared';

export interface SettingsForm {
  entryPages: string;
  siteBaseUrls: string;
  basePath: string;
  localePrefix: string;
  indexFileNames: string;
  extensions: string;
  caseInsensitive: boolean;
  wikiLinks: boolean;
  ignore: string;
  stripTopFolder: boolean;
  damping: string;
  teleport: DocSetSettings['teleport'];
  depthThreshold: string;
  relativeTo: DocSetSettings['relativeTo'];
  redirects: string;
  nightly: boolean;
  sourceFolder: string;
  lowScorePercentile: string;
  staleDays: string;
  thinWordCount: string;
  protectGlobs: string;
}

export type FieldErrors = Partial<Record<keyof SettingsForm, string>>;

const lines = (text: string) =>
  text
    .split(/\r?\n/)
    .map((l) => l.trim())
    .filter(Boolean);
/** Number("") is 0, which would silently pass as a value; keep empty as NaN so the schema rejects it. */
const num = (text: string) => (text.trim() === '' ? Number.NaN : Number(text));

export function toForm(s: DocSetSettings): SettingsForm {
  return {
    entryPages: s.entryPages.join('\n'),
    siteBaseUrls: s.siteBaseUrls.join('\n'),
    basePath: s.basePath,
    localePrefix: s.localePrefix ?? '',
    indexFileNames: s.indexFileNames.join('\n'),
    extensions: s.extensions.join(' '),
    caseInsensitive: s.caseInsensitive,
    wikiLinks: s.wikiLinks,
    ignore: s.ignore.join('\n'),
    stripTopFolder: s.stripTopFolder,
    damping: String(s.damping),
    teleport: s.teleport,
    depthThreshold: String(s.depthThreshold),
    relativeTo: s.relativeTo,
    redirects: s.redirects.map((r) => `${r.from} -> ${r.to}`).join('\n'),
    nightly: s.nightly,
    sourceFolder: s.sourceFolder ?? '',
    lowScorePercentile: String(s.pruning.lowScorePercentile),
    staleDays: String(s.pruning.staleDays),
    thinWordCount: String(s.pruning.thinWordCount),
    protectGlobs: s.pruning.protectGlobs.join('\n'),
  };
}

function parseRedirects(text: string): { redirects: DocSetSettings['redirects']; bad: number | null } {
  const redirects: DocSetSettings['redirects'] = [];
  const all = lines(text);
  for (let i = 0; i < all.length; i += 1) {
    const match = /^(.+?)\s*(?:->|→|\s)\s*(\S.*)$/.exec(all[i]);
    if (!match) return { redirects, bad: i + 1 };
    redirects.push({ from: match[1].trim(), to: match[2].trim() });
  }
  return { redirects, bad: null };
}

/** Form -> settings; `errors` names each field the schema rejects, in words for the form. */
export function fromForm(form: SettingsForm): { settings: DocSetSettings | null; errors: FieldErrors } {
  const { redirects, bad } = parseRedirects(form.redirects);
  const candidate = {
    entryPages: lines(form.entryPages),
    siteBaseUrls: lines(form.siteBaseUrls),
    basePath: form.basePath.trim(),
    localePrefix: form.localePrefix.trim() || null,
    indexFileNames: lines(form.indexFileNames),
    extensions: form.extensions.split(/[\s,]+/).filter(Boolean),
    caseInsensitive: form.caseInsensitive,
    wikiLinks: form.wikiLinks,
    ignore: lines(form.ignore),
    stripTopFolder: form.stripTopFolder,
    damping: num(form.damping),
    teleport: form.teleport,
    depthThreshold: num(form.depthThreshold),
    relativeTo: form.relativeTo,
    redirects,
    nightly: form.nightly,
    sourceFolder: form.sourceFolder.trim() || null,
    pruning: {
      lowScorePercentile: num(form.lowScorePercentile),
      staleDays: num(form.staleDays),
      thinWordCount: num(form.thinWordCount),
      protectGlobs: lines(form.protectGlobs),
    },
  };
  const errors: FieldErrors = {};
  if (bad !== null) errors.redirects = `Line ${bad}: write “old/path.md -> new/path.md”.`;
  const result = docSetSettingsSchema.safeParse(candidate);
  if (!result.success) {
    for (const issue of result.error.issues) {
      const [head, second] = issue.path;
      const field = (head === 'pruning' ? second : head) as keyof SettingsForm;
      const where = typeof second === 'number' ? `Entry ${second + 1}: ` : '';
      if (field && !errors[field]) errors[field] = `${where}${issue.message}`;
    }
  }
  return { settings: result.success && bad === null ? result.data : null, errors };
}
