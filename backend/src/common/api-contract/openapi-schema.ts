import { contractRegistry } from '@linkloom/shared';
import { z, type ZodType } from 'zod';

/** Where the OpenAPI document keeps named shapes; a response refers to its shape by this address. */
export const componentRef = (id: string): string => `#/components/schemas/${id}`;

type JsonSchema = Record<string, unknown>;

/** OpenAPI 3.0 keeps names in the components map, not in the schema, and has no `$schema`. */
function withoutIds({ $id: _id, $schema: _schema, id: _name, ...rest }: JsonSchema): JsonSchema {
  return rest;
}

/** A request body or query schema as an OpenAPI 3.0 schema, as the caller sends it (defaults make fields optional). */
export function inputJsonSchema(schema: ZodType): JsonSchema {
  return withoutIds(z.toJSONSchema(schema, { target: 'openapi-3.0', io: 'input', unrepresentable: 'any' }) as JsonSchema);
}

/** Every named response shape, referring to each other by `$ref`, for `components.schemas`. */
export function contractComponents(): Record<string, JsonSchema> {
  const { schemas } = z.toJSONSchema(contractRegistry, {
    target: 'openapi-3.0',
    io: 'output',
    unrepresentable: 'any',
    uri: componentRef,
    metadata: contractRegistry,
  });
  return Object.fromEntries(Object.entries(schemas).map(([id, schema]) => [id, withoutIds(schema as JsonSchema)]));
}
