/**
 * The object stores (server/storage): one contract suite run against LocalStore on a temp directory
 * and against S3Store talking to s3rver (a local S3 emulator) on 127.0.0.1, plus the configuration.
 * Real files and real HTTP; no mocks.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { HeadObjectCommand } from '@aws-sdk/client-s3';
import {
  InvalidKeyError,
  LocalStore,
  newAttachmentKey,
  ObjectNotFoundError,
  S3Store,
  StorageConfigError,
  storageConfigFromEnv,
  storageFromEnv,
  type ObjectStore,
} from '../../server/storage';

// s3rver ships no types; this is the part of its API the test uses (node_modules/s3rver/README.md).
interface S3rverInstance {
  run(): Promise<{ address: string; port: number }>;
  close(): Promise<void>;
}
const S3rver = require('s3rver') as new (opts: Record<string, unknown>) => S3rverInstance;

const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');

async function readAll(stream: NodeJS.ReadableStream): Promise<Buffer> {
  const chunks: Buffer[] = [];
  for await (const chunk of stream as AsyncIterable<Buffer | string>) chunks.push(Buffer.from(chunk));
  return Buffer.concat(chunks);
}

const tmpDirs: string[] = [];
const tmpDir = (prefix: string) => {
  const d = fs.mkdtempSync(path.join(os.tmpdir(), prefix));
  tmpDirs.push(d);
  return d;
};
afterAll(() => {
  for (const d of tmpDirs) fs.rmSync(d, { recursive: true, force: true });
});

let s3rver: S3rverInstance;
let s3Store: S3Store;
let s3Port = 0;
const s3Env = (port: number) => ({
  STORAGE: 's3',
  S3_ENDPOINT: `http://127.0.0.1:${port}`,
  S3_BUCKET: 'cw-test',
  // s3rver's fixed credentials (node_modules/s3rver/README.md, "Supported clients").
  S3_ACCESS_KEY_ID: 'S3RVER',
  S3_SECRET_ACCESS_KEY: 'S3RVER',
});

beforeAll(async () => {
  s3rver = new S3rver({ port: 0, address: '127.0.0.1', silent: true, directory: tmpDir('cw-s3rver-'), configureBuckets: [{ name: 'cw-test' }] });
  ({ port: s3Port } = await s3rver.run());
  s3Store = storageFromEnv(s3Env(s3Port), '/nonexistent') as S3Store;
});

afterAll(async () => {
  s3Store?.close();
  await s3rver?.close();
});

const stores: [string, () => ObjectStore][] = [
  ['LocalStore', () => new LocalStore(path.join(tmpDir('cw-local-store-'), 'uploads'))],
  ['S3Store (s3rver)', () => s3Store],
];

describe.each(stores)('%s: the ObjectStore contract', (_name, make) => {
  let store: ObjectStore;
  beforeAll(() => {
    store = make();
  });

  test('put then get returns the same bytes, content type, size and SHA-256', async () => {
    const key = newAttachmentKey();
    const body = crypto.randomBytes(70_000); // more than one stream chunk (64 kB)
    await store.put(key, body, { contentType: 'application/pdf', sha256: sha256(body) });
    const got = await store.get(key);
    expect(got.contentType).toBe('application/pdf');
    expect(got.size).toBe(body.length);
    expect(got.sha256).toBe(sha256(body));
    const bytes = await readAll(got.body);
    expect(bytes.equals(body)).toBe(true);
  });

  test('exists, delete, and delete of a missing key', async () => {
    const key = newAttachmentKey();
    const body = Buffer.from('generated test data');
    expect(await store.exists(key)).toBe(false);
    await store.put(key, body, { contentType: 'image/png', sha256: sha256(body) });
    expect(await store.exists(key)).toBe(true);
    await store.delete(key);
    expect(await store.exists(key)).toBe(false);
    await expect(store.get(key)).rejects.toBeInstanceOf(ObjectNotFoundError);
    await expect(store.delete(key)).resolves.toBeUndefined();
    await expect(store.delete(newAttachmentKey())).resolves.toBeUndefined();
  });

  test('a second put of a key replaces the object', async () => {
    const key = newAttachmentKey();
    const a = Buffer.from('first version, generated');
    const b = Buffer.from('second version, generated, longer');
    await store.put(key, a, { contentType: 'image/png', sha256: sha256(a) });
    await store.put(key, b, { contentType: 'image/webp', sha256: sha256(b) });
    const got = await store.get(key);
    expect((await readAll(got.body)).equals(b)).toBe(true);
    expect(got.contentType).toBe('image/webp');
    expect(got.sha256).toBe(sha256(b));
  });

  test.each([
    ['../etc/passwd'],
    ['attachments/../../x'],
    ['/etc/passwd'],
    ['attachments/2026/01/a.pdf'],
    ['attachments//x'],
    ['attachments/x/'],
    ['attachments\\x'],
    ['attachments/x y'],
    ['attachments/é'],
    [''],
    ['a'.repeat(513)],
  ].map(([k]) => [k.length > 40 ? `"${k.slice(0, 8)}…" (${k.length} characters)` : JSON.stringify(k), k]))('refuses the key %s for every operation', async (_label, key) => {
    const body = Buffer.from('x');
    await expect(store.put(key, body, { contentType: 'image/png', sha256: sha256(body) })).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.get(key)).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.exists(key)).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.delete(key)).rejects.toBeInstanceOf(InvalidKeyError);
  });

  test('refuses a SHA-256 that is not 64 hex digits', async () => {
    await expect(store.put(newAttachmentKey(), Buffer.from('x'), { contentType: 'image/png', sha256: 'abc' })).rejects.toThrow(/SHA-256/);
  });
});

describe('newAttachmentKey', () => {
  test('attachments/<yyyy>/<mm>/<32 hex>, UTC, a new one each time', () => {
    const at = new Date(Date.UTC(2026, 0, 31, 23, 59, 59));
    const a = newAttachmentKey(at);
    expect(a).toMatch(/^attachments\/2026\/01\/[0-9a-f]{32}$/);
    expect(newAttachmentKey(at)).not.toBe(a);
  });
});

describe('LocalStore on disk', () => {
  test('keeps the bytes as a plain file under its directory and leaves no temporary files', async () => {
    const dir = tmpDir('cw-local-layout-');
    const store = new LocalStore(dir);
    const key = newAttachmentKey();
    const body = Buffer.from('%PDF-1.4 generated\n%%EOF\n');
    await store.put(key, body, { contentType: 'application/pdf', sha256: sha256(body) });
    expect(fs.readFileSync(path.join(dir, key)).equals(body)).toBe(true);
    const names = fs.readdirSync(path.dirname(path.join(dir, key)));
    expect(names.sort()).toEqual([path.basename(key), `${path.basename(key)}.meta.json`].sort());
    await store.delete(key);
    expect(fs.readdirSync(path.dirname(path.join(dir, key)))).toEqual([]);
  });

  test('a failed put leaves nothing behind (the key names an existing directory)', async () => {
    const dir = tmpDir('cw-local-fail-');
    const store = new LocalStore(dir);
    const body = Buffer.from('generated');
    await store.put('attachments/a/b', body, { contentType: 'image/png', sha256: sha256(body) });
    // "attachments/a" is now a directory: putting an object at that key must fail, and clean up.
    await expect(store.put('attachments/a', body, { contentType: 'image/png', sha256: sha256(body) })).rejects.toThrow();
    expect(fs.readdirSync(path.join(dir, 'attachments')).sort()).toEqual(['a']);
    expect(await store.exists('attachments/a')).toBe(false);
  });
});

describe('S3Store against s3rver', () => {
  test('stores the SHA-256 as user metadata beside the content type', async () => {
    const key = newAttachmentKey();
    const body = Buffer.from('generated test data for metadata');
    await s3Store.put(key, body, { contentType: 'image/jpeg', sha256: sha256(body) });
    const head = await s3Store.client.send(new HeadObjectCommand({ Bucket: 'cw-test', Key: key }));
    expect(head.Metadata?.sha256).toBe(sha256(body));
    expect(head.ContentType).toBe('image/jpeg');
    expect(head.ContentLength).toBe(body.length);
  });

  test('ensureBucket creates a missing bucket and accepts an existing one', async () => {
    const other = storageFromEnv({ ...s3Env(s3Port), S3_BUCKET: 'cw-test-new' }) as S3Store;
    try {
      const key = newAttachmentKey();
      const body = Buffer.from('generated');
      const meta = { contentType: 'image/png', sha256: sha256(body) };
      await expect(other.put(key, body, meta)).rejects.toMatchObject({ name: 'NoSuchBucket' });
      await expect(other.get(key)).rejects.not.toBeInstanceOf(ObjectNotFoundError);
      await other.ensureBucket();
      await other.ensureBucket();
      await other.put(key, body, meta);
      expect(await other.exists(key)).toBe(true);
    } finally {
      other.close();
    }
  });
});

describe('storage configuration from the environment', () => {
  const root = '/srv/counterweight';

  test('defaults to a local directory .data/uploads under the project root', () => {
    expect(storageConfigFromEnv({}, root)).toEqual({ kind: 'local', dir: path.join(root, '.data', 'uploads') });
    expect(storageFromEnv({}, root).kind).toBe('local');
  });

  test('UPLOAD_DIR, relative to the root or absolute', () => {
    expect(storageConfigFromEnv({ STORAGE: 'local', UPLOAD_DIR: 'files' }, root)).toEqual({ kind: 'local', dir: path.join(root, 'files') });
    expect(storageConfigFromEnv({ UPLOAD_DIR: '/var/lib/cw' }, root)).toEqual({ kind: 'local', dir: '/var/lib/cw' });
  });

  test('STORAGE=s3 with its defaults', () => {
    expect(storageConfigFromEnv({ STORAGE: 's3', S3_BUCKET: 'cw-prod' }, root)).toEqual({
      kind: 's3',
      endpoint: null,
      region: 'us-east-1',
      bucket: 'cw-prod',
      accessKeyId: null,
      secretAccessKey: null,
      forcePathStyle: false,
    });
    const withEndpoint = storageConfigFromEnv({ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_ENDPOINT: 'http://127.0.0.1:9000/', S3_REGION: 'eu-west-1' }, root);
    expect(withEndpoint).toMatchObject({ endpoint: 'http://127.0.0.1:9000', region: 'eu-west-1', forcePathStyle: true });
    expect(storageConfigFromEnv({ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_ENDPOINT: 'https://s3.example.org', S3_FORCE_PATH_STYLE: 'false' }, root)).toMatchObject({
      forcePathStyle: false,
    });
    expect(storageFromEnv({ STORAGE: 's3', S3_BUCKET: 'cw-files' }, root).kind).toBe('s3');
  });

  test.each([
    [{ STORAGE: 'ftp' }, 'STORAGE'],
    [{ STORAGE: 's3' }, 'S3_BUCKET'],
    [{ STORAGE: 's3', S3_BUCKET: 'Has_Capitals' }, 'S3_BUCKET'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_ENDPOINT: 'not a url' }, 'S3_ENDPOINT'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_ENDPOINT: 'ftp://files.example.org' }, 'S3_ENDPOINT'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_REGION: 'Europe West' }, 'S3_REGION'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_ACCESS_KEY_ID: 'AKIAEXAMPLE' }, 'S3_SECRET_ACCESS_KEY'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_SECRET_ACCESS_KEY: 'secret' }, 'S3_ACCESS_KEY_ID'],
    [{ STORAGE: 's3', S3_BUCKET: 'cw-files', S3_FORCE_PATH_STYLE: 'maybe' }, 'S3_FORCE_PATH_STYLE'],
  ])('%j is refused naming %s', (env, variable) => {
    let caught: unknown;
    try {
      storageConfigFromEnv(env, root);
    } catch (err) {
      caught = err;
    }
    expect(caught).toBeInstanceOf(StorageConfigError);
    expect((caught as StorageConfigError).variable).toBe(variable);
    expect((caught as Error).message).toContain(variable);
  });
});
