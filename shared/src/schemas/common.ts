import { z } from 'zod';

/** Error body of every failed API call. */
export interface ApiErrorBody {
  statusCode: number;
  code: string;
  message: string;
  details?: unknown[];
}

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
