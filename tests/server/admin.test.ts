/** Admin: users listed and searched, roles changed with an audit event, the audit log and the outbox. */
import request from 'supertest';
import { createApp } from '../../server/app';
import { AuditEvent, User } from '../../server/models';
import { demo, startTestApp, type Client, type TestApp } from '../support/app';

jest.setTimeout(60_000);

let h: TestApp;
let admin: Client;
beforeAll(async () => {
  h = await startTestApp();
  admin = await h.signedIn(demo.admin.email);
});
afterAll(() => h?.close());

describe('users', () => {
  it('lists every user, newest first, with the total', async () => {
    const res = await admin.get('/api/admin/users').expect(200);
    expect(res.body.total).toBe(5);
    expect(res.body.users.map((u: { email: string }) => u.email).sort()).toEqual(
      [demo.admin, demo.editor, demo.moderator, demo.contributor].map((a) => a.email).concat('editor.two@example.org').sort(),
    );
    expect(res.body.users[0]).toEqual({ id: expect.any(Number), email: expect.any(String), displayName: expect.any(String), role: expect.any(String), verified: true, createdAt: expect.any(String) });
    expect(JSON.stringify(res.body)).not.toMatch(/argon2|password/i);
  });

  it('searches e-mail and display name, filters by role, pages', async () => {
    const byName = await admin.get('/api/admin/users?q=lindqvist').expect(200);
    expect(byName.body.users.map((u: { email: string }) => u.email)).toEqual(['editor.two@example.org']);
    const byMail = await admin.get('/api/admin/users?q=MODERATOR@').expect(200);
    expect(byMail.body.users.map((u: { email: string }) => u.email)).toEqual([demo.moderator.email]);
    const editors = await admin.get('/api/admin/users?role=editor').expect(200);
    expect(editors.body.total).toBe(2);
    const page = await admin.get('/api/admin/users?limit=2&offset=4').expect(200);
    expect([page.body.users.length, page.body.total]).toEqual([1, 5]);
    // % and _ are letters here, not wildcards.
    expect((await admin.get('/api/admin/users?q=%25').expect(200)).body.total).toBe(0);
    const bad = await admin.get('/api/admin/users?role=wizard&limit=0').expect(400);
    expect(Object.keys(bad.body.error.fields).sort()).toEqual(['query.limit', 'query.role']);
  });
});

describe('roles', () => {
  it('promotes a contributor to editor, writing who, what, when, before and after to the audit log', async () => {
    const target = await User.findOne({ where: { email: demo.contributor.email } });
    const actor = await User.findOne({ where: { email: demo.admin.email } });
    const contributor = await h.signedIn(demo.contributor.email);
    expect((await contributor.session()).user?.role).toBe('contributor');

    const started = Date.now();
    const res = await admin.patch(`/api/admin/users/${target!.id}/role`, { role: 'editor' }).expect(200);
    expect(res.body.user).toMatchObject({ id: target!.id, role: 'editor' });
    // The change applies to the user's live session at once.
    expect((await contributor.session()).user?.role).toBe('editor');

    const log = await admin.get('/api/admin/audit').expect(200);
    const event = log.body.events[0];
    expect(event).toEqual({
      id: expect.any(Number),
      at: expect.any(String),
      actor: { id: actor!.id, displayName: actor!.displayName },
      action: 'user.role_changed',
      subjectType: 'user',
      subjectId: String(target!.id),
      before: { role: 'contributor' },
      after: { role: 'editor' },
      sentence: expect.any(Array),
    });
    expect(new Date(event.at).getTime()).toBeGreaterThanOrEqual(Math.floor(started / 1000) * 1000);
    expect(new Date(event.at).getTime()).toBeLessThanOrEqual(Date.now());

    // The same role again changes nothing and logs nothing.
    await admin.patch(`/api/admin/users/${target!.id}/role`, { role: 'editor' }).expect(200);
    expect((await admin.get('/api/admin/audit').expect(200)).body.total).toBe(log.body.total);
  });

  it('refuses an admin demoting themself (400 naming body.role), an unknown user (404), a bad role or id (400)', async () => {
    const me = await User.findOne({ where: { email: demo.admin.email } });
    const self = await admin.patch(`/api/admin/users/${me!.id}/role`, { role: 'editor' });
    expect(self.status).toBe(400);
    expect(Object.keys(self.body.error.fields)).toEqual(['body.role']);
    expect((await User.findByPk(me!.id))!.role).toBe('admin');
    expect((await admin.patch('/api/admin/users/999999/role', { role: 'editor' })).status).toBe(404);
    const bad = await admin.patch(`/api/admin/users/${me!.id}/role`, { role: 'wizard' });
    expect([bad.status, Object.keys(bad.body.error.fields)]).toEqual([400, ['body.role']]);
    const badId = await admin.patch('/api/admin/users/abc/role', { role: 'editor' });
    expect([badId.status, Object.keys(badId.body.error.fields)]).toEqual([400, ['params.id']]);
  });

  it('keeps the audit log append-only', async () => {
    const one = await AuditEvent.findOne();
    await expect(one!.update({ action: 'rewritten' })).rejects.toThrow(/append-only/);
    await expect(one!.destroy()).rejects.toThrow(/append-only/);
    await expect(AuditEvent.destroy({ where: {} })).rejects.toThrow(/append-only/);
  });
});

describe('the audit log', () => {
  it('lists newest first and pages', async () => {
    const all = await admin.get('/api/admin/audit?limit=200').expect(200);
    const ids = all.body.events.map((e: { id: number }) => e.id);
    expect(ids).toEqual([...ids].sort((a: number, b: number) => b - a));
    const page = await admin.get('/api/admin/audit?limit=1&offset=1').expect(200);
    expect(page.body.events.map((e: { id: number }) => e.id)).toEqual([ids[1]]);
    expect((await admin.get('/api/admin/audit?limit=500')).status).toBe(400);
  });
});

describe('the outbox', () => {
  it('shows the caught messages, newest first', async () => {
    const c = await h.client();
    await c.post('/api/auth/sign-up', { email: 'outbox.one@example.org', displayName: 'Olga One', password: 'violet-gravel-oboe-1874' }).expect(201);
    await c.post('/api/auth/sign-up', { email: 'outbox.two@example.org', displayName: 'Otto Two', password: 'violet-gravel-oboe-1874' }).expect(201);
    await h.mail.next('outbox.two@example.org');
    const res = await admin.get('/api/admin/outbox').expect(200);
    expect(res.body.messages.slice(0, 2).map((m: { to: string }) => m.to)).toEqual(['outbox.two@example.org', 'outbox.one@example.org']);
    expect(res.body.messages[0]).toEqual({
      id: expect.any(Number),
      to: 'outbox.two@example.org',
      from: expect.stringContaining('no-reply@example.org'),
      subject: expect.stringMatching(/confirm/i),
      text: expect.stringContaining('/verify?token='),
      html: expect.stringContaining('/verify?token='),
      receivedAt: expect.any(String),
    });
  });

  it('does not exist in production (404, even for an admin)', async () => {
    const prod = createApp({ sequelize: h.t.sequelize, version: 'test', env: 'production', sessionSecret: 'p'.repeat(40), sessionCleanupMs: 0 });
    const res = await request(prod).get('/api/admin/outbox').expect(404);
    expect(res.body.error.code).toBe('not_found');
  });
});
