/**
 * Rate limits on sign-in, sign-up, resend, forgot and reset, and on the anonymous computations and
 * claim checks: 429 in our JSON shape, saying when to retry. (Shared across app servers:
 * rate-limit-shared.test.ts.)
 */
import request from 'supertest';
import { Client, HIGH_LIMITS, demo, startTestApp, type TestApp } from '../support/app';
import { retryIn } from '../../server/http/rate-limit';

// Sign-ins hash passwords (argon2) and the app's compute pool starts beside them.
jest.setTimeout(60_000);

let h: TestApp;
/** Signed in before the sign-in limit is reached. */
let contributor: Client;
beforeAll(async () => {
  const low = { limit: 2, windowMs: 10 * 60_000 };
  h = await startTestApp({ rateLimits: { ...HIGH_LIMITS, signIn: low, signUp: low, resend: low, forgot: low, reset: low, compute: low, claimCheck: low } });
  contributor = await h.signedIn(demo.contributor.email);
});
afterAll(() => h?.close());

/** When the window of the test under way opened (set before its first request). */
let opened = Date.now();
beforeEach(() => {
  opened = Date.now();
});

const expectLimited = (res: request.Response) => {
  expect(res.status).toBe(429);
  expect(res.body).toEqual({ error: { code: 'rate_limited', message: expect.stringMatching(/Try again in about 10 minutes\.$/) } });
  // What is left of the 10-minute window: no more than all of it, and no less than all of it but the
  // time this test has run so far (measured, so a slow machine is no failure), less a second of rounding.
  const elapsed = Math.ceil((Date.now() - opened) / 1000);
  expect(Number(res.headers['retry-after'])).toBeGreaterThanOrEqual(600 - elapsed - 1);
  expect(Number(res.headers['retry-after'])).toBeLessThanOrEqual(600);
};

it('counts failed sign-ins only, and answers the third failure with 429', async () => {
  const c = await h.client();
  await c.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password }).expect(200);
  await c.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password }).expect(200);
  await c.post('/api/auth/sign-in', { email: demo.admin.email, password: 'wrong password one' }).expect(401);
  await c.post('/api/auth/sign-in', { email: demo.admin.email, password: 'wrong password two' }).expect(401);
  const res = await c.post('/api/auth/sign-in', { email: demo.admin.email, password: demo.password });
  expectLimited(res);
  expect(res.body.error.message).toMatch(/^Too many failed sign-in attempts/);
});

it.each([
  ['/api/auth/sign-up', { email: 'a@example.org' }],
  ['/api/auth/resend-verification', { email: 'a@example.org' }],
  ['/api/auth/forgot', { email: 'a@example.org' }],
  ['/api/auth/reset', { token: 'short', password: 'x' }],
])('limits %s to 2 requests per window', async (path, body) => {
  const c = await h.client();
  for (let i = 0; i < 2; i++) expect((await c.post(path, body)).status).not.toBe(429);
  expectLimited(await c.post(path, body));
});

it('limits worksheet evaluations and check runs together, per address, without an account or a CSRF token', async () => {
  const worksheet = { name: 'w', title: 'W', inputs: [], steps: [{ name: 'a', label: 'a', expression: '2 m' }] };
  await request(h.app).post('/api/worksheets/evaluate').send({ worksheet }).expect(200);
  await request(h.app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 uN', P: '1 kW' } }).expect(200);
  const res = await request(h.app).post('/api/worksheets/evaluate').send({ worksheet });
  expectLimited(res);
  expect(res.body.error.message).toMatch(/^Too many computations from your network/);
  expectLimited(await request(h.app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 uN', P: '1 kW' } }));
});

it('limits claim checks, run or saved', async () => {
  // Invented claim text.
  const text = 'An invented rotor gives 12 W of heat from 10 W of electric input.';
  expect((await request(h.app).post('/api/claim-checks').send({ text })).status).toBe(200);
  const c = contributor;
  expect((await c.post('/api/claim-checks/saved', { text })).status).toBe(201);
  const res = await request(h.app).post('/api/claim-checks').send({ text });
  expectLimited(res);
  expect(res.body.error.message).toMatch(/^Too many claim checks from your network/);
  expectLimited(await c.post('/api/claim-checks/saved', { text }));
});

it('says when to retry in words', () => {
  expect(retryIn(1000)).toBe('in 1 second');
  expect(retryIn(45_000)).toBe('in 45 seconds');
  expect(retryIn(14 * 60_000 + 10_000)).toBe('in about 15 minutes');
  expect(retryIn(3 * 3600_000)).toBe('in about 3 hours');
});
