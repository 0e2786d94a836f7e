/**
 * The upload pipeline (server/uploads/attachments.ts) in a small Express app over supertest: multipart
 * limits, the type decided from the bytes, and all-or-nothing storage into a real LocalStore on a temp
 * directory. Sample files are generated (tests/fixtures/files/samples.ts).
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import request from 'supertest';
import { errorHandler } from '../../server/http/errors';
import { LocalStore, type ObjectStore } from '../../server/storage';
import { acceptFiles, displayName, inspectFiles, removeStored, storeFiles, uploadedFiles, type StoredFile } from '../../server/uploads/attachments';
import { elfHeader, largePdf, minimalJpeg, minimalPdf, minimalPng, minimalWebp, peHeader, plainText } from '../fixtures/files/samples';

const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');
const MB = 1024 * 1024;

/** Every regular file under a directory (relative paths). */
function filesUnder(dir: string): string[] {
  if (!fs.existsSync(dir)) return [];
  return (fs.readdirSync(dir, { recursive: true }) as string[]).filter((p) => fs.statSync(path.join(dir, p)).isFile());
}

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream as AsyncIterable<Buffer>) chunks.push(Buffer.from(chunk));
  return Buffer.concat(chunks);
}

let root: string;
beforeAll(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-uploads-'));
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

/** The route the lead will write, reduced to the pipeline: accept, inspect, store, answer what was stored. */
function appWith(store: ObjectStore) {
  const app = express();
  app.post('/upload', acceptFiles(), async (req, res) => {
    const inspected = await inspectFiles(uploadedFiles(req));
    const stored = await storeFiles(store, inspected);
    res.status(201).json({ files: stored, fields: { ...req.body } });
  });
  app.use(errorHandler({ error: () => {} }));
  return app;
}

describe('accepted files', () => {
  const dir = () => path.join(root, 'accepted');
  let store: LocalStore;
  let app: ReturnType<typeof appWith>;
  beforeAll(() => {
    store = new LocalStore(dir());
    app = appWith(store);
  });

  test.each([
    ['PDF', minimalPdf(), 'sighting.pdf', 'application/pdf'],
    ['PNG', minimalPng(), 'pixel.png', 'image/png'],
    ['JPEG', minimalJpeg(), 'photo.jpg', 'image/jpeg'],
    ['WebP', minimalWebp(), 'photo.webp', 'image/webp'],
  ])('a %s is stored with its media type and SHA-256', async (_kind, bytes, filename, mediaType) => {
    const res = await request(app).post('/upload').field('title', 'A claim seen').attach('files', bytes, { filename, contentType: 'application/octet-stream' });
    expect(res.status).toBe(201);
    expect(res.body.fields).toEqual({ title: 'A claim seen' });
    const [file] = res.body.files as StoredFile[];
    expect(file).toMatchObject({ name: filename, mediaType, size: bytes.length, sha256: sha256(bytes) });
    expect(file.key).toMatch(/^attachments\/\d{4}\/\d{2}\/[0-9a-f]{32}$/);
    const got = await store.get(file.key);
    expect(got.contentType).toBe(mediaType);
    expect((await readAll(got.body)).equals(bytes)).toBe(true);
  });

  test('five files at once, each its own object; the type comes from the bytes, not the name or header', async () => {
    const samples = [minimalPdf(), minimalPng(), minimalJpeg(), minimalWebp(), minimalPng()];
    let req = request(app).post('/upload');
    // Every file claims to be a PDF by name and header; the content decides.
    samples.forEach((b, i) => (req = req.attach('files', b, { filename: `file${i}.pdf`, contentType: 'application/pdf' })));
    const res = await req;
    expect(res.status).toBe(201);
    const files = res.body.files as StoredFile[];
    expect(files.map((f) => f.mediaType)).toEqual(['application/pdf', 'image/png', 'image/jpeg', 'image/webp', 'image/png']);
    expect(files.map((f) => f.sha256)).toEqual(samples.map(sha256));
    expect(new Set(files.map((f) => f.key)).size).toBe(5);
  });

  test('a request that is not multipart passes with no files (the route decides)', async () => {
    const res = await request(app).post('/upload').send({ title: 'JSON body' });
    expect(res.status).toBe(201);
    expect(res.body.files).toEqual([]);
  });

  test('the name kept for display is the basename, without control or bidi characters, UTF-8 intact', async () => {
    const res = await request(app)
      .post('/upload')
      .attach('files', minimalPdf(), { filename: 'C:\\Users\\someone\\Résumé du dossier\u202e.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(201);
    expect(res.body.files[0].name).toBe('Résumé du dossier.pdf');
  });
});

describe('refused files', () => {
  const dir = () => path.join(root, 'refused');
  let app: ReturnType<typeof appWith>;
  beforeAll(() => {
    app = appWith(new LocalStore(dir()));
  });
  afterEach(() => {
    // Nothing refused is ever stored.
    expect(filesUnder(dir())).toEqual([]);
  });

  test.each([
    ['an ELF executable', elfHeader(), /application\/x-elf/],
    ['a PE executable', peHeader(), /application\/x-msdownload/],
  ])('%s named evil.pdf and sent as application/pdf → 415 naming files.0 and what it is', async (_what, bytes, found) => {
    const res = await request(app).post('/upload').attach('files', bytes, { filename: 'evil.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(415);
    expect(res.body.error.code).toBe('unsupported_media_type');
    expect(Object.keys(res.body.error.fields)).toEqual(['files.0']);
    expect(res.body.error.fields['files.0']).toMatch(found);
    expect(res.body.error.fields['files.0']).toMatch(/not a PDF, PNG, JPEG or WebP image$/);
  });

  test('a plain text file → 415: not a recognised file; the bad one is named by its position', async () => {
    const res = await request(app)
      .post('/upload')
      .attach('files', minimalPng(), { filename: 'ok.png' })
      .attach('files', plainText(), { filename: 'notes.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(415);
    expect(res.body.error.fields).toEqual({ 'files.1': 'this file is not a recognised file, not a PDF, PNG, JPEG or WebP image' });
  });

  test('an empty file → 400 naming it', async () => {
    const res = await request(app).post('/upload').attach('files', Buffer.alloc(0), { filename: 'empty.pdf' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('empty_file');
    expect(res.body.error.fields).toEqual({ 'files.0': 'this file is empty' });
  });

  test('an 11 MB file → 413 file_too_large on files', async () => {
    const res = await request(app).post('/upload').attach('files', largePdf(11 * MB), { filename: 'big.pdf' });
    expect(res.status).toBe(413);
    expect(res.body.error.code).toBe('file_too_large');
    expect(res.body.error.fields).toEqual({ files: 'each file at most 10 MB' });
  });

  test('exactly 10 MB is still accepted (the limit is inclusive)', async () => {
    const store = new LocalStore(path.join(root, 'ten-mb'));
    const res = await request(appWith(store)).post('/upload').attach('files', largePdf(10 * MB), { filename: 'ten.pdf' });
    expect(res.status).toBe(201);
    expect(res.body.files[0].size).toBe(10 * MB);
  });

  test('six files → 400 too_many_files on files', async () => {
    let req = request(app).post('/upload');
    for (let i = 0; i < 6; i++) req = req.attach('files', minimalPng(), { filename: `p${i}.png` });
    const res = await req;
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('too_many_files');
    expect(Object.keys(res.body.error.fields)).toEqual(['files']);
  });

  test('a file in another field → 400 naming that field', async () => {
    const res = await request(app).post('/upload').attach('attachment', minimalPng(), { filename: 'p.png' });
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('unexpected_file_field');
    expect(Object.keys(res.body.error.fields)).toEqual(['body.attachment']);
  });

  test('a text field over 64 kB → 400 naming it', async () => {
    const res = await request(app).post('/upload').field('summary', 'x'.repeat(64 * 1024 + 1));
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('field_too_long');
    expect(Object.keys(res.body.error.fields)).toEqual(['body.summary']);
  });

  test('a multipart body cut short → 400, not 500', async () => {
    const res = await request(app)
      .post('/upload')
      .set('Content-Type', 'multipart/form-data; boundary=XyZ')
      .send('--XyZ\r\nContent-Disposition: form-data; name="files"; filename="a.pdf"\r\n\r\n%PDF-1.4');
    expect(res.status).toBe(400);
    expect(res.body.error.code).toBe('malformed_multipart');
  });
});

/** A real store that fails its n-th put (as a full disk or a lost connection would). */
class FailingStore implements ObjectStore {
  readonly kind = 'local' as const;
  puts = 0;
  constructor(
    private readonly inner: ObjectStore,
    private readonly failAt: number,
  ) {}
  async put(...args: Parameters<ObjectStore['put']>) {
    this.puts += 1;
    if (this.puts === this.failAt) throw new Error(`put number ${this.failAt} failed (test)`);
    return this.inner.put(...args);
  }
  get(key: string) {
    return this.inner.get(key);
  }
  delete(key: string) {
    return this.inner.delete(key);
  }
  exists(key: string) {
    return this.inner.exists(key);
  }
}

describe('all or nothing', () => {
  test('a store failing on the 3rd put leaves no object behind, and the request fails', async () => {
    const dir = path.join(root, 'failing');
    const store = new FailingStore(new LocalStore(dir), 3);
    let req = request(appWith(store)).post('/upload');
    for (const b of [minimalPdf(), minimalPng(), minimalJpeg(), minimalWebp()]) req = req.attach('files', b, { filename: 'f' });
    const res = await req;
    expect(res.status).toBe(500);
    expect(store.puts).toBe(3); // two objects were put before the failure...
    expect(filesUnder(dir)).toEqual([]); // ...and taken back
  });

  test('removeStored takes stored objects back (the undo when the transaction fails) and reports none left', async () => {
    const dir = path.join(root, 'undo');
    const store = new LocalStore(dir);
    const inspected = await inspectFiles([minimalPdf(), minimalPng()].map((buffer, i) => ({ buffer, originalname: `f${i}` }) as Express.Multer.File));
    const stored = await storeFiles(store, inspected);
    expect(filesUnder(dir).length).toBeGreaterThan(0);
    for (const s of stored) expect(await store.exists(s.key)).toBe(true);
    expect(await removeStored(store, stored)).toEqual([]);
    expect(filesUnder(dir)).toEqual([]);
  });

  test('a delete that fails during the undo is reported, not thrown', async () => {
    const inner = new LocalStore(path.join(root, 'undo-fail'));
    const store: ObjectStore = { kind: 'local', put: inner.put.bind(inner), get: inner.get.bind(inner), exists: inner.exists.bind(inner), delete: async () => { throw new Error('gone away'); } };
    const orphans: string[] = [];
    const failed = await removeStored(store, [{ key: 'attachments/2026/01/aa' }, { key: 'attachments/2026/01/bb' }], (key) => orphans.push(key));
    expect(failed).toEqual(['attachments/2026/01/aa', 'attachments/2026/01/bb']);
    expect(orphans).toEqual(failed);
  });
});

describe('displayName', () => {
  test.each([
    ['report.pdf', 'report.pdf'],
    ['../../etc/passwd', 'passwd'],
    ['C:\\fakepath\\scan.png', 'scan.png'],
    ['a\u0000b\u0007c\r\n.pdf', 'abc.pdf'],
    ['photo\u202egnp.exe', 'photognp.exe'],
    ['  spaced   out  .jpg ', 'spaced out .jpg'],
    ['', 'attachment'],
    ['..', 'attachment'],
  ])('%j → %j', (input, expected) => {
    expect(displayName(input)).toBe(expected);
  });

  test('at most 200 characters, keeping the extension', () => {
    const name = displayName('x'.repeat(300) + '.pdf');
    expect(Array.from(name)).toHaveLength(200);
    expect(name.endsWith('….pdf')).toBe(true);
    expect(Array.from(displayName('😀'.repeat(250)))).toHaveLength(200); // cut between characters, not inside a surrogate pair
  });
});
