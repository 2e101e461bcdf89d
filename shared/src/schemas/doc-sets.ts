import { z } from 'zod';
import { docSetSettingsPatchSchema, type DocSetSettings } from './doc-set-settings.js';

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

export interface DocSet {
  id: string;
  name: string;
  description: string;
  settings: DocSetSettings;
  createdAt: string;
  updatedAt: string;
}
