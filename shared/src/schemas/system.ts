import { z } from 'zod';
import { isoDateTime, listOf, named, recordId } from './contract.js';

export const healthSchema = named(
  'Health',
  z.object({
    status: z.literal('ok'),
    database: z.enum(['pglite', 'postgres']),
    version: z.string(),
    /** The server runs with demo accounts (the screens say so). */
    demo: z.boolean(),
  }),
);
export type Health = z.infer<typeof healthSchema>;

export const auditEntrySchema = named(
  'AuditEntry',
  z.object({
    id: z.int(),
    at: isoDateTime,
    actorId: recordId.nullable(),
    actorEmail: z.string().nullable(),
    action: z.string(),
    entityType: z.string(),
    entityId: z.string(),
    docSetId: recordId.nullable(),
    details: z.record(z.string(), z.unknown()),
  }),
);
export const auditListSchema = listOf('AuditList', auditEntrySchema);
export type AuditEntry = z.infer<typeof auditEntrySchema>;
