/**
 * The server survives the database going away and comes back by itself: health answers 503 with
 * db "down" while MariaDB is stopped, and ok again once it is restarted. Under load too (issue 13):
 * while clients keep sending reads and writes, MariaDB is stopped; every request gets an answer in
 * our JSON shape (503 db_unavailable once the database is down, never HTML, never a dropped
 * connection, never a hang beyond a generous per-request limit), the process sees no unhandled
 * rejection, and after MariaDB is back every route answers again. This file runs its own MariaDB
 * (the shared test server must stay up for the other files).
 */
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import vm from 'node:vm';
import request from 'supertest';
import type { Sequelize } from 'sequelize';
import { createApp, type AppLocals } from '../../server/app';
import { freePort, MariaDbServer } from '../../server/db/mariadb';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/models';
import { until } from '../support/poll';
import { migrateUp } from '../../server/db/migrate';
import { seedIfEmpty } from '../../server/db/seed';
import { seedDemoAccounts } from '../../server/db/seed-accounts';
import { CONTENT_DIR, Client, demo, HIGH_LIMITS } from '../support/app';

jest.setTimeout(240_000);

let server: MariaDbServer;
let sequelize: Sequelize;
let app: ReturnType<typeof createApp>;

beforeAll(async () => {
  server = new MariaDbServer({ baseDir: fs.mkdtempSync(path.join(os.tmpdir(), 'cw-outage-')), port: await freePort() });
  server.initialise(process.env.CW_INSTALL_DB ?? 'mariadb-install-db');
  await server.start(process.env.CW_MARIADBD);
  const db = { host: '127.0.0.1', port: server.port, name: 'outage', user: 'outage_app', password: 'outage-test-pw' };
  await server.provision({ database: db.name, user: db.user, password: db.password });
  sequelize = createSequelize(db);
  initModels(sequelize);
  await migrateUp(sequelize);
  await seedIfEmpty(sequelize, CONTENT_DIR);
  await seedDemoAccounts(sequelize, CONTENT_DIR, 'development');
  app = createApp({ sequelize, version: 'test', env: 'test', rateLimits: HIGH_LIMITS, searchRefreshMs: 0 });
});

afterAll(async () => {
  // The app's timers and worker threads first, then the pool, then the database.
  await (app?.locals as unknown as AppLocals | undefined)?.close();
  await sequelize?.close();
  await server?.stop();
  server?.remove();
});

async function healthUntil(status: number, timeoutMs: number) {
  const deadline = Date.now() + timeoutMs;
  let last: request.Response;
  do {
    last = await request(app).get('/api/health');
    if (last.status === status) return last;
    await new Promise((r) => setTimeout(r, 250));
  } while (Date.now() < deadline);
  return last;
}

it('answers 503 while MariaDB is down and ok again after it restarts', async () => {
  const up = await request(app).get('/api/health');
  expect(up.status).toBe(200);
  expect(up.body).toMatchObject({ status: 'ok', db: 'up' });

  await server.stop();
  const down = await request(app).get('/api/health');
  expect(down.status).toBe(503);
  expect(down.body).toEqual({ status: 'degraded', db: 'down', version: 'test' });
  // A data route answers in our error shape too, not a hang or a crash.
  const data = await request(app).get('/api/taxonomy');
  expect(data.status).toBe(503);
  expect(data.body.error.code).toBe('db_unavailable');

  await server.start(process.env.CW_MARIADBD);
  const back = await healthUntil(200, 20_000);
  expect(back.status).toBe(200);
  expect(back.body).toMatchObject({ status: 'ok', db: 'up' });
  await request(app).get('/api/taxonomy').expect(200);
});

describe('under load', () => {
  let listener: http.Server;
  let base: string;
  // Jest gives each test file its own `process`; the real one is where unhandled rejections land.
  const realProcess = vm.runInThisContext('process') as NodeJS.Process;
  const rejections: unknown[] = [];
  const onRejection = (reason: unknown) => rejections.push(reason);
  beforeAll(async () => {
    realProcess.on('unhandledRejection', onRejection);
    listener = await new Promise<http.Server>((resolve) => {
      const srv = app.listen(0, '127.0.0.1', () => resolve(srv));
    });
    base = `http://127.0.0.1:${(listener.address() as AddressInfo).port}`;
  });
  afterAll(async () => {
    realProcess.off('unhandledRejection', onRejection);
    listener.closeAllConnections();
    await new Promise((r) => listener.close(r));
  });

  interface Seen {
    what: string;
    /** When the request was both sent and answered; 'changing' when MariaDB stopped or started meanwhile. */
    phase: 'up' | 'stopping' | 'down' | 'starting' | 'back' | 'changing';
    status: number | null;
    json: boolean;
    code: string | null;
    error: string | null;
  }

  it('answers every request with JSON while MariaDB is stopped mid-load, 503 once it is down, and serves again after it returns', async () => {
    // Signed in while the database is up: reads and writes that need a session, the database and CSRF.
    const editor = await Client.start(base);
    expect((await editor.post('/api/auth/sign-in', { email: demo.editor.email, password: demo.password })).status).toBe(200);
    const stranger = await Client.start(base);
    let phase: Seen['phase'] = 'up';
    const seen: Seen[] = [];
    // A generous limit per request: past it, the request counts as hung.
    const LIMIT = { response: 8000, deadline: 10_000 };
    const kinds: [string, () => request.Test][] = [
      ['health', () => request(base).get('/api/health')],
      ['taxonomy', () => request(base).get('/api/taxonomy')],
      ['entries', () => request(base).get('/api/entries')],
      ['wrong password', () => stranger.post('/api/auth/sign-in', { email: 'nobody@example.org', password: 'not the password' })],
      ['desk (signed in)', () => editor.get('/api/desk')],
      ['new draft (signed in, a write)', () => editor.post('/api/drafts', { slug: 'x', content: {} })],
    ];
    let stop = false;
    const loop = async (offset: number) => {
      for (let i = offset; !stop; i++) {
        const [what, make] = kinds[i % kinds.length];
        const sentIn = phase;
        const at = () => (phase === sentIn ? sentIn : 'changing');
        try {
          const res = await make().timeout(LIMIT);
          const json = /^application\/json/.test(String(res.headers['content-type'] ?? ''));
          seen.push({ what, phase: at(), status: res.status, json, code: res.body?.error?.code ?? res.body?.db ?? null, error: null });
        } catch (err) {
          seen.push({ what, phase: at(), status: null, json: false, code: null, error: (err as Error).message });
        }
      }
    };
    const clients = [0, 1, 2, 3].map((i) => loop(i));
    const count = (p: Seen['phase']) => seen.filter((x) => x.phase === p).length;

    await until('requests answered while MariaDB is up', async () => count('up') >= 20, 30_000);
    phase = 'stopping';
    await server.stop();
    phase = 'down';
    await until('requests answered while MariaDB is down', async () => count('down') >= 30, 60_000);
    phase = 'starting';
    await server.start(process.env.CW_MARIADBD);
    phase = 'back';
    // Back within seconds: every kind of request answers as it did before (generous cap).
    // Every session survives the outage (express-session's unset 'destroy' used to delete a session
    // whose lookup failed, once the database was back to take the DELETE).
    const sids = [editor.sid(), stranger.sid()].map((c) => decodeURIComponent(c ?? '').replace(/^s:/, '').replace(/\..*$/, ''));
    // (90 s: the whole suite shares two cores; a failure names the answers last seen.)
    const backAsBefore = () =>
      kinds.every(([what]) => {
        const last = seen.filter((x) => x.what === what && x.phase === 'back').pop();
        const before = seen.find((x) => x.what === what && x.phase === 'up');
        return !!last && !!before && last.status === before.status;
      });
    try {
      await until('every kind of request answers as before MariaDB stopped', async () => backAsBefore(), 90_000);
    } catch (err) {
      const lastSeen = kinds.map(([what]) => {
        const last = seen.filter((x) => x.what === what && x.phase === 'back').pop();
        return `${what}: ${last ? `${last.status ?? last.error} ${last.code ?? ''}` : 'none yet'}`;
      });
      throw new Error(`${(err as Error).message}; last answers: ${lastSeen.join(' | ')}`);
    }
    stop = true;
    await Promise.all(clients);
    const kept = (await (sequelize.models.Session as never as { findAll(): Promise<{ sid: string }[]> }).findAll()).map((r) => r.sid);
    expect(sids.filter((sid) => !kept.includes(sid))).toEqual([]);

    const summary = (xs: Seen[]) => [...new Set(xs.map((x) => `${x.what}: ${x.status ?? x.error} ${x.code ?? ''}`))].sort();
    // Never a dropped connection or a hang, never HTML, at any phase.
    expect(seen.filter((x) => x.error !== null || !x.json).map((x) => `${x.phase} ${x.what}: ${x.error ?? `not JSON (${x.status})`}`)).toEqual([]);
    // While up: the answers each route gives normally.
    expect(summary(seen.filter((x) => x.phase === 'up'))).toEqual(
      summary([
        { what: 'health', status: 200, code: 'up' },
        { what: 'taxonomy', status: 200, code: null },
        { what: 'entries', status: 200, code: null },
        { what: 'wrong password', status: 401, code: 'bad_credentials' },
        { what: 'desk (signed in)', status: 200, code: null },
        { what: 'new draft (signed in, a write)', status: 400, code: 'validation_failed' },
      ] as Seen[]),
    );
    // While down: 503 in our shape, from every route (health with its own body).
    const down = seen.filter((x) => x.phase === 'down');
    expect(down.filter((x) => x.status !== 503).map((x) => `${x.what}: ${x.status} ${x.code}`)).toEqual([]);
    for (const x of down) expect(x.code).toBe(x.what === 'health' ? 'down' : 'db_unavailable');
    // Requests in flight while mariadbd shut down: 503 in our JSON shape too, also for a query whose
    // connection was cut mid-way (SQLSTATE 08S01, "socket has unexpectedly been closed").
    for (const x of seen.filter((y) => y.phase === 'stopping' || y.phase === 'starting' || y.phase === 'changing')) {
      if (x.status !== null && x.status >= 500) expect({ what: x.what, status: x.status, code: x.code }).toEqual({ what: x.what, status: 503, code: x.what === 'health' ? 'down' : 'db_unavailable' });
    }
    expect(rejections).toEqual([]);
    expect((await request(app).get('/api/health')).status).toBe(200);
  });
});
