import { type ArgumentsHost, Catch, type ExceptionFilter, HttpException, Logger } from '@nestjs/common';
import type { Request, Response } from 'express';
import type { ApiErrorBody } from '@linkloom/shared';
import { AppError } from './app-error.js';

const CODES: Record<number, string> = {
  400: 'BAD_REQUEST',
  401: 'UNAUTHENTICATED',
  403: 'FORBIDDEN',
  404: 'NOT_FOUND',
  405: 'METHOD_NOT_ALLOWED',
  409: 'CONFLICT',
  413: 'PAYLOAD_TOO_LARGE',
  415: 'UNSUPPORTED_MEDIA_TYPE',
  422: 'UNPROCESSABLE',
  429: 'TOO_MANY_REQUESTS',
  503: 'SHUTTING_DOWN',
};

const FRIENDLY: Record<number, string> = {
  401: 'Sign in first: the access token is missing, expired or not valid.',
  403: 'Your role does not allow this action.',
  404: 'Nothing was found at this address.',
  413: 'File too large.',
  429: 'Too many requests: wait a minute and try again.',
};

/** Turns any thrown value into the contract's error body. Unknown errors become a bare 500 (logged with the request id). */
export function toErrorBody(error: unknown, requestId: string | undefined, logger: Logger): ApiErrorBody {
  if (error instanceof AppError) {
    return { statusCode: error.status, code: error.code, message: error.message, ...(error.details ? { details: error.details } : {}) };
  }
  if (error instanceof HttpException) {
    const status = error.getStatus();
    const response = error.getResponse();
    const raw = typeof response === 'object' && response !== null ? (response as Record<string, unknown>) : { message: response };
    const message =
      typeof raw.message === 'string' && status !== 401 && status !== 403
        ? raw.message
        : (FRIENDLY[status] ?? String(raw.message ?? 'Request failed.'));
    return {
      statusCode: status,
      code: typeof raw.code === 'string' ? raw.code : (CODES[status] ?? `HTTP_${status}`),
      message: status === 413 ? FRIENDLY[413] : message,
    };
  }
  const expressError = error as { status?: number; statusCode?: number; type?: string; expose?: boolean; message?: string };
  const status = expressError?.status ?? expressError?.statusCode;
  if (typeof status === 'number' && status >= 400 && status < 500 && expressError.expose !== false) {
    const message =
      status === 413
        ? FRIENDLY[413]
        : expressError.type === 'entity.parse.failed'
          ? 'The request body is not valid JSON.'
          : (expressError.message ?? 'Bad request.');
    return { statusCode: status, code: CODES[status] ?? `HTTP_${status}`, message };
  }
  logger.error(`Unhandled error (request ${requestId ?? '-'}): ${(error as Error)?.stack ?? String(error)}`);
  return {
    statusCode: 500,
    code: 'INTERNAL',
    message: `Something went wrong on our side. Quote request id ${requestId ?? 'unknown'} when you report it.`,
  };
}

@Catch()
export class AllExceptionsFilter implements ExceptionFilter {
  private readonly logger = new Logger('Errors');

  catch(error: unknown, host: ArgumentsHost): void {
    const http = host.switchToHttp();
    const request = http.getRequest<Request & { id?: string }>();
    const response = http.getResponse<Response>();
    const body = toErrorBody(error, request?.id, this.logger);
    if (response.headersSent) return;
    if (body.statusCode === 503) response.setHeader('Retry-After', '10');
    response.status(body.statusCode).json(body);
  }
}
