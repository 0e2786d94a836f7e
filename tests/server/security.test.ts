/**
 * The security review pass (issue 13, item 7), on the real app and a real MariaDB:
 *  - the Markdown sanitiser on the XSS payload list (tests/fixtures/xss-payloads.ts): no element,
 *    attribute or address in its output can run script;
 *  - every address a user supplies (a citation's URL and DOI, where a sighting was seen) is taken
 *    only as http(s) or a DOI: anything else is a 400 naming the field;
 *  - attachment keys: the store refuses traversal (../, encoded forms, absolute paths, NUL bytes),
 *    and the routes that take a number or a file name never make a path of it;
 *  - the audit log is append-only in the database itself (migration 0008's triggers);
 *  - no stack trace, file path or SQL in any answer, even when the database is gone.
 * Session fixation and cookie flags are in sessions.test.ts, CSRF on every route in csrf.test.ts,
 * the same payloads rendered in Chromium in tests/browser/security.test.ts.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Express } from 'express';
import { fromHtml } from 'hast-util-from-html';
import { QueryTypes, type Sequelize } from 'sequelize';
import request from 'supertest';
import type * as AppModule from '../../server/app';
import type * as DbModule from '../support/db';
import { citationSchema, isWebAddress } from '../../shared/entries/schema';
import { parseCitations } from '../../shared/entries/citations';
import { boundEmphasis, MAX_EMPHASIS_RUNS, renderMarkdown } from '../../shared/markdown';
import { AuditEvent } from '../../server/models';
import { InvalidKeyError, LocalStore, newAttachmentKey } from '../../server/storage';
import { minimalPdf } from '../fixtures/files/samples';
import { XSS_PAYLOADS, payloadText } from '../fixtures/xss-payloads';
import { dropDatabase } from '../../server/db/mariadb';
import { demo, startTestApp, type TestApp } from '../support/app';
import { testDbEnv } from '../support/db';

jest.setTimeout(120_000);

let h: TestApp;
beforeAll(async () => {
  h = await startTestApp({ taxonomy: true });
});
afterAll(() => h?.close());

// ---- what in a piece of HTML could run script ---------------------------------------------------

/** Tags that run, load or submit something, none of which the sanitiser may let through. */
const FORBIDDEN_TAGS = new Set(['script', 'iframe', 'frame', 'frameset', 'object', 'embed', 'applet', 'style', 'meta', 'link', 'base', 'form', 'input', 'button', 'textarea', 'select']);
const URL_ATTRIBUTES = new Set(['href', 'src', 'action', 'formAction', 'data', 'xLinkHref', 'poster', 'background', 'cite', 'srcSet']);

/**
 * An address is harmless when it is http(s) or mailto, or has no scheme at all (a fragment, a relative
 * path). Browsers drop spaces and control characters before reading a scheme, so those go first.
 */
function harmlessAddress(v: string): boolean {
  const s = v.replace(/[\u0000-\u0020]/g, '');
  if (/^(https?|mailto):/i.test(s)) return true;
  return !/^[a-z][a-z0-9+.-]*:/i.test(s) && !s.startsWith('//');
}

type HastNode = { type: string; tagName?: string; properties?: Record<string, unknown>; children?: HastNode[] };

/** What in `html` could run script: forbidden elements, event-handler attributes, unsafe addresses or styles. */
function unsafeParts(html: string): string[] {
  const found: string[] = [];
  const walk = (node: HastNode) => {
    if (node.type === 'element') {
      const tag = node.tagName!;
      if (FORBIDDEN_TAGS.has(tag)) found.push(`<${tag}>`);
      for (const [name, raw] of Object.entries(node.properties ?? {})) {
        const value = Array.isArray(raw) ? raw.join(' ') : String(raw);
        if (/^on/i.test(name)) found.push(`${tag}[${name}]`);
        if (name === 'srcDoc') found.push(`${tag}[srcdoc]`);
        if (URL_ATTRIBUTES.has(name) && !harmlessAddress(value)) found.push(`${tag}[${name}=${value}]`);
        if (name === 'style' && /expression\s*\(|url\s*\(|javascript:|@import/i.test(value)) found.push(`${tag}[style=${value}]`);
      }
    }
    for (const child of node.children ?? []) walk(child);
  };
  walk(fromHtml(html, { fragment: true }) as HastNode);
  return found;
}

describe('the inspector itself (so that a clean result means something)', () => {
  it('finds what a payload would do if it were put into a page unsanitised', () => {
    // Raw payloads, not rendered: most of them must be caught, else the checks below prove nothing.
    const caught = XSS_PAYLOADS.filter((p) => unsafeParts(p).length > 0);
    expect(caught.length).toBeGreaterThanOrEqual(24);
    expect(unsafeParts('<a href="javascript:x()">a</a>')).toEqual(['a[href=javascript:x()]']);
    expect(unsafeParts('<p><a href="https://example.org/a">a</a> <a href="#x">b</a></p>')).toEqual([]);
  });
});

describe('the Markdown sanitiser (shared/markdown.ts) on the XSS payload list', () => {
  it.each(XSS_PAYLOADS.map((p, i) => [i, p]))('payload %i renders to nothing that can run: %s', (_i, payload) => {
    const html = renderMarkdown(payload as string);
    expect(unsafeParts(html)).toEqual([]);
    // What looks like a tag is either dropped or shown as text (escaped), never markup.
    expect(html).not.toMatch(/<(script|iframe|object|svg|style|img[^>]*\son)|href="\s*(javascript|data|vbscript):/i);
  });

  it('keeps the text around the payloads, and real links', () => {
    const html = renderMarkdown(`${payloadText('xss-marker')}\n\n[a source](https://example.org/paper)`);
    expect(unsafeParts(html)).toEqual([]);
    for (let i = 0; i < XSS_PAYLOADS.length; i++) expect(html).toContain(`xss-marker-${i}`);
    expect(html).toContain('<a href="https://example.org/paper">a source</a>');
  });

  it('bounds emphasis: past MAX_EMPHASIS_RUNS runs in a paragraph the rest are literal characters', () => {
    // Resolving emphasis is quadratic in a paragraph's runs: this text took about 15 s to render on two
    // cores before the bound (measured once by hand; speed itself is for `npm run bench`, not a test).
    const text = `${'*a '.repeat(3000)}x${' a*'.repeat(3000)}`;
    const bounded = boundEmphasis(text);
    const unescaped = (t: string) => (t.replace(/\\[*_]/g, '').match(/\*+|_+/g) ?? []).length;
    expect(unescaped(text)).toBe(6000);
    expect(unescaped(bounded)).toBe(MAX_EMPHASIS_RUNS);
    expect(renderMarkdown(text)).toContain(' x ');
    // Per paragraph: two paragraphs of 150 runs each are left as they are, and so is ordinary text.
    const two = `${'*b* '.repeat(75)}\n\n${'_c_ '.repeat(75)}`;
    expect(boundEmphasis(two)).toBe(two);
    expect(renderMarkdown('a *b* and **c** and _d_')).toBe('<p>a <em>b</em> and <strong>c</strong> and <em>d</em></p>');
    // List markers, code spans and math are not touched.
    const list = `${'- x\n'.repeat(3)}${'* item\n'.repeat(3)}\`*code*\` $a_1 b_2$ ${'*y* '.repeat(MAX_EMPHASIS_RUNS)}`;
    expect(boundEmphasis(list)).toContain('`*code*` $a_1 b_2$');
    expect(boundEmphasis(list).startsWith('- x\n- x\n- x\n* item\n* item\n* item\n')).toBe(true);
  });
});

// ---- addresses -----------------------------------------------------------------------------------

/** Addresses that are not http(s): each must be refused wherever a user types an address. */
const BAD_ADDRESSES = [
  'javascript:alert(1)',
  'JaVaScRiPt:alert(1)',
  ' javascript:alert(1)',
  'java\tscript:alert(1)',
  'javascript://example.org/%0aalert(1)',
  'vbscript:msgbox(1)',
  'data:text/html;base64,PHNjcmlwdD5hbGVydCgxKTwvc2NyaXB0Pg==',
  'file:///etc/passwd',
  'ftp://files.example.org/paper.pdf',
  'mailto:someone@example.org',
  '//example.org/protocol-relative',
  'example.org/no-scheme',
  'http://',
];

describe('addresses users supply', () => {
  it('isWebAddress takes http(s) addresses with a host and nothing else', () => {
    expect(isWebAddress('https://example.org/a?b=c#d')).toBe(true);
    expect(isWebAddress('http://192.0.2.7:8080/x')).toBe(true);
    for (const bad of BAD_ADDRESSES) expect([bad, isWebAddress(bad)]).toEqual([bad, false]);
  });

  it("a citation's URL must be http(s) and its DOI a DOI (the schema every path uses)", () => {
    const item = (extra: object) => ({ csl: { id: 'a', type: 'book', title: 'A book', ...extra }, note: '' });
    expect(citationSchema.safeParse(item({ URL: 'https://example.org/book' })).success).toBe(true);
    // DOI Handbook form; a resolver address or "doi:" in front is kept bare.
    expect(citationSchema.parse(item({ DOI: '10.1103/PhysRevLett.78.5' })).csl.DOI).toBe('10.1103/PhysRevLett.78.5');
    expect(citationSchema.parse(item({ DOI: 'https://doi.org/10.1063/1.1736034' })).csl.DOI).toBe('10.1063/1.1736034');
    expect(citationSchema.parse(item({ DOI: 'doi:10.1007/BF02084158' })).csl.DOI).toBe('10.1007/BF02084158');
    for (const bad of BAD_ADDRESSES) {
      const r = citationSchema.safeParse(item({ URL: bad }));
      expect([bad, r.success, r.error?.issues[0].path.join('.')]).toEqual([bad, false, 'csl.URL']);
    }
    for (const bad of ['javascript:alert(1)', 'data:,x', '11.1234/x', '10.12/x', '10.1234', '10.1234/with space']) {
      const r = citationSchema.safeParse(item({ DOI: bad }));
      expect([bad, r.success, r.error?.issues[0].path.join('.')]).toEqual([bad, false, 'csl.DOI']);
    }
  });

  it('pasted BibTeX with a javascript: url is reported, not taken', () => {
    const parsed = parseCitations('@book{bad, title = {A book}, year = 2000, url = {javascript:alert(1)}}\n@book{good, title = {Another book}, year = 2001, url = {https://example.org/b}}');
    expect(parsed.items.map((i) => i.csl.title)).toEqual(['Another book']);
    expect(parsed.problems).toEqual([expect.objectContaining({ index: 0, reason: expect.stringMatching(/URL|http/) })]);
  });

  it('a draft whose source has such a URL or DOI is refused with a 400 naming the field', async () => {
    const editor = await h.signedIn(demo.editor.email);
    const classes = (await request(h.app).get('/api/taxonomy').expect(200)).body.classes;
    const content = (csl: object) => ({ title: 'Address check draft', mechanismClass: classes[0].slug, laws: [], sources: [{ csl: { id: 's1', type: 'book', title: 'A book', ...csl }, note: '' }] });
    const created = await editor.post('/api/drafts', { slug: 'address-check-draft', content: content({ URL: 'https://example.org/book', DOI: '10.1234/abc' }) }).expect(201);
    const id = created.body.draft.id;
    for (const bad of BAD_ADDRESSES) {
      const res = await editor.put(`/api/drafts/${id}`, { content: content({ URL: bad }), lockVersion: created.body.draft.lockVersion });
      expect([bad, res.status, Object.keys(res.body.error?.fields ?? {})]).toEqual([bad, 400, ['body.content.sources.0.csl.URL']]);
    }
    const res = await editor.put(`/api/drafts/${id}`, { content: content({ DOI: 'javascript:alert(1)' }), lockVersion: created.body.draft.lockVersion });
    expect([res.status, Object.keys(res.body.error.fields)]).toEqual([400, ['body.content.sources.0.csl.DOI']]);
    expect((await editor.post('/api/drafts', { slug: 'address-check-two', content: content({ URL: 'data:text/html,x' }) })).status).toBe(400);
  });

  it('a sighting seen at such an address is refused with a 400 naming body.seenAtUrl', async () => {
    const c = await h.signedIn(demo.contributor.email);
    const sighting = (seenAtUrl: string) => ({ title: 'Address check', seenAtUrl, summary: 'Invented test data: a sealed box said to push itself.' });
    for (const bad of BAD_ADDRESSES) {
      const res = await c.post('/api/sightings', sighting(bad));
      expect([bad, res.status, Object.keys(res.body.error?.fields ?? {})]).toEqual([bad, 400, ['body.seenAtUrl']]);
    }
    await c.post('/api/sightings', sighting('https://pitch.example.org/deck')).expect(201);
  });
});

// ---- attachment keys -----------------------------------------------------------------------------

const TRAVERSALS = [
  '../outside',
  '../../etc/passwd',
  'attachments/../../outside',
  'attachments/2026/01/../../../../outside',
  '..%2f..%2foutside',
  '%2e%2e%2f%2e%2e%2foutside',
  '%2e%2e/outside',
  '..\\..\\outside',
  '/etc/passwd',
  '/tmp/outside',
  'C:\\Windows\\win.ini',
  'attachments/x\u0000.png',
  '\u0000',
  'attachments//x',
  'attachments/./x',
  'attachments/x/',
  'attachments/x.meta.json',
  '',
];

describe('attachment keys', () => {
  let root: string;
  let store: LocalStore;
  beforeAll(() => {
    root = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-keys-'));
    fs.mkdirSync(path.join(root, 'store'));
    store = new LocalStore(path.join(root, 'store'));
  });
  afterAll(() => fs.rmSync(root, { recursive: true, force: true }));

  it.each(TRAVERSALS.map((k) => [JSON.stringify(k), k]))('the store refuses %s for every operation, and writes nothing', async (_shown, key) => {
    const meta = { contentType: 'application/pdf', sha256: 'a'.repeat(64) };
    await expect(store.put(key, Buffer.from('x'), meta)).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.get(key)).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.exists(key)).rejects.toBeInstanceOf(InvalidKeyError);
    await expect(store.delete(key)).rejects.toBeInstanceOf(InvalidKeyError);
    const putFile = (store as unknown as { putFile?: (k: string, f: string, m: object) => Promise<void> }).putFile;
    if (putFile) {
      const src = path.join(root, 'src.bin');
      fs.writeFileSync(src, 'x');
      await expect(putFile.call(store, key, src, meta)).rejects.toBeInstanceOf(InvalidKeyError);
    }
    expect(fs.readdirSync(root).sort()).toEqual(expect.arrayContaining(['store']));
    expect(fs.readdirSync(root).filter((n) => n !== 'store' && n !== 'src.bin')).toEqual([]);
    expect(fs.readdirSync(path.join(root, 'store'))).toEqual([]);
  });

  it('takes the keys it makes', async () => {
    const key = newAttachmentKey();
    const body = Buffer.from('%PDF-1.4\n');
    const sha256 = crypto.createHash('sha256').update(body).digest('hex');
    await store.put(key, body, { contentType: 'application/pdf', sha256 });
    expect(await store.exists(key)).toBe(true);
    await store.delete(key);
  });

  it('the download route takes a number only: traversal in its parameter is a 400 or 404, never a file', async () => {
    const c = await h.signedIn(demo.admin.email);
    for (const p of ['..%2f..%2fetc%2fpasswd', '%2e%2e%2f%2e%2e%2fetc%2fpasswd', '1%00', '%2fetc%2fpasswd', '1.meta.json', '..']) {
      const res = await c.get(`/api/attachments/${p}`);
      expect([p, res.status < 500, res.status === 200]).toEqual([p, true, false]);
      expect(res.headers['content-type']).toMatch(/json/);
    }
  });

  it("a file's name is only shown: one named like a path is stored under a random key and sent back as a plain name", async () => {
    const c = await h.signedIn(demo.contributor.email);
    const names = ['../../../../../tmp/cw-escape.pdf', '/etc/cw-absolute.pdf', '..\\..\\cw-back.pdf', 'quote"; filename=evil.exe.pdf'];
    const req = c.agent
      .post('/api/sightings')
      .set('X-CSRF-Token', c.csrf)
      .field('title', 'File name check')
      .field('seenAtCitation', 'Invented Newsletter, issue 3 (2026)')
      .field('summary', 'Invented test data: file names that look like paths.');
    for (const name of names) req.attach('files', minimalPdf(), { filename: name, contentType: 'application/pdf' });
    const res = await req;
    expect(res.status).toBe(201);
    const attachments = res.body.submission.attachments as { id: number; name: string }[];
    expect(attachments).toHaveLength(names.length);
    for (const a of attachments) {
      expect(a.name).not.toMatch(/[/\\\u0000]/);
      expect(a.name).not.toMatch(/^\.\.?$/);
    }
    expect(fs.existsSync('/tmp/cw-escape.pdf')).toBe(false);
    expect(fs.existsSync('/etc/cw-absolute.pdf')).toBe(false);
    const rows = await h.t.sequelize.query<{ k: string }>('SELECT storage_key AS k FROM attachments WHERE submission_id = ?', {
      replacements: [res.body.submission.id],
      type: QueryTypes.SELECT,
    });
    for (const r of rows) expect(r.k).toMatch(/^attachments\/\d{4}\/\d{2}\/[0-9a-f]{32}$/);
    // Downloaded by the moderator: Content-Disposition carries a plain name, quoted, with nothing that breaks out.
    const mod = await h.signedIn(demo.moderator.email);
    const dl = await mod.get(`/api/attachments/${attachments[0].id}`).expect(200);
    expect(dl.headers['content-disposition']).toMatch(/^attachment; filename="[^"\\/]*"; filename\*=UTF-8''[^"\s]*$/);
  });
});

// ---- the audit log -----------------------------------------------------------------------------

describe('the audit log, append-only in the database', () => {
  const db = () => h.t.sequelize;

  it('has the two triggers of migration 0008', async () => {
    const rows = await db().query<{ name: string; event: string; timing: string }>(
      "SELECT trigger_name AS name, event_manipulation AS event, action_timing AS timing FROM information_schema.triggers WHERE trigger_schema = DATABASE() AND event_object_table = 'audit_events' ORDER BY trigger_name",
      { type: QueryTypes.SELECT },
    );
    expect(rows).toEqual([
      { name: 'audit_events_no_delete', event: 'DELETE', timing: 'BEFORE' },
      { name: 'audit_events_no_update', event: 'UPDATE', timing: 'BEFORE' },
    ]);
  });

  it('refuses UPDATE, DELETE, REPLACE and upserts sent as plain SQL (past the model hooks), and keeps the row', async () => {
    // A real audited action: an admin changes a role.
    const admin = await h.signedIn(demo.admin.email);
    const users = (await admin.get('/api/admin/users').expect(200)).body.users as { id: number; email: string }[];
    const target = users.find((u) => u.email === demo.contributor.email)!;
    await admin.patch(`/api/admin/users/${target.id}/role`, { role: 'contributor' });
    const count = async () => (await db().query<{ n: number }>('SELECT COUNT(*) AS n FROM audit_events', { type: QueryTypes.SELECT }))[0].n;
    await db().query("INSERT INTO audit_events (actor_id, action, subject_type, subject_id, created_at) VALUES (NULL, 'test.inserted', 'test', '1', NOW())");
    const [row] = await db().query<{ id: number; action: string }>("SELECT id, action FROM audit_events WHERE action = 'test.inserted'", { type: QueryTypes.SELECT });
    const before = Number(await count());
    expect(before).toBeGreaterThanOrEqual(2);
    const refused = /append-only/;
    await expect(db().query("UPDATE audit_events SET action = 'test.changed' WHERE id = ?", { replacements: [row.id] })).rejects.toThrow(refused);
    await expect(db().query('UPDATE audit_events SET subject_id = subject_id')).rejects.toThrow(refused);
    await expect(db().query('DELETE FROM audit_events WHERE id = ?', { replacements: [row.id] })).rejects.toThrow(refused);
    await expect(db().query('DELETE FROM audit_events')).rejects.toThrow(refused);
    await expect(db().query("REPLACE INTO audit_events (id, action, subject_type, subject_id, created_at) VALUES (?, 'test.replaced', 'test', '1', NOW())", { replacements: [row.id] })).rejects.toThrow(refused);
    await expect(
      db().query("INSERT INTO audit_events (id, action, subject_type, subject_id, created_at) VALUES (?, 'x', 'test', '1', NOW()) ON DUPLICATE KEY UPDATE action = 'test.upserted'", { replacements: [row.id] }),
    ).rejects.toThrow(refused);
    expect(Number(await count())).toBe(before);
    const [again] = await db().query<{ action: string }>('SELECT action FROM audit_events WHERE id = ?', { replacements: [row.id], type: QueryTypes.SELECT });
    expect(again.action).toBe('test.inserted');
    // The model refuses too, before any SQL.
    await expect(AuditEvent.update({ action: 'x' }, { where: { id: row.id } })).rejects.toThrow(refused);
  });
});

// ---- no internals in any answer --------------------------------------------------------------

/**
 * Things an answer must never show: a stack frame, a source path, SQL, the ORM's or the driver's
 * words. (Domain text such as the check kit's may say "at 300 K (…)", so a frame needs its :line:col.)
 */
const INTERNALS = [
  /\bat [\w$.<>[\] ]+ \([^)]*:\d+:\d+\)/, // a stack frame
  /\.(ts|tsx|js|mjs|cjs):\d+/, // a source position
  /\/work\/|\/home\/|\/root\/|node_modules/, // a file path
  /\bSELECT\b[^"]*\bFROM\b|\bINSERT INTO\b|\bDELETE FROM\b|\bUPDATE `?\w+`? SET\b|\bCREATE TABLE\b|`\w+`\.`\w+`/i, // SQL
  /Sequelize\w*(Error)?|\bER_[A-Z_]{3,}|sqlState|\berrno\b|ECONNREFUSED|\(conn[:=]|mariadb|ConnectionManager/i, // the ORM and the driver
  /"stack"\s*:/, // a serialised error
];
const internalsIn = (text: string) => INTERNALS.filter((re) => re.test(text)).map((re) => `${re} in ${text.slice(0, 300)}`);

/** Concrete paths for every route of an app: parameters filled with values that exist or look right. */
function routesOf(app: Express): { method: string; path: string }[] {
  const found: { method: string; path: string }[] = [];
  type Layer = { route?: { path: string; methods: Record<string, boolean> }; handle: { stack?: Layer[] }; rawPath?: unknown };
  const walk = (stack: Layer[], prefix: string) => {
    for (const layer of stack) {
      if (layer.route) {
        for (const m of Object.keys(layer.route.methods).filter((k) => layer.route!.methods[k] && k !== '_all')) found.push({ method: m, path: prefix + String(layer.route.path) });
      } else if (Array.isArray(layer.handle?.stack)) {
        walk(layer.handle.stack, prefix + (typeof layer.rawPath === 'string' && layer.rawPath !== '/' ? layer.rawPath : ''));
      }
    }
  };
  walk((app as unknown as { router: { stack: Layer[] } }).router.stack, '');
  const fill: Record<string, string> = { id: '1', slug: 'perpetual-motion', n: '1', check: 'carnot', name: 'carnot', token: 'A'.repeat(32) };
  return found.filter((r) => r.path.startsWith('/api/')).map((r) => ({ method: r.method, path: r.path.replace(/:(\w+)/g, (_m, p: string) => fill[p] ?? 'x') }));
}

const dbName = (sequelize: Sequelize) => sequelize.getDatabaseName();

describe('no internals in any answer', () => {
  /** An app of its own (its own copy of every server module) on a database given by `make`. */
  async function isolatedApp(make: (db: typeof DbModule) => Promise<{ sequelize: Sequelize; drop: () => Promise<void> }>) {
    let createApp!: typeof AppModule.createApp;
    let dbModule!: typeof DbModule;
    jest.isolateModules(() => {
      createApp = (require('../../server/app') as typeof AppModule).createApp;
      dbModule = require('../support/db') as typeof DbModule;
    });
    const { sequelize, drop } = await make(dbModule);
    const app = createApp({ sequelize, version: 'test', env: 'test', sessionCleanupMs: 0, searchRefreshMs: 0 });
    return { app, sequelize, drop };
  }

  async function sweep(app: Express, cookie?: string) {
    const statuses: number[] = [];
    for (const r of routesOf(app)) {
      let req = (request(app) as unknown as Record<string, (p: string) => request.Test>)[r.method](r.path).set('X-CSRF-Token', 'x'.repeat(43));
      if (cookie) req = req.set('Cookie', cookie);
      const res = r.method === 'get' ? await req : await req.send({ text: 'A sealed box said to push itself with 2 mN from 1 kW.', inputs: {} });
      const shown = `${JSON.stringify(res.headers)}\n${res.text}`;
      expect([r.method, r.path, internalsIn(res.text)]).toEqual([r.method, r.path, []]);
      expect(shown).not.toMatch(/x-powered-by/i);
      // Every error is in our shape (the health check answers 503 in its own, for load balancers).
      if (res.status >= 400 && r.path !== '/api/health') expect([r.method, r.path, res.body?.error?.code]).toEqual([r.method, r.path, expect.any(String)]);
      statuses.push(res.status);
    }
    return statuses;
  }

  it('when the tables are missing (every query fails with SQL in its error): 500 or 503 in our words, nothing more', async () => {
    const { app, sequelize, drop } = await isolatedApp((db) => db.createTestDatabase({ migrate: false }));
    try {
      const statuses = await sweep(app);
      expect(statuses.filter((s) => s >= 500).length).toBeGreaterThanOrEqual(10);
      const res = await request(app).get('/api/entries');
      expect(res.status).toBe(500);
      expect(res.body).toEqual({ error: { code: 'internal', message: expect.any(String) } });
    } finally {
      await (app.locals as unknown as AppModule.AppLocals).close();
      void sequelize;
      await drop();
    }
  });

  it('when the connection pool is closed (a database that has gone away)', async () => {
    const { app, sequelize, drop } = await isolatedApp((db) => db.createTestDatabase({ migrate: false }));
    await sequelize.close();
    try {
      const statuses = await sweep(app);
      expect(statuses.filter((s) => s >= 500).length).toBeGreaterThanOrEqual(5);
    } finally {
      await (app.locals as unknown as AppModule.AppLocals).close();
      // drop() would close the pool again: the database is dropped through the socket instead.
      await dropDatabase(testDbEnv().socket, { database: dbName(sequelize), user: dbName(sequelize) });
      void drop;
    }
  });

  it('the regular app answers bad requests without internals either', async () => {
    for (const [method, url, body] of [
      ['post', '/api/auth/sign-in', '{"email":'],
      ['get', '/api/entries/%ff%fe', undefined],
      ['get', '/api/search?q=' + 'x'.repeat(5000), undefined],
      ['put', '/api/drafts/abc', '[]'],
      ['post', '/api/checks/carnot', '{"inputs":{"Th":"1 kg"}}'],
    ] as const) {
      const c = await h.client();
      const res = method === 'get' ? await c.get(url) : await c.send(method, url).set('Content-Type', 'application/json').send(body);
      expect([url, res.status < 500, internalsIn(res.text)]).toEqual([url, true, []]);
    }
  });
});
