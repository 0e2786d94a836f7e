/**
 * The frame around every screen, in Chromium at a phone's 390 px and a wide 1366 px: the bottom bar
 * (five destinations at most, each an icon and a one-line label, the rest behind "More"), touch targets
 * of 44 px, the admin pages behind one menu on a phone, the in-page confirm dialog (never the browser's),
 * the four message styles on real screens, dark mode following the system setting with the light
 * theme's contrast, and the browser title of each route.
 * Screenshots go to test-output/screenshots/ as frame-<what>-<width>[-dark].png.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { byTestId, goInApp, networkQuiet, screenshotDir as shots, settled, signInQuickly, startHarness, submitSignInForm, type Harness } from '../support/browser';
import { until } from '../support/poll';

jest.setTimeout(240_000);

// The demo accounts (content/demo/accounts.yml; README, "Roles and demo accounts"): invented people.
const password = 'counterweight-demo-2026';
const admin = 'admin@example.org';
const contributor = 'contributor@example.org';

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

type Scheme = 'light' | 'dark';
type WatchedPage = Page & { problems: string[]; dialogs: string[] };

/** A signed-out page at this size and colour scheme (the harness's shared context); any browser dialog it raises is recorded. */
async function open(width: number, scheme: Scheme = 'light'): Promise<WatchedPage> {
  const page = (await h.page(width, width < 960 ? 844 : 900, scheme)) as WatchedPage;
  page.dialogs = [];
  // The app must never open the browser's own alert, confirm or prompt.
  page.on('dialog', (d) => {
    page.dialogs.push(`${d.type()}: ${d.message()}`);
    void d.dismiss();
  });
  return page;
}

const shot = (page: Page, name: string, width: number, scheme: Scheme = 'light', fullPage = false) =>
  page.screenshot({ path: path.join(shots, `frame-${name}-${width}${scheme === 'dark' ? '-dark' : ''}.png`), fullPage });

/**
 * Colour measures run in the page, as a string (babel would rewrite a function for a page that lacks its
 * helpers). WCAG 2.1 definitions: "relative luminance" (sRGB linearised with the 0.03928 knee, weights
 * 0.2126, 0.7152, 0.0722) and "contrast ratio" ((L1 + 0.05) / (L2 + 0.05), lighter over darker).
 * The background of an element is the first opaque background among it and its ancestors.
 */
const COLOUR_HELPERS = `
  const rgb = (c) => { const m = c.match(/rgba?\\(([^)]+)\\)/); if (!m) return null; const p = m[1].split(/[ ,\\/]+/).filter(Boolean).map(Number); return { r: p[0], g: p[1], b: p[2], a: p.length > 3 ? p[3] : 1 }; };
  const lum = (c) => { const v = [c.r, c.g, c.b].map((x) => x / 255).map((x) => (x <= 0.03928 ? x / 12.92 : Math.pow((x + 0.055) / 1.055, 2.4))); return 0.2126 * v[0] + 0.7152 * v[1] + 0.0722 * v[2]; };
  const ratio = (a, b) => { const [hi, lo] = [lum(a), lum(b)].sort((x, y) => y - x); return (hi + 0.05) / (lo + 0.05); };
  const bgOf = (el) => { for (let e = el; e; e = e.parentElement) { const c = rgb(getComputedStyle(e).backgroundColor); if (c && c.a >= 0.99) return c; } return rgb(getComputedStyle(document.body).backgroundColor); };
`;

/** The contrast of the text of the first element matching `selector` against its background, and both colours. */
async function contrastOf(page: Page, selector: string): Promise<{ ratio: number; fg: string; bg: string }> {
  await page.locator(selector).first().waitFor();
  return page.evaluate(`(() => { ${COLOUR_HELPERS}
    const el = document.querySelector(${JSON.stringify(selector)});
    const fg = rgb(getComputedStyle(el).color); const bg = bgOf(el);
    return { ratio: ratio(fg, bg), fg: getComputedStyle(el).color, bg: 'rgb(' + bg.r + ', ' + bg.g + ', ' + bg.b + ')' };
  })()`);
}

/** The relative luminance of the page's own background. */
const pageLuminance = (page: Page): Promise<number> =>
  page.evaluate(`(() => { ${COLOUR_HELPERS} return lum(bgOf(document.querySelector('[role="main"]'))); })()`);

/** Every visible element matching `selector` whose box is under 44 px either way, named for the failure message. */
async function smallTargets(page: Page, selector: string): Promise<string[]> {
  return page.evaluate(`(() => {
    const out = [];
    for (const el of document.querySelectorAll(${JSON.stringify(selector)})) {
      const r = el.getBoundingClientRect();
      if (r.width === 0 || r.height === 0 || getComputedStyle(el).visibility === 'hidden') continue;
      if (r.width < 43.5 || r.height < 43.5) out.push((el.getAttribute('data-testid') || el.textContent.trim().slice(0, 30)) + ' ' + Math.round(r.width) + 'x' + Math.round(r.height));
    }
    return out;
  })()`);
}

describe.each([
  ['phone', 390],
  ['wide', 1366],
])('on a %s (%i px)', (_name, width) => {
  const phone = width < 960;

  it(phone ? 'has a bottom bar of five destinations at most, each an icon and a one-line label, the rest behind "More"' : 'keeps the rail, with every section of the role', async () => {
    const page = await open(width);
    await signInQuickly(page, h.base, admin, password);
    await page.goto(`${h.base}/account`);
    await byTestId(page, 'screen-account').waitFor();
    if (!phone) {
      const rail = byTestId(page, 'nav-rail');
      for (const key of ['library', 'check', 'checks', 'desk', 'queue', 'admin', 'account']) await rail.locator(`[data-testid="nav-${key}"]`).waitFor();
      expect(await byTestId(page, 'nav-bar').count()).toBe(0);
      await shot(page, 'nav', width);
      await page.close();
      return;
    }
    const bar = byTestId(page, 'nav-bar');
    await bar.waitFor();
    // The destinations are the bar's direct children, the "More" list aside.
    const items = bar.locator(':scope > a, :scope > [role="button"]');
    expect(await items.count()).toBeLessThanOrEqual(5);
    expect(await items.count()).toBe(5);
    for (let i = 0; i < (await items.count()); i++) {
      const item = items.nth(i);
      expect(await item.locator('svg').count()).toBe(1);
      const label = item.locator('[dir="auto"]').first();
      const one = await label.evaluate((el) => ({
        height: el.getBoundingClientRect().height,
        lineHeight: parseFloat(getComputedStyle(el).lineHeight),
        clipped: el.scrollWidth > el.clientWidth + 1,
        text: el.textContent,
      }));
      // One line: the label is no taller than its line height, and not cut short.
      expect([one.text, one.height <= one.lineHeight + 1, one.clipped]).toEqual([one.text, true, false]);
    }
    expect(await items.evaluateAll((els) => els.map((el) => el.textContent))).toEqual(['Library', 'Claims', 'Kit', 'Desk', 'More']);

    const more = byTestId(page, 'nav-more');
    expect(await more.getAttribute('aria-expanded')).toBe('false');
    expect(await byTestId(page, 'nav-more-list').isVisible()).toBe(false);
    await more.click();
    const list = byTestId(page, 'nav-more-list');
    await list.waitFor({ state: 'visible' });
    expect(await more.getAttribute('aria-expanded')).toBe('true');
    expect(await list.locator('a').evaluateAll((els) => els.map((el) => el.getAttribute('href')))).toEqual(['/queue', '/admin', '/account']);
    await shot(page, 'nav-more', width);
    await page.keyboard.press('Escape');
    await list.waitFor({ state: 'hidden' });
    await more.click();
    await list.locator('[data-testid="nav-admin"]').click();
    await byTestId(page, 'screen-admin').waitFor();
    expect(new URL(page.url()).pathname).toBe('/admin');
    await list.waitFor({ state: 'hidden' });
    // The current page is behind "More": it says so.
    expect(await more.getAttribute('aria-label')).toMatch(/current page/);
    expect(page.problems).toEqual([]);
    await page.close();
  });

  it('gives buttons, chips, and links used as buttons a touch target of 44 px at least', async () => {
    const page = await open(width);
    const targets = '[data-testid="nav-bar"] a, [data-testid="nav-bar"] [role="button"], [data-testid="nav-rail"] a, [role="main"] [role="button"], [role="main"] button, [role="main"] [role="radio"], [role="main"] [role="checkbox"], [data-testid="admin-menu"] a, [data-testid="admin-tabs"] a';
    await page.goto(`${h.base}/sign-in`);
    await byTestId(page, 'screen-sign-in').waitFor();
    await settled(page);
    expect(await smallTargets(page, targets)).toEqual([]);
    // Signed in through the form just measured, then on to the admin screen, in the same page (no load
    // between screens): each screen is measured once its requests are done, as after a load.
    await submitSignInForm(page, admin, password);
    await networkQuiet(page);
    await settled(page);
    expect(await smallTargets(page, targets)).toEqual([]);
    await goInApp(page, `${h.base}/admin`);
    await byTestId(page, 'screen-admin').waitFor();
    await byTestId(page, `user-row-${contributor}`).waitFor();
    await networkQuiet(page);
    await settled(page);
    expect(await smallTargets(page, targets)).toEqual([]);
    await shot(page, 'targets-admin', width, 'light', true);
    await page.close();
  });

  it(phone ? 'puts the admin pages behind one menu' : 'shows the admin pages as tabs on one row', async () => {
    const page = await open(width);
    await signInQuickly(page, h.base, admin, password);
    await page.goto(`${h.base}/admin`);
    await byTestId(page, 'screen-admin').waitFor();
    if (phone) {
      expect(await byTestId(page, 'admin-tabs').count()).toBe(0);
      const button = byTestId(page, 'admin-menu-button');
      expect(await button.textContent()).toContain('Users and roles');
      expect(await button.getAttribute('aria-expanded')).toBe('false');
      await button.click();
      await byTestId(page, 'admin-menu-list').waitFor();
      expect(await button.getAttribute('aria-expanded')).toBe('true');
      await shot(page, 'admin-menu', width);
      await byTestId(page, 'admin-tab-audit').click();
      await byTestId(page, 'screen-audit').waitFor();
      expect(new URL(page.url()).pathname).toBe('/admin/audit');
      expect(await byTestId(page, 'admin-menu-list').count()).toBe(0);
      expect(await byTestId(page, 'admin-menu-button').textContent()).toContain('Audit log');
    } else {
      expect(await byTestId(page, 'admin-menu').count()).toBe(0);
      const tops = await byTestId(page, 'admin-tabs').locator('a').evaluateAll((els) => els.map((el) => Math.round(el.getBoundingClientRect().top)));
      expect(tops).toHaveLength(3);
      expect(new Set(tops).size).toBe(1);
      await shot(page, 'admin-menu', width);
    }
    await page.close();
  });

  it('asks before a role change in its own dialog, never the browser’s: Escape cancels, the button goes ahead', async () => {
    const page = await open(width);
    await signInQuickly(page, h.base, admin, password);
    await page.goto(`${h.base}/admin`);
    // A different editor for each width, so that the two runs do not depend on each other.
    const editor = phone ? 'editor.one@example.org' : 'editor.two@example.org';
    await byTestId(page, `user-row-${editor}`).waitFor();
    const option = byTestId(page, `role-${editor}-moderator`);
    await option.focus();
    await option.click();
    const dialog = byTestId(page, 'confirm-dialog');
    await dialog.waitFor();
    expect(await dialog.getAttribute('role')).toBe('alertdialog');
    expect(await page.locator('[aria-modal="true"]').count()).toBeGreaterThan(0);
    expect(await dialog.textContent()).toContain('to moderator');
    // Focus moved into the dialog, to the safe choice.
    await until('focus is on Cancel', async () => (await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))) === 'confirm-dialog-cancel');
    await shot(page, 'confirm', width);
    await page.keyboard.press('Escape');
    await dialog.waitFor({ state: 'detached' });
    expect(await byTestId(page, `role-${editor}-editor`).getAttribute('aria-checked')).toBe('true');
    // Focus came back to where it was.
    await until('focus is back on the role chip', async () => (await page.evaluate(() => document.activeElement?.getAttribute('data-testid'))) === `role-${editor}-moderator`);

    await option.click();
    await byTestId(page, 'confirm-dialog-accept').click();
    await byTestId(page, `role-status-${editor}`).waitFor();
    expect(await byTestId(page, `role-${editor}-moderator`).getAttribute('aria-checked')).toBe('true');
    // Put back as it was.
    await byTestId(page, `role-${editor}-editor`).click();
    await byTestId(page, 'confirm-dialog-accept').click();
    await until('the role is back', async () => (await byTestId(page, `role-${editor}-editor`).getAttribute('aria-checked')) === 'true');
    expect(page.dialogs).toEqual([]);
    expect(page.problems).toEqual([]);
    await page.close();
  });

  it.each(['light', 'dark'] as const)('keeps text at 4.5:1 and more in the %s theme, following the system setting', async (scheme) => {
    const page = await open(width, scheme);
    await page.goto(`${h.base}/sign-in`);
    await byTestId(page, 'screen-sign-in').waitFor();
    await settled(page);
    const l = await pageLuminance(page);
    if (scheme === 'dark') expect(l).toBeLessThan(0.05);
    else expect(l).toBeGreaterThan(0.8);

    const checks: Record<string, string> = {
      'the heading': '[data-testid="screen-sign-in"] [role="heading"]',
      'muted text (the footer)': '[data-testid="footer"] [dir="auto"]',
      'a link': '[data-testid="screen-sign-in"] a[href]',
      'a primary button': '[data-testid="submit"] [dir="auto"]',
      'navigation': `[data-testid="${phone ? 'nav-bar' : 'nav-rail'}"] [data-testid="nav-check"] [dir="auto"]`,
    };
    for (const [what, selector] of Object.entries(checks)) {
      const c = await contrastOf(page, selector);
      expect([what, c.ratio >= 4.5, c]).toEqual([what, true, c]);
    }

    // The notices of each tone: "the four message styles" below measure their text in both themes.
    await shot(page, 'sign-in', width, scheme);
    expect(page.problems).toEqual([]);
    await page.close();
  });

  // Titles do not depend on the width: checked once, on the wide screen. A load opens the first route
  // and the first signed in; the others are reached within the app, where each must set its own title
  // over the one before (the server's page shell sets none for them).
  if (!phone) it('gives each route its own browser title, and a description for link previews', async () => {
    const page = await open(width);
    const titleIs = (want: string) => until(`the title is “${want}”`, async () => (await page.title()) === want);
    /** Opens a path (loading the page, or within the app), waits for its screen to render, then for the title it sets. */
    const visit = async (pathname: string, screen: string, want: string, how: 'load' | 'in-app' = 'in-app') => {
      if (how === 'load') await page.goto(`${h.base}${pathname}`);
      else await goInApp(page, `${h.base}${pathname}`);
      await byTestId(page, screen).waitFor();
      await titleIs(want);
    };
    await visit('/check', 'screen-check', 'Claim check — Counterweight', 'load');
    const description = await page.locator('meta[name="description"]').evaluateAll((els) => els.map((el) => el.getAttribute('content')));
    expect(description).toHaveLength(1);
    expect(description[0]).toMatch(/claim/i);
    await visit('/checks', 'screen-checks', 'Check kit — Counterweight');
    await visit('/sign-in', 'screen-sign-in', 'Sign in — Counterweight');
    await visit('/sign-up', 'screen-sign-up', 'Create an account — Counterweight');
    await visit('/no-such-page', 'screen-not-found', 'Page not found — Counterweight');
    await signInQuickly(page, h.base, admin, password);
    await visit('/account', 'screen-account', 'Account — Counterweight', 'load');
    await visit('/admin/audit', 'screen-audit', 'Audit log — Admin — Counterweight');
    await visit('/queue', 'screen-queue', 'Queue — Counterweight');
    expect(page.problems).toEqual([]);
    await page.close();
  });
});

describe('the four message styles', () => {
  /** The look of a notice: its tone, role, mark and colours, measured in the page. */
  const lookOf = (page: Page, id: string) =>
    page.evaluate(`(() => { ${COLOUR_HELPERS}
      const el = document.querySelector('[data-testid="${id}"]');
      const s = getComputedStyle(el);
      const title = el.querySelector('[dir="auto"]');
      return {
        tone: el.getAttribute('data-tone'), role: el.getAttribute('role'),
        mark: el.querySelector('svg') ? el.querySelector('svg').getAttribute('data-testid') : null,
        look: [s.backgroundColor, s.borderLeftColor, s.borderLeftWidth, s.borderTopStyle].join(' | '),
        text: ratio(rgb(getComputedStyle(title).color), bgOf(title)),
        word: title.textContent.split(':')[0],
      };
    })()`) as Promise<{ tone: string; role: string | null; mark: string; look: string; text: number; word: string }>;

  it.each([
    [390, 'light'],
    [1366, 'light'],
    [390, 'dark'],
    [1366, 'dark'],
  ] as const)('are told apart by mark, word, edge and colour, at %i px in the %s theme', async (width, scheme) => {
    const page = await open(width, scheme);
    const seen: Record<string, Awaited<ReturnType<typeof lookOf>>> = {};
    // Signed in before the one page load, so that the app goes from screen to screen without another
    // (a notice looks the same whoever reads it).
    await signInQuickly(page, h.base, contributor, password);

    // Error: a load that fails.
    await page.route('**/api/taxonomy**', (route) => route.abort('connectionrefused'));
    await page.goto(`${h.base}/`);
    await byTestId(page, 'taxonomy-error').waitFor();
    seen.error = await lookOf(page, 'taxonomy-error');
    await shot(page, 'error', width, scheme);
    await page.unroute('**/api/taxonomy**');

    // Empty and warning, before anything is sent: the contributor's own list, and the caution on the form.
    await goInApp(page, `${h.base}/account`);
    await byTestId(page, 'screen-account').waitFor();
    await networkQuiet(page);
    await settled(page);
    const empty = byTestId(page, 'my-submissions-empty');
    if (await empty.count()) {
      seen.empty = await lookOf(page, 'my-submissions-empty');
      await shot(page, 'empty', width, scheme, true);
    }
    await goInApp(page, `${h.base}/report`);
    await byTestId(page, 'sighting-caution').waitFor();
    seen.warning = await lookOf(page, 'sighting-caution');
    await shot(page, 'warning', width, scheme);

    // Success: a sighting sent (invented claim and source).
    await byTestId(page, 'sighting-title').fill(`A sealed cavity said to push without exhaust (${width} px, ${scheme})`);
    await byTestId(page, 'sighting-url').fill('https://pitch.example.org/sealed-cavity');
    await byTestId(page, 'sighting-citation').fill('Invented Newsletter, issue 4 (2026)');
    await byTestId(page, 'sighting-summary').fill('A closed metal cavity fed with microwaves is said to give a steady push with nothing leaving it.');
    await byTestId(page, 'sighting-submit').click();
    await byTestId(page, 'sighting-done').waitFor();
    seen.success = await lookOf(page, 'sighting-done');
    await shot(page, 'success', width, scheme);

    // The first run finds the list empty; later runs (after a sighting was sent) read an empty list elsewhere.
    if (!seen.empty) {
      await signInQuickly(page, h.base, 'editor.two@example.org', password);
      await page.goto(`${h.base}/account`);
      await byTestId(page, 'my-submissions-empty').waitFor();
      seen.empty = await lookOf(page, 'my-submissions-empty');
    }

    expect(seen.success).toMatchObject({ tone: 'success', role: 'status', mark: 'notice-mark-success', word: 'Done' });
    expect(seen.empty).toMatchObject({ tone: 'empty', role: null, mark: 'notice-mark-empty', word: 'Nothing here yet' });
    expect(seen.warning).toMatchObject({ tone: 'warning', role: null, mark: 'notice-mark-warning', word: 'Note' });
    expect(seen.error).toMatchObject({ tone: 'error', role: 'alert', mark: 'notice-mark-error', word: 'Problem' });
    // Four looks, no two alike, each with its text at 4.5:1 or more.
    expect(new Set(Object.values(seen).map((s) => s.look)).size).toBe(4);
    for (const [tone, s] of Object.entries(seen)) expect([tone, s.text >= 4.5, s.text]).toEqual([tone, true, s.text]);
    expect(page.dialogs).toEqual([]);
    await page.close();
  });
});
