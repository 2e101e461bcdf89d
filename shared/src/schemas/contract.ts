import { z, type ZodType } from 'zod';

/**
 * Every response shape of the HTTP API, by name. The back end builds the OpenAPI components from this
 * registry and checks its answers against the same schemas; the front end parses what it receives with
 * them. One name per shape, so the document refers to it instead of repeating it (docs/api.md).
 */
export const contractRegistry = z.registry<{ id: string; description?: string }>();

const names: string[] = [];

/** Registers a response shape under its OpenAPI component name. */
export function named<T extends ZodType>(id: string, schema: T, description?: string): T {
  if (contractRegistry.has(schema)) throw new Error(`The schema ${id} is already named ${contractRegistry.get(schema)?.id}`);
  if (names.includes(id)) throw new Error(`Two response schemas are named ${id}`);
  contractRegistry.add(schema, description ? { id, description } : { id });
  names.push(id);
  return schema;
}

/** The names of every registered response shape, in registration order. */
export function contractNames(): readonly string[] {
  return names;
}

/** The component name of a registered response shape, or undefined. */
export function contractName(schema: ZodType): string | undefined {
  return contractRegistry.get(schema)?.id;
}

/** The fields of a paged list as every list route answers it (docs/api.md "Lists"). */
export function pagedShape<T extends ZodType>(item: T) {
  return { items: z.array(item), total: z.int().nonnegative(), page: z.int().positive(), pageSize: z.int().nonnegative() };
}

/** A named paged list: `{ items, total, page, pageSize }`. */
export function listOf<T extends ZodType>(id: string, item: T) {
  return named(id, z.object(pagedShape(item)));
}

/** Routes that answer 204: no body at all. */
export const noContentSchema = z.undefined();

/** A moment as the server writes it (`Date.prototype.toISOString`). */
export const isoDateTime = z.iso.datetime({ offset: true });

/** Record ids are opaque strings to a client (UUIDs on the server). */
export const recordId = z.string().min(1);
