/**
 * Sessions in MariaDB (express-session + connect-session-sequelize on the `sessions` table, which
 * the migration creates), so that several app servers behind a load balancer share them; passport
 * (with passport-local) on top for sign-in.
 */
import connectSessionSequelize from 'connect-session-sequelize';
import session from 'express-session';
import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { Op, type Sequelize, type Transaction } from 'sequelize';
import { Session, User } from '../models';
import { burnPasswordCheck, prepareDummyHash, verifyPassword } from './passwords';

export const SESSION_COOKIE = 'cw.sid';
export const SESSION_MAX_AGE_MS = 14 * 24 * 3600_000;

const SequelizeStore = connectSessionSequelize(session.Store);

export interface SessionOptions {
  sequelize: Sequelize;
  secret: string | string[];
  /**
   * Secure cookies (HTTPS only): true in production; 'auto' elsewhere, which marks the cookie Secure
   * whenever the request came over https (directly, or through a trusted proxy's X-Forwarded-Proto).
   */
  secure: boolean | 'auto';
  /** How often expired sessions are deleted; 0 never. */
  cleanupIntervalMs?: number;
}

export function sessionMiddleware(opts: SessionOptions) {
  const store = new SequelizeStore({
    db: opts.sequelize,
    table: 'Session',
    checkExpirationInterval: opts.cleanupIntervalMs ?? 15 * 60_000,
    expiration: SESSION_MAX_AGE_MS,
    // The user beside the data, so that a password reset can end every session of that user.
    extendDefaultFields: (defaults: { data: string; expires: Date }, data: { passport?: { user?: number } }) => ({
      data: defaults.data,
      expires: defaults.expires,
      userId: data.passport?.user ?? null,
    }),
  });
  const middleware = session({
    name: SESSION_COOKIE,
    secret: opts.secret,
    store,
    resave: false,
    saveUninitialized: false,
    // 'keep', not 'destroy': a request whose session could not be read (the database down) ends with
    // no req.session, and 'destroy' then deleted the session as the answer went out — once the
    // database was back, that signed the user out (found by the outage test under load).
    unset: 'keep',
    cookie: { httpOnly: true, sameSite: 'lax', secure: opts.secure, maxAge: SESSION_MAX_AGE_MS, path: '/' },
  });
  return { middleware, store };
}

/** Ends every session of this user except `keepSid` (a password change keeps the current one). */
export function endSessionsOf(userId: number, opts: { keepSid?: string; transaction?: Transaction } = {}): Promise<number> {
  const where = opts.keepSid ? { userId, sid: { [Op.ne]: opts.keepSid } } : { userId };
  return Session.destroy({ where, transaction: opts.transaction });
}

/** A passport instance of our own (not the global one: tests build several apps in one process). */
export function createPassport(): InstanceType<typeof Passport> {
  prepareDummyHash();
  const passport = new Passport();
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      void (async () => {
        const user = await User.findOne({ where: { email: email.trim().toLowerCase() } });
        // Unknown address: check the password against a dummy hash anyway, so both failures take as long.
        const ok = user ? await verifyPassword(user.passwordHash, password) : await burnPasswordCheck(password);
        done(null, user && ok ? user : false);
      })().catch((err) => done(err));
    }),
  );
  passport.serializeUser((user, done) => done(null, (user as User).id));
  passport.deserializeUser((id: number, done) => {
    User.findByPk(id)
      .then((user) => done(null, user ?? false))
      .catch((err) => done(err));
  });
  return passport;
}
