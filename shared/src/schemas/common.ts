import { z } from 'zod';
import { named } from './contract.js';

/** Error body of every failed API call (docs/api.md "Errors"). */
export const apiErrorBodySchema = named(
  'ApiError',
  z.object({
    statusCode: z.int(),
    code: z.string(),
    message: z.string(),
    details: z.array(z.unknown()).optional(),
  }),
  'A failed call: the HTTP status again, a stable code for programs and a sentence for people.',
);
export type ApiErrorBody = z.infer<typeof apiErrorBodySchema>;

export const MAX_PAGE_SIZE = 500;

export const listQuerySchema = z.object({
  page: z.coerce.number().int().min(1).max(1_000_000).default(1),
  pageSize: z.coerce.number().int().min(1).max(MAX_PAGE_SIZE).default(50),
});

export interface ListResult<T> {
  items: T[];
  total: number;
  page: number;
  pageSize: number;
}
