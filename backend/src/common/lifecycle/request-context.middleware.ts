import { randomUUID } from 'node:crypto';
import { Logger } from '@nestjs/common';
import type { NextFunction, Request, Response } from 'express';
import type { LifecycleService } from './lifecycle.service.js';

/** Gives every request an id, refuses new API work while shutting down, and logs one line per request. */
export function requestContext(lifecycle: LifecycleService, logRequests: boolean) {
  const logger = new Logger('HTTP');
  return (request: Request & { id?: string; user?: { id: string } }, response: Response, next: NextFunction): void => {
    const id = randomUUID();
    request.id = id;
    response.setHeader('X-Request-Id', id);
    if (lifecycle.draining && request.path.startsWith('/api')) {
      response.setHeader('Retry-After', '10');
      response
        .status(503)
        .json({ statusCode: 503, code: 'SHUTTING_DOWN', message: 'Linkloom is shutting down; try again in a few seconds.' });
      return;
    }
    const started = process.hrtime.bigint();
    response.on('finish', () => {
      if (!logRequests) return;
      const ms = Number(process.hrtime.bigint() - started) / 1e6;
      logger.log({
        requestId: id,
        method: request.method,
        path: request.path,
        status: response.statusCode,
        ms: Math.round(ms * 10) / 10,
        userId: request.user?.id ?? null,
      });
    });
    next();
  };
}
