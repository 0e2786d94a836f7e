/**
 * The words readers read, in Chromium at phone (390 px) and wide (1366 px) sizes, against the real
 * server and the starter library: the audit log tells events as sentences (no dotted action codes);
 * a refused upload names "the first file", not `files.0`; a worksheet prints powers of ten as
 * print does (10⁻ⁿ, never e-notation or a caret) and labels its names; a sighting's second figure
 * takes the kind its unit fits; and an image attachment previews for a moderator. Screenshots of
 * each screen at both widths go to test-output/screenshots/.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { minimalPng } from '../fixtures/files/samples';
import { byTestId, screenshotDir, settled, signInQuickly, startHarness, widest, type Harness } from '../support/browser';
import { until } from '../support/poll';

jest.setTimeout(300_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// The demo accounts seeded in development (content/demo/accounts.yml).
const contributor = 'contributor@example.org';
const moderator = 'moderator@example.org';
const admin = 'admin@example.org';

const text = async (page: Page, id: string) => ((await byTestId(page, id).first().textContent()) ?? '').trim();

/** Nothing sticks out sideways at this width. */
const shot = (page: Page, screen: string, width: number) => page.screenshot({ path: path.join(screenshotDir, `${screen}-${width}.png`), fullPage: true });

/** Dotted action codes as the services write them (user.role_changed, submission.accepted, …). */
const ACTION_CODE = /\b(?:user|entry|submission|synonyms)\.[a-z_]+\b/;

describe.each([390, 1366])('at %i px', (width) => {
  const height = width < 700 ? 844 : 900;
  // Invented test data: no real device, company or person.
  const title = `Sealed cavity drive with a photo (words test, ${width} px)`;

  it('prints a worksheet’s numbers with powers of ten and its names as labelled symbols', async () => {
    const page = await h.open(width, height);
    // 1 nW of input power: the bound P/c is 1e-9 W / 299 792 458 m/s = 3.336 × 10⁻¹⁸ N (c exact, SI Brochure 9th ed.).
    await page.goto(`${h.base}/worksheets/photon-rocket-bound?F=1%20mN&P=1e-9%20W`);
    await byTestId(page, 'step-F_bound').waitFor();
    const si = Number(await byTestId(page, 'step-F_bound').getAttribute('data-si'));
    expect(Math.abs(si - 1e-9 / 299_792_458) / si).toBeLessThan(1e-12);
    const shown = await text(page, 'step-F_bound');
    expect(shown).toMatch(/^3\.336 × 10⁻¹⁸ N$/);
    const ratio = await text(page, 'step-ratio');
    expect(ratio).toMatch(/× 10[⁰¹²³⁴⁵⁶⁷⁸⁹]+$/);
    // No e-notation or caret anywhere in the steps, the checks or the readings (the permalink keeps what was typed).
    const shownValues = await page.locator('[data-testid^="step-"], [data-testid^="wcheck-"], [data-testid$="-reading"]').allTextContents();
    expect(shownValues.length).toBeGreaterThan(4);
    for (const v of shownValues) expect(v).not.toMatch(/\d[eE][+-]?\d|10\^/);
    // The input's label carries its symbol, and a step's name shows as a symbol with its subscript.
    expect(await page.getByLabel('Input power, P', { exact: true }).count()).toBe(1);
    const row = byTestId(page, 'step-F_bound').locator('xpath=ancestor::*[@role="listitem"][1]');
    expect(await row.getByLabel('F bound', { exact: true }).count()).toBeGreaterThan(0);
    expect(await widest(page)).toBeLessThanOrEqual(width);
    await shot(page, 'worksheet', width);
  });

  it('lets the second figure take its kind from the unit, names a refused file in words, and previews an image for a moderator', async () => {
    const page = await h.open(width, height);
    await signInQuickly(page, h.base, contributor);
    await page.goto(`${h.base}/report`);
    await byTestId(page, 'screen-report').waitFor();
    await byTestId(page, 'sighting-title').fill(title);
    await byTestId(page, 'sighting-url').fill('https://pitch.example.org/cavity-drive-photo');
    await byTestId(page, 'sighting-summary').fill('Invented test data: a photo of a sealed cavity said to push with no propellant.');
    await byTestId(page, 'sighting-figure-add').click();
    await byTestId(page, 'sighting-figure-0-quantity').fill('12 mN');
    await byTestId(page, 'sighting-figure-add').click();
    await byTestId(page, 'sighting-figure-1-quantity').fill('3 kW');
    // The second row was thrust by default; "3 kW" is a power, so the kind follows.
    await until('the kind follows the unit', async () => (await byTestId(page, 'sighting-figure-1-kind-power').getAttribute('aria-checked')) === 'true');
    expect(Number(await byTestId(page, 'sighting-figure-1-si').getAttribute('data-si'))).toBe(3000);
    expect(await byTestId(page, 'sighting-figure-0-kind-thrust').getAttribute('aria-checked')).toBe('true');

    // A text file named like a picture: the browser calls it image/png, the server reads its bytes.
    const chooser = page.waitForEvent('filechooser');
    await byTestId(page, 'sighting-pick-files').click();
    await (await chooser).setFiles({ name: 'photo.png', mimeType: 'image/png', buffer: Buffer.from('not a picture at all\n') });
    await byTestId(page, 'sighting-file-0').waitFor();
    await byTestId(page, 'sighting-submit').click();
    await byTestId(page, 'sighting-error').waitFor();
    const problem = await text(page, 'sighting-error');
    expect(problem).toContain('the first file');
    expect(problem).not.toMatch(/files\.\d/);
    await byTestId(page, 'sighting-file-0-error').waitFor();
    expect(await widest(page)).toBeLessThanOrEqual(width);
    await shot(page, 'report', width);

    // The same sighting with a real PNG goes through.
    await byTestId(page, 'sighting-file-0-remove').click();
    const chooser2 = page.waitForEvent('filechooser');
    await byTestId(page, 'sighting-pick-files').click();
    await (await chooser2).setFiles({ name: 'stand-photo.png', mimeType: 'image/png', buffer: minimalPng() });
    await byTestId(page, 'sighting-file-0').waitFor();
    await byTestId(page, 'sighting-submit').click();
    await byTestId(page, 'sighting-done').waitFor();
    const href = (await byTestId(page, 'sighting-done-link').getAttribute('href'))!;
    const id = Number(/^\/submissions\/(\d+)$/.exec(href)?.[1]);
    expect(id).toBeGreaterThan(0);

    // The moderator sees the picture itself, decoded by the browser from the preview address.
    const mod = await h.open(width, height);
    await signInQuickly(mod, h.base, moderator);
    await mod.goto(`${h.base}/queue/${id}`);
    await byTestId(mod, 'screen-queue-item').waitFor();
    expect(await text(mod, 'item-status')).toBe('Not picked up yet');
    const preview = mod.locator('[data-testid^="attachment-"][data-testid$="-preview"]');
    await preview.first().waitFor();
    const img = preview.first().locator('img');
    await until('the preview image has loaded', async () => (await img.count()) > 0 && (await img.first().evaluate((el) => (el as HTMLImageElement).complete && (el as HTMLImageElement).naturalWidth === 1)));
    const src = (await img.first().getAttribute('src'))!;
    expect(src).toMatch(/\/api\/attachments\/\d+\?view=inline$/);
    const res = await mod.request.get(new URL(src, h.base).toString());
    expect(res.headers()['content-disposition']).toMatch(/^inline;/);
    expect(res.headers()['x-content-type-options']).toBe('nosniff');
    await byTestId(mod, 'item-claim').click();
    await until('the item is in hand', async () => (await text(mod, 'item-status')) === 'In hand');
    await settled(mod);
    expect(await widest(mod)).toBeLessThanOrEqual(width);
    await shot(mod, 'queue-item', width);
  });

  it('tells the audit log as sentences, with no action codes', async () => {
    const page = await h.open(width, height);
    await signInQuickly(page, h.base, admin);
    await page.goto(`${h.base}/admin/audit`);
    await byTestId(page, 'audit-list').waitFor();
    await settled(page);
    const sentences = await byTestId(page, 'audit-sentence').allTextContents();
    expect(sentences.length).toBeGreaterThan(0);
    for (const s of sentences) expect(s).toMatch(/^\S.*\.$/);
    // The moderator's pick-up of the sighting above is one of them, naming it by its title.
    expect(sentences.some((s) => s.includes('picked up the sighting') && s.includes(title))).toBe(true);
    expect((await byTestId(page, 'audit-list').textContent()) ?? '').not.toMatch(ACTION_CODE);
    expect(await widest(page)).toBeLessThanOrEqual(width);
    await shot(page, 'audit', width);
  });
});
