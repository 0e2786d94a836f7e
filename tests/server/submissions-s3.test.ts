/**
 * A sighting's attachment through the whole app with S3-compatible storage (s3rver on loopback):
 * stored with its type, read back byte for byte through GET /api/attachments/:id, and removed from
 * the bucket when the database write fails. The texts and files are invented test data.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { Attachment, Submission } from '../../server/models';
import { storageFromEnv, type S3Store } from '../../server/storage';
import { minimalPdf } from '../fixtures/files/samples';
import { demo, startTestApp, type TestApp } from '../support/app';

jest.setTimeout(120_000);

// s3rver ships no types; the part of its API used here (node_modules/s3rver/README.md).
const S3rver = require('s3rver') as new (opts: Record<string, unknown>) => { run(): Promise<{ port: number }>; close(): Promise<void> };

let s3: InstanceType<typeof S3rver>;
let store: S3Store;
let dir: string;
let h: TestApp;
beforeAll(async () => {
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-s3rver-'));
  s3 = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: dir, configureBuckets: [{ name: 'cw-sightings' }] });
  const { port } = await s3.run();
  // s3rver's fixed credentials (its README, "Supported clients").
  store = storageFromEnv({ STORAGE: 's3', S3_ENDPOINT: `http://127.0.0.1:${port}`, S3_BUCKET: 'cw-sightings', S3_ACCESS_KEY_ID: 'S3RVER', S3_SECRET_ACCESS_KEY: 'S3RVER' }, '/nonexistent') as S3Store;
  h = await startTestApp({ store, searchRefreshMs: 0 });
});
afterAll(async () => {
  await h?.close();
  store?.close();
  await s3?.close();
  fs.rmSync(dir, { recursive: true, force: true });
});

const post = async (files: Buffer[]) => {
  const c = await h.signedIn(demo.contributor.email);
  let req = c.agent
    .post('/api/sightings')
    .set('X-CSRF-Token', c.csrf)
    .field('title', 'Closed cavity drive in a conference hall')
    .field('seenAtCitation', 'Exhibitor leaflet, Brenford Technology Fair, 2026')
    .field('summary', 'The leaflet claims a sealed cavity pushes itself with no exhaust.');
  files.forEach((f, i) => (req = req.attach('files', f, { filename: `leaflet-${i}.pdf`, contentType: 'application/pdf' })));
  return { c, res: await req };
};

it('stores the attachment in the bucket and serves it back unchanged', async () => {
  const pdf = minimalPdf();
  const { c, res } = await post([pdf]);
  expect(res.status).toBe(201);
  const a = res.body.submission.attachments[0];
  const row = (await Attachment.findByPk(a.id))!;
  expect(await store.exists(row.storageKey)).toBe(true);
  const got = await c.get(a.url).buffer(true).parse((r, cb) => {
    const chunks: Buffer[] = [];
    r.on('data', (x: Buffer) => chunks.push(x));
    r.on('end', () => cb(null, Buffer.concat(chunks)));
  });
  expect(got.status).toBe(200);
  expect(got.headers['content-type']).toBe('application/pdf');
  expect(crypto.createHash('sha256').update(got.body as Buffer).digest('hex')).toBe(crypto.createHash('sha256').update(pdf).digest('hex'));
});

it('leaves no object in the bucket when the database write fails', async () => {
  const before = await Attachment.count();
  const spy = jest.spyOn(Submission, 'create').mockRejectedValueOnce(new Error('simulated database failure'));
  const putKeys: string[] = [];
  // Uploads reach the store from their temporary files (putFile).
  const putFile = store.putFile.bind(store);
  const putSpy = jest.spyOn(store, 'putFile').mockImplementation(async (key, file, meta) => {
    putKeys.push(key);
    return putFile(key, file, meta);
  });
  const { res } = await post([minimalPdf(), minimalPdf()]);
  spy.mockRestore();
  putSpy.mockRestore();
  expect(res.status).toBe(500);
  expect(putKeys).toHaveLength(2);
  for (const key of putKeys) expect(await store.exists(key)).toBe(false);
  expect(await Attachment.count()).toBe(before);
});
