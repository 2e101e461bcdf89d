import { index, pgTable, text, timestamp, uniqueIndex, uuid } from 'drizzle-orm/pg-core';
import { docSets } from './doc-sets.js';
import { users } from './users.js';

/** A doc set's credential for CI jobs. Only a SHA-256 of the secret is kept; the secret is shown once. */
export const apiTokens = pgTable(
  'api_tokens',
  {
    id: uuid('id').primaryKey().defaultRandom(),
    docSetId: uuid('doc_set_id')
      .notNull()
      .references(() => docSets.id, { onDelete: 'cascade' }),
    name: text('name').notNull(),
    tokenHash: text('token_hash').notNull(),
    createdBy: uuid('created_by')
      .notNull()
      .references(() => users.id, { onDelete: 'cascade' }),
    createdAt: timestamp('created_at', { withTimezone: true }).notNull().defaultNow(),
    lastUsedAt: timestamp('last_used_at', { withTimezone: true }),
    revokedAt: timestamp('revoked_at', { withTimezone: true }),
  },
  (t) => [uniqueIndex('api_tokens_hash_unique').on(t.tokenHash), index('api_tokens_doc_set_idx').on(t.docSetId)],
);
