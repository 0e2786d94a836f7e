/**
 * The Express application: the JSON API under /api and the built web app (dist/) with an SPA
 * fallback, on one port. Built by a factory so tests can run it against their own database.
 */
import fs from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express from 'express';
import helmet from 'helmet';
import pino, { type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import { apiNotFound, errorHandler } from './http/errors';
import { checkRoutes } from './routes/checks';
import { healthRoutes } from './routes/health';
import { taxonomyRoutes } from './routes/taxonomy';
import { worksheetRoutes } from './routes/worksheets';

export interface AppOptions {
  sequelize: Sequelize;
  version: string;
  /** The built web app; when absent or missing on disk, only the API is served. */
  staticDir?: string;
  logger?: Logger;
  /** Largest JSON body accepted. */
  jsonLimit?: string;
}

export function createApp(opts: AppOptions): express.Express {
  const logger = opts.logger ?? pino({ level: 'silent' });
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', 'loopback');
  // Plot series are typed arrays (Float64Array); JSON has no such thing, so they go out as arrays.
  app.set('json replacer', (_key: string, value: unknown) =>
    ArrayBuffer.isView(value) && !(value instanceof DataView) ? Array.from(value as Float64Array) : value,
  );

  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          // The Expo web build injects its styles at run time; fonts and images are bundled.
          'style-src': ["'self'", "'unsafe-inline'"],
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'", 'data:'],
          'script-src': ["'self'"],
          'connect-src': ["'self'"],
          // Served over plain HTTP on loopback; TLS is the load balancer's job (README, scaling out).
          'upgrade-insecure-requests': null,
        },
      },
    }),
  );
  app.use(compression());
  app.use(
    pinoHttp({
      logger,
      autoLogging: { ignore: (req) => req.url === '/api/health' },
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, url: req.url }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: opts.jsonLimit ?? '256kb' }));
  api.use(healthRoutes(opts.sequelize, opts.version));
  api.use(taxonomyRoutes());
  api.use(checkRoutes());
  api.use(worksheetRoutes());
  api.use(apiNotFound);
  app.use('/api', api);

  const index = opts.staticDir ? path.join(opts.staticDir, 'index.html') : null;
  if (opts.staticDir && index && fs.existsSync(index)) {
    // Hashed bundles may be cached for long; index.html must always be fresh.
    app.use(
      express.static(opts.staticDir, {
        index: false,
        setHeaders: (res, file) => {
          if (/[\\/]_expo[\\/]|[\\/]assets[\\/]/.test(file)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
        },
      }),
    );
    // SPA fallback: every other GET that wants a page gets the app, which routes on the client.
    app.get(/.*/, (req, res, next) => {
      if (!req.accepts('html')) return next();
      res.setHeader('Cache-Control', 'no-cache');
      res.sendFile(index);
    });
  }

  app.use((req, res) => {
    res.status(404).json({ error: { code: 'not_found', message: `Nothing at ${req.path}.` } });
  });
  app.use(errorHandler(logger));
  return app;
}
