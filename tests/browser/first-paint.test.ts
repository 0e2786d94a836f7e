/**
 * The first paint, before any script runs (server/http/page-shell.ts, the #cw-shell of
 * public/index.html): with JavaScript disabled an entry page shows the entry's title and sections
 * and the Library its entries, other pages the frame; with JavaScript the app takes over the same
 * page with nothing shown twice. The fonts are WOFF2 subsets with `font-display: swap`
 * (scripts/web-fonts.ts). Screenshots first-paint-<route>-<width>.png (no JavaScript).
 */
import path from 'node:path';
import type { BrowserContext, Page } from 'playwright-core';
import { byTestId, screenshotDir as shots, settled, startHarness, type Harness } from '../support/browser';

jest.setTimeout(120_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// A starter entry with display and inline math and several sections (content/entries/gyroscopic-thruster.md).
const SLUG = 'gyroscopic-thruster';

interface EntryJson {
  version: { number: number; content: { title: string; inBrief: string } };
}
interface ListJson {
  entries: { slug: string; title: string }[];
}
const getJson = async <T>(url: string): Promise<T> => (await (await fetch(`${h.base}${url}`)).json()) as T;

/** Markdown of a short passage as plain words, to look for in the page's text (emphasis and math marks dropped). */
const words = (markdown: string) =>
  markdown
    .replace(/\$[^$]*\$/g, ' ')
    .replace(/[*_`[\]()]/g, ' ')
    .split(/\s+/)
    .filter((w) => /^[A-Za-z]{4,}$/.test(w));

/**
 * Opens `route` in a page without JavaScript and waits for everything it loads. (No `settled`: it
 * waits on timers and animation frames, which a page without scripts never runs.)
 */
async function loaded(page: Page, route: string): Promise<void> {
  await page.goto(`${h.base}${route}`);
  await page.waitForLoadState('networkidle');
}

/** The visible text of the page (what a reader sees: display:none parts left out). */
const visibleText = (page: Page) => page.locator('body').innerText();

/** The left edge of the page's one visible level-1 heading. */
const headingLeft = (page: Page) =>
  page.evaluate(() => {
    const shown = Array.from(document.querySelectorAll('h1, [role="heading"][aria-level="1"]')).filter((el) => el.getClientRects().length > 0);
    if (shown.length !== 1) throw new Error(`${shown.length} visible level-1 headings`);
    return shown[0].getBoundingClientRect().left;
  });

describe.each([
  [390, 844],
  [1366, 900],
])('the first paint at %i px', (width, height) => {
  let noScript: BrowserContext;
  // The entry with the app, loaded once at this size for the three tests that read it (none changes it).
  let app: Page & { problems: string[] };
  beforeAll(async () => {
    noScript = await h.browser.newContext({ viewport: { width, height }, deviceScaleFactor: 1, javaScriptEnabled: false });
    app = await h.page(width, height, 'light', { held: true });
    await app.goto(`${h.base}/entries/${SLUG}`);
    await byTestId(app, 'entry-section-inBrief').waitFor();
    await byTestId(app, 'entry-section-whyItFails').waitFor();
    await settled(app);
  });
  afterAll(async () => {
    await app?.close();
    await noScript?.close();
  });

  it('shows an entry’s title and its first section without JavaScript, in the column the app uses', async () => {
    const { version } = await getJson<EntryJson>(`/api/entries/${SLUG}`);
    const page = await noScript.newPage();
    await loaded(page, `/entries/${SLUG}`);
    expect(await page.locator('#cw-shell h1').innerText()).toBe(version.content.title);
    const text = await visibleText(page);
    expect(text).toContain('In brief');
    const brief = words(version.content.inBrief);
    expect(brief.length).toBeGreaterThan(3);
    for (const w of brief) expect(text).toContain(w);
    expect(text).toContain('Why it fails');
    // KaTeX ran on the server: its markup is in the page, with no script.
    expect(await page.locator('#cw-shell .katex').count()).toBeGreaterThan(0);
    expect(text).toContain('Counterweight');
    await page.screenshot({ path: path.join(shots, `first-paint-entry-${width}.png`) });
    const shellLeft = await headingLeft(page);
    await page.close();

    // The app's own heading sits where the shell's did (close is fine: a few pixels).
    expect(Math.abs((await headingLeft(app)) - shellLeft)).toBeLessThanOrEqual(4);
  });

  it('shows the Library’s entries without JavaScript', async () => {
    const list = await getJson<ListJson>('/api/entries?limit=20');
    expect(list.entries.length).toBeGreaterThan(3);
    const page = await noScript.newPage();
    await loaded(page, '/');
    const text = await visibleText(page);
    for (const e of list.entries) expect(text).toContain(e.title);
    expect(await page.locator(`#cw-shell a[href="/entries/${list.entries[0].slug}"]`).count()).toBe(1);
    await page.screenshot({ path: path.join(shots, `first-paint-library-${width}.png`) });
    await page.close();
  });

  it('shows the frame and a skeleton on other pages, never a blank page', async () => {
    const page = await noScript.newPage();
    await loaded(page, '/checks');
    expect(await page.locator('#cw-shell .cw-skeleton').isVisible()).toBe(true);
    expect(await visibleText(page)).toContain('Counterweight');
    await page.screenshot({ path: path.join(shots, `first-paint-other-${width}.png`) });
    await page.close();
  });

  it('hands the page over to the app: the same entry once, no page errors', async () => {
    const { version } = await getJson<EntryJson>(`/api/entries/${SLUG}`);
    const page = app;
    expect(await page.locator('#cw-shell').isVisible()).toBe(false);
    // The title as a visible level-1 heading exactly once (the shell's copy is hidden).
    expect(await page.getByRole('heading', { level: 1, name: version.content.title, exact: true }).count()).toBe(1);
    expect(await page.getByRole('heading', { level: 2, name: 'Why it fails', exact: true }).count()).toBe(1);
    expect(page.problems).toEqual([]);
  });

  it('has the Library working with the app as before', async () => {
    const list = await getJson<ListJson>('/api/entries?limit=20');
    const page = await h.page(width, height);
    await page.goto(`${h.base}/`);
    await byTestId(page, `entry-${list.entries[0].slug}`).waitFor();
    await settled(page);
    expect(await page.locator('#cw-shell').isVisible()).toBe(false);
    const text = await visibleText(page);
    expect(text.split(list.entries[0].title).length - 1).toBe(1);
    expect(page.problems).toEqual([]);
    await page.close();
  });

  it('sets text in our WOFF2 fonts, loaded with font-display: swap, the preloaded ones among them', async () => {
    const page = app;
    const faces = await page.evaluate(() => {
      const out: { family: string; display: string; status: string }[] = [];
      document.fonts.forEach((f) => out.push({ family: f.family.replace(/^"|"$/g, ''), display: f.display, status: f.status }));
      return out;
    });
    const loaded = new Set(faces.filter((f) => f.status === 'loaded').map((f) => f.family));
    for (const family of ['SourceSerif4_400Regular', 'SourceSerif4_600SemiBold', 'IBMPlexSans_400Regular']) expect(loaded).toContain(family);
    // Every face of ours (not KaTeX's) shows text in a system font until it has loaded.
    const ours = faces.filter((f) => /^(SourceSerif4|IBMPlex)/.test(f.family));
    expect(ours.length).toBeGreaterThanOrEqual(14);
    expect(new Set(ours.map((f) => f.display))).toEqual(new Set(['swap']));
    // The reading text is set in our serif, headings in its semibold.
    const fontOf = (selector: string) => page.locator(selector).first().evaluate((el) => getComputedStyle(el).fontFamily);
    expect(await fontOf('[data-testid="entry-section-inBrief"] .cw-md p')).toMatch(/^"?SourceSerif4_400Regular/);
    expect(await fontOf('[data-testid="screen-entry"] [role="heading"][aria-level="1"]')).toMatch(/^"?SourceSerif4_600SemiBold/);
    // The fonts came as WOFF2 from /fonts/, no TTF of ours.
    const fetched = await page.evaluate(() => performance.getEntriesByType('resource').map((r) => r.name));
    expect(fetched.filter((u) => /\/fonts\/source-serif-4-latin-400\.[0-9a-f]{10}\.woff2$/.test(u)).length).toBeGreaterThan(0);
    expect(fetched.filter((u) => /(IBMPlex|SourceSerif4)[^/]*\.ttf$/.test(u))).toEqual([]);
  });
});
