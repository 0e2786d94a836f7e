/**
 * The built web app as the server sends it: the brotli and gzip copies the build writes
 * (server/build.ts, precompress) go out as they are, with the original's type, `Vary` and cache
 * headers; a client that accepts neither gets the file itself; the page itself stays the app.
 */
import fs from 'node:fs';
import http from 'node:http';
import type { AddressInfo } from 'node:net';
import os from 'node:os';
import path from 'node:path';
import zlib from 'node:zlib';
import request from 'supertest';
import { createApp } from '../../server/app';
import { precompress } from '../../server/build';
import { readVersion } from '../../server/config';
import { createTestDatabase, type TestDatabase } from '../support/db';

const SCRIPT = '/_expo/static/js/web/entry-0123456789abcdef0123456789abcdef.js';
const STYLE = '/_expo/static/css/print-0123456789abcdef.css';
const TINY = '/_expo/static/js/web/tiny-0123456789abcdef.js';

let t: TestDatabase;
let app: ReturnType<typeof createApp>;
let staticDir: string;
let script: Buffer;
let compressed: ReturnType<typeof precompress>;

/** A script like a bundle's: varied enough that compression is real work, repetitive enough that it pays. */
function fakeBundle(): string {
  const lines: string[] = [];
  for (let i = 0; i < 4000; i++) lines.push(`__d(function(g,r,i,a,m,e,d){var x${i}=r(d[${i % 17}]);m.exports={id:${i},name:"module-${(i * 7919) % 10007}"}},${i});`);
  return lines.join('\n');
}

/** The raw bytes of a response, not decoded (supertest decodes gzip and brotli). */
function rawGet(url: string, acceptEncoding: string): Promise<{ headers: http.IncomingHttpHeaders; body: Buffer }> {
  return new Promise((resolve, reject) => {
    const server = app.listen(0, '127.0.0.1', () => {
      const { port } = server.address() as AddressInfo;
      http
        .get({ host: '127.0.0.1', port, path: url, headers: { 'Accept-Encoding': acceptEncoding } }, (res) => {
          const chunks: Buffer[] = [];
          res.on('data', (c: Buffer) => chunks.push(c));
          res.on('end', () => server.close(() => resolve({ headers: res.headers, body: Buffer.concat(chunks) })));
        })
        .on('error', (e) => server.close(() => reject(e)));
    });
  });
}

beforeAll(async () => {
  t = await createTestDatabase();
  staticDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-static-assets-'));
  const put = (url: string, body: string | Buffer) => {
    const file = path.join(staticDir, url);
    fs.mkdirSync(path.dirname(file), { recursive: true });
    fs.writeFileSync(file, body);
  };
  script = Buffer.from(fakeBundle());
  put('index.html', `<!doctype html><html><head><title>shell for tests</title></head><body><div id="root"></div>${'<!-- padding -->'.repeat(80)}</body></html>`);
  put(SCRIPT, script);
  put(STYLE, `.print-only{display:none}\n${'@media print{.print-only{display:block}}\n'.repeat(60)}`);
  put(TINY, 'console.log(1);');
  compressed = precompress(staticDir);
  app = createApp({ sequelize: t.sequelize, version: readVersion(), staticDir });
});

afterAll(async () => {
  await t.drop();
  fs.rmSync(staticDir, { recursive: true, force: true });
});

describe('precompressed assets', () => {
  it('writes a brotli and a gzip copy beside each text file of 1 KB or more, and none for a smaller one', () => {
    const file = path.join(staticDir, SCRIPT);
    // What the copies hold is the file: Node's own decoders read them back.
    expect(zlib.brotliDecompressSync(fs.readFileSync(`${file}.br`)).equals(script)).toBe(true);
    expect(zlib.gunzipSync(fs.readFileSync(`${file}.gz`)).equals(script)).toBe(true);
    expect(fs.statSync(`${file}.br`).size).toBeLessThan(script.length);
    expect(fs.existsSync(path.join(staticDir, `${STYLE}.br`))).toBe(true);
    expect(fs.existsSync(path.join(staticDir, 'index.html.gz'))).toBe(true);
    expect(fs.existsSync(path.join(staticDir, `${TINY}.br`))).toBe(false);
    expect(compressed.files).toBe(3); // the script, the stylesheet and index.html
  });

  it('sends the brotli copy to a client that accepts brotli, as it is, with the script type and long caching', async () => {
    const res = await request(app).get(SCRIPT).set('Accept-Encoding', 'gzip, deflate, br');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('br');
    expect(res.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(res.headers.etag).toBeTruthy();
    // The stored copy's length: not compressed again on the way out.
    expect(Number(res.headers['content-length'])).toBe(fs.statSync(path.join(staticDir, `${SCRIPT}.br`)).size);
    expect(Buffer.from(res.text).equals(script)).toBe(true);

    const raw = await rawGet(SCRIPT, 'br');
    expect(raw.headers['content-encoding']).toBe('br');
    expect(raw.body.equals(fs.readFileSync(path.join(staticDir, `${SCRIPT}.br`)))).toBe(true);
    expect(zlib.brotliDecompressSync(raw.body).equals(script)).toBe(true);
  });

  it('sends the gzip copy to a client that accepts gzip only', async () => {
    const res = await request(app).get(SCRIPT).set('Accept-Encoding', 'gzip');
    expect(res.status).toBe(200);
    expect(res.headers['content-encoding']).toBe('gzip');
    expect(res.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(res.headers.vary).toMatch(/Accept-Encoding/i);
    expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(Number(res.headers['content-length'])).toBe(fs.statSync(path.join(staticDir, `${SCRIPT}.gz`)).size);
    expect(Buffer.from(res.text).equals(script)).toBe(true);

    const raw = await rawGet(SCRIPT, 'gzip');
    expect(raw.body.equals(fs.readFileSync(path.join(staticDir, `${SCRIPT}.gz`)))).toBe(true);
    expect(zlib.gunzipSync(raw.body).equals(script)).toBe(true);
  });

  it('sends the file itself to a client that accepts no compression', async () => {
    const raw = await rawGet(SCRIPT, 'identity');
    expect(raw.headers['content-encoding']).toBeUndefined();
    expect(raw.headers['content-type']).toMatch(/^(application|text)\/javascript/);
    expect(raw.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    expect(raw.body.equals(script)).toBe(true);
  });

  it('sends a stylesheet with its own type, and a file without copies as before', async () => {
    const css = await request(app).get(STYLE).set('Accept-Encoding', 'br');
    expect([css.status, css.headers['content-encoding']]).toEqual([200, 'br']);
    expect(css.headers['content-type']).toMatch(/^text\/css/);
    const tiny = await rawGet(TINY, 'br');
    expect(tiny.headers['content-encoding']).toBeUndefined();
    expect(tiny.body.toString()).toBe('console.log(1);');
  });

  it('still answers a page address with the app, never cached', async () => {
    for (const url of ['/', '/checks']) {
      const res = await request(app).get(url).set('Accept', 'text/html').set('Accept-Encoding', 'identity');
      expect(res.status).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/html/);
      expect(res.headers['cache-control']).toBe('no-cache');
      expect(res.text).toContain('shell for tests');
    }
  });
});
