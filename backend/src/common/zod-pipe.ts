import { applyDecorators, type PipeTransform } from '@nestjs/common';
import { ApiBody, ApiQuery } from '@nestjs/swagger';
import type { ZodType } from 'zod';
import { AppError } from './app-error.js';
import { inputJsonSchema } from './api-contract/openapi-schema.js';

/** Validates (and coerces) a body or query against a shared zod contract; unknown keys fail when the schema is strict. */
export class ZodPipe<T> implements PipeTransform<unknown, T> {
  constructor(private readonly schema: ZodType<T>) {}

  transform(value: unknown): T {
    const result = this.schema.safeParse(value ?? {});
    if (result.success) return result.data;
    const details = result.error.issues.slice(0, 20).map((issue) => ({ path: issue.path.join('.'), message: issue.message }));
    const first = details[0];
    const message = first ? `${first.path ? `${first.path}: ` : ''}${first.message}` : 'The request is not valid.';
    throw new AppError(400, 'VALIDATION_FAILED', `The request is not valid. ${message}`, details);
  }
}

/** Documents a zod body in OpenAPI. */
export const ApiZodBody = (schema: ZodType): MethodDecorator => applyDecorators(ApiBody({ schema: inputJsonSchema(schema) as never }));

/** Documents each top-level field of a zod object as a query parameter in OpenAPI, required unless optional or defaulted. */
export function ApiZodQuery(schema: ZodType): MethodDecorator {
  const { properties = {}, required = [] } = inputJsonSchema(schema) as { properties?: Record<string, object>; required?: string[] };
  return applyDecorators(
    ...Object.entries(properties).map(([name, s]) => ApiQuery({ name, required: required.includes(name), schema: s as never })),
  );
}
