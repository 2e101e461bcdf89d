import { z } from 'zod';

const pagePath = z.string().trim().min(1).max(512);
const url = z.string().trim().url().max(2048).refine((u) => /^https?:\/\//i.test(u), 'must start with http:// or https://');

export const redirectSchema = z.object({ from: pagePath, to: pagePath });

/** Every setting of a doc set (see the HTTP contract). Defaults are what most doc sets need. */
export const docSetSettingsSchema = z
  .object({
    entryPages: z.array(pagePath).max(200).default([]),
    siteBaseUrls: z.array(url).max(20).default([]),
    basePath: z.string().trim().max(256).regex(/^(\/[^\s]*)?$/, 'must be empty or start with /').default(''),
    localePrefix: z.string().trim().min(1).max(32).regex(/^[A-Za-z0-9_-]+$/, 'letters, digits, - and _ only').nullable().default(null),
    indexFileNames: z.array(z.string().trim().min(1).max(128)).min(1).max(20).default(['index.md', 'README.md', '_index.md']),
    extensions: z
      .array(z.string().trim().regex(/^\.[A-Za-z0-9]+$/, 'like .md'))
      .min(1)
      .max(10)
      .default(['.md', '.mdx', '.markdown']),
    caseInsensitive: z.boolean().default(false),
    wikiLinks: z.boolean().default(true),
    ignore: z.array(z.string().trim().min(1).max(256)).max(100).default([]),
    stripTopFolder: z.boolean().default(true),
    damping: z.number().gt(0, 'must be above 0').lt(1, 'must be below 1').default(0.85),
    teleport: z.enum(['uniform', 'entry-pages']).default('uniform'),
    depthThreshold: z.number().int().min(1).max(50).default(3),
    relativeTo: z.enum(['file', 'published-url']).default('file'),
    redirects: z.array(redirectSchema).max(5000).default([]),
    nightly: z.boolean().default(true),
    sourceFolder: z.string().trim().min(1).max(1024).nullable().default(null),
    pruning: z
      .object({
        lowScorePercentile: z.number().min(0).max(100).default(20),
        staleDays: z.number().int().min(1).max(3650).default(365),
        thinWordCount: z.number().int().min(0).max(100000).default(80),
        protectGlobs: z.array(z.string().trim().min(1).max(256)).max(100).default([]),
      })
      .default({ lowScorePercentile: 20, staleDays: 365, thinWordCount: 80, protectGlobs: [] }),
  })
  .strict();

export type DocSetSettings = z.infer<typeof docSetSettingsSchema>;
export const docSetSettingsPatchSchema = docSetSettingsSchema.partial().strict();
export type DocSetSettingsPatch = z.infer<typeof docSetSettingsPatchSchema>;

export function defaultDocSetSettings(): DocSetSettings {
  return docSetSettingsSchema.parse({});
}
