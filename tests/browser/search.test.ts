/**
 * The Library's search in Chromium at phone and wide sizes, on the starter library: the query and
 * the filters live in the address (typing replaces it, a filter adds a history entry), a reload or a
 * shared link gives the same results as the API, Back and Forward restore the search before; on a
 * phone the results come first and the filters fold away behind one button; nonsense gets the empty
 * state. Screenshots: test-output/screenshots/library-390.png and library-1366.png (and the phone's
 * filters opened).
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { byTestId, screenshotDir, settled, startHarness, type Harness } from '../support/browser';
import { until } from '../support/poll';

jest.setTimeout(180_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

type TestPage = Page & { problems: string[] };

const param = (page: Page, name: string) => new URL(page.url()).searchParams.get(name);

/** The slugs of the results listed, in order. */
const listed = (page: Page) =>
  page.$$eval('[data-testid="search-results"] [role="listitem"]', (items) => items.map((i) => i.getAttribute('data-testid')!.replace(/^search-result-/, '')));

/** The slugs the API ranks for this search (the first 20, as the screen asks). */
async function apiSlugs(page: Page, query: Record<string, string>): Promise<string[]> {
  const res = await page.request.get(`${h.base}/api/search?${new URLSearchParams(query)}`);
  expect(res.status()).toBe(200);
  return ((await res.json()) as { results: { slug: string }[] }).results.map((r) => r.slug);
}

/** Waits until the list shows exactly what the API ranks for this search. */
async function showsApi(page: Page, query: Record<string, string>): Promise<string[]> {
  const want = await apiSlugs(page, query);
  expect(want.length).toBeGreaterThan(0);
  await until(`the results are those of ${JSON.stringify(query)}`, async () => JSON.stringify(await listed(page)) === JSON.stringify(want));
  return want;
}

const historyLength = (page: Page) => page.evaluate(() => history.length);

describe.each([
  ['phone', 390, 844],
  ['wide', 1366, 900],
])('the Library search on a %s (%i px)', (_name, width, height) => {
  let page: TestPage;
  beforeAll(async () => {
    page = await h.page(width, height, 'light', { held: true });
  });
  afterAll(() => page.close());

  it('puts the query in the address as it is typed, titles the page with it, and a reload gives the same results', async () => {
    await page.goto(`${h.base}/`);
    await byTestId(page, 'screen-library').waitFor();
    await settled(page);
    expect(await page.title()).toBe('Library — Counterweight');
    const before = await historyLength(page);

    // Typed key by key: the address follows once the typing rests, without a history entry per key.
    await byTestId(page, 'library-search').pressSequentially('magnet motor');
    await until('the address holds the query', async () => param(page, 'q') === 'magnet motor');
    const first = await showsApi(page, { q: 'magnet motor' });
    expect(await historyLength(page)).toBe(before);
    expect(await page.title()).toBe('“magnet motor” — Library — Counterweight');
    // The reader's words, not the index's stems.
    const matched = await byTestId(page, `search-terms-${first[0]}`).textContent();
    expect(matched).toMatch(/^Matched: /);
    expect(matched).toContain('magnet');

    await page.reload();
    await byTestId(page, 'screen-library').waitFor();
    await until('the field holds the query again', async () => (await byTestId(page, 'library-search').inputValue()) === 'magnet motor');
    expect(await showsApi(page, { q: 'magnet motor' })).toEqual(first);
    await page.screenshot({ path: path.join(screenshotDir, `library-${width}.png`), fullPage: true });
  });

  it('opens a shared link with a query and a filter as the same search', async () => {
    await page.goto(`${h.base}/?q=energy&law=entropy`);
    await byTestId(page, 'screen-library').waitFor();
    await showsApi(page, { q: 'energy', law: 'entropy' });
    expect(await byTestId(page, 'library-search').inputValue()).toBe('energy');
    if (width < 960) {
      // On a phone the filter set is named above the list and counted on the folded button.
      expect(await byTestId(page, 'filters-set').textContent()).toContain('Second law of thermodynamics');
      expect(await byTestId(page, 'filters-toggle').textContent()).toContain('Filters (1 set)');
      await byTestId(page, 'filters-toggle').click();
    }
    expect(await byTestId(page, 'filter-law-entropy').getAttribute('aria-checked')).toBe('true');
  });

  it('puts a chosen filter in the address as a new history entry; Back and Forward restore each search', async () => {
    await page.goto(`${h.base}/?q=energy`);
    await byTestId(page, 'screen-library').waitFor();
    const unfiltered = await showsApi(page, { q: 'energy' });
    const before = await historyLength(page);
    if (width < 960) await byTestId(page, 'filters-toggle').click();

    await byTestId(page, 'filter-law-entropy').click();
    await until('the address holds the filter', async () => param(page, 'law') === 'entropy');
    expect(param(page, 'q')).toBe('energy');
    const filtered = await showsApi(page, { q: 'energy', law: 'entropy' });
    expect(filtered).not.toEqual(unfiltered);
    expect(await historyLength(page)).toBe(before + 1);
    // The keyboard stays on the chip just chosen, and the phone's filters stay open.
    await until('the chosen chip has the focus', async () => (await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))) === 'filter-law-entropy');
    expect(await byTestId(page, 'filter-law-entropy').getAttribute('aria-checked')).toBe('true');

    await page.goBack();
    await until('the address has no filter', async () => param(page, 'law') === null && param(page, 'q') === 'energy');
    await showsApi(page, { q: 'energy' });
    expect(await byTestId(page, 'library-search').inputValue()).toBe('energy');

    await page.goForward();
    await until('the address has the filter again', async () => param(page, 'law') === 'entropy');
    await showsApi(page, { q: 'energy', law: 'entropy' });
  });

  it('answers nonsense with the empty state, not with stray fragments', async () => {
    await page.goto(`${h.base}/`);
    await byTestId(page, 'screen-library').waitFor();
    for (const q of ['asdf qwerty', 'xq zz']) {
      await byTestId(page, 'library-search').fill(q);
      await until(`the empty state for “${q}”`, async () => ((await byTestId(page, 'search-empty').textContent()) ?? '').includes(`“${q}”`));
      expect(await byTestId(page, 'search-count').textContent()).toBe('0 entries');
      expect(await byTestId(page, 'search-results').count()).toBe(0);
    }
    // An emptied field takes the query out of the address and brings back the recent entries.
    await byTestId(page, 'library-search').fill('');
    await until('the address has no query', async () => !param(page, 'q'));
    await byTestId(page, 'entry-list').waitFor();
    expect(await page.title()).toBe('Library — Counterweight');
  });
});

describe('on a phone (390 px)', () => {
  let page: TestPage;
  beforeAll(async () => {
    page = await h.page(390, 844, 'light', { held: true });
  });
  afterAll(() => page.close());

  /** Elements inside the filter panel that the Tab key stops at. */
  const tabStops = () =>
    page.$$eval('[data-testid="filter-panel"] *', (els) =>
      els.filter((el) => (el as HTMLElement).tabIndex >= 0 && !(el as HTMLElement).hasAttribute('disabled') && (el as HTMLElement).offsetParent !== null).map((el) => el.getAttribute('data-testid')),
    );

  it('lists the results before the filters, which fold behind one button and one tab stop', async () => {
    await page.goto(`${h.base}/?q=wheel`);
    await byTestId(page, 'screen-library').waitFor();
    const slugs = await showsApi(page, { q: 'wheel' });
    await settled(page);

    const toggle = byTestId(page, 'filters-toggle');
    expect(await toggle.getAttribute('aria-expanded')).toBe('false');
    expect((await toggle.textContent())?.trim()).toBe('▸ Filters');
    expect(await byTestId(page, 'filter-law-energy').count()).toBe(0);
    expect(await tabStops()).toEqual(['filters-toggle']);
    const lastResult = (await byTestId(page, `search-result-${slugs[slugs.length - 1]}`).boundingBox())!;
    const toggleBox = (await toggle.boundingBox())!;
    expect(toggleBox.y).toBeGreaterThanOrEqual(lastResult.y + lastResult.height);
    expect(toggleBox.height).toBeGreaterThanOrEqual(44);

    // Opened from the keyboard, the chips come next in the tab order.
    await toggle.focus();
    await page.keyboard.press('Enter');
    await until('the filters are open', async () => (await toggle.getAttribute('aria-expanded')) === 'true');
    expect((await tabStops()).length).toBeGreaterThan(4);
    await page.keyboard.press('Tab');
    expect(await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))).toBe('filter-law-any');
    await page.screenshot({ path: path.join(screenshotDir, 'library-filters-open-390.png'), fullPage: true });
    expect(page.problems).toEqual([]);
  });
});
