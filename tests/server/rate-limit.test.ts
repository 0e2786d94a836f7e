/** Rate limits on sign-in, sign-up, resend, forgot and reset: 429 in our JSON shape, saying when to retry. */
import request from 'supertest';
import { HIGH_LIMITS, demo, startTestApp, type TestApp } from '../support/app';
import { retryIn } from '../../server/http/rate-limit';

let h: TestApp;
beforeAll(async () => {
  const low = { limit: 2, windowMs: 10 * 60_000 };
  h = await startTestApp({ rateLimits: { ...HIGH_LIMITS, signIn: low, signUp: low, resend: low, forgot: low, reset: low } });
});
afterAll(() => h?.close());

const expectLimited = (res: request.Response) => {
  expect(res.status).toBe(429);
  expect(res.body).toEqual({ error: { code: 'rate_limited', message: expect.stringMatching(/Try again in about 10 minutes\.$/) } });
  expect(Number(res.headers['retry-after'])).toBeGreaterThan(590);
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

it('says when to retry in words', () => {
  expect(retryIn(1000)).toBe('in 1 second');
  expect(retryIn(45_000)).toBe('in 45 seconds');
  expect(retryIn(14 * 60_000 + 10_000)).toBe('in about 15 minutes');
  expect(retryIn(3 * 3600_000)).toBe('in about 3 hours');
});
