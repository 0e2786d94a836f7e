/**
 * Rate limits shared across app servers (issue 13, item 6): two apps on one test database, the
 * second with its own copy of every server module (jest.isolateModules, as in search-cluster.test.ts)
 * and its own connection pool, count together; counts live in the rate_limits table, a window ends
 * and a new one starts, and expired rows are deleted.
 */
import { QueryTypes, type Sequelize } from 'sequelize';
import request from 'supertest';
import type * as AppModule from '../../server/app';
import type * as ModelsModule from '../../server/models';
import type * as SequelizeModule from '../../server/db/sequelize';
import { deleteExpiredRateLimits, MariaDbStore } from '../../server/http/rate-limit';
import { Client, HIGH_LIMITS, demo, startTestApp, type TestApp } from '../support/app';
import { until } from '../support/poll';

jest.setTimeout(120_000);

const low = { limit: 3, windowMs: 10 * 60_000 };
let h: TestApp;
/** The second app server: its own Sequelize (own connections) on the same database. */
let other: Sequelize;
let b: ReturnType<typeof AppModule.createApp>;
beforeAll(async () => {
  h = await startTestApp({ rateLimits: { ...HIGH_LIMITS, compute: low, signIn: low } });
  jest.isolateModules(() => {
    const { createApp } = require('../../server/app') as typeof AppModule;
    const { initModels } = require('../../server/models') as typeof ModelsModule;
    const { createSequelize } = require('../../server/db/sequelize') as typeof SequelizeModule;
    other = createSequelize(h.t.db);
    initModels(other);
    b = createApp({ sequelize: other, version: 'test', env: 'test', sessionCleanupMs: 0, rateLimits: { ...HIGH_LIMITS, compute: low, signIn: low } });
  });
});
afterAll(async () => {
  await (b?.locals as unknown as AppModule.AppLocals | undefined)?.close();
  await other?.close();
  await h?.close();
});

const rows = (sequelize: Sequelize) =>
  sequelize.query<{ rate_key: string; hits: number }>('SELECT rate_key, hits FROM rate_limits ORDER BY rate_key', { type: QueryTypes.SELECT });

it('counts computations from one address across both app servers', async () => {
  // The photon bound on 1 kW is P/c = 3.3356 µN (c exact, BIPM SI Brochure, 9th ed., 2019); 3 µN is within it.
  const run = (app: Parameters<typeof request>[0]) => request(app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 uN', P: '1 kW' } });
  expect((await run(h.app)).status).toBe(200);
  expect((await run(b)).status).toBe(200);
  expect((await run(h.app)).status).toBe(200);
  // The fourth, on either server, is over the limit of three.
  const res = await run(b);
  expect(res.status).toBe(429);
  expect(res.body.error.code).toBe('rate_limited');
  expect((await run(h.app)).status).toBe(429);
  const counted = (await rows(other)).filter((r) => r.rate_key.startsWith('compute:'));
  expect(counted).toHaveLength(1);
  expect(Number(counted[0].hits)).toBe(5);
});

it('counts failed sign-ins across both servers, and a successful one not at all', async () => {
  const ca = await h.client();
  const cb = await Client.start(b);
  await ca.post('/api/auth/sign-in', { email: demo.editor.email, password: demo.password }).expect(200);
  await ca.post('/api/auth/sign-in', { email: demo.editor.email, password: 'wrong one' }).expect(401);
  await cb.post('/api/auth/sign-in', { email: demo.editor.email, password: 'wrong two' }).expect(401);
  await ca.post('/api/auth/sign-in', { email: demo.editor.email, password: 'wrong three' }).expect(401);
  // Three failures, one on b: the next attempt on b is refused, right password or not.
  const res = await cb.post('/api/auth/sign-in', { email: demo.editor.email, password: demo.password });
  expect(res.status).toBe(429);
  expect(res.body.error.message).toMatch(/^Too many failed sign-in attempts/);
});

it('starts a new window when the old one has ended, and deletes the rows of ended windows', async () => {
  const store = new MariaDbStore(other, 'probe');
  store.init({ windowMs: 400 } as Parameters<MariaDbStore['init']>[0]);
  expect((await store.increment('10.0.0.1')).totalHits).toBe(1);
  const second = await store.increment('10.0.0.1');
  expect(second.totalHits).toBe(2);
  expect(second.resetTime!.getTime()).toBeGreaterThan(Date.now() - 5_000);
  await store.decrement('10.0.0.1');
  expect((await store.get('10.0.0.1'))?.totalHits).toBe(1);
  // No fixed wait: poll until the window has ended on the database's clock (400 ms after the first hit).
  await until('the window of 10.0.0.1 has ended', async () => (await store.get('10.0.0.1')) === undefined, 30_000);
  // The window has ended: it reads as empty, and the next hit counts from one.
  expect(await store.get('10.0.0.1')).toBeUndefined();
  await store.increment('10.0.0.2');
  await until('the window of 10.0.0.2 has ended', async () => (await store.get('10.0.0.2')) === undefined, 30_000);
  // 10.0.0.1's new window is counted by a store of the same name with a 60 s window, so that it cannot
  // also end before the deletion below, however slow the machine.
  const long = new MariaDbStore(other, 'probe');
  long.init({ windowMs: 60_000 } as Parameters<MariaDbStore['init']>[0]);
  expect((await long.increment('10.0.0.1')).totalHits).toBe(1);
  // 10.0.0.2's window has ended and 10.0.0.1's has not: only the first row is deleted.
  const before = (await rows(other)).map((r) => r.rate_key).filter((k) => k.startsWith('probe:'));
  expect(before.sort()).toEqual(['probe:10.0.0.1', 'probe:10.0.0.2']);
  expect(await deleteExpiredRateLimits(other)).toBeGreaterThanOrEqual(1);
  const after = (await rows(other)).map((r) => r.rate_key).filter((k) => k.startsWith('probe:'));
  expect(after).toEqual(['probe:10.0.0.1']);
  await store.resetAll();
  expect((await rows(other)).filter((r) => r.rate_key.startsWith('probe:'))).toEqual([]);
});

it('counts every one of many concurrent requests exactly once', async () => {
  const store = new MariaDbStore(h.t.sequelize, 'burst');
  store.init({ windowMs: 60_000 } as Parameters<MariaDbStore['init']>[0]);
  const hits = await Promise.all(Array.from({ length: 20 }, () => store.increment('10.0.0.9')));
  // Each increment reads back its own count under the row lock: 1 … 20, each once.
  expect(hits.map((x) => x.totalHits).sort((x, y) => x - y)).toEqual(Array.from({ length: 20 }, (_, i) => i + 1));
});
