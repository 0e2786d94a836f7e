/**
 * The Express application: the JSON API under /api and the built web app (dist/) with an SPA
 * fallback, on one port. Built by a factory so tests can run it against their own database.
 *
 * The API: JSON bodies up to a limit, sessions in MariaDB (cookie cw.sid), passport for sign-in,
 * and on every route `allow(action)` from policies.ts (who may, plus Origin and CSRF checks).
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import compression from 'compression';
import express from 'express';
import expressStaticGzip from 'express-static-gzip';
import helmet from 'helmet';
import pino, { type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import type { Sequelize } from 'sequelize';
import { createPassport, sessionMiddleware } from './auth/session';
import { bodyDepthLimit } from './http/depth';
import { shellPageSender } from './http/page-shell';
import { apiNotFound, errorHandler } from './http/errors';
import { rateLimiters, rateLimitsFromEnv, type RateLimits } from './http/rate-limit';
import { ComputePool, type ComputeOptions } from './compute/pool';
import { computeConfig } from './config';
import { mailAfterCommit } from './mail/after-commit';
import { createMailer, type Mailer } from './mail/mailer';
import { policyGuard } from './policies';
import { accountRoutes } from './routes/account';
import { adminRoutes } from './routes/admin';
import { attachmentRoutes } from './routes/attachments';
import { authRoutes } from './routes/auth';
import { checkRoutes } from './routes/checks';
import { citationRoutes } from './routes/citations';
import { claimCheckRoutes } from './routes/claim-checks';
import { correctionRoutes } from './routes/corrections';
import { deskRoutes } from './routes/desk';
import { draftRoutes } from './routes/drafts';
import { entryRoutes } from './routes/entries';
import { healthRoutes } from './routes/health';
import { queueRoutes } from './routes/queue';
import { searchRoutes } from './routes/search';
import { sessionRoutes } from './routes/session';
import { sightingRoutes } from './routes/sightings';
import { submissionRoutes } from './routes/submissions';
import { synonymRoutes } from './routes/synonyms';
import { taxonomyRoutes } from './routes/taxonomy';
import { worksheetRoutes } from './routes/worksheets';
import { Accounts } from './services/accounts';
import { ClaimChecks } from './services/claim-checks';
import { createEntries } from './services/entries';
import { createSubmissions } from './services/submissions';
import { Synonyms } from './services/synonyms';
import { S3Store, storageFromEnv, type ObjectStore } from './storage';
import { SearchIndex } from './search';

export interface AppOptions {
  sequelize: Sequelize;
  version: string;
  /** The built web app; when absent or missing on disk, only the API is served. */
  staticDir?: string;
  logger?: Logger;
  /** Largest JSON body accepted. */
  jsonLimit?: string;
  /** Defaults to NODE_ENV (development when unset). Production: Secure cookies, no outbox. */
  env?: 'development' | 'test' | 'production';
  /**
   * Signs the session cookie; every app server sharing the sessions needs the same one(s).
   * Required in production; elsewhere a random one per app when absent.
   */
  sessionSecret?: string | string[];
  /**
   * The origin of e-mailed links and of the Origin check (PUBLIC_URL). When absent (tests only),
   * the request's own origin is used; main.ts always passes it.
   */
  publicUrl?: string;
  /** Outgoing mail; without one, messages are rendered and dropped. */
  mailer?: Mailer;
  /** Per-route rate limits (tests set them low for the rate-limit test and high elsewhere). */
  rateLimits?: Partial<RateLimits>;
  /** Express's `trust proxy` (TRUST_PROXY); default loopback. */
  trustProxy?: string | number;
  /** How often expired sessions are deleted (ms); 0 never. */
  sessionCleanupMs?: number;
  /**
   * How often the search index checks the database's change watermark and rebuilds when it moved
   * (ms), so that entries published through another app server are found; 0 never. Default 5000.
   */
  searchRefreshMs?: number;
  /** Searches wait for a first index build of at most this many entries; a larger one answers at once, flagged partial (SearchIndexOptions.waitBelow). */
  searchWaitBelow?: number;
  /** Where attachments are kept (server/storage); default from the environment (STORAGE, …): .data/uploads. */
  store?: ObjectStore;
  /** How long new submissions are gathered before the moderators' digest mail goes out (ms). Default 60 000. */
  submissionDigestMs?: number;
  /** The compute pool's settings (server/compute/pool.ts); default from the environment (COMPUTE_*). */
  compute?: Partial<ComputeOptions>;
  /** How often expired rate-limit counts are deleted (ms); 0 never. Default 10 minutes. */
  rateLimitCleanupMs?: number;
}

/** What createApp leaves in app.locals for its owner. */
export interface AppLocals {
  /** Resolves once the mail work started after earlier answers (forgot, resend) has finished. */
  settle(): Promise<void>;
  /** Stops the session store's cleanup timer. */
  close(): Promise<void>;
  /** The worker threads that compute worksheets, checks and claim checks. */
  compute: ComputePool;
}

export function createApp(opts: AppOptions): express.Express {
  const logger = opts.logger ?? pino({ level: 'silent' });
  const env = opts.env ?? ((process.env.NODE_ENV as AppOptions['env']) || 'development');
  if (env === 'production' && !opts.sessionSecret) throw new Error('createApp: a session secret is required in production');
  const app = express();
  app.disable('x-powered-by');
  app.set('trust proxy', opts.trustProxy ?? 'loopback');
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

  const mailer = opts.mailer ?? createMailer({ url: null, from: 'Counterweight <no-reply@example.org>' });
  const accounts = new Accounts({ sequelize: opts.sequelize, mailer });
  const allow = policyGuard({ publicUrl: opts.publicUrl });
  const rateLimits = rateLimiters({ ...rateLimitsFromEnv(), ...opts.rateLimits }, { sequelize: opts.sequelize, cleanupMs: opts.rateLimitCleanupMs, logger });
  const limits = rateLimits.handlers;
  // Worksheets, checks and claim checks run in worker threads, never on the event loop (issue 13).
  // Test apps keep no spare thread unless they ask (`compute: { spare: true }`): most compute a few
  // quick jobs and never end a thread, and loading one more worker only slowed them (server/compute/pool.ts).
  const compute = new ComputePool({ ...computeConfig(), spare: env !== 'test', ...opts.compute }, logger);
  // Started at once (a server that cannot compute says so in its first log lines); under tests only
  // when first needed, so that the many test apps that never compute load no worker thread.
  if (env !== 'test') void compute.start();
  const sessions = sessionMiddleware({
    sequelize: opts.sequelize,
    secret: opts.sessionSecret ?? crypto.randomBytes(32).toString('base64url'),
    secure: env === 'production' ? true : 'auto',
    cleanupIntervalMs: opts.sessionCleanupMs,
  });
  const passport = createPassport();

  // Mail work that runs after the answer has gone (forgot, resend), so that its timing says nothing.
  const pending = new Set<Promise<void>>();
  const later = (what: string, job: () => Promise<void>) => {
    const p: Promise<void> = job()
      .catch((err) => logger.error({ err }, `${what} failed`))
      .finally(() => pending.delete(p));
    pending.add(p);
  };
  const locals: AppLocals = {
    settle: async () => {
      while (pending.size) await Promise.all([...pending]);
    },
    close: async () => {
      sessions.store.stopExpiringSessions();
      rateLimits.stop();
      await compute.close();
      await search.stop();
      submissions.digest.stop();
      if (!opts.store && store instanceof S3Store) store.close();
      await locals.settle();
    },
    compute,
  };
  Object.assign(app.locals, locals);
  const origin = (req: express.Request) => opts.publicUrl ?? `${req.protocol}://${req.get('host')}`;
  const search = new SearchIndex({ refreshMs: opts.searchRefreshMs ?? 5000, logger, waitBelow: opts.searchWaitBelow });
  search.start();
  // Mail that follows a committed change goes after the answer (server/mail/after-commit.ts).
  const mail = mailAfterCommit({ mailer, later });
  const entries = createEntries({
    sequelize: opts.sequelize,
    mail,
    changed: (slug) => search.update(slug).catch((err) => logger.error({ err, slug }, 'search index update failed')),
  });

  const store = opts.store ?? storageFromEnv();
  const submissions = createSubmissions({
    sequelize: opts.sequelize,
    store,
    mailer,
    mail,
    drafts: entries.drafts,
    later,
    digestMs: opts.submissionDigestMs ?? 60_000,
    logger,
    // An accepted sighting is indexed as part of the entries it is linked to (issue 11).
    linked: (slugs) => Promise.all(slugs.map((slug) => search.update(slug).catch((err) => logger.error({ err, slug }, 'search index update failed')))).then(() => undefined),
  });
  if (opts.publicUrl) submissions.digest.origin = opts.publicUrl;
  // Items that arrived before a restart and were never listed in a digest.
  submissions.digest.schedule();

  const api = express.Router();
  api.use(express.json({ limit: opts.jsonLimit ?? '256kb' }));
  api.use(bodyDepthLimit());
  api.use(sessions.middleware);
  api.use(passport.initialize());
  api.use(passport.session());
  // One router per URL prefix, each in server/routes/<prefix>/ beside its schema.ts.
  const submit = { allow, submissions, origin, limits };
  api.use(healthRoutes(allow, opts.sequelize, opts.version));
  api.use(taxonomyRoutes(allow));
  api.use(checkRoutes(allow, { compute, limit: limits.compute }));
  api.use(worksheetRoutes(allow, { compute, limit: limits.compute }));
  api.use(sessionRoutes(allow));
  api.use(authRoutes({ allow, accounts, passport, limits, origin, later, logger }));
  api.use(accountRoutes(allow, accounts));
  api.use(adminRoutes(allow, accounts, env));
  api.use(entryRoutes({ allow, entries, submissions, origin }));
  api.use(draftRoutes(allow, entries, origin));
  api.use(deskRoutes(allow, entries, submissions));
  api.use(citationRoutes(allow));
  api.use(searchRoutes(allow, search));
  api.use(synonymRoutes(allow, new Synonyms({ sequelize: opts.sequelize, changed: () => search.rebuild().catch((err) => logger.error({ err }, 'search index rebuild failed')) })));
  api.use(sightingRoutes(submit, store));
  api.use(correctionRoutes(submit));
  api.use(submissionRoutes(allow, submissions, origin));
  api.use(attachmentRoutes(allow, submissions));
  api.use(queueRoutes(allow, submissions));
  api.use(claimCheckRoutes(allow, new ClaimChecks({ sequelize: opts.sequelize, index: search, library: entries.library, compute }), origin, limits.claimCheck));
  api.use(apiNotFound);
  app.use('/api', api);

  const index = opts.staticDir ? path.join(opts.staticDir, 'index.html') : null;
  if (opts.staticDir && index && fs.existsSync(index)) {
    // The build's brotli and gzip copies (server/build.ts, precompress) are sent as they are, brotli
    // first, with the original's Content-Type and `Vary: Accept-Encoding`; `compression` above leaves
    // a response that already has a Content-Encoding alone. Hashed bundles may be cached for long;
    // index.html must always be fresh (the fallback below sends it).
    app.use(
      expressStaticGzip(opts.staticDir, {
        enableBrotli: true,
        orderPreference: ['br', 'gzip'],
        index: false,
        serveStatic: {
          index: false,
          setHeaders: (res, file) => {
            if (/[\\/]_expo[\\/]|[\\/]assets[\\/]|[\\/]fonts[\\/]/.test(file)) res.setHeader('Cache-Control', 'public, max-age=31536000, immutable');
          },
        },
      }),
    );
    // SPA fallback: every other GET that wants a page gets the app, which routes on the client
    // (an entry's page with its own title and description for link previews, and the first paint of
    // an entry and of the Library filled in by the server: http/page-shell.ts).
    const shellPage = shellPageSender(index, origin);
    app.get(/.*/, async (req, res, next) => {
      if (!req.accepts('html')) return next();
      res.setHeader('Cache-Control', 'no-cache');
      if (!(await shellPage(req, res))) res.sendFile(index);
    });
  }

  app.use((req, res) => {
    res.status(404).json({ error: { code: 'not_found', message: `Nothing at ${req.path}.` } });
  });
  app.use(errorHandler(logger));
  return app;
}
