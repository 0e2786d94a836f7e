/**
 * Who may do what: the one place on the server that says so. Every route names its action with
 * `allow('<resource>.<action>')`; tests/server/role-matrix.test.ts walks the router and fails for
 * a route without one.
 *
 * `allow()` also guards every state-changing request (POST, PUT, PATCH, DELETE): an Origin header
 * that is not this server's own is refused, and the session's CSRF token must come back in
 * `X-CSRF-Token` — except for pure computations (`csrf: false`), which change nothing and read no
 * session: the check kit and the worksheet evaluator, whose input merely travels as a POST body.
 */
import type { NextFunction, Request, Response } from 'express';
import type { Role, Viewer } from '../shared/schemas/auth';
import { HttpError } from './http/errors';
import { sameToken } from './auth/tokens';

/** 'public': anyone, signed in or not; 'signed-in': any account; a list: those roles only. */
export type Who = 'public' | 'signed-in' | readonly Role[];

export interface Policy {
  who: Who;
  /** false only for pure computations (no state changed, no session read). Default true. */
  csrf?: boolean;
}

const PUBLIC: Policy = { who: 'public' };
const COMPUTE: Policy = { who: 'public', csrf: false };
const SIGNED_IN: Policy = { who: 'signed-in' };
const ADMIN: Policy = { who: ['admin'] };
/** Moderators decide submissions; admins may do the same. */
const MODERATOR: Policy = { who: ['moderator', 'admin'] };
/** Editors write and vet entries; admins may do the same. */
const EDITOR: Policy = { who: ['editor', 'admin'] };

export const policies = {
  health: { read: PUBLIC },
  taxonomy: { read: PUBLIC },
  checks: { list: PUBLIC, run: COMPUTE },
  worksheets: { list: PUBLIC, read: PUBLIC, evaluate: COMPUTE },
  session: { read: PUBLIC },
  auth: {
    signUp: PUBLIC,
    verify: PUBLIC,
    resendVerification: PUBLIC,
    signIn: PUBLIC,
    signOut: PUBLIC,
    forgotPassword: PUBLIC,
    resetPassword: PUBLIC,
  },
  account: { updateProfile: SIGNED_IN, changePassword: SIGNED_IN },
  users: { list: ADMIN, setRole: ADMIN },
  audit: { list: ADMIN },
  outbox: { list: ADMIN },
  entries: { list: PUBLIC, read: PUBLIC, versions: PUBLIC, cite: PUBLIC, sightings: PUBLIC, startDraft: EDITOR, retire: EDITOR },
  drafts: { create: EDITOR, read: EDITOR, update: EDITOR, submit: EDITOR, approve: EDITOR, sendBack: EDITOR },
  desk: { read: EDITOR, corrections: EDITOR },
  citations: { parse: EDITOR },
  search: { query: PUBLIC },
  /** The trade's synonym groups the claim matcher expands through: anyone reads them, editors change them. */
  synonyms: { list: PUBLIC, create: EDITOR, update: EDITOR, delete: EDITOR },
  /** The claim check; a saved one is read by anyone holding its link and deleted by its owner only (checked in the service). */
  /** Sightings and corrections; who sees one (submitter, moderators, the editors it was passed to) is checked in the service. */
  submissions: { sighting: SIGNED_IN, correction: SIGNED_IN, mine: SIGNED_IN, read: SIGNED_IN, answer: SIGNED_IN },
  attachments: { read: SIGNED_IN },
  queue: { list: MODERATOR, editors: MODERATOR, claim: MODERATOR, release: MODERATOR, decide: MODERATOR },
  claimChecks: { run: COMPUTE, save: SIGNED_IN, listMine: SIGNED_IN, read: PUBLIC, delete: SIGNED_IN },
} as const satisfies Record<string, Record<string, Policy>>;

type Table = typeof policies;
export type Action = { [R in keyof Table]: `${R & string}.${keyof Table[R] & string}` }[keyof Table];

export function policyOf(action: Action): Policy {
  const [resource, verb] = action.split('.') as [keyof Table, string];
  const policy = (policies[resource] as Record<string, Policy> | undefined)?.[verb];
  if (!policy) throw new Error(`no policy for action "${action}"`);
  return policy;
}

/** Every declared action, e.g. for a test that each one is used by some route. */
export const allActions = (): Action[] =>
  Object.entries(policies).flatMap(([resource, verbs]) => Object.keys(verbs).map((verb) => `${resource}.${verb}` as Action));

/** May this viewer (a role, or 'reader' without an account) do this? The client may ask the same. */
export function can(viewer: Viewer, action: Action): boolean {
  const { who } = policyOf(action);
  if (who === 'public') return true;
  if (viewer === 'reader') return false;
  return who === 'signed-in' || who.includes(viewer);
}

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
        if (policy.who !== 'signed-in' && !policy.who.includes(user.role)) {
          const roles = policy.who.join(' or ');
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
