/**
 * Two app servers on one database: the second has its own copy of every server module
 * (jest.isolateModules, as in sessions.test.ts), its own Sequelize pool and its own search index.
 * An entry published (by two editors) and then retired through the first is found, and then no
 * longer found, through the second at a later refresh (polled with a generous deadline, never timed). The entry is invented test data.
 */
import request from 'supertest';
import type * as AppModule from '../../server/app';
import type * as ModelsModule from '../../server/models';
import type * as SequelizeModule from '../../server/db/sequelize';
import { until } from '../support/poll';
import { startTestApp, type TestApp } from '../support/app';

jest.setTimeout(120_000);

const REFRESH_MS = 200;
let h: TestApp;
let second: ReturnType<typeof AppModule.createApp>;
let secondClose: () => Promise<void>;
beforeAll(async () => {
  h = await startTestApp({ starterEntries: true, searchRefreshMs: REFRESH_MS });
  jest.isolateModules(() => {
    const { createApp } = require('../../server/app') as typeof AppModule;
    const { initModels } = require('../../server/models') as typeof ModelsModule;
    const { createSequelize } = require('../../server/db/sequelize') as typeof SequelizeModule;
    const sequelize = createSequelize(h.t.db);
    initModels(sequelize);
    second = createApp({ sequelize, version: 'test', env: 'test', sessionCleanupMs: 0, searchRefreshMs: REFRESH_MS });
    secondClose = async () => {
      await (second.locals as unknown as AppModule.AppLocals).close();
      await sequelize.close();
    };
  });
});
afterAll(async () => {
  await secondClose?.();
  await h?.close();
});

const content = {
  title: 'Zorblax crates that push themselves with trapped light',
  aliases: ['zorblax drive'],
  mechanismClass: 'enclosed-radiation',
  laws: ['linear-momentum'],
  inBrief: 'A sealed crate full of light pushes on every wall alike, so it goes nowhere.',
  howItIsPitched: 'The crate is said to push harder on one end than the other.',
  whyItFails: 'The momentum of the light and the crate together is conserved: $p = E/c$.',
  whatFakesTheEffect: 'Thermal drift of the balance.',
};

const slugsOn = async (app: Parameters<typeof request>[0], q: string): Promise<string[]> => {
  const res = await request(app).get('/api/search').query({ q }).expect(200);
  return res.body.results.map((r: { slug: string }) => r.slug);
};

it('finds through the second server what the first published, at a later refresh', async () => {
  expect(await slugsOn(second, 'zorblax')).toEqual([]);
  const one = await h.signedIn('editor.one@example.org');
  const two = await h.signedIn('editor.two@example.org');
  const draft = await one.post('/api/drafts', { slug: 'zorblax-crate', content });
  expect(draft.status).toBe(201);
  expect((await one.post(`/api/drafts/${draft.body.draft.id}/submit`, { lockVersion: 0 })).status).toBe(200);
  expect((await two.post(`/api/drafts/${draft.body.draft.id}/approve`, { changeNote: 'First published version.' })).status).toBe(200);

  // The first server updated its own index at once.
  expect((await slugsOn(h.app, 'zorblax'))[0]).toBe('zorblax-crate');
  // The second sees it at its next refresh. No timed assertion (speed is measured by `npm run bench`):
  // the deadline is generous, far above REFRESH_MS, so that a busy machine cannot fail the test.
  await until('the second server finds it', async () => (await slugsOn(second, 'zorblax'))[0] === 'zorblax-crate', 60_000);

  expect((await two.post('/api/entries/zorblax-crate/retire', { reason: 'Merged into the cavity entry.' })).status).toBe(200);
  expect(await slugsOn(h.app, 'zorblax')).toEqual([]);
  await until('the second server drops it', async () => (await slugsOn(second, 'zorblax')).length === 0, 60_000);
});
