/**
 * Entries in Chromium at phone size: a reader opens a starter entry, runs its worksheet in place with
 * new numbers (the same numbers as the server's evaluator), and copies a citation of that exact
 * version. And a published entry carrying known XSS payloads in its Markdown runs none of them.
 * Screenshots go to test-output/screenshots/.
 */
import path from 'node:path';
import type { APIRequestContext, Page } from 'playwright-core';
import { byTestId, screenshotDir, settled, startHarness, type Harness } from '../support/browser';
import { relClose, until } from '../support/poll';

jest.setTimeout(180_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// The demo editors seeded in development (README, "Roles and demo accounts").
const DEMO_PASSWORD = 'counterweight-demo-2026';

/** A signed-in API client sharing the page's cookie jar, sending the CSRF token on writes. */
async function signedInRequest(page: Page, email: string) {
  const req: APIRequestContext = page.context().request;
  const token = async () => ((await (await req.get(`${h.base}/api/session`)).json()) as { csrfToken: string }).csrfToken;
  const signIn = await req.post(`${h.base}/api/auth/sign-in`, {
    headers: { 'X-CSRF-Token': await token() },
    data: { email, password: DEMO_PASSWORD },
  });
  expect(signIn.status()).toBe(200);
  return async (method: 'post' | 'put', url: string, data: unknown) => {
    const res = await req[method](`${h.base}${url}`, { headers: { 'X-CSRF-Token': await token() }, data });
    return { status: res.status(), body: await res.json().catch(() => null) };
  };
}

it('reads a starter entry, runs its worksheet with new numbers, and copies a citation', async () => {
  const list = (await (await fetch(`${h.base}/api/entries?limit=100`)).json()) as { entries: { slug: string }[] };
  expect(list.entries.length).toBeGreaterThanOrEqual(12);
  const page = await h.open(390, 844);
  await page.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: h.base });

  // The first entry with a worksheet whose first input has a number we can double.
  let chosen: { slug: string; worksheet: { name: string; inputs: { name: string; default: string }[] } } | null = null;
  for (const { slug } of list.entries) {
    const { version } = await (await fetch(`${h.base}/api/entries/${slug}`)).json();
    const ws = version.content.worksheets.find((w: { inputs: { default: string }[] }) => /^\d/.test(w.inputs[0]?.default ?? ''));
    if (ws) {
      chosen = { slug, worksheet: ws };
      break;
    }
  }
  expect(chosen).not.toBeNull();
  const { slug, worksheet } = chosen!;

  await page.goto(`${h.base}/entries/${slug}`);
  await byTestId(page, 'screen-entry').waitFor();
  for (const section of ['inBrief', 'howItIsPitched', 'whyItFails']) await byTestId(page, `entry-section-${section}`).waitFor();
  await page.screenshot({ path: path.join(screenshotDir, `entry-${slug}.png`) });

  const box = byTestId(page, `worksheet-${worksheet.name}`);
  const input = worksheet.inputs[0];
  const m = /^([-+]?\d*\.?\d+(?:e[-+]?\d+)?)(.*)$/i.exec(input.default.trim())!;
  const typed = `${Number(m[1]) * 2}${m[2]}`;
  await box.locator(`[data-testid="input-${input.name}"]`).fill(typed);
  const server = await (
    await fetch(`${h.base}/api/worksheets/evaluate`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ worksheet, values: { [input.name]: typed } }),
    })
  ).json();
  const expected = (server.steps as { name: string; value?: { si: number } }[]).filter((s) => s.value);
  expect(expected.length).toBeGreaterThan(0);
  await until('the worksheet shows the new numbers', async () => {
    const shown = await box.evaluate((el) => {
      const out: Record<string, number> = {};
      el.querySelectorAll('[data-testid^="step-"][data-si]').forEach((s) => {
        out[s.getAttribute('data-testid')!.slice(5)] = Number(s.getAttribute('data-si'));
      });
      return out;
    });
    return expected.every((s) => relClose(shown[s.name], s.value!.si));
  });

  const cite = byTestId(page, 'cite-panel');
  await cite.scrollIntoViewIfNeeded();
  await byTestId(page, 'cite-format-apa').click();
  await until('the APA citation names this version', async () =>
    /\/entries\/[a-z0-9-]+\/v\/1/.test((await byTestId(page, 'cite-text').textContent()) ?? ''),
  );
  const text = (await byTestId(page, 'cite-text').textContent())!;
  expect(text).toContain('Counterweight');
  expect(text).toContain(`/entries/${slug}/v/1`);
  await byTestId(page, 'cite-copy').click();
  await until('the citation is on the clipboard', async () => (await page.evaluate(() => navigator.clipboard.readText())).trim() === text.trim());
  await page.screenshot({ path: path.join(screenshotDir, `entry-${slug}-cite.png`) });
  expect(page.problems).toEqual([]);
  await page.context().close();
});

// Known XSS vectors (OWASP XSS Filter Evasion Cheat Sheet, from memory), each trying to set window.__xss.
const payloads = [
  '<script>window.__xss = 1</script>',
  '<img src=x onerror="window.__xss = 2">',
  '<svg onload="window.__xss = 3"></svg>',
  '<a href="javascript:window.__xss = 4">plain link</a>',
  '[markdown link](javascript:window.__xss=5)',
  '<iframe src="javascript:window.__xss = 6"></iframe>',
  '<details open ontoggle="window.__xss = 7">x</details>',
  '<math><mtext><table><mglyph><style><img src=x onerror="window.__xss = 8">',
  '<object data="javascript:window.__xss = 9"></object>',
  '![image](x" onerror="window.__xss=10)',
  '$\\href{javascript:window.__xss=11}{math link}$',
  '<div style="background:url(javascript:window.__xss=12)">styled</div>',
  '<form action="javascript:window.__xss=13"><button>go</button></form>',
];

it('renders a published entry full of XSS payloads without running any of them', async () => {
  const author = await h.open(390, 844);
  const reviewer = await h.open(390, 844);
  const asAuthor = await signedInRequest(author, 'editor.one@example.org');
  const asReviewer = await signedInRequest(reviewer, 'editor.two@example.org');
  const hostile = payloads.join('\n\n');
  const content = {
    title: 'Payload test entry',
    aliases: [],
    mechanismClass: 'over-unity',
    laws: ['energy'],
    inBrief: `A test entry. ${payloads[1]}`,
    howItIsPitched: hostile,
    whyItFails: hostile,
    whatFakesTheEffect: hostile,
    cautions: payloads[0],
    repliesAndAnswers: [{ reply: payloads[2], answer: payloads[3] }],
    questionsToAsk: [payloads[1]],
  };
  const created = await asAuthor('post', '/api/drafts', { slug: 'payload-test-entry', content });
  expect(created.status).toBe(201);
  const { id, lockVersion } = created.body.draft;
  expect((await asAuthor('post', `/api/drafts/${id}/submit`, { lockVersion })).status).toBe(200);
  expect((await asReviewer('post', `/api/drafts/${id}/approve`, { changeNote: 'Test of the sanitiser.' })).status).toBe(200);

  const page = await h.open(390, 844);
  await page.goto(`${h.base}/entries/payload-test-entry`);
  await byTestId(page, 'entry-section-whyItFails').waitFor();
  await settled(page);
  for (const link of await page.locator('[data-testid="screen-entry"] a').all()) {
    const href = (await link.getAttribute('href')) ?? '';
    expect(href.toLowerCase().replace(/\s/g, '')).not.toMatch(/^javascript:/);
  }
  const found = await page.evaluate(() => ({
    xss: (window as unknown as { __xss?: number }).__xss,
    scripts: document.querySelectorAll('[data-testid="screen-entry"] script, [data-testid="screen-entry"] iframe, [data-testid="screen-entry"] object').length,
    handlers: Array.from(document.querySelectorAll('[data-testid="screen-entry"] *')).filter((el) =>
      Array.from(el.attributes).some((a) => a.name.toLowerCase().startsWith('on')),
    ).length,
  }));
  expect(found).toEqual({ xss: undefined, scripts: 0, handlers: 0 });
  await page.screenshot({ path: path.join(screenshotDir, 'entry-payloads.png') });
  for (const p of [author, reviewer, page]) await p.context().close();
});

it('lets an editor retire an entry with a reason and a successor; readers then see the notice', async () => {
  const page = await h.open(390, 844);
  await signedInRequest(page, 'editor.one@example.org');
  await page.goto(`${h.base}/entries/buoyancy-wheel`);
  await byTestId(page, 'screen-entry').waitFor();
  await byTestId(page, 'retire-open').click();
  await byTestId(page, 'retire-successor').fill('no-such-entry');
  await byTestId(page, 'retire-reason').fill('Folded into the entry on overbalanced wheels.');
  await byTestId(page, 'retire-confirm').click();
  // An unknown successor is refused beside its field, and nothing is retired.
  await byTestId(page, 'retire-successor-error').waitFor();
  expect((await (await fetch(`${h.base}/api/entries/buoyancy-wheel`)).json()).entry.status).toBe('published');
  await byTestId(page, 'retire-successor').fill('overbalanced-wheel');
  await byTestId(page, 'retire-confirm').click();
  await byTestId(page, 'entry-retired').waitFor();
  expect(await byTestId(page, 'entry-retired').textContent()).toContain('Folded into the entry on overbalanced wheels.');
  await page.screenshot({ path: path.join(screenshotDir, 'entry-retired.png') });

  // A reader in a fresh context sees the notice and the link to the successor.
  const reader = await h.open(390, 844);
  await reader.goto(`${h.base}/entries/buoyancy-wheel`);
  await byTestId(reader, 'entry-retired').waitFor();
  await byTestId(reader, 'entry-successor').click();
  await until('the successor page opens', async () => reader.url().endsWith('/entries/overbalanced-wheel'));
  expect(page.problems).toEqual([]);
  expect(reader.problems).toEqual([]);
});
