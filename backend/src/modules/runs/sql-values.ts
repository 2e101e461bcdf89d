import type { SQL } from 'drizzle-orm';
import type { Executor } from '../../db/database.js';

/**
 * A PostgreSQL array literal ('{"a","b"}') passed as ONE bound parameter. Drizzle expands a JS array in a
 * `sql` template into a list of parameters, which caps a statement at 65,535 values; one text parameter
 * per column cast with ::type[] and spread with unnest() has no such cap and is parsed by PostgreSQL.
 */
export function pgArray(values: ArrayLike<string | number | boolean | null>): string {
  const parts = new Array<string>(values.length);
  for (let i = 0; i < values.length; i++) {
    const v = values[i];
    if (v === null) parts[i] = 'NULL';
    else if (typeof v === 'string') parts[i] = `"${v.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
    else if (typeof v === 'number' && !Number.isFinite(v)) throw new RangeError(`not a finite number: ${v}`);
    else parts[i] = String(v);
  }
  return `{${parts.join(',')}}`;
}

/** Rows of a raw query, the same for PGlite and node-postgres results. */
export async function queryRows<T>(executor: Executor, query: SQL): Promise<T[]> {
  const result = await executor.execute(query);
  return (result as unknown as { rows: T[] }).rows;
}

/** LIKE pattern that matches `text` literally anywhere (check 40: %, _ and \ are not wildcards here). */
export function containsPattern(text: string): string {
  return `%${text.replace(/[\\%_]/g, (c) => `\\${c}`)}%`;
}
