/**
 * The Desk in Chromium at phone (390 px) and wide (1366 px) sizes, against the real server and the
 * built web app (issue 15, "The editor"):
 * - an editor writes a new entry: the live preview sits beside the fields on a wide screen and is
 *   one tap away on a phone (tab labels on one line); a field's problem appears once the field is
 *   left, in our words (no zod defaults); the Other names box grows with its text; the first save
 *   moves the address to the draft's own (no extra history entry) and a reload keeps the draft; a
 *   formula KaTeX cannot parse blocks "Send for review", naming the field and the line;
 * - another editor reviews a revision: the changes against the published version are shown before
 *   the approve button; approving lands on the version just published; the draft's old address then
 *   says it was published and links to that version.
 * Screenshots: desk-editor-*, desk-preview-390, desk-review-* in test-output/screenshots/.
 * All texts are invented test data.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { demo } from '../support/app';
import { byTestId, screenshotDir, settled, signInQuickly, startHarness, type Harness } from '../support/browser';
import { until } from '../support/poll';
import { saveDraft, signedInAt, startRevision, submitDraft } from '../support/workflow';

jest.setTimeout(300_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

/** zod 4's default wording ("Too small: expected string to have >=3 characters"), which must never reach the screen. */
const ZOD_DEFAULTS = /expected (string|number|array)|Too small|Too big|Invalid input|>=|<=/;

const sizes = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1366, height: 900 },
] as const;

const shot = (page: Page, name: string) => page.screenshot({ path: path.join(screenshotDir, name), fullPage: true });
const text = async (page: Page, testID: string) => (await byTestId(page, testID).first().textContent()) ?? '';

describe.each(sizes)('the editor at $width px', ({ width, height }) => {
  it('previews, tells problems in our words after a field is left, moves to the draft’s address, and blocks a bad formula', async () => {
    const page = await h.open(width, height);
    await signInQuickly(page, h.base, demo.editor.email);
    await page.goto(`${h.base}/desk/new`);
    await byTestId(page, 'entry-editor').waitFor();
    expect(await page.title()).toBe('New entry — Counterweight');
    const historyAtStart = await page.evaluate(() => history.length);

    // A title too short: nothing is said while typing, the problem shows once the field is left, in our words.
    await byTestId(page, 'editor-field-title').fill('ab');
    expect(await byTestId(page, 'editor-error-title').count()).toBe(0);
    await byTestId(page, 'editor-field-title').press('Tab');
    expect(await text(page, 'editor-error-title')).toBe('Give the title at least 3 characters.');
    // Sending too early lists every missing part by name, still in our words.
    await byTestId(page, 'submit-review').click();
    await byTestId(page, 'submit-missing').waitFor();
    expect(await text(page, 'submit-missing-whyItFails')).toBe('Why it fails: Write the technical objection.');
    expect(await page.locator('body').innerText()).not.toMatch(ZOD_DEFAULTS);

    // The preview: beside the fields on a wide screen; on a phone one tap away, its tab labels on one line.
    if (width >= 960) {
      expect(await byTestId(page, 'editor-mode').count()).toBe(0);
      const fields = (await byTestId(page, 'editor-field-title').boundingBox())!;
      const preview = (await byTestId(page, 'editor-preview').boundingBox())!;
      expect(preview.x).toBeGreaterThanOrEqual(fields.x + fields.width);
    } else {
      for (const tab of ['editor-mode-edit', 'editor-mode-preview']) {
        const label = byTestId(page, tab).locator('div[dir="auto"]');
        const box = (await label.boundingBox())!;
        const lineHeight = await label.evaluate((el) => parseFloat(getComputedStyle(el).lineHeight));
        // One line of text, and a touch target of at least 44 px.
        expect(box.height).toBeLessThanOrEqual(lineHeight + 1);
        expect((await byTestId(page, tab).boundingBox())!.height).toBeGreaterThanOrEqual(44);
      }
      expect(await byTestId(page, 'editor-preview').count()).toBe(0);
      await byTestId(page, 'editor-mode-preview').click();
      await byTestId(page, 'editor-preview').waitFor();
      expect(await byTestId(page, 'editor-field-title').count()).toBe(0);
      await settled(page);
      await shot(page, 'desk-preview-390.png');
      await byTestId(page, 'editor-mode-edit').click();
      await byTestId(page, 'editor-field-title').waitFor();
    }

    // The Other names box grows with its names instead of scrolling inside itself.
    const aliases = byTestId(page, 'editor-field-aliases');
    const before = (await aliases.boundingBox())!.height;
    await aliases.fill(['sealed light drive', 'photon tin engine', 'mirror-box thruster', 'closed cavity drive', 'reflex light motor', 'trapped-beam drive'].join('\n'));
    await until('the Other names box has grown', async () => (await aliases.boundingBox())!.height > before * 1.5);
    expect(await aliases.evaluate((el) => el.scrollHeight <= el.clientHeight + 2)).toBe(true);

    // Every required part, with a formula KaTeX cannot parse on line 3 of Why it fails.
    const slug = `sealed-light-tin-${width}`;
    await byTestId(page, 'editor-field-title').fill('Thrust from light sealed in a tin');
    await byTestId(page, 'editor-field-slug').fill(slug);
    await page.locator('[data-testid^="class-pick-"]').first().click();
    await page.locator('[data-testid^="law-pick-"]').first().click();
    await byTestId(page, 'editor-field-inBrief').fill('Light sealed in a tin pushes on every wall alike, so the tin goes nowhere.');
    await byTestId(page, 'editor-field-howItIsPitched').fill('The tin is said to push harder at its narrow end.');
    await byTestId(page, 'editor-field-whyItFails').fill('Momentum of light and tin together is conserved.\n\nThe bound is $F = \\fra{P}{c}$ for anything that emits.');

    // The first save makes the draft; the address becomes the draft's own, replacing /desk/new.
    await until('the address is the draft’s', async () => /\/desk\/drafts\/\d+$/.test(page.url()));
    const draftUrl = page.url();
    expect(await page.evaluate(() => history.length)).toBe(historyAtStart);
    await until('the draft is saved', async () => /^Saved /.test(await text(page, 'save-status')));

    // The bad formula blocks sending, naming the field and the line; KaTeX's own words follow.
    await byTestId(page, 'submit-blocked').waitFor();
    expect(await text(page, 'submit-blocked-whyItFails')).toMatch(/^Why it fails, line 3: KaTeX says Undefined control sequence: \\fra\.$/);
    expect(await byTestId(page, 'submit-review').getAttribute('aria-disabled')).toBe('true');
    expect(await text(page, 'submit-why')).toContain('held until KaTeX can read every formula');
    // The page scrolls inside the app's frame: bring the blocked button into view for the picture.
    await byTestId(page, 'submit-blocked').scrollIntoViewIfNeeded();
    await settled(page);
    await shot(page, `desk-editor-${width}.png`);

    // A reload keeps the draft at its address.
    await page.reload();
    await byTestId(page, 'entry-editor').waitFor();
    expect(page.url()).toBe(draftUrl);
    expect(await byTestId(page, 'editor-field-title').inputValue()).toBe('Thrust from light sealed in a tin');
    expect(await page.title()).toBe('Draft: Thrust from light sealed in a tin — Counterweight');
    await byTestId(page, 'submit-blocked').waitFor();

    // Mended, the draft saves and goes to review.
    await byTestId(page, 'editor-field-whyItFails').fill('Momentum of light and tin together is conserved.\n\nThe bound is $F = \\frac{P}{c}$ for anything that emits.');
    await until('the formula reads again', async () => (await byTestId(page, 'submit-blocked').count()) === 0);
    await until('the mended draft is saved', async () => /^Saved /.test(await text(page, 'save-status')));
    await byTestId(page, 'submit-review').click();
    await byTestId(page, 'draft-read-only').waitFor();
    expect(page.problems).toEqual([]);
    await page.context().close();
  });
});

describe.each(sizes)('reviewing a revision at $width px', ({ width, height }) => {
  it('shows the changes before approving, lands on the published version, and the old address explains', async () => {
    // A starter entry revised by the first demo editor through the API: one number changed, one sentence added.
    const slug = width >= 960 ? 'demon-loop' : 'buoyancy-wheel';
    const author = await signedInAt(h.base, demo.editor.email, demo.password);
    const current = (await author.get(`/api/entries/${slug}`)).body.version;
    const started = await startRevision(author, slug);
    const added = `Revision note for the reviewer at ${width} px.`;
    const content = { ...current.content, whyItFails: `${current.content.whyItFails}\n\n${added}` };
    const draft = await submitDraft(author, await saveDraft(author, started, content));

    const page = await h.open(width, height);
    await signInQuickly(page, h.base, demo.editor2.email);
    await page.goto(`${h.base}/desk/drafts/${draft.id}`);
    const panel = byTestId(page, 'review-panel');
    await panel.waitFor();
    const diff = panel.locator('[data-testid="diff-view"]');
    await diff.waitFor();
    expect(await diff.textContent()).toContain(`From version ${current.number}, as published to this draft`);
    const section = panel.locator('[data-testid="diff-section-Why it fails"]');
    expect(await section.locator('[data-testid="diff-added"]').allTextContents()).toEqual(expect.arrayContaining([expect.stringContaining('Revision note for the reviewer')]));
    // The changes come before the approve button.
    const diffBox = (await diff.boundingBox())!;
    const approveBox = (await byTestId(page, 'approve').boundingBox())!;
    expect(diffBox.y + diffBox.height).toBeLessThanOrEqual(approveBox.y);
    await settled(page);
    await shot(page, `desk-review-${width}.png`);

    await byTestId(page, 'editor-field-change-note').fill('Adds a note on the balance used.');
    await byTestId(page, 'approve').click();
    const published = `${h.base}/entries/${slug}/v/${current.number + 1}`;
    await until('the reviewer is on the published version', async () => page.url() === published).catch(async (err) => {
      throw new Error(`${(err as Error).message}: at ${page.url()}, ${await page.locator('[data-testid="review-error"]').allTextContents()}`);
    });
    await byTestId(page, 'screen-entry').waitFor();

    // The draft's old address now says what became of it.
    await page.goto(`${h.base}/desk/drafts/${draft.id}`);
    await byTestId(page, 'draft-published').waitFor();
    expect(await text(page, 'draft-published')).toContain(`version ${current.number + 1}`);
    expect(await byTestId(page, 'draft-published-link').getAttribute('href')).toBe(`/entries/${slug}/v/${current.number + 1}`);
    // Chromium logs the 404 of the old address as a console error; page errors (script failures) there are none.
    expect(page.problems).toEqual([]);
    await page.context().close();
  });
});
