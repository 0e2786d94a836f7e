/** The API's common behaviour against the real app and a real MariaDB. */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import { createApp } from '../../server/app';
import { readVersion, ROOT } from '../../server/config';
import { readTaxonomy, seedIfEmpty } from '../../server/db/seed';
import { ConservationLaw, MechanismClass } from '../../server/models';
import { createTestDatabase, type TestDatabase } from '../support/db';

let t: TestDatabase;
let app: ReturnType<typeof createApp>;
let staticDir: string;

beforeAll(async () => {
  t = await createTestDatabase();
  await seedIfEmpty(t.sequelize, path.join(ROOT, 'content'));
  staticDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-static-'));
  fs.writeFileSync(path.join(staticDir, 'index.html'), '<!doctype html><title>shell for tests</title>');
  fs.mkdirSync(path.join(staticDir, '_expo'));
  fs.writeFileSync(path.join(staticDir, '_expo', 'bundle.js'), 'console.log(1)');
  app = createApp({ sequelize: t.sequelize, version: readVersion(), staticDir, jsonLimit: '1kb' });
});

afterAll(async () => {
  await t.drop();
  fs.rmSync(staticDir, { recursive: true, force: true });
});

const expectErrorShape = (body: unknown, code: string) => {
  expect(body).toEqual({ error: expect.objectContaining({ code, message: expect.any(String) }) });
};

describe('GET /api/health', () => {
  it('answers ok with the database up and the package version', async () => {
    const res = await request(app).get('/api/health').expect(200);
    const pkg = JSON.parse(fs.readFileSync(path.join(ROOT, 'package.json'), 'utf8'));
    expect(res.body).toEqual({ status: 'ok', db: 'up', version: pkg.version });
    expect(res.headers['cache-control']).toBe('no-store');
  });
});

describe('errors in one JSON shape', () => {
  it('answers an unknown /api route with a JSON 404 naming the route', async () => {
    const res = await request(app).get('/api/no-such-thing').expect(404);
    expect(res.headers['content-type']).toMatch(/application\/json/);
    expectErrorShape(res.body, 'not_found');
    expect(res.body.error.message).toContain('/api/no-such-thing');
  });

  it('answers an unknown /api route for POST too, not the web app', async () => {
    const res = await request(app).post('/api/nowhere').send({ a: 1 }).expect(404);
    expectErrorShape(res.body, 'not_found');
  });

  it.each([
    ['{"title": "unterminated'],
    ['{bad json}'],
    ['[1, 2,'],
  ])('answers malformed JSON %p with 400 invalid_json, never 500', async (raw) => {
    const res = await request(app).post('/api/health').set('Content-Type', 'application/json').send(raw).expect(400);
    expectErrorShape(res.body, 'invalid_json');
  });

  it('answers a body over the limit with 413', async () => {
    const res = await request(app)
      .post('/api/health')
      .set('Content-Type', 'application/json')
      .send(JSON.stringify({ text: 'x'.repeat(4096) }))
      .expect(413);
    expectErrorShape(res.body, 'body_too_large');
  });

  it('sets the usual security headers', async () => {
    const res = await request(app).get('/api/health');
    expect(res.headers['x-content-type-options']).toBe('nosniff');
    expect(res.headers['content-security-policy']).toContain("default-src 'self'");
    expect(res.headers['x-powered-by']).toBeUndefined();
  });
});

describe('the web app and its SPA fallback', () => {
  it('serves index.html for client-side routes', async () => {
    for (const route of ['/', '/check', '/entries/some-entry/v/2']) {
      const res = await request(app).get(route).set('Accept', 'text/html').expect(200);
      expect(res.text).toContain('shell for tests');
    }
  });

  it('serves hashed bundles with a long cache life', async () => {
    const res = await request(app).get('/_expo/bundle.js').expect(200);
    expect(res.headers['cache-control']).toContain('immutable');
  });

  it('answers a missing file that is not a page with a JSON 404', async () => {
    const res = await request(app).get('/missing.png').set('Accept', 'image/png').expect(404);
    expectErrorShape(res.body, 'not_found');
  });
});

describe('starter taxonomy', () => {
  it('is served in order, with the class tree', async () => {
    const res = await request(app).get('/api/taxonomy').expect(200);
    const file = readTaxonomy(path.join(ROOT, 'content'));
    expect(res.body.laws.map((l: { slug: string }) => l.slug)).toEqual(file.laws.map((l) => l.slug));
    expect(res.body.classes).toHaveLength(file.classes.length);
    const momentum = res.body.laws.find((l: { slug: string }) => l.slug === 'linear-momentum');
    expect(momentum.symmetry).toMatch(/translation in space/);
    const child = res.body.classes.find((c: { slug: string }) => c.slug === 'enclosed-radiation');
    expect(child.parentSlug).toBe('propellant-free-thrust');
  });

  it('is loaded only into an empty database', async () => {
    const before = [await ConservationLaw.count(), await MechanismClass.count()];
    expect(await seedIfEmpty(t.sequelize, path.join(ROOT, 'content'))).toBe(false);
    expect([await ConservationLaw.count(), await MechanismClass.count()]).toEqual(before);
  });
});
