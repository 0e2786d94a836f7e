/**
 * Sessions live in MariaDB, so several app servers share them: a second app instance — with its
 * own copy of every server module (jest.isolateModules), its own Sequelize pool and its own session
 * store, sharing only the database and SESSION_SECRET — accepts the cookie the first one set.
 */
import request from 'supertest';
import type * as AppModule from '../../server/app';
import type * as ModelsModule from '../../server/models';
import type * as SequelizeModule from '../../server/db/sequelize';
import { Session, User } from '../../server/models';
import { demo, startTestApp, type TestApp } from '../support/app';

// Building a second and third app with their own copy of every module takes seconds on a busy machine.
jest.setTimeout(60_000);

const SECRET = 'shared-by-every-app-server-'.padEnd(48, 'x');

let h: TestApp;
let second: ReturnType<typeof AppModule.createApp>;
let secondClose: () => Promise<void>;
beforeAll(async () => {
  h = await startTestApp({ sessionSecret: SECRET });
  jest.isolateModules(() => {
    const { createApp } = require('../../server/app') as typeof AppModule;
    const { initModels } = require('../../server/models') as typeof ModelsModule;
    const { createSequelize } = require('../../server/db/sequelize') as typeof SequelizeModule;
    const sequelize = createSequelize(h.t.db);
    initModels(sequelize);
    second = createApp({ sequelize, version: 'test', env: 'test', sessionSecret: SECRET, sessionCleanupMs: 0 });
    secondClose = () => sequelize.close();
  });
});
afterAll(async () => {
  await secondClose?.();
  await h?.close();
});

const cookieOf = (res: request.Response) =>
  (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('cw.sid='))!.split(';')[0];

it('is stored in the sessions table with its user', async () => {
  const c = await h.client();
  await c.post('/api/auth/sign-in', { email: demo.editor.email, password: demo.password }).expect(200);
  const editor = await User.findOne({ where: { email: demo.editor.email } });
  const rows = await Session.findAll({ where: { userId: editor!.id } });
  expect(rows).toHaveLength(1);
  expect(JSON.parse(rows[0].data!)).toMatchObject({ passport: { user: editor!.id }, csrfToken: c.csrf });
  expect(rows[0].expires!.getTime()).toBeGreaterThan(Date.now() + 13 * 24 * 3600_000);
});

it('is accepted by a second app server on the same database, and ends there for both', async () => {
  const first = await h.client();
  const signIn = await first.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password }).expect(200);
  const cookie = cookieOf(signIn);

  const there = await request(second).get('/api/session').set('Cookie', cookie).expect(200);
  expect(there.body.user).toMatchObject({ email: demo.admin.email, role: 'admin' });
  expect(there.body.csrfToken).toBe(first.csrf);
  // A write on the second server with the session and token from the first.
  const renamed = await request(second)
    .patch('/api/account')
    .set('Cookie', cookie)
    .set('X-CSRF-Token', first.csrf)
    .send({ displayName: 'Ada N. Okonkwo' })
    .expect(200);
  expect(renamed.body.user.displayName).toBe('Ada N. Okonkwo');
  expect((await first.session()).user).toMatchObject({ displayName: 'Ada N. Okonkwo' });

  // Signing out on the second server ends the session on the first.
  await request(second).post('/api/auth/sign-out').set('Cookie', cookie).set('X-CSRF-Token', first.csrf).expect(204);
  expect((await request(h.app).get('/api/session').set('Cookie', cookie)).body.user).toBeNull();
});

it('is not accepted by a server with another secret', async () => {
  const first = await h.client();
  const cookie = cookieOf(await first.post('/api/auth/sign-in', { email: demo.moderator.email, password: demo.password }).expect(200));
  let foreign!: ReturnType<typeof AppModule.createApp>;
  let close!: () => Promise<void>;
  jest.isolateModules(() => {
    const { createApp } = require('../../server/app') as typeof AppModule;
    const { initModels } = require('../../server/models') as typeof ModelsModule;
    const { createSequelize } = require('../../server/db/sequelize') as typeof SequelizeModule;
    const sequelize = createSequelize(h.t.db);
    initModels(sequelize);
    foreign = createApp({ sequelize, version: 'test', env: 'test', sessionSecret: 'another-secret-entirely-'.padEnd(40, 'y'), sessionCleanupMs: 0 });
    close = () => sequelize.close();
  });
  const res = await request(foreign).get('/api/session').set('Cookie', cookie).expect(200);
  expect(res.body.user).toBeNull();
  await close();
});

describe('session fixation (issue 13, item 7)', () => {
  const sidOf = (cookie: string) => decodeURIComponent(cookie.slice('cw.sid='.length)).replace(/^s:/, '').split('.')[0];

  it('gives a new session id at sign-in and at sign-out; the id from before is worth nothing after', async () => {
    // The session an attacker might plant: one started without signing in.
    const before = await request(h.app).get('/api/session').expect(200);
    const planted = cookieOf(before);
    const token = before.body.csrfToken as string;

    const signIn = await request(h.app)
      .post('/api/auth/sign-in')
      .set('Cookie', planted)
      .set('X-CSRF-Token', token)
      .send({ email: demo.contributor.email, password: demo.password })
      .expect(200);
    const signedIn = cookieOf(signIn);
    expect(sidOf(signedIn)).not.toBe(sidOf(planted));
    // The planted id does not carry the sign-in, and its row is gone.
    expect((await request(h.app).get('/api/session').set('Cookie', planted)).body.user).toBeNull();
    expect(await Session.findByPk(sidOf(planted))).toBeNull();
    expect((await request(h.app).get('/api/session').set('Cookie', signedIn)).body.user).toMatchObject({ email: demo.contributor.email });

    const signOut = await request(h.app).post('/api/auth/sign-out').set('Cookie', signedIn).set('X-CSRF-Token', token).expect(204);
    const after = (signOut.headers['set-cookie'] as unknown as string[] | undefined)?.find((c) => c.startsWith('cw.sid='))?.split(';')[0];
    if (after) expect(sidOf(after)).not.toBe(sidOf(signedIn));
    expect((await request(h.app).get('/api/session').set('Cookie', signedIn)).body.user).toBeNull();
    expect(await Session.findByPk(sidOf(signedIn))).toBeNull();
  });

  it('ignores a session id the server never issued (unsigned, or signed with another secret)', async () => {
    for (const forged of ['cw.sid=attacker-chosen-id', `cw.sid=${encodeURIComponent('s:attacker-chosen-id.bm90LWEtc2lnbmF0dXJl')}`]) {
      const res = await request(h.app).get('/api/session').set('Cookie', forged).expect(200);
      expect(res.body.user).toBeNull();
      expect(sidOf(cookieOf(res))).not.toBe('attacker-chosen-id');
    }
    expect(await Session.findByPk('attacker-chosen-id')).toBeNull();
  });
});

describe('the session cookie flags', () => {
  const flagsOf = (res: request.Response) => (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('cw.sid='))!;

  it('HttpOnly, SameSite=Lax, Path=/, and an expiry 14 days ahead', async () => {
    const started = Date.now();
    const cookie = flagsOf(await request(h.app).get('/api/session').expect(200));
    expect(cookie).toMatch(/; HttpOnly(;|$)/);
    expect(cookie).toMatch(/; SameSite=Lax(;|$)/);
    expect(cookie).toMatch(/; Path=\/(;|$)/);
    const expires = Date.parse(/; Expires=([^;]+)/.exec(cookie)![1]);
    // Fourteen days (SESSION_MAX_AGE_MS); the cookie date has whole seconds.
    expect(Math.abs(expires - (started + 14 * 24 * 3600_000))).toBeLessThan(60_000);
  });

  it('Secure when the request came over https (a trusted proxy says so), not over plain http, outside production', async () => {
    const viaTls = flagsOf(await request(h.app).get('/api/session').set('X-Forwarded-Proto', 'https').expect(200));
    expect(viaTls).toMatch(/; Secure(;|$)/);
    const plain = flagsOf(await request(h.app).get('/api/session').expect(200));
    expect(plain).not.toMatch(/; Secure/);
  });
});
