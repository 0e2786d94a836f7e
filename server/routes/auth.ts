/** The session (who is signed in, and the CSRF token), sign-up, verification, sign-in and out, password reset. */
import { Router, type Request } from 'express';
import type { Logger } from 'pino';
import type { PassportStatic } from 'passport';
import type { SessionResponse } from '../../shared/api-types';
import { emailOnlySchema, resetSchema, signInSchema, signUpSchema, verifySchema } from '../../shared/schemas/auth';
import { newToken } from '../auth/tokens';
import { HttpError } from '../http/errors';
import type { LimitName } from '../http/rate-limit';
import { validate } from '../http/validate';
import type { User } from '../models';
import type { Allow } from '../policies';
import type { Accounts } from '../services/accounts';
import type { RequestHandler } from 'express';

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

  r.get('/session', allow('session.read'), (req, res) => {
    req.session.csrfToken ??= newToken();
    const payload: SessionResponse = { user: req.user ? req.user.toDto() : null, csrfToken: req.session.csrfToken };
    res.set('Cache-Control', 'no-store').json(payload);
  });

  r.post('/auth/sign-up', allow('auth.signUp'), limits.signUp, async (req, res) => {
    const input = validate(signUpSchema, req.body ?? {}, 'body');
    const user = await accounts.signUp(input, d.origin(req));
    res.status(201).json({ user: user.toDto() });
  });

  r.post('/auth/verify', allow('auth.verify'), async (req, res) => {
    const { token } = validate(verifySchema, req.body ?? {}, 'body');
    const user = await accounts.verify(token);
    res.json({ user: user.toDto() });
  });

  r.post('/auth/resend-verification', allow('auth.resendVerification'), limits.resend, (req, res) => {
    const { email } = validate(emailOnlySchema, req.body ?? {}, 'body');
    const origin = d.origin(req);
    d.later('resend verification', () => accounts.resendVerification(email, origin));
    res.status(202).json({});
  });

  r.post('/auth/sign-in', allow('auth.signIn'), limits.signIn, (req, res, next) => {
    // Validated (and the address lower-cased) before passport-local reads the body.
    req.body = validate(signInSchema, req.body ?? {}, 'body');
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
        res.json({ user: user.toDto() });
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

  r.post('/auth/forgot', allow('auth.forgotPassword'), limits.forgot, (req, res) => {
    const { email } = validate(emailOnlySchema, req.body ?? {}, 'body');
    const origin = d.origin(req);
    d.later('password reset mail', () => accounts.forgotPassword(email, origin));
    res.status(202).json({});
  });

  r.post('/auth/reset', allow('auth.resetPassword'), limits.reset, async (req, res) => {
    const { token, password } = validate(resetSchema, req.body ?? {}, 'body');
    const user = await accounts.resetPassword(token, password);
    // Every session of that user has been ended; this request's, if it was one of them, too.
    if (req.user && req.user.id === user.id) {
      await new Promise<void>((resolve, reject) => req.logout({ keepSessionInfo: true }, (err) => (err ? reject(err) : resolve())));
    }
    res.json({});
  });

  return r;
}
