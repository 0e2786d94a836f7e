/**
 * The entry page as a reader uses it, in Chromium at phone (390 px) and wide (1366 px) sizes: the
 * table of contents (sticky beside the text on a wide screen, a jump menu on a phone), the Cite
 * action at the top, display math, Markdown cautions, related entries by title, the page title,
 * printing (print media and a real PDF), and the word-by-word comparison of two versions.
 * Screenshots go to test-output/screenshots/ as entry-<width>.png and entry-print-<width>.png.
 */
import fs from 'node:fs';
import path from 'node:path';
import type { Locator, Page } from 'playwright-core';
import { byTestId, screenshotDir, settled, startHarness, type Harness } from '../support/browser';
import { Client } from '../support/app';
import { until } from '../support/poll';
import { approveDraft, expectStatus, publishNewEntry, startRevision, submitDraft } from '../support/workflow';

jest.setTimeout(240_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// A starter entry with a one-line $$…$$ equation in "Why it fails", inline math, a caution written over
// several source lines, worksheets and two related entries (content/entries/gyroscopic-thruster.md).
const SLUG = 'gyroscopic-thruster';

interface EntryJson {
  version: { number: number; content: { title: string; related: string[]; worksheets: { name: string }[] } };
}
const getJson = async <T>(url: string): Promise<T> => (await (await fetch(`${h.base}${url}`)).json()) as T;

/** The box of an element in the viewport's coordinates. */
const box = (l: Locator) => l.evaluate((el) => el.getBoundingClientRect().toJSON() as DOMRect);

/** Whether any part of the element is inside the viewport. */
async function inViewport(page: Page, l: Locator): Promise<boolean> {
  const r = await box(l);
  const vh = page.viewportSize()!.height;
  return r.bottom > 0 && r.top < vh && r.height > 0;
}

/** Scrolls the app's scrolling box (the page scrolls inside it, not the document) to its very end. */
async function scrollToEnd(page: Page): Promise<void> {
  await byTestId(page, 'screen-entry').evaluate((el) => {
    let node: Element | null = el;
    while (node && !(node.scrollHeight > node.clientHeight && /(auto|scroll)/.test(getComputedStyle(node).overflowY))) node = node.parentElement;
    if (!node) throw new Error('no scrolling box around the entry');
    node.scrollTop = node.scrollHeight;
  });
  await settled(page);
}

describe.each([
  [390, 844],
  [1366, 900],
])('the entry page at %i px', (width, height) => {
  const wide = width >= 960;

  // One load of the entry at this size for both tests: the printout is checked first (it only reads
  // the page), then the screen test puts the page back to screen media and does what a reader does.
  let page: Page & { problems: string[] };
  beforeAll(async () => {
    page = await h.page(width, height);
    await page.goto(`${h.base}/entries/${SLUG}`);
    await byTestId(page, 'entry-section-whyItFails').waitFor();
    await settled(page);
  });
  afterAll(() => page?.close());

  it('prints the entry without navigation or input boxes, values as text, the permanent address and version at the end', async () => {
    const { version } = await getJson<EntryJson>(`/api/entries/${SLUG}`);
    const footer = byTestId(page, 'entry-print-footer');
    // On screen the printout's footer is not shown.
    expect(await footer.isVisible()).toBe(false);

    await page.emulateMedia({ media: 'print' });
    await settled(page);
    for (const nav of ['nav-rail', 'nav-bar', 'entry-toc', 'entry-jump', 'entry-cite-action', 'cite-panel', 'versions-list']) {
      expect(await byTestId(page, nav).isVisible()).toBe(false);
    }
    expect(await page.locator('[role="banner"]').isVisible()).toBe(false);
    expect(await page.locator('[role="button"]:visible, button:visible, textarea:visible').count()).toBe(0);

    // A worksheet's inputs print their values as plain text: no border, no background, the value kept.
    const sheet = byTestId(page, `worksheet-${version.content.worksheets[0].name}`);
    const input = sheet.locator('input').first();
    const look = await input.evaluate((el) => {
      const s = getComputedStyle(el);
      return { border: s.borderTopWidth, background: s.backgroundColor, value: (el as HTMLInputElement).value };
    });
    expect(look.border).toBe('0px');
    expect(look.background).toBe('rgba(0, 0, 0, 0)');
    expect(look.value).not.toBe('');

    // The text uses the page's width; the sources come after the text (related entries included); the footer
    // with the version and its permanent address closes the printout.
    expect((await box(byTestId(page, 'entry-body'))).width).toBeGreaterThan(width * 0.8);
    expect(await footer.isVisible()).toBe(true);
    const footerText = (await footer.textContent())!;
    expect(footerText).toContain(`version ${version.number}`);
    expect(footerText).toContain(`${h.base}/entries/${SLUG}/v/${version.number}`);
    const order = await page.evaluate(() =>
      ['entry-section-whyItFails', 'entry-section-cautions', 'entry-section-related', 'entry-section-sources', 'entry-print-footer'].map(
        (id) => document.querySelector(`[data-testid="${id}"]`)!.getBoundingClientRect().top,
      ),
    );
    expect([...order].sort((a, b) => a - b)).toEqual(order);
    await page.screenshot({ path: path.join(screenshotDir, `entry-print-${width}.png`), fullPage: true });

    // A real PDF: the whole entry over several pages, not one screenful of a scrolling box.
    const pdf = await page.pdf({ format: 'A4', printBackground: true });
    expect(pdf.subarray(0, 5).toString('latin1')).toBe('%PDF-');
    const pages = pdf.toString('latin1').match(/\/Type\s*\/Page(?![s\w])/g)?.length ?? 0;
    expect(pages).toBeGreaterThanOrEqual(3);
    if (wide) fs.writeFileSync(path.join(screenshotDir, 'entry-print.pdf'), pdf);
    expect(page.problems).toEqual([]);
  });

  it('has a table of contents, a Cite action, display math, Markdown cautions, related titles and its own title', async () => {
    const { version } = await getJson<EntryJson>(`/api/entries/${SLUG}`);
    await page.emulateMedia({ media: 'screen' });
    await settled(page);

    // The browser tab names the entry; a description for link previews is set from its brief.
    expect(await page.title()).toBe(`${version.content.title} — Counterweight`);
    const description = await page.locator('meta[name="description"]').getAttribute('content');
    expect(description).toMatch(/^Gyroscopes behave in surprising ways/);

    // Nothing runs off the side.
    expect(await page.evaluate(() => document.documentElement.scrollWidth)).toBeLessThanOrEqual(width);

    // Display math: the one-line $$…$$ is a centred block in KaTeX's display mode, taller than inline math.
    const why = byTestId(page, 'entry-section-whyItFails');
    const display = why.locator('.katex-display').first();
    await display.waitFor();
    expect(await display.evaluate((el) => getComputedStyle(el).textAlign)).toBe('center');
    expect(await display.locator('math').first().getAttribute('display')).toBe('block');
    const outer = await box(display);
    // The equation's ink: KaTeX's .katex box spans the line in display mode, the .base boxes hold the glyphs.
    const inner = await display.evaluate((el) => {
      const bases = Array.from(el.querySelectorAll('.katex-html > .base')).map((b) => b.getBoundingClientRect());
      const left = Math.min(...bases.map((b) => b.left));
      const right = Math.max(...bases.map((b) => b.right));
      const top = Math.min(...bases.map((b) => b.top));
      const bottom = Math.max(...bases.map((b) => b.bottom));
      return { left, right, width: right - left, height: bottom - top };
    });
    const inlineMath = why.locator('p > .katex').first();
    const inlineBox = await box(inlineMath.locator('.katex-html'));
    // Centred: the space left and right of the equation is the same to a pixel (it is narrower than the column).
    expect(inner.width).toBeLessThan(outer.width);
    expect(Math.abs(inner.left - outer.left - (outer.right - inner.right))).toBeLessThanOrEqual(1.5);
    expect(inner.height).toBeGreaterThan(inlineBox.height);
    const fontSize = (l: Locator) => l.evaluate((el) => parseFloat(getComputedStyle(el).fontSize));
    expect(await fontSize(display.locator('.katex').first())).toBeGreaterThanOrEqual(await fontSize(inlineMath));

    // The caution is Markdown: its source's line breaks are spaces (white space collapses), not hard breaks.
    const caution = byTestId(page, 'entry-cautions').locator('.cw-md');
    expect(await caution.evaluate((el) => getComputedStyle(el).whiteSpace)).toBe('normal');
    expect(await caution.locator('p').count()).toBe(1);

    // Related entries by their titles, linked.
    for (const slug of version.content.related) {
      const related = await getJson<EntryJson>(`/api/entries/${slug}`);
      const link = byTestId(page, `related-${slug}`);
      await until(`the related entry ${slug} is named by its title`, async () => (await link.textContent()) === related.version.content.title);
      expect(await link.getAttribute('href')).toBe(`/entries/${slug}`);
    }

    await page.screenshot({ path: path.join(screenshotDir, `entry-${width}.png`) });

    if (wide) {
      expect(await byTestId(page, 'entry-jump').count()).toBe(0);
      const toc = byTestId(page, 'entry-toc');
      expect(await toc.isVisible()).toBe(true);
      // Text column and contents side by side, the worksheets inside the text column at its full width.
      const text = await box(byTestId(page, 'entry-body'));
      const tocBox = await box(toc);
      expect(tocBox.left).toBeGreaterThanOrEqual(text.right);
      const sheet = await box(byTestId(page, `worksheet-${version.content.worksheets[0].name}`));
      expect(sheet.width).toBeGreaterThan(text.width * 0.95);

      // A contents line takes the reader to its section.
      await byTestId(page, 'toc-cautions').click();
      await until('the Cautions section is at the top of the view', async () => {
        const top = (await box(byTestId(page, 'entry-section-cautions'))).top;
        return top >= -2 && top < 120;
      });
      // The contents mark the section being read.
      await until('the contents mark Cautions as the section in view', async () => (await byTestId(page, 'toc-cautions').getAttribute('aria-current')) === 'location');
      expect(await toc.locator('[aria-current="location"]').count()).toBe(1);
      // Sticky: scrolled to the very end of a long page, the contents are still in view.
      await scrollToEnd(page);
      expect(await inViewport(page, byTestId(page, 'entry-section-whyItFails'))).toBe(false);
      expect(await inViewport(page, toc)).toBe(true);
      const tocTop = (await box(toc)).top;
      expect(tocTop).toBeGreaterThanOrEqual(0);
      expect(tocTop).toBeLessThan(height / 2);
    } else {
      expect(await byTestId(page, 'entry-toc').count()).toBe(0);
      const toggle = byTestId(page, 'entry-jump-toggle');
      expect(await toggle.getAttribute('aria-expanded')).toBe('false');
      // A touch target of at least 44 px, one line of label.
      expect((await box(toggle)).height).toBeGreaterThanOrEqual(44);
      await toggle.click();
      const list = byTestId(page, 'entry-jump-list');
      await list.waitFor();
      await list.locator('[data-testid="jump-sources"]').click();
      await until('the Sources section is in view below the jump menu', async () => {
        const top = (await box(byTestId(page, 'entry-section-sources'))).top;
        const menuBottom = (await box(byTestId(page, 'entry-jump'))).bottom;
        return top >= menuBottom - 2 && top < menuBottom + 120;
      });
      expect(await list.count()).toBe(0);
      // The jump menu stays at the top of the screen while the page scrolls.
      await scrollToEnd(page);
      const menu = await box(byTestId(page, 'entry-jump'));
      expect(menu.top).toBeGreaterThanOrEqual(0);
      expect(menu.top).toBeLessThan(120);
    }

    // The Cite action near the title takes the reader to the citation panel.
    await byTestId(page, 'screen-entry').evaluate((el) => el.scrollIntoView({ block: 'start' }));
    const cite = byTestId(page, 'entry-cite-action');
    expect(await inViewport(page, cite)).toBe(true);
    await cite.click();
    await until('the citation panel is in view', async () => inViewport(page, byTestId(page, 'cite-panel')));
    expect(page.problems).toEqual([]);
  });
});

it('compares two versions word by word: a changed number is one changed word, moved line breaks are no change', async () => {
  const author = await Client.start(h.base);
  const reviewer = await Client.start(h.base);
  for (const [c, email] of [
    [author, 'editor.one@example.org'],
    [reviewer, 'editor.two@example.org'],
  ] as const) {
    expectStatus(`signing in ${email}`, await c.post('/api/auth/sign-in', { email, password: 'counterweight-demo-2026' }), 200);
  }
  const slug = 'word-diff-test-entry';
  const content = {
    title: 'A scale that reads light under a spinning rotor',
    aliases: [],
    mechanismClass: 'gyroscopic-drive',
    laws: ['linear-momentum'],
    inBrief: 'An invented test entry.',
    howItIsPitched: 'A rig on a scale reads 3.3 N below its weight\nwhile its rotor spins.',
    whyItFails: 'The support force equals the weight while the centre of mass does not accelerate.',
    sources: [],
  };
  await publishNewEntry(author, reviewer, slug, content);
  const draft = await startRevision(author, slug);
  const revised = { ...content, howItIsPitched: 'A rig on a scale reads 3.34 N below its weight while\nits rotor spins.' };
  const saved = expectStatus('saving the revision', await author.put(`/api/drafts/${draft.id}`, { content: revised, lockVersion: draft.lockVersion }), 200);
  const submitted = await submitDraft(author, { id: draft.id, lockVersion: saved.body.draft.lockVersion });
  expect(await approveDraft(reviewer, submitted, 'A more exact reading.')).toBe(2);

  for (const width of [390, 1366]) {
    const page = await h.page(width, 900);
    await page.goto(`${h.base}/entries/${slug}`);
    const diff = byTestId(page, 'diff-view');
    await diff.waitFor();
    await settled(page);
    const section = diff.locator('[data-testid="diff-section-How it is pitched"]');
    expect(await section.locator('[data-testid="diff-removed"]').allTextContents()).toEqual(['3.3']);
    expect(await section.locator('[data-testid="diff-added"]').allTextContents()).toEqual(['3.34']);
    // No other section changed: the moved line break is not reported.
    expect(await diff.locator('[data-testid^="diff-section-"]').count()).toBe(1);
    await section.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(screenshotDir, `entry-diff-${width}.png`) });
    expect(page.problems).toEqual([]);
    await page.context().close();
  }
});

it('prints a claim check as its result: no form, no switches, no saving, no navigation', async () => {
  // An invented claim with figures the kit can check (a photon-pressure bound; c exact, BIPM SI Brochure 9th ed.).
  const claim = 'A sealed microwave cavity fed with 1 kW of RF produced 2 mN of thrust, the makers say, with nothing leaving it.';
  for (const width of [390, 1366]) {
    const page = await h.page(width, 900);
    await page.goto(`${h.base}/check`);
    await byTestId(page, 'claim-text').fill(claim);
    await byTestId(page, 'claim-run').click();
    // The first check of a server loads the claim reader in a worker thread: slow on two busy cores.
    // The first check of a server loads the claim reader in a worker thread; on busy cores that can pass the
    // server's time limit, and the reader then does what the error says: retry (the worker is warm by then).
    const done = page.locator('[data-testid="claim-paragraph-body"], [data-testid="claim-error"]').first();
    for (let attempt = 1; ; attempt += 1) {
      await done.waitFor({ timeout: 120_000 });
      if ((await byTestId(page, 'claim-error').count()) === 0) break;
      const why = await byTestId(page, 'claim-error').textContent();
      if (attempt === 3 || !why?.includes('computation_too_long')) throw new Error(`the check failed: ${why}`);
      await byTestId(page, 'claim-error').locator('[role="button"]').first().click();
      await byTestId(page, 'claim-error').waitFor({ state: 'detached' });
    }
    await settled(page);
    expect(await byTestId(page, 'claim-form').isVisible()).toBe(true);

    await page.emulateMedia({ media: 'print' });
    await settled(page);
    for (const hidden of ['claim-form', 'claim-variant', 'claim-style', 'claim-save', 'claim-figures-intro', width >= 960 ? 'nav-rail' : 'nav-bar']) {
      expect(await byTestId(page, hidden).isVisible()).toBe(false);
    }
    expect(await page.locator('[role="button"]:visible, button:visible, textarea:visible, [role="radiogroup"]:visible').count()).toBe(0);
    expect(await byTestId(page, 'claim-paragraph-body').isVisible()).toBe(true);
    // The claim's own words print, with its figures marked, where the result shows them.
    expect(await byTestId(page, 'claim-result').textContent()).toContain('1 kW');
    // No heading is left standing over nothing (the saving section goes with its heading).
    const headings = await byTestId(page, 'claim-result').locator('[role="heading"]:visible').allTextContents();
    expect(headings).not.toContain('Save and share');
    await page.screenshot({ path: path.join(screenshotDir, `check-print-${width}.png`), fullPage: true });
    expect(page.problems).toEqual([]);
    await page.context().close();
  }
});
