/**
 * The request guard. Every route names its action with `allow('<resource>.<action>')`, looked up in
 * the shared policy table (shared/policies.ts); tests/server/role-matrix.test.ts walks the router
 * and fails for a route without one.
 *
 * `allow()` also guards every state-changing request (POST, PUT, PATCH, DELETE): an Origin header
 * that is not this server's own is refused, and the session's CSRF token must come back in
 * `X-CSRF-Token` — except for pure computations (`csrf: false`), which change nothing and read no
 * session: the check kit and the worksheet evaluator, whose input merely travels as a POST body.
 */
import type { NextFunction, Request, Response } from 'express';
import { can, policyOf, type Action, type Policy } from '../shared/policies';
import { HttpError } from './http/errors';
import { sameToken } from './auth/tokens';

// The table itself (and `can()`) lives in shared/policies.ts, read by the app too.
export { allActions, can, policies, policyOf, type Action, type Policy, type Who } from '../shared/policies';

const SAFE_METHODS = new Set(['GET', 'HEAD', 'OPTIONS']);

/** This server's own origins: PUBLIC_URL's and the one the request was addressed to. */
function isOwnOrigin(req: Request, origin: string, publicOrigin: string | null): boolean {
  if (publicOrigin && origin === publicOrigin) return true;
  const host = req.get('host');
  return Boolean(host) && origin === `${req.protocol}://${host}`;
}

export interface AllowOptions {
  /** PUBLIC_URL, whose origin counts as our own beside the request's own host. */
  publicUrl?: string;
}

/** The middleware type that `allow()` returns: it carries its action for the route walker. */
// `Request<any>`: so that a route's own handler still gets its path parameters typed from the path.
// eslint-disable-next-line @typescript-eslint/no-explicit-any
export type PolicyMiddleware = ((req: Request<any>, res: Response, next: NextFunction) => void) & { action: Action; policy: Policy };

/**
 * Builds the `allow` function for one app. `allow(action)`: 401 sign_in_required for a reader
 * where an account is needed, 403 forbidden for a role without the right, 403 csrf_failed for a
 * state-changing request from another origin or without this session's token.
 */
export function policyGuard(opts: AllowOptions = {}) {
  const publicOrigin = opts.publicUrl ? new URL(opts.publicUrl).origin : null;
  return function allow(action: Action): PolicyMiddleware {
    const policy = policyOf(action);
    const middleware = (req: Request, _res: Response, next: NextFunction) => {
      const user = req.user;
      if (policy.who !== 'public') {
        if (!user) {
          return next(new HttpError(401, 'sign_in_required', 'Sign in to do this.'));
        }
        if (!can(user, action)) {
          const roles = typeof policy.who === 'string' ? policy.who : policy.who.join(' or ');
          return next(new HttpError(403, 'forbidden', `Only an account with the ${roles} role may do this; yours has the ${user.role} role.`));
        }
      }
      if (!SAFE_METHODS.has(req.method)) {
        const origin = req.get('origin');
        if (origin !== undefined && !isOwnOrigin(req, origin, publicOrigin)) {
          return next(new HttpError(403, 'csrf_failed', `Refused: this request came from another site (${origin}), not from Counterweight itself.`));
        }
        if (policy.csrf !== false) {
          const sent = req.get('x-csrf-token');
          const expected = req.session?.csrfToken;
          if (!sent || !expected || !sameToken(sent, expected)) {
            return next(
              new HttpError(
                403,
                'csrf_failed',
                sent
                  ? "The request's security token does not match this session's (the session may have ended). Reload the page and try again."
                  : 'The request did not carry the security token (X-CSRF-Token from GET /api/session). Reload the page and try again.',
              ),
            );
          }
        }
      }
      next();
    };
    return Object.assign(middleware, { action, policy });
  };
}

export type Allow = ReturnType<typeof policyGuard>;
