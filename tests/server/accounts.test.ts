/**
 * Accounts against the real app, a real MariaDB and the fake SMTP server: sign-up → the e-mail →
 * verify → sign-in → forgot → the e-mail → reset → sign-in with the new password; and each way
 * that can go wrong (duplicate address, common password, expired and reused links, wrong
 * credentials, unverified address).
 */
import { QueryTypes } from 'sequelize';
import { createApp } from '../../server/app';
import { freePort } from '../../server/db/mariadb';
import { createMailer } from '../../server/mail/mailer';
import * as passwords from '../../server/auth/passwords';
import { sha256 } from '../../server/auth/tokens';
import { EmailToken, Session, User } from '../../server/models';
import { Client, demo, startTestApp, type TestApp } from '../support/app';
import { linkToken } from '../support/mail';

jest.setTimeout(60_000);

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ publicUrl: 'http://counterweight.test:8080' });
});
afterAll(() => h?.close());

// A password with a high zxcvbn score (4) and no dictionary entry of its own: random words and digits.
const strong = 'violet-gravel-oboe-1874';
const stronger = 'quartz lantern marsh 5309';

const expectError = (res: { status: number; body: unknown }, status: number, code: string) => {
  expect({ status: res.status, code: (res.body as { error?: { code?: string } }).error?.code }).toEqual({ status, code });
  expect((res.body as { error: { message: string } }).error.message).toEqual(expect.any(String));
};

describe('the whole flow', () => {
  const email = 'new.reader@example.org';

  it('signs up, verifies from the e-mail, signs in, resets the password from the e-mail, signs in with the new one', async () => {
    const c = await h.client();
    const up = await c.post('/api/auth/sign-up', { email: ' New.Reader@Example.org ', displayName: 'Nadia Reader', password: strong }).expect(201);
    expect(up.body.user).toMatchObject({ email, displayName: 'Nadia Reader', role: 'contributor', verified: false });
    expect(up.body.user).not.toHaveProperty('passwordHash');
    expect((await c.session()).user).toBeNull(); // not signed in by sign-up

    // Stored as an argon2id hash, never the password.
    const row = await User.findOne({ where: { email } });
    expect(row!.passwordHash).toMatch(/^\$argon2id\$v=19\$m=19456,t=2,p=1\$/);

    // Unverified: the right password gets 403 email_unverified.
    expectError(await c.post('/api/auth/sign-in', { email, password: strong }), 403, 'email_unverified');

    const mail = await h.mail.next(email, { subject: /confirm/i });
    expect(mail.from).toContain('no-reply@example.org');
    expect(mail.text).toContain('Nadia Reader');
    expect(mail.text).toMatch(/http:\/\/counterweight\.test:8080\/verify\?token=[A-Za-z0-9_-]{43}/);
    expect(mail.html).toContain('http://counterweight.test:8080/verify?token=');
    expect(mail.html).toMatch(/<a href=/);
    const token = linkToken(mail, 'verify');
    // Only the SHA-256 of the token is stored.
    const stored = await EmailToken.findAll({ where: { userId: row!.id } });
    expect(stored.map((s) => s.tokenHash)).toEqual([sha256(token)]);
    const raw = await h.t.sequelize.query<{ n: number }>('SELECT COUNT(*) AS n FROM email_tokens WHERE token_hash = ?', {
      replacements: [token],
      type: QueryTypes.SELECT,
    });
    expect(Number(raw[0].n)).toBe(0);

    const verified = await c.post('/api/auth/verify', { token }).expect(200);
    expect(verified.body.user).toMatchObject({ email, verified: true });

    const before = c.sid();
    const signIn = await c.post('/api/auth/sign-in', { email: 'NEW.reader@example.org', password: strong }).expect(200);
    expect(signIn.body.user).toMatchObject({ email, role: 'contributor', verified: true });
    // The session id is regenerated at sign-in; the old one is gone from the store.
    expect(c.sid()).toBeDefined();
    expect(c.sid()).not.toBe(before);
    expect(await Session.findByPk(decodeSid(before!))).toBeNull();
    expect((await c.session()).user).toMatchObject({ email });

    // A second device signed in as the same user.
    const other = await h.signedIn(email, strong);

    const anon = await h.client();
    await anon.post('/api/auth/forgot', { email }).expect(202);
    const resetMail = await h.mail.next(email, { subject: /password/i });
    expect(resetMail.text).toMatch(/http:\/\/counterweight\.test:8080\/reset\?token=/);
    const resetToken = linkToken(resetMail, 'reset');
    expect(await Session.count({ where: { userId: row!.id } })).toBe(2);

    await anon.post('/api/auth/reset', { token: resetToken, password: stronger }).expect(200);
    // Every session of that user has ended.
    expect(await Session.count({ where: { userId: row!.id } })).toBe(0);
    expect((await c.session()).user).toBeNull();
    expect((await other.session()).user).toBeNull();
    expectError(await c.patch('/api/account', { displayName: 'Still Here' }), 401, 'sign_in_required');

    expectError(await anon.post('/api/auth/sign-in', { email, password: strong }), 401, 'bad_credentials');
    const again = await anon.post('/api/auth/sign-in', { email, password: stronger }).expect(200);
    expect(again.body.user.email).toBe(email);
  });

  it('refuses the same address again with 409 naming body.email, whatever its case', async () => {
    // An account of its own (invented), so that the test does not lean on the one above.
    const taken = 'taken.reader@example.org';
    await (await h.client()).post('/api/auth/sign-up', { email: taken, displayName: 'Tamsin Reader', password: strong }).expect(201);
    const c = await h.client();
    const res = await c.post('/api/auth/sign-up', { email: 'TAKEN.READER@example.org', displayName: 'Someone Else', password: stronger });
    expectError(res, 409, 'email_taken');
    expect(Object.keys(res.body.error.fields)).toEqual(['body.email']);
    expect(await User.count({ where: { email: taken } })).toBe(1);
  });
});

describe('when mail cannot be sent', () => {
  it('opens no account and says so with 503', async () => {
    // Nothing listens on a port that was free a moment ago: the SMTP connection is refused.
    const broken = createMailer({ url: `smtp://127.0.0.1:${await freePort()}`, from: 'Counterweight <no-reply@example.org>' });
    const app = createApp({ sequelize: h.t.sequelize, version: 'test', env: 'test', mailer: broken, sessionCleanupMs: 0 });
    const c = await Client.start(app);
    const res = await c.post('/api/auth/sign-up', { email: 'unlucky@example.org', displayName: 'Una Lucky', password: strong });
    expectError(res, 503, 'mail_unavailable');
    expect(await User.count({ where: { email: 'unlucky@example.org' } })).toBe(0);
    broken.close();
  });
});

/** express-session's cookie value is "s:<sid>.<signature>", URL-encoded. */
function decodeSid(cookie: string): string {
  return decodeURIComponent(cookie).replace(/^s:/, '').replace(/\.[^.]+$/, '');
}

describe('passwords', () => {
  it.each([
    // Entries of zxcvbn-ts's common-password list (@zxcvbn-ts/language-common, passwords.json).
    ['qwerty123456'],
    ['administrator'],
    // Too close to a common one: "password" followed by a sequence.
    ['password1234'],
    // A straight row of keys.
    ['qwertyuiopasdf'],
  ])('refuses %p at sign-up with 400 naming body.password, in plain words', async (password) => {
    const c = await h.client();
    const res = await c.post('/api/auth/sign-up', { email: 'weak@example.org', displayName: 'Wendy Weak', password });
    expectError(res, 400, 'weak_password');
    expect(Object.keys(res.body.error.fields)).toEqual(['body.password']);
    expect(res.body.error.fields['body.password']).toMatch(/^[A-Z][^{}]+\.$/);
    // Sentences, not zxcvbn's translation keys (camelCase words such as topTen or anotherWord).
    expect(res.body.error.fields['body.password']).not.toMatch(/[a-z][A-Z]/);
    expect(await User.count({ where: { email: 'weak@example.org' } })).toBe(0);
  });

  it('names "common" for a password that is on the list', async () => {
    const c = await h.client();
    const res = await c.post('/api/auth/sign-up', { email: 'weak@example.org', displayName: 'Wendy Weak', password: 'qwerty123456' });
    expect(res.body.error.fields['body.password']).toMatch(/common/i);
  });

  it('refuses fewer than 12 characters, and a password made of the own name', async () => {
    const c = await h.client();
    const short = await c.post('/api/auth/sign-up', { email: 'short@example.org', displayName: 'Sam Short', password: 'Xk9!pq2#' });
    expectError(short, 400, 'validation_failed');
    expect(short.body.error.fields['body.password']).toMatch(/12/);
    const own = await c.post('/api/auth/sign-up', { email: 'wilhelmina.stroganova@example.org', displayName: 'Wilhelmina Stroganova', password: 'wilhelminastroganova' });
    expectError(own, 400, 'weak_password');
  });

  it('changes the password with the current one, and names the field when it is wrong', async () => {
    const c = await h.signedIn(demo.editor.email);
    const other = await h.signedIn(demo.editor.email);
    const wrong = await c.post('/api/account/password', { currentPassword: 'not-my-password-at-all', newPassword: stronger });
    expectError(wrong, 400, 'wrong_password');
    expect(Object.keys(wrong.body.error.fields)).toEqual(['body.currentPassword']);
    const weak = await c.post('/api/account/password', { currentPassword: demo.password, newPassword: 'qwerty123456' });
    expectError(weak, 400, 'weak_password');
    expect(Object.keys(weak.body.error.fields)).toEqual(['body.newPassword']);

    await c.post('/api/account/password', { currentPassword: demo.password, newPassword: stronger }).expect(200);
    // This session stays; the other one has ended.
    expect((await c.session()).user?.email).toBe(demo.editor.email);
    expect((await other.session()).user).toBeNull();
    const anon = await h.client();
    expectError(await anon.post('/api/auth/sign-in', { email: demo.editor.email, password: demo.password }), 401, 'bad_credentials');
    await anon.post('/api/auth/sign-in', { email: demo.editor.email, password: stronger }).expect(200);
  });

  it('changes the display name and says who it is now', async () => {
    const c = await h.signedIn(demo.moderator.email);
    const res = await c.patch('/api/account', { displayName: '  Dmitri H. Havel ' }).expect(200);
    expect(res.body.user).toMatchObject({ email: demo.moderator.email, displayName: 'Dmitri H. Havel' });
    expect((await c.session()).user).toMatchObject({ displayName: 'Dmitri H. Havel' });
    const bad = await c.patch('/api/account', { displayName: '<b>' });
    expectError(bad, 400, 'validation_failed');
    expect(Object.keys(bad.body.error.fields)).toEqual(['body.displayName']);
  });
});

describe('links', () => {
  async function freshUser(email: string) {
    const c = await h.client();
    await c.post('/api/auth/sign-up', { email, displayName: 'Link Tester', password: strong }).expect(201);
    return { c, token: linkToken(await h.mail.next(email), 'verify') };
  }

  it('refuses a reused verification link with a clear message', async () => {
    const { c, token } = await freshUser('reused@example.org');
    await c.post('/api/auth/verify', { token }).expect(200);
    const again = await c.post('/api/auth/verify', { token });
    expectError(again, 400, 'token_used');
    expect(again.body.error.message).toMatch(/used already/);
  });

  it('refuses an expired verification link (expires_at moved into the past) and a new one works', async () => {
    const { c, token } = await freshUser('expired@example.org');
    // Links last 24 h: the stored expiry is 24 h after it was issued.
    const row = await EmailToken.findOne({ where: { tokenHash: sha256(token) } });
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeGreaterThan(24 * 3600_000 - 5000);
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeLessThanOrEqual(24 * 3600_000 + 1000);
    await h.t.sequelize.query('UPDATE email_tokens SET expires_at = ? WHERE token_hash = ?', {
      replacements: [new Date(Date.now() - 1000), sha256(token)],
    });
    const res = await c.post('/api/auth/verify', { token });
    expectError(res, 400, 'token_expired');
    expect(res.body.error.message).toMatch(/expired.*24 hours/);

    await c.post('/api/auth/resend-verification', { email: 'expired@example.org' }).expect(202);
    const fresh = linkToken(await h.mail.next('expired@example.org'), 'verify');
    // The new link replaces the old one.
    expectError(await c.post('/api/auth/verify', { token }), 400, 'token_invalid');
    await c.post('/api/auth/verify', { token: fresh }).expect(200);
  });

  it('refuses expired, reused and unknown reset links, and keeps the old password then', async () => {
    const anon = await h.client();
    const email = demo.contributor.email;
    await anon.post('/api/auth/forgot', { email }).expect(202);
    const token = linkToken(await h.mail.next(email, { subject: /password/i }), 'reset');
    const row = await EmailToken.findOne({ where: { tokenHash: sha256(token) } });
    // Reset links last 1 h.
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeLessThanOrEqual(3600_000 + 1000);
    expect(row!.expiresAt.getTime() - row!.createdAt.getTime()).toBeGreaterThan(3600_000 - 5000);

    await h.t.sequelize.query('UPDATE email_tokens SET expires_at = ? WHERE token_hash = ?', {
      replacements: [new Date(Date.now() - 1000), sha256(token)],
    });
    const expired = await anon.post('/api/auth/reset', { token, password: stronger });
    expectError(expired, 400, 'token_expired');
    expect(expired.body.error.message).toMatch(/one hour/);
    expect(expired.body.error.fields).toEqual({ 'body.token': expect.any(String) });

    await anon.post('/api/auth/forgot', { email }).expect(202);
    const second = linkToken(await h.mail.next(email, { subject: /password/i }), 'reset');
    // A weak password does not use up the link.
    expectError(await anon.post('/api/auth/reset', { token: second, password: 'qwerty123456' }), 400, 'weak_password');
    await anon.post('/api/auth/reset', { token: second, password: stronger }).expect(200);
    const reused = await anon.post('/api/auth/reset', { token: second, password: 'another-fine-password-77' });
    expectError(reused, 400, 'token_used');

    const unknown = await anon.post('/api/auth/reset', { token: 'A'.repeat(43), password: stronger });
    expectError(unknown, 400, 'token_invalid');
    // A verification link is no reset link.
    const { token: verifyToken } = await freshUser('purpose@example.org');
    expectError(await anon.post('/api/auth/reset', { token: verifyToken, password: stronger }), 400, 'token_invalid');
    const malformed = await anon.post('/api/auth/reset', { token: 'abc', password: stronger });
    expectError(malformed, 400, 'validation_failed');
    expect(Object.keys(malformed.body.error.fields)).toEqual(['body.token']);
  });

  it('answers forgot and resend with 202 for an unknown address too, and sends nothing', async () => {
    const anon = await h.client();
    const before = (await h.mail.all()).length;
    const a = await anon.post('/api/auth/forgot', { email: 'nobody.here@example.org' });
    const b = await anon.post('/api/auth/resend-verification', { email: 'nobody.here@example.org' });
    expect([a.status, a.body, b.status, b.body]).toEqual([202, {}, 202, {}]);
    await (h.app.locals as unknown as { settle(): Promise<void> }).settle();
    expect((await h.mail.all()).length).toBe(before);
  });
});

describe('sign-in failures', () => {
  it('says the same for an unknown address and for a wrong password, and checks a dummy hash for the unknown one', async () => {
    const burn = jest.spyOn(passwords, 'burnPasswordCheck');
    const verify = jest.spyOn(passwords, 'verifyPassword');
    const c = await h.client();
    const unknown = await c.post('/api/auth/sign-in', { email: 'no.such.person@example.org', password: demo.password });
    expect(burn).toHaveBeenCalledTimes(1);
    expect(verify).not.toHaveBeenCalled();
    const wrong = await c.post('/api/auth/sign-in', { email: demo.admin.email, password: 'not the right password' });
    expect(burn).toHaveBeenCalledTimes(1);
    expect(verify).toHaveBeenCalledTimes(1);
    burn.mockRestore();
    verify.mockRestore();

    expect(unknown.status).toBe(401);
    expect(wrong.status).toBe(401);
    expect(unknown.body).toEqual(wrong.body);
    expect(unknown.body).toEqual({ error: { code: 'bad_credentials', message: 'The e-mail address or the password is wrong.' } });
    expect((await c.session()).user).toBeNull();
  });

  it('names the field of a malformed sign-in', async () => {
    const c = await h.client();
    const res = await c.post('/api/auth/sign-in', { email: 'not-an-address', password: '' });
    expectError(res, 400, 'validation_failed');
    expect(Object.keys(res.body.error.fields).sort()).toEqual(['body.email', 'body.password']);
  });

  it('signs out: 204, the session forgets the user and gets a new id', async () => {
    const c = await h.signedIn(demo.admin.email);
    const sid = c.sid();
    await c.post('/api/auth/sign-out').expect(204);
    expect(c.sid()).not.toBe(sid);
    expect((await c.session()).user).toBeNull();
    // Signing in again from the same page works with the token it already has.
    await c.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password }).expect(200);
  });
});
