/**
 * Rate limits (express-rate-limit) on the routes that guess passwords or send mail, answering 429
 * in our JSON error shape with a sentence saying when to try again (and a Retry-After header).
 * Counts are kept in each app server's memory: behind a load balancer each server counts its own.
 */
import type { Request, RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import { body } from './errors';

export interface Limit {
  /** Requests allowed per window and client address. */
  limit: number;
  windowMs: number;
}

export const LIMIT_NAMES = ['signIn', 'signUp', 'resend', 'forgot', 'reset', 'submitAccount', 'submitAddress'] as const;
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
};

const what: Record<LimitName, string> = {
  signIn: 'failed sign-in attempts',
  signUp: 'sign-ups',
  resend: 'requests for a new confirmation e-mail',
  forgot: 'requests for a password-reset e-mail',
  reset: 'password-reset attempts',
  submitAccount: 'submissions',
  submitAddress: 'submissions',
};

/** "in 40 seconds", "in about 14 minutes", "in about 2 hours" */
export function retryIn(ms: number): string {
  const s = Math.max(1, Math.ceil(ms / 1000));
  if (s < 90) return `in ${s} second${s === 1 ? '' : 's'}`;
  const m = Math.ceil(s / 60);
  if (m < 90) return `in about ${m} minutes`;
  return `in about ${Math.round(m / 60)} hours`;
}

export function rateLimiters(limits: Partial<RateLimits> = {}): Record<LimitName, RequestHandler> {
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
  return out;
}
