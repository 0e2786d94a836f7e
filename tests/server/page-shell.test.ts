/**
 * The page the server sends before any script runs (server/http/page-shell.ts): an entry page and
 * the Library carry their content in #cw-shell, rendered by the one Markdown pipeline and escaped;
 * other pages the plain template. The fonts (scripts/web-fonts.ts): the page preloads WOFF2 files
 * that answer 200 as font/woff2, and public/ holds exactly the subsets of the installed packages.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { JSDOM } from 'jsdom';
import request from 'supertest';
import { ROOT } from '../../server/config';
import { fontBlock, fontFiles } from '../../scripts/web-fonts';
import { demo, startTestApp, type TestApp } from '../support/app';
import { publishNewEntry } from '../support/workflow';

jest.setTimeout(120_000);

const HOSTILE_TITLE = '<script>window.__x=1</script> & "wheels" $&';
const HOSTILE_WHY = 'Gravity is conservative. <script>window.__y=1</script> <img src="x" onerror="window.__z=1"> [a link](javascript:alert(1)) *after* all.';

let site: TestApp;
let dir: string;
beforeAll(async () => {
  // A static directory like dist/: the page template (Expo writes the title in place of %WEB_TITLE%) and the fonts.
  dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-shell-'));
  fs.writeFileSync(path.join(dir, 'index.html'), fs.readFileSync(path.join(ROOT, 'public', 'index.html'), 'utf8').replace('%WEB_TITLE%', 'Counterweight'));
  fs.cpSync(path.join(ROOT, 'public', 'fonts'), path.join(dir, 'fonts'), { recursive: true });
  site = await startTestApp({ taxonomy: true, publicUrl: 'https://counterweight.example.org', staticDir: dir });
  const a = await site.signedIn(demo.editor.email);
  const r = await site.signedIn(demo.editor2.email);
  await publishNewEntry(a, r, 'shell-wheel', {
    title: 'Wheels that turn for ever',
    mechanismClass: 'overbalanced-wheel',
    laws: ['energy'],
    inBrief: 'A wheel that *turns forever* gains nothing, since $\\oint F\\,ds = 0$ round a closed path.',
    howItIsPitched: 'Hinged arms.',
    whyItFails: 'Gravity is conservative.',
  });
  await publishNewEntry(a, r, 'shell-hostile', {
    title: HOSTILE_TITLE,
    mechanismClass: 'overbalanced-wheel',
    laws: ['energy'],
    inBrief: 'Ends </div></main><script>window.__w=1</script> here.',
    howItIsPitched: 'Hinged arms.',
    whyItFails: HOSTILE_WHY,
  });
});
afterAll(async () => {
  await site?.close();
  if (dir) fs.rmSync(dir, { recursive: true, force: true });
});

const page = async (p: string) => {
  const res = await request(site.app).get(p).set('Accept', 'text/html').expect(200);
  expect(res.headers['content-type']).toMatch(/^text\/html/);
  return { text: res.text, doc: new JSDOM(res.text).window.document };
};

describe('the first paint', () => {
  it('carries an entry’s title, version and sections, math set by KaTeX', async () => {
    const { doc } = await page('/entries/shell-wheel');
    const shell = doc.querySelector('#cw-shell')!;
    expect(shell.querySelector('h1')!.textContent).toBe('Wheels that turn for ever');
    expect([...shell.querySelectorAll('h2')].map((h2) => h2.textContent)).toEqual(['In brief', 'How it is pitched', 'Why it fails', 'Sources']);
    const brief = shell.querySelector('#section-inBrief')!;
    expect(brief.querySelector('em')!.textContent).toBe('turns forever');
    expect(brief.querySelector('.katex annotation')!.textContent).toBe('\\oint F\\,ds = 0');
    expect(shell.textContent).toMatch(/Version 1, published \d{1,2} \w+ \d{4} · written by /);
    // The app's root is still empty: the app mounts into it as before.
    expect(doc.querySelector('#root')!.childNodes.length).toBe(0);
    // A pinned version says so and links to the latest.
    const v1 = (await page('/entries/shell-wheel/v/1')).doc.querySelector('#cw-shell')!;
    expect(v1.querySelector('a[href="/entries/shell-wheel"]')!.textContent).toBe('Read the latest version');
  });

  it('keeps what the entry says inert: escaped text, sanitised Markdown, no script', async () => {
    const { text, doc } = await page('/entries/shell-hostile');
    expect(doc.querySelectorAll('script').length).toBe(0);
    expect(text).not.toMatch(/<script|<img|onerror|javascript:/i);
    const shell = doc.querySelector('#cw-shell')!;
    expect(shell.querySelector('h1')!.textContent).toBe(HOSTILE_TITLE);
    expect(shell.querySelector('#section-inBrief')!.textContent).toContain('here.');
    const why = shell.querySelector('#section-whyItFails')!;
    expect(why.textContent).toContain('Gravity is conservative.');
    expect(why.querySelector('em')!.textContent).toBe('after');
    // The page's frame is whole: the footer follows the page, the hostile brief closed nothing.
    expect(doc.querySelector('#cw-shell .cw-footer')).not.toBeNull();
    expect(doc.querySelectorAll('main').length).toBe(1);
  });

  it('says when an entry is retired, as the app does', async () => {
    const a = await site.signedIn(demo.editor.email);
    const r = await site.signedIn(demo.editor2.email);
    await publishNewEntry(a, r, 'shell-retired', {
      title: 'Wheels retired for good',
      mechanismClass: 'overbalanced-wheel',
      laws: ['energy'],
      inBrief: 'Retired.',
      howItIsPitched: 'Hinged arms.',
      whyItFails: 'Gravity is conservative.',
    });
    expect((await a.post('/api/entries/shell-retired/retire', { reason: 'Folded into <b>another</b>.' })).status).toBe(200);
    const shell = (await page('/entries/shell-retired')).doc.querySelector('#cw-shell')!;
    expect(shell.textContent).toContain('This entry is retired.Folded into <b>another</b>. It stays here, and citable, as it was.');
    expect(shell.querySelector('b')).toBeNull();
  });

  it('lists the published entries on the Library, escaped', async () => {
    const { doc } = await page('/');
    const links = [...doc.querySelectorAll('#cw-shell .cw-entries a')].map((a) => [a.getAttribute('href'), a.textContent]);
    expect(links).toEqual(
      expect.arrayContaining([
        ['/entries/shell-wheel', 'Wheels that turn for ever'],
        ['/entries/shell-hostile', HOSTILE_TITLE],
      ]),
    );
    expect(doc.querySelectorAll('script').length).toBe(0);
    expect(doc.querySelector('#cw-shell')!.textContent).toMatch(/\d+ entries published/);
  });

  it('sends the plain template, with its skeleton, for other pages and for entries that do not exist', async () => {
    const template = fs.readFileSync(path.join(dir, 'index.html'), 'utf8');
    for (const p of ['/checks', '/desk', '/entries/no-such-entry', '/entries/shell-wheel/v/9']) {
      const { text } = await page(p);
      expect([p, text]).toEqual([p, template]);
    }
    expect(template).toContain('class="cw-skeleton"');
  });
});

describe('the web fonts', () => {
  it('preloads WOFF2 files that answer as font/woff2', async () => {
    const { doc } = await page('/entries/shell-wheel');
    const preloads = [...doc.querySelectorAll('link[rel="preload"][as="font"]')];
    expect(preloads.length).toBeGreaterThanOrEqual(3);
    for (const link of preloads) {
      expect([link.getAttribute('type'), link.hasAttribute('crossorigin')]).toEqual(['font/woff2', true]);
      const res = await request(site.app).get(link.getAttribute('href')!).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (c: Buffer) => chunks.push(c));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect([link.getAttribute('href'), res.status, res.headers['content-type']]).toEqual([link.getAttribute('href'), 200, 'font/woff2']);
      // The WOFF2 signature, "wOF2" (W3C WOFF File Format 2.0, §3 "WOFF2 Header": signature 0x774F4632).
      expect((res.body as Buffer).subarray(0, 4).toString('latin1')).toBe('wOF2');
      // The names carry a hash of the content, so a browser may keep them for a year.
      expect(res.headers['cache-control']).toBe('public, max-age=31536000, immutable');
    }
    // Every @font-face shows text in a system font until it loads.
    const faces = doc.querySelector('#cw-fonts')!.textContent!.match(/@font-face\{[^}]*\}/g)!;
    expect(faces.length).toBe(14);
    for (const f of faces) expect(f).toContain('font-display:swap');
  });

  it('ships exactly the subsets of the installed @fontsource packages (run scripts/web-fonts.ts after an update)', () => {
    const files = fontFiles(ROOT);
    const shipped = fs.readdirSync(path.join(ROOT, 'public', 'fonts')).sort();
    expect(shipped).toEqual(files.map((f) => f.name).sort());
    for (const f of files) expect(fs.readFileSync(path.join(ROOT, 'public', 'fonts', f.name)).equals(fs.readFileSync(f.source))).toBe(true);
    expect(fs.readFileSync(path.join(ROOT, 'public', 'index.html'), 'utf8')).toContain(fontBlock(files));
    // The math and unit symbols of the entries: µ, ×, ¹ in latin; Ω, Δ, η in greek (code points from The Unicode Standard's charts).
    const covers = (family: string, cp: number) =>
      files
        .filter((f) => f.family === family)
        .some((f) =>
          f.unicodeRange.split(',').some((r) => {
            const [a, b = a] = r.replace('U+', '').split('-');
            return cp >= parseInt(a, 16) && cp <= parseInt(b, 16);
          }),
        );
    for (const cp of [0x00b5, 0x00d7, 0x00b9, 0x03a9, 0x0394, 0x03b7]) expect([cp, covers('SourceSerif4_400Regular', cp)]).toEqual([cp, true]);
  });
});
