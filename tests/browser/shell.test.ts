/**
 * The built web app, served by the real server on a real database, in Debian's Chromium:
 * the shell renders in our fonts at phone and desktop sizes, navigation moves between sections,
 * the Library shows what the API sends, and says so clearly when the API cannot be reached.
 * Screenshots go to test-output/screenshots/.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { byTestId, screenshotDir as shots, startHarness, type Harness } from '../support/browser';

jest.setTimeout(120_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

/** The font families the page has actually loaded (FontFace objects with status "loaded"). */
const loadedFamilies = async (page: Page): Promise<string[]> => {
  // A string, not a function: babel would rewrite an async function for a page that lacks its helpers.
  await page.evaluate('document.fonts.ready');
  return page.evaluate(() => {
    const families: string[] = [];
    document.fonts.forEach((f) => {
      if (f.status === 'loaded') families.push(f.family.replace(/^"|"$/g, ''));
    });
    return families;
  });
};

const fontOf = (page: Page, selector: string) =>
  page.locator(selector).first().evaluate((el) => getComputedStyle(el).fontFamily);

describe.each([
  ['phone', 390, 844, 'nav-bar'],
  ['desktop', 1280, 800, 'nav-rail'],
])('the shell on a %s (%ix%i)', (name, width, height, navId) => {
  let page: Page & { problems: string[] };
  beforeAll(async () => {
    page = await h.page(width, height, 'light', { held: true });
  });
  afterAll(() => page.context().close());
  /** Each test opens the Library itself, so that it does not depend on where an earlier one left the page. */
  const openLibrary = async () => {
    await page.goto(h.base + '/');
    await byTestId(page, 'screen-library').waitFor();
  };

  it('renders the Library in our fonts with the starter taxonomy', async () => {
    await openLibrary();
    await page.getByText('Conservation of linear momentum').first().waitFor();
    const families = await loadedFamilies(page);
    for (const family of ['IBMPlexSans_400Regular', 'SourceSerif4_400Regular', 'IBMPlexMono_400Regular']) {
      expect(families).toContain(family);
    }
    expect(await fontOf(page, '[data-testid="screen-library"] [role="heading"]')).toMatch(/SourceSerif4|IBMPlexSans/);
    expect(await fontOf(page, `[data-testid="${navId}"] [data-testid="nav-library"] [dir]`)).toMatch(/IBMPlexSans/);
    await page.screenshot({ path: path.join(shots, `${name}-library.png`), fullPage: true });
  });

  it(`shows the ${navId === 'nav-bar' ? 'bottom bar' : 'left rail'}`, async () => {
    await openLibrary();
    const nav = byTestId(page, navId);
    await nav.waitFor();
    await expect(nav.isVisible()).resolves.toBe(true);
    const box = (await nav.boundingBox())!;
    if (navId === 'nav-bar') {
      expect(box.y + box.height).toBeGreaterThan(height - 4);
      expect(box.width).toBeGreaterThan(width - 4);
      expect(await byTestId(page, 'nav-rail').count()).toBe(0);
    } else {
      expect(box.x).toBeLessThan(4);
      expect(box.height).toBeGreaterThan(height - 4);
      expect(await byTestId(page, 'nav-bar').count()).toBe(0);
    }
  });

  it('moves between sections and marks the active one', async () => {
    await openLibrary();
    const nav = byTestId(page, navId);
    await nav.locator('[data-testid="nav-check"]').click();
    await byTestId(page, 'screen-check').waitFor();
    expect(new URL(page.url()).pathname).toBe('/check');
    expect(await nav.locator('[data-testid="nav-check"]').getAttribute('aria-current')).toBe('page');
    await page.screenshot({ path: path.join(shots, `${name}-check.png`) });

    await nav.locator('[data-testid="nav-account"]').click();
    await byTestId(page, 'screen-account').waitFor();
    expect(new URL(page.url()).pathname).toBe('/account');

    await nav.locator('[data-testid="nav-library"]').click();
    await byTestId(page, 'screen-library').waitFor();
    expect(new URL(page.url()).pathname).toBe('/');
    expect(await nav.locator('[data-testid="nav-library"]').getAttribute('aria-current')).toBe('page');
  });

  it('opens a section from its address directly (SPA fallback)', async () => {
    await page.goto(h.base + '/account');
    await byTestId(page, 'screen-account').waitFor();
    expect(page.problems).toEqual([]);
  });
});

it('says clearly when the API cannot be reached, and recovers on retry', async () => {
  const page = await h.page(390, 844);
  let block = true;
  await page.route('**/api/**', (route) => (block ? route.abort('connectionrefused') : route.continue()));
  await page.goto(h.base + '/');
  const message = page.getByText(/could not be reached/i).first();
  await message.waitFor();
  await page.screenshot({ path: path.join(shots, 'phone-api-down.png') });
  block = false;
  await byTestId(page, 'taxonomy-error-retry').click();
  await page.getByText('Conservation of linear momentum').first().waitFor();
  await page.context().close();
});
