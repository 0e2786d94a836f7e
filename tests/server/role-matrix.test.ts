/**
 * The role matrix, built from the server's own route table: every route of the real app (found by
 * walking the Express router) must appear in the hand-written table below and carry a policy
 * (`allow(action)` from server/policies.ts), and every state-changing route is tried as a reader
 * and as each role — signing in as the seeded demo users — expecting 401, 403 or neither (and, for
 * the queue's routes, which act on a real submission made for each cell, the route's success).
 * A new route without an entry here, or without a policy, fails this test.
 */
import request from 'supertest';
import type { Express } from 'express';
import { allActions, type PolicyMiddleware } from '../../server/policies';
import { User } from '../../server/models';
import { hashPassword } from '../../server/auth/passwords';
import { demo, startTestApp, type Client, type TestApp } from '../support/app';
import { claimSubmission, submitSighting } from '../support/workflow';

jest.setTimeout(120_000);

type Viewer = 'reader' | 'contributor' | 'editor' | 'moderator' | 'admin';
const VIEWERS: Viewer[] = ['reader', 'contributor', 'editor', 'moderator', 'admin'];
/** 'editor': editors and admins (policies.ts EDITOR); 'moderator': moderators and admins. */
type Who = 'public' | 'signed-in' | 'editor' | 'moderator' | 'admin';

interface Expectation {
  who: Who;
  /** For state-changing routes: the request to send (a concrete path and a body). */
  try?: (ctx: { targetId: number; id: number }) => { path: string; body: object };
  /**
   * Makes, for each cell, a real record in the state the route needs (its id reaches `try` as `id`), so
   * that an allowed viewer must get `ok` — the route's real success — rather than a 404 or a 400.
   */
  prepare?: (viewer: Viewer) => Promise<number>;
  /** With `prepare`: the status an allowed viewer gets. */
  ok?: number;
  /** For read routes with path parameters and a policy beyond public: a concrete path that answers 200. */
  read?: (ctx: { draftId: number }) => string;
  /** What an allowed viewer gets from `read` when not 200 (a record that is not theirs or not there: 404, never 401/403). */
  allowedStatus?: number;
}

/** Hand-written: who may use each route. Not derived from policies.ts, so that a change there shows here. */
const expected: Record<string, Expectation> = {
  'GET /api/health': { who: 'public' },
  'GET /api/taxonomy': { who: 'public' },
  'GET /api/search': { who: 'public' },
  'GET /api/checks': { who: 'public' },
  'POST /api/checks/:check': { who: 'public', try: () => ({ path: '/api/checks/carnot', body: { inputs: {} } }) },
  'GET /api/worksheets': { who: 'public' },
  'GET /api/worksheets/:name': { who: 'public' },
  'POST /api/worksheets/evaluate': { who: 'public', try: () => ({ path: '/api/worksheets/evaluate', body: {} }) },
  'GET /api/session': { who: 'public' },
  'POST /api/auth/sign-up': { who: 'public', try: () => ({ path: '/api/auth/sign-up', body: { email: 'not-an-address' } }) },
  'POST /api/auth/verify': { who: 'public', try: () => ({ path: '/api/auth/verify', body: { token: 'A'.repeat(43) } }) },
  'POST /api/auth/resend-verification': { who: 'public', try: () => ({ path: '/api/auth/resend-verification', body: { email: 'nobody@example.org' } }) },
  'POST /api/auth/sign-in': { who: 'public', try: () => ({ path: '/api/auth/sign-in', body: {} }) },
  'POST /api/auth/sign-out': { who: 'public', try: () => ({ path: '/api/auth/sign-out', body: {} }) },
  'POST /api/auth/forgot': { who: 'public', try: () => ({ path: '/api/auth/forgot', body: { email: 'nobody@example.org' } }) },
  'POST /api/auth/reset': { who: 'public', try: () => ({ path: '/api/auth/reset', body: { token: 'A'.repeat(43), password: 'violet-gravel-oboe-1874' } }) },
  'PATCH /api/account': { who: 'signed-in', try: () => ({ path: '/api/account', body: { displayName: 'Matrix Person' } }) },
  'POST /api/account/password': {
    who: 'signed-in',
    try: () => ({ path: '/api/account/password', body: { currentPassword: 'not the current one', newPassword: 'violet-gravel-oboe-1874' } }),
  },
  'GET /api/admin/users': { who: 'admin' },
  'PATCH /api/admin/users/:id/role': { who: 'admin', try: ({ targetId }) => ({ path: `/api/admin/users/${targetId}/role`, body: { role: 'editor' } }) },
  'GET /api/admin/audit': { who: 'admin' },
  'GET /api/admin/outbox': { who: 'admin' },
  // Entries (issue 5). State-changing tries aim at records that do not exist: allowed means 404/400, never 401/403.
  'GET /api/entries': { who: 'public' },
  'GET /api/entries/:slug': { who: 'public' },
  'GET /api/entries/:slug/versions': { who: 'public' },
  'GET /api/entries/:slug/versions/:n': { who: 'public' },
  'GET /api/entries/:slug/cite': { who: 'public' },
  'POST /api/entries/:slug/drafts': { who: 'editor', try: () => ({ path: '/api/entries/no-such-entry/drafts', body: {} }) },
  'POST /api/entries/:slug/retire': { who: 'editor', try: () => ({ path: '/api/entries/no-such-entry/retire', body: { reason: 'Matrix test.' } }) },
  'POST /api/drafts': { who: 'editor', try: () => ({ path: '/api/drafts', body: {} }) },
  'GET /api/drafts/:id': { who: 'editor', read: ({ draftId }) => `/api/drafts/${draftId}` },
  'PUT /api/drafts/:id': { who: 'editor', try: () => ({ path: '/api/drafts/4000000000', body: { content: {}, lockVersion: 0 } }) },
  'POST /api/drafts/:id/submit': { who: 'editor', try: () => ({ path: '/api/drafts/4000000000/submit', body: { lockVersion: 0 } }) },
  'POST /api/drafts/:id/approve': { who: 'editor', try: () => ({ path: '/api/drafts/4000000000/approve', body: { changeNote: 'Matrix test.' } }) },
  'POST /api/drafts/:id/send-back': { who: 'editor', try: () => ({ path: '/api/drafts/4000000000/send-back', body: { reason: 'Matrix test.' } }) },
  'GET /api/desk': { who: 'editor' },
  // Claim checks (issue 6). Saved-check tries aim at a token that does not exist: allowed means 404, never 401/403.
  'POST /api/claim-checks': { who: 'public', try: () => ({ path: '/api/claim-checks', body: { text: 'A sealed box said to push itself with 2 mN from 1 kW.' } }) },
  'POST /api/claim-checks/saved': { who: 'signed-in', try: () => ({ path: '/api/claim-checks/saved', body: { text: '' } }) },
  'GET /api/claim-checks/saved': { who: 'signed-in' },
  'GET /api/claim-checks/saved/:token': { who: 'public' },
  'DELETE /api/claim-checks/saved/:token': { who: 'signed-in', try: () => ({ path: `/api/claim-checks/saved/${'A'.repeat(32)}`, body: {} }) },
  // Sightings, corrections and the queue (issue 7). Tries aim at submissions that do not exist, except the queue's own routes below.
  'POST /api/sightings': { who: 'signed-in', try: () => ({ path: '/api/sightings', body: {} }) },
  'POST /api/corrections': { who: 'signed-in', try: () => ({ path: '/api/corrections', body: {} }) },
  'GET /api/submissions/mine': { who: 'signed-in' },
  'GET /api/submissions/:id': { who: 'signed-in', read: () => '/api/submissions/4000000000', allowedStatus: 404 },
  'POST /api/submissions/:id/answer': { who: 'signed-in', try: () => ({ path: '/api/submissions/4000000000/answer', body: { message: 'Matrix test.' } }) },
  'GET /api/attachments/:id': { who: 'signed-in', read: () => '/api/attachments/4000000000', allowedStatus: 404 },
  'GET /api/queue': { who: 'moderator' },
  'GET /api/queue/editors': { who: 'moderator' },
  // The queue's own routes act on a real submission: open for claim; claimed (by the viewer when the
  // viewer may hold it, else by the moderator) for release and decide. Allowed means 200.
  'POST /api/submissions/:id/claim': { who: 'moderator', prepare: (v) => queuedSighting(v, 'open'), ok: 200, try: ({ id }) => ({ path: `/api/submissions/${id}/claim`, body: {} }) },
  'POST /api/submissions/:id/release': { who: 'moderator', prepare: (v) => queuedSighting(v, 'claimed'), ok: 200, try: ({ id }) => ({ path: `/api/submissions/${id}/release`, body: {} }) },
  'POST /api/submissions/:id/decide': {
    who: 'moderator',
    prepare: (v) => queuedSighting(v, 'claimed'),
    ok: 200,
    try: ({ id }) => ({ path: `/api/submissions/${id}/decide`, body: { decision: 'reject', note: 'Matrix test.' } }),
  },
  'GET /api/entries/:slug/sightings': { who: 'public' },
  'GET /api/desk/corrections': { who: 'editor' },
  'POST /api/citations/parse': { who: 'editor', try: () => ({ path: '/api/citations/parse', body: { text: '@book{matrix, title = {A book}, year = 2000}' } }) },
  // The trade's synonyms (issue 11). Create tries an invalid body (allowed means 400); change and delete aim at a group that does not exist.
  'GET /api/synonyms': { who: 'public' },
  'POST /api/synonyms': { who: 'editor', try: () => ({ path: '/api/synonyms', body: { terms: ['matrix'] } }) },
  'PUT /api/synonyms/:id': { who: 'editor', try: () => ({ path: '/api/synonyms/4000000000', body: { terms: ['matrix one', 'matrix two'], version: 1 } }) },
  'DELETE /api/synonyms/:id': { who: 'editor', try: () => ({ path: '/api/synonyms/4000000000', body: {} }) },
};

interface FoundRoute {
  method: string;
  path: string;
  actions: string[];
}

/** Every route of the app: method, full path, and the policy actions in its handler chain. */
function routesOf(app: Express): FoundRoute[] {
  const found: FoundRoute[] = [];
  type Layer = { route?: { path: string; methods: Record<string, boolean>; stack: { handle: unknown }[] }; handle: { stack?: Layer[] }; rawPath?: unknown };
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        const actions = layer.route.stack.map((l) => (l.handle as Partial<PolicyMiddleware>).action).filter((a): a is NonNullable<typeof a> => Boolean(a));
        for (const method of Object.keys(layer.route.methods).filter((m) => layer.route!.methods[m] && m !== '_all')) {
          found.push({ method: method.toUpperCase(), path: prefix + String(layer.route.path), actions });
        }
      } else if (Array.isArray(layer.handle?.stack)) {
        const mount = typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : '';
        walk(layer.handle.stack, prefix + mount);
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  return found;
}

const STATE_CHANGING = new Set(['POST', 'PUT', 'PATCH', 'DELETE']);

let h: TestApp;
let routes: FoundRoute[];
let targetId: number;
let draftId: number;
beforeAll(async () => {
  h = await startTestApp({ taxonomy: true });
  routes = routesOf(h.app).filter((r) => r.path.startsWith('/api/'));
  const target = await User.create({
    email: 'matrix.target@example.org',
    displayName: 'Matrix Target',
    passwordHash: await hashPassword('violet-gravel-oboe-1874'),
    emailVerifiedAt: new Date(),
  });
  targetId = target.id;
  // A draft for the draft read route to find.
  const editor = await h.signedIn(demo.editor.email);
  const created = await editor.post('/api/drafts', {
    slug: 'matrix-draft',
    content: { title: 'Matrix draft', mechanismClass: (await firstClassSlug()), laws: [] },
  });
  if (created.status !== 201) throw new Error(`could not create the matrix draft: ${created.status} ${JSON.stringify(created.body)}`);
  draftId = created.body.draft.id;
});

async function firstClassSlug(): Promise<string> {
  const res = await request(h.app).get('/api/taxonomy').expect(200);
  if (!res.body.classes.length) throw new Error('the test database has no mechanism classes');
  return res.body.classes[0].slug;
}
afterAll(() => h?.close());

const accountOf: Record<Exclude<Viewer, 'reader'>, string> = {
  contributor: demo.contributor.email,
  editor: demo.editor.email,
  moderator: demo.moderator.email,
  admin: demo.admin.email,
};

/** A fresh client for each cell: a reader's own session, or a real sign-in as the seeded user. */
const clientFor = (viewer: Viewer): Promise<Client> => (viewer === 'reader' ? h.client() : h.signedIn(accountOf[viewer]));

/**
 * A sighting by the demo contributor (invented text), open or claimed: claimed by the viewer when the
 * viewer is one who may hold it (moderator, admin), else by the demo moderator.
 */
async function queuedSighting(viewer: Viewer, state: 'open' | 'claimed'): Promise<number> {
  const id = await submitSighting(await clientFor('contributor'), {
    title: `Matrix sighting for the ${viewer}`,
    seenAtUrl: 'https://news.example.org/matrix-sighting',
    summary: 'An invented wheel said to turn for ever on a stand at a fair.',
  });
  if (state === 'claimed') await claimSubmission(await clientFor(viewer === 'admin' ? 'admin' : 'moderator'), id);
  return id;
}

const outcome = (who: Who, viewer: Viewer): 'allowed' | 401 | 403 => {
  if (who === 'public') return 'allowed';
  if (viewer === 'reader') return 401;
  if (who === 'signed-in') return 'allowed';
  if (who === 'editor') return viewer === 'editor' || viewer === 'admin' ? 'allowed' : 403;
  if (who === 'moderator') return viewer === 'moderator' || viewer === 'admin' ? 'allowed' : 403;
  return viewer === 'admin' ? 'allowed' : 403;
};

describe('the route table', () => {
  it('finds the routes by walking the router', () => {
    expect(routes.length).toBeGreaterThanOrEqual(20);
    expect(routes).toContainEqual({ method: 'POST', path: '/api/auth/sign-in', actions: ['auth.signIn'] });
  });

  it('matches the expectation table exactly: a new route needs an entry here', () => {
    expect(routes.map((r) => `${r.method} ${r.path}`).sort()).toEqual(Object.keys(expected).sort());
  });

  it('gives every route exactly one policy, and every policy a route', () => {
    for (const r of routes) expect({ route: `${r.method} ${r.path}`, actions: r.actions.length }).toEqual({ route: `${r.method} ${r.path}`, actions: 1 });
    expect([...new Set(routes.flatMap((r) => r.actions))].sort()).toEqual([...allActions()].sort());
  });

  it('gives every state-changing route a request to try', () => {
    for (const r of routes.filter((x) => STATE_CHANGING.has(x.method))) expect([r.path, typeof expected[`${r.method} ${r.path}`].try]).toEqual([r.path, 'function']);
  });
});

describe('the matrix: every state-changing route × reader, contributor, editor, moderator, admin', () => {
  const cells = Object.entries(expected)
    .filter(([key]) => STATE_CHANGING.has(key.split(' ')[0]))
    .flatMap(([key, e]) => VIEWERS.map((viewer) => [key, viewer, e] as const));

  it.each(cells)('%s as %s', async (key, viewer, e) => {
    const method = key.split(' ')[0].toLowerCase() as 'post' | 'patch' | 'put' | 'delete';
    const id = e.prepare ? await e.prepare(viewer) : 0;
    const { path, body } = e.try!({ targetId, id });
    const c = await clientFor(viewer);
    const res = await c.send(method, path, body);
    const want = outcome(e.who, viewer);
    const got = { status: res.status, code: res.body?.error?.code };
    if (want === 401) expect(got).toEqual({ status: 401, code: 'sign_in_required' });
    else if (want === 403) expect(got).toEqual({ status: 403, code: 'forbidden' });
    else if (e.ok !== undefined) expect(got).toEqual({ status: e.ok, code: undefined });
    else {
      // Allowed: success, or a 4xx about the request itself — never a refusal of the viewer, never a 5xx.
      expect(got.status).toBeLessThan(500);
      expect(['sign_in_required', 'forbidden', 'csrf_failed']).not.toContain(got.code);
      expect([401, 403]).not.toContain(got.status);
    }
  });
});

describe('the read routes with a policy beyond public', () => {
  const reads = Object.entries(expected).filter(([key, e]) => key.startsWith('GET ') && e.who !== 'public');
  it.each(reads.flatMap(([key, e]) => VIEWERS.map((v) => [key, v, e.who] as const)))('%s as %s', async (key, viewer, who) => {
    const c = await clientFor(viewer);
    const res = await c.get(expected[key].read ? expected[key].read!({ draftId }) : key.split(' ')[1]);
    const want = outcome(who, viewer);
    if (want === 'allowed') expect(res.status).toBe(expected[key].allowedStatus ?? 200);
    else expect({ status: res.status, code: res.body.error.code }).toEqual({ status: want, code: want === 401 ? 'sign_in_required' : 'forbidden' });
  });

  it('answers the public reads for a reader without any session', async () => {
    for (const key of Object.keys(expected).filter((k) => k.startsWith('GET ') && expected[k].who === 'public' && !k.includes(':'))) {
      expect([key, (await request(h.app).get(key.split(' ')[1])).status]).toEqual([key, 200]);
    }
  });
});
