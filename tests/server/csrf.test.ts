/**
 * Protection of state-changing requests: the session's synchronizer token in X-CSRF-Token, an
 * Origin that is not ours refused, and the session cookie's attributes.
 */
import { QueryTypes } from 'sequelize';
import request from 'supertest';
import { createApp } from '../../server/app';
import type { PolicyMiddleware } from '../../server/policies';
import { demo, startTestApp, type TestApp } from '../support/app';

// The first computation in an app waits for a worker thread to load (seconds on a busy machine).
jest.setTimeout(60_000);

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ publicUrl: 'https://counterweight.example.org' });
});
afterAll(() => h?.close());

const expectCsrf = (res: request.Response) => {
  expect(res.status).toBe(403);
  expect(res.body).toEqual({ error: { code: 'csrf_failed', message: expect.any(String) } });
};

describe('the CSRF token', () => {
  it('is sent by GET /api/session, kept for the session, and not cached', async () => {
    const agent = request.agent(h.app);
    const first = await agent.get('/api/session').expect(200);
    expect(first.body).toEqual({ user: null, csrfToken: expect.stringMatching(/^[A-Za-z0-9_-]{43}$/) });
    expect(first.headers['cache-control']).toBe('no-store');
    const second = await agent.get('/api/session').expect(200);
    expect(second.body.csrfToken).toBe(first.body.csrfToken);
    const elsewhere = await request(h.app).get('/api/session').expect(200);
    expect(elsewhere.body.csrfToken).not.toBe(first.body.csrfToken);
  });

  it('is required: a missing token is refused, before anything happens', async () => {
    const agent = request.agent(h.app);
    await agent.get('/api/session').expect(200);
    const res = await agent.post('/api/auth/sign-in').send({ email: demo.admin.email, password: demo.password });
    expectCsrf(res);
    expect(res.body.error.message).toMatch(/X-CSRF-Token/);
    expect((await agent.get('/api/session')).body.user).toBeNull();
  });

  it('must match: a wrong token, or one from another session, is refused', async () => {
    const mine = await h.client();
    const theirs = await h.client();
    expectCsrf(await mine.agent.post('/api/auth/sign-in').set('X-CSRF-Token', 'x'.repeat(43)).send({ email: demo.admin.email, password: demo.password }));
    expectCsrf(await mine.agent.post('/api/auth/sign-in').set('X-CSRF-Token', theirs.csrf).send({ email: demo.admin.email, password: demo.password }));
    // No session at all (no cookie): nothing to match.
    expectCsrf(await request(h.app).post('/api/auth/forgot').set('X-CSRF-Token', mine.csrf).send({ email: demo.admin.email }));
  });

  it('guards signed-in writes too (PATCH, and the admin routes)', async () => {
    const admin = await h.signedIn(demo.admin.email);
    expectCsrf(await admin.agent.patch('/api/account').send({ displayName: 'Changed Without Token' }));
    expectCsrf(await admin.agent.patch('/api/admin/users/1/role').set('X-CSRF-Token', 'nope').send({ role: 'admin' }));
    await admin.patch('/api/account', { displayName: 'Ada Okonkwo' }).expect(200);
  });

  it('survives sign-in and sign-out (same token, new session id)', async () => {
    const c = await h.client();
    const token = c.csrf;
    await c.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password }).expect(200);
    expect((await c.session()).csrfToken).toBe(token);
    await c.post('/api/auth/sign-out').expect(204);
    expect((await c.session()).csrfToken).toBe(token);
  });
});

describe('the Origin check', () => {
  it('refuses a state-changing request from another origin even with the right token', async () => {
    const c = await h.client();
    const res = await c.agent
      .post('/api/auth/sign-in')
      .set('X-CSRF-Token', c.csrf)
      .set('Origin', 'https://evil.example.net')
      .send({ email: demo.admin.email, password: demo.password });
    expectCsrf(res);
    expect(res.body.error.message).toContain('https://evil.example.net');
    expectCsrf(await c.agent.post('/api/auth/sign-out').set('X-CSRF-Token', c.csrf).set('Origin', 'null'));
    // Pure computations need no token, but a foreign origin is refused there too.
    expectCsrf(await request(h.app).post('/api/checks/carnot').set('Origin', 'https://evil.example.net').send({ inputs: {} }));
  });

  it("accepts PUBLIC_URL's origin and the server's own", async () => {
    const c = await h.client();
    await c.agent
      .post('/api/auth/forgot')
      .set('X-CSRF-Token', c.csrf)
      .set('Origin', 'https://counterweight.example.org')
      .send({ email: 'x@example.org' })
      .expect(202);
    await c.agent.post('/api/auth/forgot').set('X-CSRF-Token', c.csrf).set('Host', 'cw.internal:8080').set('Origin', 'http://cw.internal:8080').send({ email: 'x@example.org' }).expect(202);
  });

  it('leaves reads alone: GET with a foreign Origin and no token', async () => {
    await request(h.app).get('/api/taxonomy').set('Origin', 'https://evil.example.net').expect(200);
  });

  it('lets pure computations (check kit, worksheet evaluation) through without a token', async () => {
    await request(h.app).post('/api/checks/carnot').send({ inputs: {} }).expect(200);
    await request(h.app).post('/api/worksheets/evaluate').send({}).expect(400);
  });
});

describe('the session cookie', () => {
  it('is cw.sid, HttpOnly, SameSite=Lax, not Secure outside production, and appears only when a session starts', async () => {
    const none = await request(h.app).get('/api/taxonomy');
    expect(none.headers['set-cookie']).toBeUndefined();
    const res = await request(h.app).get('/api/session');
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('cw.sid='))!;
    expect(cookie).toMatch(/; HttpOnly/);
    expect(cookie).toMatch(/; SameSite=Lax/);
    expect(cookie).not.toMatch(/; Secure/);
    expect(cookie).toMatch(/; Path=\//);
  });

  it('is Secure in production (behind a TLS-terminating proxy on loopback)', async () => {
    const prod = createApp({ sequelize: h.t.sequelize, version: 'test', env: 'production', sessionSecret: 'p'.repeat(40), sessionCleanupMs: 0 });
    const res = await request(prod).get('/api/session').set('X-Forwarded-Proto', 'https').expect(200);
    const cookie = (res.headers['set-cookie'] as unknown as string[]).find((c) => c.startsWith('cw.sid='))!;
    expect(cookie).toMatch(/; Secure/);
    expect(cookie).toMatch(/; HttpOnly/);
    await (prod.locals as unknown as { close(): Promise<void> }).close();
    expect(() => createApp({ sequelize: h.t.sequelize, version: 'test', env: 'production' })).toThrow(/secret/);
  });
});

describe('every state-changing route of the router (issue 13, item 7)', () => {
  type Layer = { route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] }; handle: { stack?: Layer[] }; rawPath?: unknown };
  type Found = { method: string; path: string; csrf: boolean };
  /** Every route with its method, read from the Express router as the role matrix and the fuzz test do, with its policy's csrf flag. */
  function routesOf(app: unknown): Found[] {
    const found: Found[] = [];
    const walk = (stack: Layer[], prefix: string) => {
      for (const layer of stack) {
        if (layer.route) {
          const policy = layer.route.stack.map((l) => (l.handle as Partial<PolicyMiddleware>).policy).find(Boolean);
          for (const m of Object.keys(layer.route.methods).filter((k) => layer.route!.methods[k] && k !== '_all')) {
            found.push({ method: m.toUpperCase(), path: prefix + String(layer.route.path), csrf: policy?.csrf !== false });
          }
        } else if (Array.isArray(layer.handle?.stack)) {
          walk(layer.handle.stack, prefix + (typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''));
        }
      }
    };
    walk((app as { router: { stack: Layer[] } }).router.stack, '');
    return found;
  }
  const concrete = (p: string) =>
    p.replace(/:(\w+)/g, (_m, name: string) => ({ id: '4000000000', slug: 'no-such-entry', check: 'carnot', token: 'A'.repeat(32) })[name] ?? 'x');
  const writes = () => routesOf(h.app).filter((r) => r.path.startsWith('/api/') && !['GET', 'HEAD', 'OPTIONS'].includes(r.method));

  /**
   * Row counts and checksums of every table but the sessions (whose expiry a request may touch) and
   * the rate limiter's counters (which count every request, refused or not, by design).
   */
  async function snapshot(): Promise<Record<string, unknown>> {
    const tables = await h.t.sequelize.query<{ name: string }>(
      "SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE() AND table_name NOT IN ('sessions', 'rate_limits') ORDER BY table_name",
      { type: QueryTypes.SELECT },
    );
    const out: Record<string, unknown> = {};
    for (const { name } of tables) {
      const [sum] = await h.t.sequelize.query<{ Checksum: unknown }>(`CHECKSUM TABLE \`${name}\``, { type: QueryTypes.SELECT });
      const [count] = await h.t.sequelize.query<{ n: unknown }>(`SELECT COUNT(*) AS n FROM \`${name}\``, { type: QueryTypes.SELECT });
      out[name] = [String(sum.Checksum), String(count.n)];
    }
    return out;
  }

  it('the only routes without the token are the documented pure computations', () => {
    expect(writes().length).toBeGreaterThanOrEqual(25);
    // policies.ts: checks.run, worksheets.evaluate and claimChecks.run (a check not saved) are `csrf: false`.
    expect(writes().filter((r) => !r.csrf).map((r) => `${r.method} ${r.path}`).sort()).toEqual(
      ['POST /api/checks/:check', 'POST /api/claim-checks', 'POST /api/worksheets/evaluate'].sort(),
    );
  });

  it('refuses each of the others without the token, and with a wrong one (403 JSON), signed in as an admin, changing nothing', async () => {
    const admin = await h.signedIn(demo.admin.email);
    const before = await snapshot();
    for (const r of writes().filter((x) => x.csrf)) {
      const method = r.method.toLowerCase() as 'post' | 'put' | 'patch' | 'delete';
      const path = concrete(r.path);
      for (const token of [undefined, 'x'.repeat(43)]) {
        let req = admin.agent[method](path);
        if (token) req = req.set('X-CSRF-Token', token);
        const res = await req.send({ displayName: 'Changed without a token', role: 'admin', email: demo.admin.email, password: demo.password });
        expect([r.method, r.path, res.status, res.headers['content-type'], res.body?.error?.code]).toEqual([r.method, r.path, 403, expect.stringMatching(/^application\/json/), 'csrf_failed']);
      }
    }
    // The session is still the admin's, and no table other than the sessions changed.
    expect((await admin.session()).user).toMatchObject({ email: demo.admin.email });
    expect(await snapshot()).toEqual(before);
  });

  it('the exempt computations change no state: no row anywhere, no session, no cookie', async () => {
    const sessionsBefore = (await h.t.sequelize.query<{ n: unknown }>('SELECT COUNT(*) AS n FROM sessions', { type: QueryTypes.SELECT }))[0].n;
    const before = await snapshot();
    const bodies: Record<string, object> = {
      'POST /api/checks/:check': { inputs: { Th: '600 K', Tc: '300 K', eta_claimed: '0.6' } },
      'POST /api/worksheets/evaluate': { worksheet: { name: 'w', title: 'W', inputs: [], steps: [], checks: [] } },
      'POST /api/claim-checks': { text: 'A sealed box is said to push itself with 2 mN from 1 kW of microwaves, with no propellant.' },
    };
    for (const r of writes().filter((x) => !x.csrf)) {
      const res = await request(h.app).post(concrete(r.path)).send(bodies[`${r.method} ${r.path}`] ?? {});
      expect([r.path, res.status < 500, res.headers['set-cookie']]).toEqual([r.path, true, undefined]);
    }
    expect(await snapshot()).toEqual(before);
    expect((await h.t.sequelize.query<{ n: unknown }>('SELECT COUNT(*) AS n FROM sessions', { type: QueryTypes.SELECT }))[0].n).toEqual(sessionsBefore);
  });
});
