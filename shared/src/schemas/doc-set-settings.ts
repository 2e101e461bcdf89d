import { z } from 'zod';
import { named } from './contract.js';

const pagePath = z.string().trim().min(1).max(512);
const url = z
  .string()
  .trim()
  .url()
  .max(2048)
  .refine((u) => /^https?:\/\//i.test(u), 'must start with http:// or https://');

export const redirectSchema = z.object({ from: pagePath, to: pagePath }).strict();

const pruningShape = {
  /** Pages whose score is in this lowest share (percent) of all pages may be proposed for pruning. */
  lowScorePercentile: z.number().min(0).max(100),
  /** Pages not reviewed or updated for this many days may be proposed. */
  staleDays: z.number().int().min(1).max(3650),
  /** Pages with fewer words than this count as thin. */
  thinWordCount: z.number().int().min(0).max(100000),
  /** Paths matching these globs are never proposed. */
  protectGlobs: z.array(z.string().trim().min(1).max(256)).max(100),
};

const settingsShape = {
  entryPages: z.array(pagePath).max(200),
  siteBaseUrls: z.array(url).max(20),
  basePath: z
    .string()
    .trim()
    .max(256)
    .regex(/^(\/\S*)?$/, 'must be empty or start with /'),
  localePrefix: z
    .string()
    .trim()
    .min(1)
    .max(32)
    .regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, - and _ only')
    .nullable(),
  indexFileNames: z.array(z.string().trim().min(1).max(128)).min(1).max(20),
  extensions: z
    .array(
      z
        .string()
        .trim()
        .regex(/^\.[A-Za-z0-9]+$/, 'like .md'),
    )
    .min(1)
    .max(10),
  caseInsensitive: z.boolean(),
  wikiLinks: z.boolean(),
  ignore: z.array(z.string().trim().min(1).max(256)).max(100),
  stripTopFolder: z.boolean(),
  damping: z.number().gt(0, 'must be above 0').lt(1, 'must be below 1'),
  teleport: z.enum(['uniform', 'entry-pages']),
  depthThreshold: z.number().int().min(1).max(50),
  relativeTo: z.enum(['file', 'published-url']),
  redirects: z.array(redirectSchema).max(5000),
  nightly: z.boolean(),
  sourceFolder: z.string().trim().min(1).max(1024).nullable(),
  pruning: z.object(pruningShape).strict(),
};

/** The stored settings as the API answers them: every field present. */
export const docSetSettingsValueSchema = named('DocSetSettings', z.object({ ...settingsShape, pruning: z.object(pruningShape) }));

/** Every setting of a doc set (see the HTTP contract) with the defaults most doc sets need. */
export const DEFAULT_DOC_SET_SETTINGS = {
  entryPages: [] as string[],
  siteBaseUrls: [] as string[],
  basePath: '',
  localePrefix: null as string | null,
  indexFileNames: ['index.md', 'README.md', '_index.md'],
  extensions: ['.md', '.mdx', '.markdown'],
  caseInsensitive: false,
  wikiLinks: true,
  ignore: [] as string[],
  stripTopFolder: true,
  damping: 0.85,
  teleport: 'uniform' as 'uniform' | 'entry-pages',
  depthThreshold: 3,
  relativeTo: 'file' as 'file' | 'published-url',
  redirects: [] as { from: string; to: string }[],
  nightly: true,
  sourceFolder: null as string | null,
  pruning: { lowScorePercentile: 20, staleDays: 365, thinWordCount: 80, protectGlobs: [] as string[] },
};

/** Full settings: missing fields take the defaults. */
export const docSetSettingsSchema = z
  .object(settingsShape)
  .partial()
  .strict()
  .transform(
    (given) =>
      ({
        ...structuredClone(DEFAULT_DOC_SET_SETTINGS),
        ...Object.fromEntries(Object.entries(given).filter(([, v]) => v !== undefined)),
      }) as typeof DEFAULT_DOC_SET_SETTINGS,
  );

export type DocSetSettings = typeof DEFAULT_DOC_SET_SETTINGS;

/** A change to some settings: only the given fields; `pruning` may itself be partial. */
export const docSetSettingsPatchSchema = z
  .object({ ...settingsShape, pruning: z.object(pruningShape).partial().strict() })
  .partial()
  .strict();
export type DocSetSettingsPatch = z.infer<typeof docSetSettingsPatchSchema>;

export function defaultDocSetSettings(): DocSetSettings {
  return structuredClone(DEFAULT_DOC_SET_SETTINGS);
}
