/**
 * Accounts: sign-up, e-mail verification, password reset and changes, each write in one
 * transaction. The single-use tokens of e-mailed links are stored only as their SHA-256.
 */
import { UniqueConstraintError, type Sequelize, type Transaction } from 'sequelize';
import { HttpError } from '../http/errors';
import { hashPassword, passwordWeakness, verifyPassword } from '../auth/passwords';
import { endSessionsOf } from '../auth/session';
import { newToken, sha256 } from '../auth/tokens';
import { MailError, type Mailer } from '../mail/mailer';
import { resetMessage, verificationMessage } from '../mail/messages';
import { audit, EmailToken, User, type TokenPurpose } from '../models';
import type { Role } from '../../shared/schemas/auth';
import { can } from '../../shared/policies';

export const TOKEN_TTL_MS: Record<TokenPurpose, number> = {
  verify: 24 * 3600_000,
  reset: 3600_000,
};

const LINK_PATH: Record<TokenPurpose, string> = { verify: '/verify', reset: '/reset' };

export const emailTaken = () =>
  new HttpError(409, 'email_taken', 'An account with this e-mail address exists already. Sign in, or ask for a new password.', {
    'body.email': 'an account with this address exists already',
  });

export function weakPassword(field: 'body.password' | 'body.newPassword', why: string): HttpError {
  return new HttpError(400, 'weak_password', `Choose another password: ${why}`, { [field]: why });
}

const tokenErrors = {
  invalid: () =>
    new HttpError(
      400,
      'token_invalid',
      'This link is not valid: it may be incomplete, or a newer link has replaced it. Ask for a new one.',
      { 'body.token': 'this link is not valid' },
    ),
  used: (purpose: TokenPurpose) =>
    new HttpError(
      400,
      'token_used',
      purpose === 'verify'
        ? 'This confirmation link has been used already (each link works once). If your address is confirmed, sign in; otherwise ask for a new link.'
        : 'This password-reset link has been used already (each link works once). Ask for a new one if you still need to choose a password.',
      { 'body.token': 'this link has been used already' },
    ),
  expired: (purpose: TokenPurpose) =>
    new HttpError(
      400,
      'token_expired',
      purpose === 'verify'
        ? 'This confirmation link has expired (links work for 24 hours). Ask for a new one from the sign-in page.'
        : 'This password-reset link has expired (links work for one hour). Ask for a new one.',
      { 'body.token': 'this link has expired' },
    ),
};

export interface AccountsDeps {
  sequelize: Sequelize;
  mailer: Mailer;
}

export class Accounts {
  constructor(private readonly deps: AccountsDeps) {}

  private link(origin: string, purpose: TokenPurpose, token: string): string {
    return `${origin}${LINK_PATH[purpose]}?token=${token}`;
  }

  /** A new single-use token for this user and purpose; older unused ones stop working. */
  private async issueToken(userId: number, purpose: TokenPurpose, transaction: Transaction): Promise<string> {
    await EmailToken.destroy({ where: { userId, purpose, usedAt: null }, transaction });
    const token = newToken();
    await EmailToken.create(
      { userId, purpose, tokenHash: sha256(token), expiresAt: new Date(Date.now() + TOKEN_TTL_MS[purpose]), usedAt: null },
      { transaction },
    );
    return token;
  }

  /** Marks the token used and returns its user (row-locked), or throws a 400 saying what is wrong with it. */
  private async consumeToken(token: string, purpose: TokenPurpose, transaction: Transaction): Promise<User> {
    const row = await EmailToken.findOne({ where: { tokenHash: sha256(token), purpose }, transaction, lock: transaction.LOCK.UPDATE });
    if (!row) throw tokenErrors.invalid();
    if (row.usedAt) throw tokenErrors.used(purpose);
    if (row.expiresAt.getTime() <= Date.now()) throw tokenErrors.expired(purpose);
    row.usedAt = new Date();
    await row.save({ transaction });
    const user = await User.findByPk(row.userId, { transaction, lock: transaction.LOCK.UPDATE });
    if (!user) throw tokenErrors.invalid();
    return user;
  }

  private async send(message: Parameters<Mailer['send']>[0]): Promise<void> {
    await this.deps.mailer.send(message);
  }

  /**
   * Opens an unverified account and e-mails the confirmation link; no account if the mail cannot
   * go (the mail is sent inside the transaction, which commits right after the SMTP server accepts
   * it and before the answer goes out).
   */
  async signUp(input: { email: string; displayName: string; password: string }, origin: string): Promise<User> {
    const why = passwordWeakness(input.password, [input.email, input.displayName]);
    if (why) throw weakPassword('body.password', why);
    if (await User.findOne({ where: { email: input.email }, attributes: ['id'] })) throw emailTaken();
    const passwordHash = await hashPassword(input.password);
    try {
      return await this.deps.sequelize.transaction(async (transaction) => {
        const user = await User.create(
          { email: input.email, displayName: input.displayName, passwordHash, emailVerifiedAt: null },
          { transaction },
        );
        const token = await this.issueToken(user.id, 'verify', transaction);
        await audit(transaction, {
          actorId: user.id,
          action: 'user.signed_up',
          subjectType: 'user',
          subjectId: user.id,
          after: { email: user.email, displayName: user.displayName, role: user.role },
        });
        await this.send(verificationMessage(user.email, user.displayName, this.link(origin, 'verify', token)));
        return user;
      });
    } catch (err) {
      if (err instanceof UniqueConstraintError) throw emailTaken();
      if (err instanceof MailError) {
        throw new HttpError(503, 'mail_unavailable', 'The confirmation e-mail could not be sent just now, so no account was opened. Try again in a few minutes.');
      }
      throw err;
    }
  }

  async verify(token: string): Promise<User> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const user = await this.consumeToken(token, 'verify', transaction);
      if (!user.emailVerifiedAt) {
        user.emailVerifiedAt = new Date();
        await user.save({ transaction });
        await audit(transaction, { actorId: user.id, action: 'user.email_verified', subjectType: 'user', subjectId: user.id, before: { verified: false }, after: { verified: true } });
      }
      return user;
    });
  }

  /**
   * A new confirmation link for an unverified account; nothing (and no sign of it) otherwise.
   * The token is committed before the mail goes, so the link works as soon as it arrives; should
   * the mail fail, the unsent token is merely useless.
   */
  async resendVerification(email: string, origin: string): Promise<void> {
    const user = await User.findOne({ where: { email } });
    if (!user || user.emailVerifiedAt) return;
    const token = await this.deps.sequelize.transaction((transaction) => this.issueToken(user.id, 'verify', transaction));
    await this.send(verificationMessage(user.email, user.displayName, this.link(origin, 'verify', token)));
  }

  /** A reset link for an existing account; nothing (and no sign of it) otherwise. Committed before sending, as above. */
  async forgotPassword(email: string, origin: string): Promise<void> {
    const user = await User.findOne({ where: { email } });
    if (!user) return;
    const token = await this.deps.sequelize.transaction((transaction) => this.issueToken(user.id, 'reset', transaction));
    await this.send(resetMessage(user.email, user.displayName, this.link(origin, 'reset', token)));
  }

  /**
   * Sets a new password from a reset link and ends every session of that user. The link proves the
   * address, so an unverified account becomes verified.
   */
  async resetPassword(token: string, password: string): Promise<User> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const user = await this.consumeToken(token, 'reset', transaction);
      const why = passwordWeakness(password, [user.email, user.displayName]);
      if (why) throw weakPassword('body.password', why);
      user.passwordHash = await hashPassword(password);
      const wasVerified = user.emailVerifiedAt !== null;
      user.emailVerifiedAt ??= new Date();
      await user.save({ transaction });
      await EmailToken.destroy({ where: { userId: user.id, purpose: 'reset', usedAt: null }, transaction });
      const ended = await endSessionsOf(user.id, { transaction });
      await audit(transaction, {
        actorId: null,
        action: 'user.password_reset',
        subjectType: 'user',
        subjectId: user.id,
        before: { verified: wasVerified },
        after: { verified: true, sessionsEnded: ended },
      });
      return user;
    });
  }

  /** Needs the current password; ends the user's other sessions, keeps this one. */
  async changePassword(userId: number, current: string, next: string, keepSid: string): Promise<void> {
    const found = await User.findByPk(userId);
    if (!found) throw new HttpError(401, 'sign_in_required', 'Sign in to do this.');
    if (!(await verifyPassword(found.passwordHash, current))) {
      throw new HttpError(400, 'wrong_password', 'The current password is not right, so the password was not changed.', {
        'body.currentPassword': 'this is not your current password',
      });
    }
    const why = passwordWeakness(next, [found.email, found.displayName]);
    if (why) throw weakPassword('body.newPassword', why);
    const passwordHash = await hashPassword(next);
    await this.deps.sequelize.transaction(async (transaction) => {
      const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!user) throw new HttpError(401, 'sign_in_required', 'Sign in to do this.');
      user.passwordHash = passwordHash;
      await user.save({ transaction });
      const ended = await endSessionsOf(user.id, { keepSid, transaction });
      await audit(transaction, { actorId: user.id, action: 'user.password_changed', subjectType: 'user', subjectId: user.id, after: { otherSessionsEnded: ended } });
    });
  }

  async changeDisplayName(userId: number, displayName: string): Promise<User> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const user = await User.findByPk(userId, { transaction, lock: transaction.LOCK.UPDATE });
      if (!user) throw new HttpError(401, 'sign_in_required', 'Sign in to do this.');
      const before = user.displayName;
      if (before !== displayName) {
        user.displayName = displayName;
        await user.save({ transaction });
        await audit(transaction, { actorId: user.id, action: 'user.display_name_changed', subjectType: 'user', subjectId: user.id, before: { displayName: before }, after: { displayName } });
      }
      return user;
    });
  }

  /**
   * An admin gives a user a role. Both rows are locked (in id order) and the actor's admin role is
   * checked again inside the transaction, so two admins cannot demote each other at once.
   */
  async setRole(actorId: number, targetId: number, role: Role): Promise<User> {
    return this.deps.sequelize.transaction(async (transaction) => {
      const rows = await User.findAll({
        where: { id: [...new Set([actorId, targetId])] },
        order: [['id', 'ASC']],
        transaction,
        lock: transaction.LOCK.UPDATE,
      });
      const actor = rows.find((u) => u.id === actorId);
      const target = rows.find((u) => u.id === targetId);
      if (!actor || !can(actor, 'users.setRole')) throw new HttpError(403, 'forbidden', 'Only an account with the admin role may change roles.');
      if (!target) throw new HttpError(404, 'user_not_found', `There is no user with id ${targetId}.`);
      if (target.id === actor.id && role !== 'admin') {
        throw new HttpError(400, 'cannot_demote_self', 'You cannot take the admin role away from yourself; another admin can.', {
          'body.role': 'you cannot take the admin role away from yourself',
        });
      }
      const before = target.role;
      if (before !== role) {
        target.role = role;
        await target.save({ transaction });
        await audit(transaction, { actorId: actor.id, action: 'user.role_changed', subjectType: 'user', subjectId: target.id, before: { role: before }, after: { role } });
      }
      return target;
    });
  }
}
