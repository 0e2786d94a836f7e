/**
 * Sign-up, verification, sign-in and out, password reset: /api/auth/*.
 * Tests: tests/server/accounts.test.ts, sessions.test.ts, rate-limit.test.ts, security.test.ts (and
 * the role matrix, csrf.test.ts, the fuzzer).
 */
import { Router, type Request, type RequestHandler } from 'express';
import type { Logger } from 'pino';
import type { PassportStatic } from 'passport';
import { HttpError } from '../../http/errors';
import type { LimitName } from '../../http/rate-limit';
import { validated } from '../../http/validate';
import type { User } from '../../models';
import type { Allow } from '../../policies';
import * as present from '../../presenters/accounts';
import type { Accounts } from '../../services/accounts';
import { emailOnlySchema, resetSchema, signInSchema, signUpSchema, verifySchema } from './schema';

export interface AuthRouteDeps {
  allow: Allow;
  accounts: Accounts;
  passport: Pick<PassportStatic, 'authenticate'>;
  limits: Record<LimitName, RequestHandler>;
  /** The origin of e-mailed links for this request. */
  origin: (req: Request) => string;
  /** Runs mail work after the answer has gone, so that the answer's timing reveals nothing. */
  later: (what: string, job: () => Promise<void>) => void;
  logger: Logger;
}

const BAD_CREDENTIALS = 'The e-mail address or the password is wrong.';

export function authRoutes(d: AuthRouteDeps): Router {
  const r = Router();
  const { allow, accounts, limits } = d;

  r.post('/auth/sign-up', allow('auth.signUp'), limits.signUp, validated({ body: signUpSchema }), async (req, res) => {
    const input = res.locals.valid.body;
    const user = await accounts.signUp(input, d.origin(req));
    res.status(201).json({ user: present.user(user) });
  });

  r.post('/auth/verify', allow('auth.verify'), validated({ body: verifySchema }), async (_req, res) => {
    const { token } = res.locals.valid.body;
    const user = await accounts.verify(token);
    res.json({ user: present.user(user) });
  });

  r.post('/auth/resend-verification', allow('auth.resendVerification'), limits.resend, validated({ body: emailOnlySchema }), (req, res) => {
    const { email } = res.locals.valid.body;
    const origin = d.origin(req);
    d.later('resend verification', () => accounts.resendVerification(email, origin));
    res.status(202).json({});
  });

  r.post('/auth/sign-in', allow('auth.signIn'), limits.signIn, validated({ body: signInSchema }), (req, res, next) => {
    // Validated (and the address lower-cased) before passport-local reads the body.
    req.body = res.locals.valid.body;
    d.passport.authenticate('local', (err: unknown, user: User | false) => {
      if (err) return next(err);
      if (!user) return next(new HttpError(401, 'bad_credentials', BAD_CREDENTIALS));
      if (!user.emailVerifiedAt) {
        return next(
          new HttpError(
            403,
            'email_unverified',
            'Confirm your e-mail address first: open the link in the message we sent you, or ask for a new one.',
          ),
        );
      }
      // passport regenerates the session (a new session id); the CSRF token carries over.
      req.login(user, { session: true, keepSessionInfo: true }, (loginErr) => {
        if (loginErr) return next(loginErr);
        res.json({ user: present.user(user) });
      });
    })(req, res, next);
  });

  r.post('/auth/sign-out', allow('auth.signOut'), (req, res, next) => {
    if (!req.isAuthenticated()) {
      res.status(204).end();
      return;
    }
    req.logout({ keepSessionInfo: true }, (err) => {
      if (err) return next(err);
      res.status(204).end();
    });
  });

  r.post('/auth/forgot', allow('auth.forgotPassword'), limits.forgot, validated({ body: emailOnlySchema }), (req, res) => {
    const { email } = res.locals.valid.body;
    const origin = d.origin(req);
    d.later('password reset mail', () => accounts.forgotPassword(email, origin));
    res.status(202).json({});
  });

  r.post('/auth/reset', allow('auth.resetPassword'), limits.reset, validated({ body: resetSchema }), async (req, res) => {
    const { token, password } = res.locals.valid.body;
    const user = await accounts.resetPassword(token, password);
    // Every session of that user has been ended; this request's, if it was one of them, too.
    if (req.user && req.user.id === user.id) {
      await new Promise<void>((resolve, reject) => req.logout({ keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())));
    }
    res.json({});
  });

  return r;
}
