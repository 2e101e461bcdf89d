import type { PgDatabase, PgQueryResultHKT } from 'drizzle-orm/pg-core';
import type * as schema from './schema/index.js';

/** The Drizzle handle, the same type whether PGlite or a PostgreSQL server sits behind it. */
export type Database = PgDatabase<PgQueryResultHKT, typeof schema>;
/** A transaction handle: inside `db.transaction(tx => ...)` use only `tx`, never the outer `db`. */
export type Transaction = Parameters<Parameters<Database['transaction']>[0]>[0];
export type Executor = Database | Transaction;
export type DatabaseKind = 'pglite' | 'postgres';
