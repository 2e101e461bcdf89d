import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';
import { docSetSettingsPatchSchema, docSetSettingsValueSchema } from './doc-set-settings.js';

export const createDocSetSchema = z
  .object({
    name: z.string().trim().min(1, 'give the doc set a name').max(120),
    description: z.string().trim().max(2000).default(''),
    settings: docSetSettingsPatchSchema.default({}),
  })
  .strict();

export const updateDocSetSchema = z
  .object({
    name: z.string().trim().min(1).max(120).optional(),
    description: z.string().trim().max(2000).optional(),
    settings: docSetSettingsPatchSchema.optional(),
  })
  .strict();

export type CreateDocSetInput = z.infer<typeof createDocSetSchema>;
export type UpdateDocSetInput = z.infer<typeof updateDocSetSchema>;

export const docSetSchema = named(
  'DocSet',
  z.object({
    id: recordId,
    name: z.string(),
    description: z.string(),
    settings: docSetSettingsValueSchema,
    createdAt: isoDateTime,
    updatedAt: isoDateTime,
  }),
);
export const docSetListSchema = listOf('DocSetList', docSetSchema);
export type DocSet = z.infer<typeof docSetSchema>;
