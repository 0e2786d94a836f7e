/**
 * The upload pipeline (server/uploads/attachments.ts) in a small Express app over supertest: multipart
 * limits, the type decided from the bytes, files streamed through a temporary directory of the test's
 * own (never left there, whatever happens: success, refusal, a failing store, a client that goes away
 * mid-body), and all-or-nothing storage into a real LocalStore on a temp directory. Sample files are
 * generated (tests/fixtures/files/samples.ts).
 */
import { spawnSync } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import express from 'express';
import mariadb from 'mariadb';
import request from 'supertest';
import { errorHandler } from '../../server/http/errors';
import { Attachment, Submission } from '../../server/models';
import { LocalStore, type ObjectMeta, type ObjectStore } from '../../server/storage';
import { acceptFiles, discardUploads, displayName, inspectFiles, removeStored, storeFiles, uploadedFiles, type StoredFile } from '../../server/uploads/attachments';
import { sweepStaleTempFiles } from '../../server/uploads/temp-files';
import { until } from '../support/poll';
import { demo, startTestApp, type Client, type TestApp } from '../support/app';
import { testDbEnv } from '../support/db';
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
/** The temporary directory every app of this file streams uploads into (checked empty after each test). */
let tmpDir: string;
beforeAll(() => {
  root = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-uploads-'));
  tmpDir = path.join(root, 'incoming');
});
afterAll(() => fs.rmSync(root, { recursive: true, force: true }));
afterEach(async () => {
  // No temporary file outlives its request, whatever the answer was.
  await until('the temporary upload directory is empty', async () => filesUnder(tmpDir).length === 0, 5000).catch(() => {});
  expect(filesUnder(tmpDir)).toEqual([]);
});

/** The sightings route reduced to the pipeline: accept, inspect, store, remove the temporary files, answer what was stored. */
function appWith(store: ObjectStore) {
  const app = express();
  app.post('/upload', acceptFiles({ tmpDir }), async (req, res) => {
    let stored: StoredFile[];
    try {
      const inspected = await inspectFiles(uploadedFiles(req));
      stored = await storeFiles(store, inspected);
    } finally {
      await discardUploads(req);
    }
    res.status(201).json({ files: stored, fields: { ...req.body } });
  });
  app.use(errorHandler({ error: () => {} }));
  return app;
}

/** A real LocalStore that notes, at each putFile, where the bytes came from and what that file held then. */
class RecordingStore extends LocalStore {
  sources: { file: string; size: number; sha256: string }[] = [];
  async putFile(key: string, file: string, meta: ObjectMeta): Promise<void> {
    const bytes = fs.readFileSync(file);
    this.sources.push({ file, size: bytes.length, sha256: sha256(bytes) });
    return super.putFile(key, file, meta);
  }
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

  test('exactly 10 MB is still accepted (the limit is inclusive), streamed through the temporary directory, not memory', async () => {
    const store = new RecordingStore(path.join(root, 'ten-mb'));
    const bytes = largePdf(10 * MB);
    const res = await request(appWith(store)).post('/upload').attach('files', bytes, { filename: 'ten.pdf' });
    expect(res.status).toBe(201);
    expect(res.body.files[0]).toMatchObject({ size: 10 * MB, sha256: sha256(bytes) });
    // The store was handed a file in the injected temporary directory, whole at that moment…
    expect(store.sources).toHaveLength(1);
    expect(path.dirname(store.sources[0].file)).toBe(tmpDir);
    expect(path.basename(store.sources[0].file)).toMatch(/^cw-upload-\d+-[0-9a-f]{16}\.part$/);
    expect(store.sources[0]).toMatchObject({ size: 10 * MB, sha256: sha256(bytes) });
    // …which is gone once the answer is out (afterEach), while the stored copy holds the same bytes.
    expect(fs.existsSync(store.sources[0].file)).toBe(false);
    expect((await readAll((await store.get(res.body.files[0].key)).body)).equals(bytes)).toBe(true);
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
  async putFile(...args: Parameters<ObjectStore['putFile']>) {
    this.puts += 1;
    if (this.puts === this.failAt) throw new Error(`put number ${this.failAt} failed (test)`);
    return this.inner.putFile(...args);
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
    const temps = [minimalPdf(), minimalPng()].map((bytes, i) => {
      const file = path.join(root, `undo-source-${i}`);
      fs.writeFileSync(file, bytes);
      return { path: file, size: bytes.length, sha256: sha256(bytes), originalname: `f${i}` } as Express.Multer.File & { sha256: string };
    });
    const inspected = await inspectFiles(temps);
    const stored = await storeFiles(store, inspected);
    // The sources are left where they were (the route removes them).
    for (const t of temps) expect(fs.existsSync(t.path)).toBe(true);
    expect(filesUnder(dir).length).toBeGreaterThan(0);
    for (const s of stored) expect(await store.exists(s.key)).toBe(true);
    expect(await removeStored(store, stored)).toEqual([]);
    expect(filesUnder(dir)).toEqual([]);
  });

  test('the local store refuses to place a copy whose SHA-256 is not the one taken on arrival, and leaves nothing', async () => {
    const dir = path.join(root, 'mismatch');
    const store = new LocalStore(dir);
    const source = path.join(root, 'mismatch-source.pdf');
    fs.writeFileSync(source, minimalPdf());
    const wrong = sha256(Buffer.from('some other bytes'));
    await expect(store.putFile('attachments/2026/01/abcdef', source, { contentType: 'application/pdf', sha256: wrong })).rejects.toThrow(/SHA-256/);
    expect(filesUnder(dir)).toEqual([]);
    await store.putFile('attachments/2026/01/abcdef', source, { contentType: 'application/pdf', sha256: sha256(minimalPdf()) });
    expect(await store.exists('attachments/2026/01/abcdef')).toBe(true);
  });

  test('a delete that fails during the undo is reported, not thrown', async () => {
    const inner = new LocalStore(path.join(root, 'undo-fail'));
    const store: ObjectStore = { kind: 'local', put: inner.put.bind(inner), putFile: inner.putFile.bind(inner), get: inner.get.bind(inner), exists: inner.exists.bind(inner), delete: async () => { throw new Error('gone away'); } };
    const orphans: string[] = [];
    const failed = await removeStored(store, [{ key: 'attachments/2026/01/aa' }, { key: 'attachments/2026/01/bb' }], (key) => orphans.push(key));
    expect(failed).toEqual(['attachments/2026/01/aa', 'attachments/2026/01/bb']);
    expect(orphans).toEqual(failed);
  });
});

/**
 * Sends the start of a multipart body (a text field, then `parts` of files, the last cut short) to
 * 127.0.0.1:port over a raw socket, waits until `ready()` holds (the server has begun writing the
 * files), then destroys the socket, as a client whose connection drops would.
 */
async function abortMidBody(port: number, urlPath: string, headers: Record<string, string>, parts: { name: string; bytes: Buffer }[], ready: () => Promise<boolean>) {
  const boundary = `cwAbort${crypto.randomBytes(6).toString('hex')}`;
  const chunks: Buffer[] = [Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="title"\r\n\r\nA sighting whose upload was cut off\r\n`)];
  parts.forEach((p, i) => {
    chunks.push(Buffer.from(`--${boundary}\r\nContent-Disposition: form-data; name="files"; filename="${p.name}"\r\nContent-Type: application/pdf\r\n\r\n`));
    chunks.push(p.bytes);
    if (i < parts.length - 1) chunks.push(Buffer.from('\r\n'));
  });
  const sent = Buffer.concat(chunks);
  // Content-Length promises far more than is sent: the server is still waiting for the rest.
  const req = http.request({
    host: '127.0.0.1',
    port,
    method: 'POST',
    path: urlPath,
    headers: { ...headers, 'Content-Type': `multipart/form-data; boundary=${boundary}`, 'Content-Length': String(sent.length + 4 * MB) },
  });
  const outcome = new Promise<string>((resolve) => {
    req.on('error', (e) => resolve(`error: ${e.message}`));
    req.on('response', (r) => resolve(`answered ${r.statusCode}`));
  });
  req.write(sent);
  await until('the server has begun writing the upload to its temporary directory', ready, 10_000);
  req.destroy();
  // The client saw its own socket go, not an answer.
  expect(await outcome).toMatch(/^error: /);
}

const listen = (app: express.Express) =>
  new Promise<http.Server>((resolve) => {
    const server = app.listen(0, '127.0.0.1', () => resolve(server));
  });
const portOf = (server: http.Server) => (server.address() as AddressInfo).port;
const closeServer = (server: http.Server) => new Promise((r) => { server.closeAllConnections(); server.close(r); });

describe('an upload cut off mid-body', () => {
  test('leaves nothing in the temporary directory or the store: one file half sent', async () => {
    const dir = path.join(root, 'aborted-one');
    const server = await listen(appWith(new LocalStore(dir)));
    try {
      await abortMidBody(portOf(server), '/upload', {}, [{ name: 'cut.pdf', bytes: largePdf(3 * MB) }], async () => filesUnder(tmpDir).length === 1 && fs.statSync(path.join(tmpDir, filesUnder(tmpDir)[0])).size > 0);
      await until('the half-written temporary file is removed', async () => filesUnder(tmpDir).length === 0);
      expect(filesUnder(dir)).toEqual([]);
    } finally {
      await closeServer(server);
    }
  });

  test('leaves nothing either when one file was complete and the next one half sent', async () => {
    const dir = path.join(root, 'aborted-two');
    const server = await listen(appWith(new LocalStore(dir)));
    try {
      const parts = [{ name: 'whole.png', bytes: minimalPng() }, { name: 'cut.pdf', bytes: largePdf(2 * MB) }];
      await abortMidBody(portOf(server), '/upload', {}, parts, async () => filesUnder(tmpDir).length === 2);
      await until('both temporary files are removed', async () => filesUnder(tmpDir).length === 0);
      expect(filesUnder(dir)).toEqual([]);
    } finally {
      await closeServer(server);
    }
  });
});

describe('temporary files of a process that is gone', () => {
  test('are swept; those of live processes and other files are kept', async () => {
    const dir = path.join(root, 'sweep');
    fs.mkdirSync(dir, { recursive: true });
    // A pid that no longer runs: a child that has exited (spawnSync waits for it).
    const gone = spawnSync(process.execPath, ['-e', '0']).pid!;
    const hex = () => crypto.randomBytes(8).toString('hex');
    const dead = `cw-upload-${gone}-${hex()}.part`;
    const live = `cw-upload-${process.pid}-${hex()}.part`;
    const other = 'someone-elses-file.part';
    for (const name of [dead, live, other]) fs.writeFileSync(path.join(dir, name), 'x');
    expect(await sweepStaleTempFiles(dir)).toEqual([dead]);
    expect(fs.readdirSync(dir).sort()).toEqual([live, other].sort());
    expect(await sweepStaleTempFiles(path.join(root, 'no-such-dir'))).toEqual([]);
  });
});

describe('the sightings route of the real app (real MariaDB)', () => {
  let h: TestApp;
  let c: Client;
  let server: http.Server;
  const storeDir = () => (h.store as LocalStore).dir;
  const storedFiles = () => filesUnder(storeDir()).filter((f) => !f.endsWith('.meta.json'));
  beforeAll(async () => {
    // The app reads UPLOAD_TMP_DIR when its routes are made: this file's temporary directory.
    process.env.UPLOAD_TMP_DIR = tmpDir;
    h = await startTestApp({ starterEntries: false });
    c = await h.signedIn(demo.contributor.email);
    server = await listen(h.app);
  });
  afterAll(async () => {
    if (server) await closeServer(server);
    await h?.close();
    delete process.env.UPLOAD_TMP_DIR;
  });
  const counts = async () => ({ submissions: await Submission.count(), attachments: await Attachment.count() });

  test('a sighting is stored through the temporary directory, which is empty once it is answered', async () => {
    const bytes = minimalPdf();
    const res = await c.agent
      .post('/api/sightings')
      .set('X-CSRF-Token', c.csrf)
      .field('title', 'A sealed drive shown on a stage')
      .field('seenAtUrl', 'https://news.example.org/stage-drive')
      .field('summary', 'A stand claimed thrust from a closed box.')
      .attach('files', bytes, { filename: 'leaflet.pdf', contentType: 'application/pdf' });
    expect(res.status).toBe(201);
    expect(res.body.submission.attachments[0].sha256).toBe(sha256(bytes));
    expect(filesUnder(tmpDir)).toEqual([]);
    expect(storedFiles()).toHaveLength(1);
  });

  test('a sighting cut off mid-body leaves no temporary file, no stored file and no row', async () => {
    const before = await counts();
    const storedBefore = storedFiles();
    const cookie = `cw.sid=${c.sid()}`;
    await abortMidBody(portOf(server), '/api/sightings', { Cookie: cookie, 'X-CSRF-Token': c.csrf }, [{ name: 'cut.pdf', bytes: largePdf(3 * MB) }], async () => filesUnder(tmpDir).length === 1);
    await until('the half-written temporary file is removed', async () => filesUnder(tmpDir).length === 0);
    expect(storedFiles()).toEqual(storedBefore);
    expect(await counts()).toEqual(before);
    // The app is still answering.
    expect((await c.get('/api/health')).status).toBe(200);
  });

  test('a database failure while the sighting is recorded leaves no temporary file, no stored file and no row', async () => {
    const before = await counts();
    const storedBefore = storedFiles();
    // A real failure inside the transaction: a trigger (made as root over the socket) refuses every attachment row.
    const root = await mariadb.createConnection({ socketPath: testDbEnv().socket, user: 'root', database: h.t.db.name });
    try {
      await root.query("CREATE TRIGGER refuse_attachments BEFORE INSERT ON attachments FOR EACH ROW SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'refused by the test'");
      const res = await c.agent
        .post('/api/sightings')
        .set('X-CSRF-Token', c.csrf)
        .field('title', 'A wheel said to turn for ever')
        .field('seenAtUrl', 'https://news.example.org/wheel')
        .field('summary', 'A wheel with weighted arms was said to keep turning unaided.')
        .attach('files', minimalPdf(), { filename: 'a.pdf', contentType: 'application/pdf' })
        .attach('files', minimalPng(), { filename: 'b.png', contentType: 'image/png' });
      expect(res.status).toBeGreaterThanOrEqual(500);
      expect(res.body.error).toBeDefined();
    } finally {
      await root.query('DROP TRIGGER IF EXISTS refuse_attachments');
      await root.end();
    }
    expect(filesUnder(tmpDir)).toEqual([]);
    expect(storedFiles()).toEqual(storedBefore);
    expect(await counts()).toEqual(before);
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
