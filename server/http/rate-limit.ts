/**
 * Rate limits (express-rate-limit) on the routes that guess passwords or send mail, and on the
 * anonymous computation and claim-check routes, answering 429 in our JSON error shape with a
 * sentence saying when to try again (and a Retry-After header).
 *
 * Counts are kept in MariaDB (table rate_limits, migration 0007), so that several app servers
 * behind a load balancer count together (issue 13, item 6). Why a store of our own and not
 * rate-limiter-flexible's MySQL store: that store's Sequelize mode runs `connection.query(sql,
 * values, callback)` on the raw connection, a mysql/mysql2 callback API that the `mariadb`
 * connector under Sequelize (promise API, pinned at 3.0.2) does not offer; and the express-rate-limit
 * middleware, its messages and headers stay as they were. The store is one small table: each count
 * is one atomic `INSERT … ON DUPLICATE KEY UPDATE` (fixed windows on the database's clock), read
 * back in the same transaction; expired rows are deleted on a timer.
 */
import crypto from 'node:crypto';
import type { Request, RequestHandler } from 'express';
import { rateLimit, type ClientRateLimitInfo, type Options, type Store } from 'express-rate-limit';
import { QueryTypes, type Sequelize } from 'sequelize';
import { body } from './errors';

export interface Limit {
  /** Requests allowed per window and client address. */
  limit: number;
  windowMs: number;
}

export const LIMIT_NAMES = ['signIn', 'signUp', 'resend', 'forgot', 'reset', 'submitAccount', 'submitAddress', 'compute', 'claimCheck'] as const;
export type LimitName = (typeof LIMIT_NAMES)[number];
export type RateLimits = Record<LimitName, Limit>;

const minutes = (n: number) => n * 60_000;

export const DEFAULT_RATE_LIMITS: RateLimits = {
  // Failed sign-ins only: a successful one does not count.
  signIn: { limit: 10, windowMs: minutes(15) },
  signUp: { limit: 10, windowMs: minutes(60) },
  resend: { limit: 5, windowMs: minutes(60) },
  forgot: { limit: 5, windowMs: minutes(60) },
  reset: { limit: 10, windowMs: minutes(60) },
  // Sightings and corrections (issue 7): per account, and per address (several accounts behind one).
  submitAccount: { limit: 20, windowMs: minutes(60) },
  submitAddress: { limit: 60, windowMs: minutes(60) },
  // Worksheet evaluations and check runs over the API (issue 13; the screens compute in the browser).
  // Each job ended at the time limit costs a worker thread, which takes seconds of CPU to replace.
  compute: { limit: 60, windowMs: minutes(1) },
  // Claim checks, run or saved: each reads a text, searches the library and runs checks.
  claimCheck: { limit: 20, windowMs: minutes(1) },
};

/** COMPUTE_RATE_LIMIT and CLAIM_CHECK_RATE_LIMIT: requests per minute and address, when set. */
export function rateLimitsFromEnv(env: NodeJS.ProcessEnv = process.env): Partial<RateLimits> {
  const out: Partial<RateLimits> = {};
  for (const [name, variable] of [['compute', 'COMPUTE_RATE_LIMIT'], ['claimCheck', 'CLAIM_CHECK_RATE_LIMIT']] as const) {
    const raw = env[variable];
    if (raw === undefined || raw === '') continue;
    const n = Number(raw);
    if (!Number.isInteger(n) || n < 1) throw new Error(`${variable} must be a whole number of requests per minute (at least 1), got "${raw}"`);
    out[name] = { limit: n, windowMs: minutes(1) };
  }
  return out;
}

const what: Record<LimitName, string> = {
  signIn: 'failed sign-in attempts',
  signUp: 'sign-ups',
  resend: 'requests for a new confirmation e-mail',
  forgot: 'requests for a password-reset e-mail',
  reset: 'password-reset attempts',
  submitAccount: 'submissions',
  submitAddress: 'submissions',
  compute: 'computations',
  claimCheck: 'claim checks',
};

/** "in 40 seconds", "in about 14 minutes", "in about 2 hours" */
export function retryIn(ms: number): string {
  const s = Math.max(1, Math.ceil(ms / 1000));
  if (s < 90) return `in ${s} second${s === 1 ? '' : 's'}`;
  const m = Math.ceil(s / 60);
  if (m < 90) return `in about ${m} minutes`;
  return `in about ${Math.round(m / 60)} hours`;
}

/** The database's clock in milliseconds since 1970 (@@timestamp: seconds with microseconds, whatever the time zone). */
const NOW_MS = 'ROUND(@@timestamp * 1000)';
/** Longest key kept as it is; longer ones (none today) are hashed. */
const KEY_MAX = 190;

/**
 * An express-rate-limit store on the rate_limits table: fixed windows, counted on the database's
 * clock, shared by every app server on the database. One per limiter (`prefix` is the limit's name).
 */
export class MariaDbStore implements Store {
  readonly localKeys = false;
  readonly prefix: string;
  private windowMs = 60_000;

  constructor(
    private readonly sequelize: Sequelize,
    name: string,
  ) {
    this.prefix = `${name}:`;
  }

  init(options: Options): void {
    this.windowMs = options.windowMs;
  }

  private key(key: string): string {
    const full = this.prefix + key;
    return full.length <= KEY_MAX ? full : `${this.prefix}#${crypto.createHash('sha256').update(key).digest('base64url')}`;
  }

  async get(key: string): Promise<ClientRateLimitInfo | undefined> {
    const [row] = await this.sequelize.query<{ hits: number; resetMs: number }>(
      `SELECT hits, CAST(reset_ms AS DOUBLE) AS resetMs FROM rate_limits WHERE rate_key = ? AND reset_ms > ${NOW_MS}`,
      { replacements: [this.key(key)], type: QueryTypes.SELECT },
    );
    return row ? { totalHits: Number(row.hits), resetTime: new Date(Number(row.resetMs)) } : undefined;
  }

  async increment(key: string): Promise<ClientRateLimitInfo> {
    const k = this.key(key);
    return this.sequelize.transaction(async (transaction) => {
      // One statement counts atomically: a new window starts when the old one has ended. (hits is
      // assigned before reset_ms, so both IFs read the old reset_ms.)
      await this.sequelize.query(
        `INSERT INTO rate_limits (rate_key, hits, reset_ms) VALUES (?, 1, ${NOW_MS} + ?)
         ON DUPLICATE KEY UPDATE hits = IF(reset_ms <= ${NOW_MS}, 1, hits + 1), reset_ms = IF(reset_ms <= ${NOW_MS}, VALUES(reset_ms), reset_ms)`,
        { replacements: [k, this.windowMs], transaction },
      );
      // Read back under the row lock the insert took: this request's own count.
      const [row] = await this.sequelize.query<{ hits: number; resetMs: number }>(
        'SELECT hits, CAST(reset_ms AS DOUBLE) AS resetMs FROM rate_limits WHERE rate_key = ?',
        { replacements: [k], type: QueryTypes.SELECT, transaction },
      );
      return { totalHits: Number(row.hits), resetTime: new Date(Number(row.resetMs)) };
    });
  }

  async decrement(key: string): Promise<void> {
    await this.sequelize.query(`UPDATE rate_limits SET hits = IF(hits > 0, hits - 1, 0) WHERE rate_key = ? AND reset_ms > ${NOW_MS}`, {
      replacements: [this.key(key)],
    });
  }

  async resetKey(key: string): Promise<void> {
    await this.sequelize.query('DELETE FROM rate_limits WHERE rate_key = ?', { replacements: [this.key(key)] });
  }

  async resetAll(): Promise<void> {
    await this.sequelize.query("DELETE FROM rate_limits WHERE rate_key LIKE ? ESCAPE '!'", {
      replacements: [this.prefix.replace(/[!%_]/g, '!$&') + '%'],
    });
  }
}

/** Deletes the rows of windows that have ended; returns how many. */
export async function deleteExpiredRateLimits(sequelize: Sequelize): Promise<number> {
  const deleted = await sequelize.query(`DELETE FROM rate_limits WHERE reset_ms <= ${NOW_MS}`, { type: QueryTypes.BULKDELETE });
  return Number(deleted);
}

export interface RateLimitersOptions {
  /** Counts go to this database (shared by the app servers); without one, each process counts alone in memory. */
  sequelize?: Sequelize;
  /** How often expired counts are deleted (ms); 0 never. Default 10 minutes. */
  cleanupMs?: number;
  logger?: { error: (obj: unknown, msg?: string) => void; warn: (obj: unknown, msg?: string) => void; info: (obj: unknown, msg?: string) => void; debug: (obj: unknown, msg?: string) => void };
}

export interface RateLimiters {
  handlers: Record<LimitName, RequestHandler>;
  /** Stops the cleanup timer. */
  stop(): void;
}

/** Limits whose routes need no database: when it cannot be reached, they let requests through (logged). */
const passWhenStoreFails = new Set<LimitName>(['compute']);

export function rateLimiters(limits: Partial<RateLimits> = {}, opts: RateLimitersOptions = {}): RateLimiters {
  const out = {} as Record<LimitName, RequestHandler>;
  for (const name of LIMIT_NAMES) {
    const { limit, windowMs } = { ...DEFAULT_RATE_LIMITS[name], ...limits[name] };
    out[name] = rateLimit({
      limit,
      windowMs,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      identifier: name,
      skipSuccessfulRequests: name === 'signIn',
      ...(opts.sequelize ? { store: new MariaDbStore(opts.sequelize, name) } : {}),
      ...(opts.logger ? { logger: opts.logger } : {}),
      // Otherwise a store error is passed on: the error handler answers 503 when the database is down.
      passOnStoreError: passWhenStoreFails.has(name),
      // Per account: the route runs after allow(), so a user is signed in.
      ...(name === 'submitAccount' ? { keyGenerator: (req: Request) => `user:${(req.user as { id?: number } | undefined)?.id ?? 'none'}` } : {}),
      handler: (req: Request, res) => {
        const reset = (req as Request & { rateLimit?: { resetTime?: Date } }).rateLimit?.resetTime;
        const wait = reset ? reset.getTime() - Date.now() : windowMs;
        res
          .status(429)
          .json(body('rate_limited', `Too many ${what[name]} ${name === 'submitAccount' ? 'from this account' : 'from your network'}. Try again ${retryIn(wait)}.`));
      },
    });
  }
  const cleanupMs = opts.cleanupMs ?? minutes(10);
  let timer: NodeJS.Timeout | null = null;
  const { sequelize } = opts;
  if (sequelize && cleanupMs > 0) {
    timer = setInterval(() => {
      deleteExpiredRateLimits(sequelize).catch((err) => opts.logger?.warn({ err }, 'deleting expired rate-limit counts failed'));
    }, cleanupMs) as unknown as NodeJS.Timeout;
    timer.unref();
  }
  return {
    handlers: out,
    stop: () => {
      if (timer) clearInterval(timer);
      timer = null;
    },
  };
}
