/**
 * Citing a revision in Chromium, at phone (390 px) and wide (1366 px) sizes: an entry whose version 1
 * one editor wrote and whose version 2 another wrote (a third reviewed both). Its version-2 page's
 * Cite panel names both authors, first contributor first, in every format, credits the reviewer
 * apart, and offers the data formats as files. Screenshots: test-output/screenshots/entry-cite-<width>.png.
 */
import path from 'node:path';
import { Client, demo } from '../support/app';
import { byTestId, screenshotDir, settled, startHarness, type Harness } from '../support/browser';
import { until } from '../support/poll';
import { makeEditor, publishTwoAuthorEntry } from '../support/workflow';
import { CITE_FORMATS } from '../../shared/api/constants';

jest.setTimeout(240_000);

const slug = 'browser-two-author-wheel';
const [aGiven, aFamily] = demo.editor.displayName.split(' ');
const [bGiven, bFamily] = demo.contributor.displayName.split(' ');

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
  const signedIn = async (email: string) => {
    const c = await Client.start(h.base);
    const res = await c.post('/api/auth/sign-in', { email, password: demo.password });
    if (res.status !== 200) throw new Error(`sign-in as ${email} answered ${res.status}`);
    await c.session();
    return c;
  };
  await makeEditor(await signedIn(demo.admin.email), demo.contributor.email);
  await publishTwoAuthorEntry(
    await signedIn(demo.editor.email),
    await signedIn(demo.contributor.email),
    await signedIn(demo.editor2.email),
    slug,
    {
      title: 'Wheels whose weights swing outward',
      mechanismClass: 'overbalanced-wheel',
      laws: ['energy'],
      inBrief: 'Weights that swing out on the way down swing back in on the way up: each turn ends where it began.',
      howItIsPitched: 'Hinged arms fall open on one side.',
      whyItFails: 'Gravity is conservative: the work over a closed path is zero.',
    },
    { inBrief: 'A wheel with hinged weights returns to the same state each turn, so it gains no energy from gravity.' },
  );
});
afterAll(() => h?.close());

/** How each format writes the two authors (the server tests check the formats against their manuals). */
const authorsIn: Record<(typeof CITE_FORMATS)[number], RegExp> = {
  apa: new RegExp(`${aFamily}, ${aGiven[0]}\\., & ${bFamily}, ${bGiven[0]}\\.`),
  vancouver: new RegExp(`${aFamily} ${aGiven[0]}, ${bFamily} ${bGiven[0]}\\.`),
  harvard: new RegExp(`${aFamily}, ${aGiven[0]}\\. and ${bFamily}, ${bGiven[0]}\\.`),
  bibtex: new RegExp(`author = \\{${aFamily}, ${aGiven} and ${bFamily}, ${bGiven}\\}`),
  ris: new RegExp(`AU {2}- ${aFamily}, ${aGiven}\\s+AU {2}- ${bFamily}, ${bGiven}`),
  'csl-json': new RegExp(`"family": "${aFamily}"[\\s\\S]*"family": "${bFamily}"`),
};

for (const [width, height] of [
  [390, 844],
  [1366, 900],
] as const) {
  it(`cites a two-author revision in every format at ${width} px`, async () => {
    const page = await h.open(width, height);
    await page.goto(`${h.base}/entries/${slug}/v/2`);
    await byTestId(page, 'screen-entry').waitFor();
    const panel = byTestId(page, 'cite-panel');
    await panel.scrollIntoViewIfNeeded();
    for (const format of CITE_FORMATS) {
      await byTestId(page, `cite-format-${format}`).click();
      await until(`the ${format} citation names both authors in order`, async () => authorsIn[format].test((await byTestId(page, 'cite-text').textContent()) ?? ''));
      expect(await byTestId(page, 'cite-text').textContent()).toContain(`/entries/${slug}/v/2`);
    }
    expect(await byTestId(page, 'cite-credits').textContent()).toBe(`Written by ${demo.editor.displayName} and ${demo.contributor.displayName}; reviewed by ${demo.editor2.displayName}.`);

    // Each data format as a file: the link asks for the download, and the server sends the file.
    for (const [format, ext, type] of [
      ['bibtex', 'bib', 'application/x-bibtex'],
      ['ris', 'ris', 'application/x-research-info-systems'],
      ['csl-json', 'json', 'application/vnd.citationstyles.csl+json'],
    ]) {
      const link = byTestId(page, `cite-download-${format}`);
      expect(await link.getAttribute('download')).toBe(`${slug}-v2.${ext}`);
      const res = await page.request.get(new URL((await link.getAttribute('href'))!, h.base).toString());
      expect([res.status(), res.headers()['content-type'], res.headers()['content-disposition']]).toEqual([200, `${type}; charset=utf-8`, `attachment; filename="${slug}-v2.${ext}"`]);
      expect(authorsIn[format as 'bibtex'].test(await res.text())).toBe(true);
      // A touch target of 44 px at least.
      expect((await link.boundingBox())!.height).toBeGreaterThanOrEqual(44);
    }

    // Nothing runs off the side of the page.
    expect(await page.evaluate(() => document.documentElement.scrollWidth <= window.innerWidth)).toBe(true);
    await byTestId(page, 'cite-format-apa').click();
    await until('the APA citation is back', async () => authorsIn.apa.test((await byTestId(page, 'cite-text').textContent()) ?? ''));
    await settled(page);
    await panel.scrollIntoViewIfNeeded();
    await page.screenshot({ path: path.join(screenshotDir, `entry-cite-${width}.png`) });
    expect(page.problems).toEqual([]);
    await page.context().close();
  });
}
