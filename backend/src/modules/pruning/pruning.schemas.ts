import { listQuerySchema } from '@linkloom/shared';
import { z } from 'zod';

const pagePath = z.string().trim().min(1).max(1024);

export const pruningListQuerySchema = listQuerySchema
  .extend({ status: z.enum(['undecided', 'approve', 'reject', 'keep', 'flagged']).optional() })
  .strict();

export const nominationSchema = z.object({ path: pagePath, reason: z.string().trim().min(3).max(2000) }).strict();

export const decisionsSchema = z
  .object({
    version: z.number().int().min(0),
    decisions: z
      .array(
        z
          .object({ path: pagePath, decision: z.enum(['approve', 'reject', 'keep']), note: z.string().trim().max(2000).default('') })
          .strict(),
      )
      .min(1)
      .max(500)
      .refine((items) => new Set(items.map((i) => i.path)).size === items.length, 'each path may appear once'),
  })
  .strict();

export type PruningListQuery = z.infer<typeof pruningListQuerySchema>;
export type NominationInput = z.infer<typeof nominationSchema>;
export type DecisionsInput = z.infer<typeof decisionsSchema>;
