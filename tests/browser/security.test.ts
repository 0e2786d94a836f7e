/**
 * The security pass in Chromium (issue 13, item 7), against the real server and the built web app:
 *
 * 1. XSS: the payloads of tests/fixtures/xss-payloads.ts go through every Markdown and text field a
 *    page shows — an entry's title, aliases, sections, replies and answers, questions, cautions and
 *    sources (title, container, note, address); a sighting's title, citation ("where seen"), summary;
 *    a moderator's question and the submitter's reply; display names — published and decided through
 *    the API as editors and moderators would. Each page that shows them (the entry, the library, the
 *    submission as its submitter and as the moderator) must show the payloads' markers as text, fire
 *    no dialog, leave `window.__xss` undefined, and hold no element, event-handler attribute or
 *    javascript:/data: address that a payload brought. (The Content-Security-Policy would stop inline
 *    script anyway; the DOM checks are what prove the sanitising.)
 * 2. A wrong password: the sign-in screen says so, and our own code logs nothing to the console.
 *    Chromium itself logs every fetch answered 4xx as "Failed to load resource: the server responded
 *    with a status of 401" — the browser's network layer writes that line, page script cannot stop
 *    it, so it is the one console error allowed, and only for the sign-in request.
 * All texts are invented test data.
 */
import type { ConsoleMessage, Page } from 'playwright-core';
import request from 'supertest';
import { XSS_PAYLOADS, payloadText } from '../fixtures/xss-payloads';
import { demo } from '../support/app';
import { byTestId, settled, startHarness, signInQuickly, type Harness } from '../support/browser';

jest.setTimeout(300_000);

// The demo accounts of content/demo/accounts.yml.
const password = demo.password;
const accounts = {
  editor: demo.editor.email,
  editor2: demo.editor2.email,
  moderator: demo.moderator.email,
  contributor: demo.contributor.email,
};

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

/** A signed-in API client on the harness's server (cookie jar and CSRF token, as the web app keeps them). */
async function api(email: string) {
  const agent = request.agent(h.base);
  const csrf = (await agent.get('/api/session').expect(200)).body.csrfToken as string;
  const send = (method: 'post' | 'put' | 'patch', path: string, body: object) => agent[method](path).set('X-CSRF-Token', csrf).send(body);
  const res = await send('post', '/api/auth/sign-in', { email, password });
  if (res.status !== 200) throw new Error(`sign-in as ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return { agent, send };
}

const expectOk = (res: request.Response, status = 200) => {
  const sent = (res as unknown as { req?: { method?: string; path?: string } }).req;
  if (res.status !== status) throw new Error(`${sent?.method} ${sent?.path}: ${res.status} ${JSON.stringify(res.body).slice(0, 500)}`);
  return res;
};

const SLUG = 'xss-probe-entry';
const HALF = Math.ceil(XSS_PAYLOADS.length / 2);
/** Display names refuse < and >, so theirs are the attribute and URL kinds. */
const NAME_PAYLOAD = `Q" onfocus="window.__xss=1" x=' javascript:window.__xss=1 &#60;b&#62;`;
let sightingId = 0;

/** Publishes an entry whose every field carries payloads, and a sighting on it, decided after a question and a reply. */
async function seed() {
  const editor = await api(accounts.editor);
  const editor2 = await api(accounts.editor2);
  const moderator = await api(accounts.moderator);
  const contributor = await api(accounts.contributor);
  expectOk(await contributor.send('patch', '/api/account', { displayName: NAME_PAYLOAD }));
  expectOk(await moderator.send('patch', '/api/account', { displayName: `Mod ${NAME_PAYLOAD}`.slice(0, 80) }));

  const taxonomy = expectOk(await editor.agent.get('/api/taxonomy')).body;
  const few = XSS_PAYLOADS.slice(0, 6).join(' ');
  const content = {
    title: `XSS probe ${'<img src=x onerror=window.__xss=1>'}`,
    aliases: ['<script>window.__xss=1</script>', 'javascript:window.__xss=1'],
    mechanismClass: taxonomy.classes[0].slug,
    laws: [taxonomy.laws[0].slug],
    inBrief: `in-brief-marker ${XSS_PAYLOADS.slice(27, 34).join(' ')}`,
    howItIsPitched: payloadText('pitch-marker'),
    whyItFails: payloadText('why-marker'),
    whatFakesTheEffect: payloadText('mimic-marker'),
    // A reply is at most 2000 characters: the payloads in two halves.
    repliesAndAnswers: [
      { reply: payloadText('reply-marker', 0, HALF), answer: payloadText('answer-marker', 0, HALF) },
      { reply: payloadText('reply-marker', HALF), answer: payloadText('answer-marker', HALF) },
    ],
    questionsToAsk: XSS_PAYLOADS.slice(0, 10).map((p, i) => `question-marker-${i} ${p}`),
    cautions: payloadText('caution-marker'),
    sources: [
      {
        csl: {
          id: 'xss-source',
          type: 'article-journal',
          title: `source-title-marker ${few}`,
          'container-title': `container-marker ${XSS_PAYLOADS[16]}`,
          author: [{ family: '<svg onload=window.__xss=1>', given: 'A.' }],
          issued: { 'date-parts': [[2020]] },
          URL: 'https://example.org/paper?q=%3Cscript%3Ewindow.__xss=1%3C/script%3E',
        },
        note: `source-note-marker ${few}`,
      },
    ],
  };
  const draft = expectOk(await editor.send('post', '/api/drafts', { slug: SLUG, content }), 201).body.draft;
  const submitted = expectOk(await editor.send('post', `/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion })).body.draft;
  void submitted;
  expectOk(await editor2.send('post', `/api/drafts/${draft.id}/approve`, { changeNote: 'Invented test data for the security test.' }));

  const sighting = expectOk(
    await contributor.send('post', '/api/sightings', {
      title: `sighting-title-marker ${XSS_PAYLOADS[4]}`,
      seenAtUrl: 'https://pitch.example.org/deck?x=%22%3E%3Cscript%3E',
      seenAtCitation: `where-seen-marker ${XSS_PAYLOADS.slice(9, 15).join(' ')}`.slice(0, 1000),
      summary: payloadText('summary-marker'),
    }),
    201,
  ).body.submission;
  sightingId = sighting.id;
  expectOk(await moderator.send('post', `/api/submissions/${sightingId}/claim`, {}));
  expectOk(await moderator.send('post', `/api/submissions/${sightingId}/decide`, { decision: 'ask', note: `question-note-marker ${XSS_PAYLOADS.slice(0, 8).join(' ')}` }));
  expectOk(await contributor.send('post', `/api/submissions/${sightingId}/answer`, { message: payloadText('answer-note-marker') }));
  expectOk(await moderator.send('post', `/api/submissions/${sightingId}/claim`, {}));
  expectOk(await moderator.send('post', `/api/submissions/${sightingId}/decide`, { decision: 'accept', entries: [SLUG] }));
}

/** What on the page a payload could have brought: run in the page. */
function inspectPage(): { flag: unknown; problems: string[]; text: string } {
  const problems: string[] = [];
  const origin = location.origin;
  for (const el of Array.from(document.querySelectorAll('*'))) {
    const tag = el.tagName.toLowerCase();
    if (['iframe', 'frame', 'object', 'embed', 'applet', 'base'].includes(tag)) problems.push(`<${tag}>`);
    if (tag === 'meta' && el.getAttribute('http-equiv')) problems.push(`<meta http-equiv=${el.getAttribute('http-equiv')}>`);
    if (tag === 'script') {
      const src = el.getAttribute('src');
      // The app's own bundles only: same origin, with a src.
      if (!src || !new URL(src, location.href).href.startsWith(origin)) problems.push(`<script src=${src}>`);
    }
    if (tag === 'style' && /javascript:|expression\s*\(|@import/i.test(el.textContent ?? '')) problems.push('<style> with script');
    for (const attr of Array.from(el.attributes)) {
      const name = attr.name.toLowerCase();
      const value = attr.value.replace(/[\u0000-\u0020]/g, '');
      if (name.startsWith('on')) problems.push(`${tag}[${name}]`);
      if (name === 'srcdoc') problems.push(`${tag}[srcdoc]`);
      if (['href', 'src', 'action', 'formaction', 'xlink:href', 'data'].includes(name) && /^(javascript|vbscript):/i.test(value)) problems.push(`${tag}[${name}=${attr.value}]`);
      if (['href', 'action', 'formaction'].includes(name) && /^data:/i.test(value)) problems.push(`${tag}[${name}=data:…]`);
      if (name === 'style' && /expression\(|javascript:/i.test(value)) problems.push(`${tag}[style=${attr.value}]`);
    }
  }
  return { flag: (window as unknown as Record<string, unknown>).__xss, problems, text: document.body.innerText };
}

async function openWatched(): Promise<Page & { problems: string[]; dialogs: string[] }> {
  const page = (await h.open(1280, 900)) as Page & { problems: string[]; dialogs: string[] };
  page.dialogs = [];
  page.on('dialog', (d) => {
    page.dialogs.push(`${d.type()}: ${d.message()}`);
    void d.dismiss();
  });
  return page;
}

/** Waits for the page to settle, then runs the inspection and checks every marker is shown as text. */
async function expectClean(page: Page & { problems: string[]; dialogs: string[] }, markers: string[]) {
  // Wait until the page has settled (network idle, painted, queued handlers run), not for a fixed time.
  await settled(page);
  const seen = await page.evaluate(inspectPage);
  expect(seen.problems).toEqual([]);
  expect(seen.flag).toBeUndefined();
  expect(page.dialogs).toEqual([]);
  expect(page.problems).toEqual([]);
  for (const m of markers) expect([m, seen.text.includes(m)]).toEqual([m, true]);
  return seen;
}

const all = (marker: string) => XSS_PAYLOADS.map((_p, i) => `${marker}-${i}`);

it('shows every payload as text, runs none of them, on the entry, the library and the submission pages', async () => {
  await seed();

  // The published entry: its sections (Markdown rendered on the server), questions, sources and the accepted sighting.
  const page = await openWatched();
  await page.goto(`${h.base}/entries/${SLUG}`);
  await byTestId(page, 'screen-entry').waitFor();
  await page.getByText('pitch-marker-0', { exact: false }).first().waitFor();
  // The sightings and sources come with the entry's deferred part: wait for them, not for a time.
  await page.getByText('sighting-title-marker', { exact: false }).first().waitFor();
  const entry = await expectClean(page, [
    'in-brief-marker',
    ...all('pitch-marker'),
    ...all('why-marker'),
    ...all('mimic-marker'),
    ...all('reply-marker'),
    ...all('answer-marker'),
    ...all('caution-marker'),
    'question-marker-0',
    'question-marker-9',
    'source-title-marker',
    'source-note-marker',
    'sighting-title-marker',
  ]);
  // The payload text shows literally where it was plain text (not as markup), e.g. a question.
  expect(entry.text).toContain('question-marker-0 <script>window.__xss=1;alert(1)</script>');
  // Markdown links with javascript: lost their address; the http source address is a link as typed.
  const hrefs = await page.evaluate(() => Array.from(document.querySelectorAll('a[href]')).map((a) => a.getAttribute('href')!));
  expect(hrefs.filter((x) => /^\s*(javascript|data|vbscript):/i.test(x))).toEqual([]);
  expect(hrefs).toContain('https://example.org/paper?q=%3Cscript%3Ewindow.__xss=1%3C/script%3E');

  // The library lists it, its "in brief" rendered in the browser by the same pipeline.
  await page.goto(`${h.base}/`);
  await page.getByText('in-brief-marker', { exact: false }).first().waitFor();
  await expectClean(page, ['in-brief-marker']);

  // The submission as its submitter: title, where seen, summary, the question and the reply, the moderator's name.
  const own = await openWatched();
  await signInQuickly(own, h.base, accounts.contributor, password);
  await own.goto(`${h.base}/submissions/${sightingId}`);
  await own.getByText('summary-marker-0', { exact: false }).first().waitFor();
  const mine = await expectClean(own, ['sighting-title-marker', 'where-seen-marker', ...all('summary-marker'), 'question-note-marker', ...all('answer-note-marker')]);
  expect(mine.text).toContain('javascript:window.__xss=1');

  // The same item in the moderator's queue: the submitter's display name.
  const mod = await openWatched();
  await signInQuickly(mod, h.base, accounts.moderator, password);
  await mod.goto(`${h.base}/queue/${sightingId}`);
  await mod.getByText('summary-marker-0', { exact: false }).first().waitFor();
  const queued = await expectClean(mod, ['sighting-title-marker', 'where-seen-marker', ...all('summary-marker'), ...all('answer-note-marker')]);
  expect(queued.text).toContain(`Q" onfocus="window.__xss=1"`);

  // The inspection itself finds what it looks for (so that the clean results above mean something).
  await mod.evaluate(() => document.body.insertAdjacentHTML('beforeend', '<a href=" javascript:void 0">x</a><img alt="" src="data:," onerror="void 0"><iframe></iframe>'));
  expect((await mod.evaluate(inspectPage)).problems).toEqual(['a[href= javascript:void 0]', 'img[onerror]', '<iframe>']);
});

it('a wrong password: said on the screen, and nothing in the console from our own code', async () => {
  const page = await openWatched();
  const errors: { text: string; url: string }[] = [];
  page.on('console', (m: ConsoleMessage) => {
    if (m.type() === 'error' || m.type() === 'warning') errors.push({ text: `${m.type()}: ${m.text()}`, url: m.location().url });
  });
  await page.goto(`${h.base}/sign-in`);
  await byTestId(page, 'screen-sign-in').waitFor();
  await page.waitForLoadState('networkidle');
  const beforeSignIn = errors.length;
  await byTestId(page, 'field-email').fill(accounts.contributor);
  await byTestId(page, 'field-password').fill('not-the-password-at-all');
  const answer = page.waitForResponse((r) => r.url().endsWith('/api/auth/sign-in'));
  await byTestId(page, 'submit').click();
  expect((await answer).status()).toBe(401);
  await page.getByText(/password/i).first().waitFor();
  await settled(page);
  expect(await page.evaluate(() => location.pathname)).toBe('/sign-in');
  expect(errors.slice(0, beforeSignIn)).toEqual([]);
  // Chromium's own network line for the 401 is the only one allowed (it comes from the browser, not from a script).
  const ours = errors.slice(beforeSignIn).filter((e) => !(/^error: Failed to load resource: the server responded with a status of 401\b/.test(e.text) && e.url.endsWith('/api/auth/sign-in')));
  expect(ours).toEqual([]);
  expect(page.problems).toEqual([]);
});
