import { applyDecorators, SetMetadata } from '@nestjs/common';
import { ApiProduces, ApiResponse } from '@nestjs/swagger';
import { contractName } from '@linkloom/shared';
import type { ZodType } from 'zod';
import { componentRef } from './openapi-schema.js';

export const RESPONSE_CONTRACT = 'linkloom:response-contract';

/** What a route answers on success: a JSON body of a named shape, nothing (204), or a file. */
export type ResponseContract =
  | { kind: 'json'; schema: ZodType; name: string; status: number }
  | { kind: 'none'; status: 204 }
  | { kind: 'file'; contentType: string; status: number };

/**
 * The route answers `status` with a body of this shared schema. The schema must be named (registered with
 * `named()` in `shared/src/schemas`), so the OpenAPI document refers to one component instead of copying it.
 */
export function ApiZodResponse(schema: ZodType, options: { status?: number; description?: string } = {}): MethodDecorator {
  const name = contractName(schema);
  if (!name) throw new Error('ApiZodResponse needs a named schema: register it with named() in shared/src/schemas');
  const status = options.status ?? 200;
  const contract: ResponseContract = { kind: 'json', schema, name, status };
  return applyDecorators(
    SetMetadata(RESPONSE_CONTRACT, contract),
    ApiResponse({ status, description: options.description ?? name, schema: { $ref: componentRef(name) } }),
  );
}

/** The route answers 204 with no body. */
export function ApiNoContentResponse(description = 'Done; no body.'): MethodDecorator {
  const contract: ResponseContract = { kind: 'none', status: 204 };
  return applyDecorators(SetMetadata(RESPONSE_CONTRACT, contract), ApiResponse({ status: 204, description }));
}

/** The route answers with a file download (CSV, plain text) instead of JSON. */
export function ApiFileResponse(contentType: string, description: string): MethodDecorator {
  const contract: ResponseContract = { kind: 'file', contentType, status: 200 };
  return applyDecorators(
    SetMetadata(RESPONSE_CONTRACT, contract),
    ApiProduces(contentType),
    ApiResponse({ status: 200, description, schema: { type: 'string' } }),
  );
}
