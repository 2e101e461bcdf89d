import type { INestApplication } from '@nestjs/common';
import { ConsoleLogger, Logger } from '@nestjs/common';
import { NestFactory } from '@nestjs/core';
import type { NestExpressApplication } from '@nestjs/platform-express';
import express, { type NextFunction, type Request, type Response } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { AppModule } from './app.module.js';
import { mountApiDocs } from './common/api-contract/api-document.js';
import { toErrorBody } from './common/exception.filter.js';
import { LifecycleService } from './common/lifecycle/lifecycle.service.js';
import { requestContext } from './common/lifecycle/request-context.middleware.js';
import type { AppConfig } from './config/app-config.js';

/** Builds the whole app (API, docs, front end) the same way for the server and for tests. */
export async function createApp(config: AppConfig, options: { logger?: false } = {}): Promise<INestApplication> {
  const app = await NestFactory.create<NestExpressApplication>(AppModule.register(config), {
    bodyParser: false,
    abortOnError: false,
    logger: options.logger ?? new ConsoleLogger({ json: config.logFormat === 'json', colors: config.logFormat === 'text' }),
  });
  app.disable('x-powered-by');
  app.set('query parser', 'simple');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          fontSrc: ["'self'", 'data:'],
          objectSrc: ["'none'"],
          baseUri: ["'none'"],
          frameAncestors: ["'none'"],
          formAction: ["'self'"],
          upgradeInsecureRequests: null,
        },
      },
      hsts: process.env.NODE_ENV === 'production',
      referrerPolicy: { policy: 'no-referrer' },
    }),
  );
  app.use(requestContext(app.get(LifecycleService), config.logRequests));
  app.use('/api', express.json({ limit: '1mb' }));
  app.setGlobalPrefix('api');
  // Not SIGUSR2 (Nest's default list has it): that signal asks the running server for a backup.
  app.enableShutdownHooks(['SIGTERM', 'SIGINT', 'SIGHUP']);
  mountApiDocs(app);
  mountFrontEnd(app, config);
  app.use(expressErrorHandler());
  await app.init();
  return app;
}

/** Serves the built front end on the same port; unknown non-API paths get index.html (client-side routes). */
function mountFrontEnd(app: NestExpressApplication, config: AppConfig): void {
  const dist = config.frontendDist;
  if (!dist || !existsSync(join(dist, 'index.html'))) return;
  app.useStaticAssets(dist, { index: false, maxAge: '1h' });
  const index = join(dist, 'index.html');
  app.use((request: Request, response: Response, next: NextFunction) => {
    if (request.method !== 'GET' || request.path.startsWith('/api')) return next();
    response.sendFile(index);
  });
}

/** Errors raised by Express middleware (body parser: too large, bad JSON) get the same body as API errors. */
function expressErrorHandler() {
  const logger = new Logger('Errors');
  return (error: unknown, request: Request & { id?: string }, response: Response, next: NextFunction) => {
    if (response.headersSent) return next(error);
    const body = toErrorBody(error, request.id, logger);
    response.status(body.statusCode).json(body);
  };
}
