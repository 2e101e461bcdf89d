import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';

/** A doc set's API token as the list shows it; the secret itself is never listed. */
export const apiTokenSchema = named(
  'ApiToken',
  z.object({
    id: recordId,
    name: z.string(),
    createdAt: isoDateTime,
    lastUsedAt: isoDateTime.nullable(),
    /** The name of the person who made it, or null when that account is gone. */
    createdBy: z.string().nullable(),
  }),
);
export const apiTokenListSchema = listOf('ApiTokenList', apiTokenSchema);
export const createdApiTokenSchema = named(
  'CreatedApiToken',
  z.object({ id: recordId, name: z.string(), token: z.string().min(1) }),
  'The only answer that carries the secret: store it in the CI job at once.',
);

export type ApiToken = z.infer<typeof apiTokenSchema>;
export type CreatedApiToken = z.infer<typeof createdApiTokenSchema>;
