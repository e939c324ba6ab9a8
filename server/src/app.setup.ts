import { INestApplication } from '@nestjs/common';
import { NestExpressApplication } from '@nestjs/platform-express';
import cookieParser from 'cookie-parser';
import express, { NextFunction, Request, Response } from 'express';
import helmet from 'helmet';
import { existsSync } from 'node:fs';
import { join } from 'node:path';
import { toApiError } from './common/api-error';
import { ApiErrorFilter } from './common/api-error.filter';
import { requestLogger } from './common/request-logger.middleware';
import { createValidationPipe } from './common/validation';

export const JSON_BODY_LIMIT = '256kb';

export interface SetupOptions {
  logRequests: boolean;
  hostAppDist?: string;
  playerAppDist?: string;
}

/** Everything main.ts and the integration tests share: headers, parsers, the error shape, static apps. */
export function configureApp(app: INestApplication, opts: SetupOptions): void {
  const http = app as NestExpressApplication;
  http.set('trust proxy', 'loopback');
  http.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"], // Radix Themes sets inline styles
          imgSrc: ["'self'", 'data:', 'blob:'],
          connectSrc: ["'self'"],
          fontSrc: ["'self'", 'data:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: null,
        },
      },
      crossOriginEmbedderPolicy: false,
    }),
  );
  if (opts.logRequests) app.use(requestLogger);
  app.use(cookieParser());
  app.use('/api', express.json({ limit: JSON_BODY_LIMIT }));
  app.use('/api', express.urlencoded({ extended: false, limit: JSON_BODY_LIMIT }));
  // Body-parser failures (bad JSON, too large) get the one error shape too.
  app.use((err: unknown, _req: Request, res: Response, next: NextFunction) => {
    if (!err) return next();
    const { status, body } = toApiError(err);
    res.status(status).json(body);
  });
  app.setGlobalPrefix('api');
  app.useGlobalPipes(createValidationPipe());
  app.useGlobalFilters(new ApiErrorFilter());
  if (opts.playerAppDist) serveSpa(http, '/play', opts.playerAppDist);
  if (opts.hostAppDist) serveSpa(http, '/', opts.hostAppDist);
}

/** A built single-page app under `base`; unknown paths fall back to its index.html. */
function serveSpa(app: NestExpressApplication, base: string, dist: string): void {
  const index = join(dist, 'index.html');
  if (!existsSync(index)) throw new Error(`No built app at ${dist}: run npm run build first.`);
  app.use(base, express.static(dist, { index: false, maxAge: '1h', fallthrough: true }));
  app.use((req: Request, res: Response, next: NextFunction) => {
    const inBase = base === '/' ? true : req.path === base || req.path.startsWith(`${base}/`);
    const reserved = req.path.startsWith('/api') || req.path.startsWith('/socket.io') || (base === '/' && req.path.startsWith('/play'));
    if (req.method !== 'GET' || !inBase || reserved || !req.accepts('html')) return next();
    res.setHeader('Cache-Control', 'no-cache');
    res.sendFile(index);
  });
}
