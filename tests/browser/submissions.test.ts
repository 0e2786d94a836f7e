/**
 * Sightings end to end in Chromium at phone size, against the real server, its fake SMTP server and
 * the starter library: a contributor reports a sighting with a claimed figure and a small PDF (read
 * by its content on the server), sees it on their account as waiting; a moderator, in a fresh
 * context, finds it in the Queue, downloads the attachment (sent as an attachment, never shown in the
 * page), takes the item up and accepts it onto the resonant-cavity entry; the entry page lists it
 * under "Seen in the wild", the contributor's page says it was accepted, and the contributor got the
 * decision by e-mail. Screenshots go to test-output/screenshots/.
 */
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Page } from 'playwright-core';
import { byTestId, screenshotDir, signInThroughForm, startHarness, widest, type Harness } from '../support/browser';
import { until } from '../support/poll';

jest.setTimeout(240_000);

let h: Harness;
let tmp: string;
beforeAll(async () => {
  h = await startHarness();
  tmp = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-sighting-'));
});
afterAll(async () => {
  await h?.close();
  if (tmp) fs.rmSync(tmp, { recursive: true, force: true });
});

// The demo accounts seeded in development (content/demo/accounts.yml, README "Roles and demo accounts").
const password = 'counterweight-demo-2026';
const contributor = 'contributor@example.org';
const moderator = 'moderator@example.org';
// Invented test data: no real device, company or person.
const title = `Sealed cavity drive pitched with no exhaust (test ${Date.now().toString(36)})`;
const summary =
  'Invented test data. A pitch deck says a sealed resonant microwave cavity fed 1.5 kW of RF power gives 0.2 lbf of steady thrust with no propellant.';

/**
 * The smallest valid PDF we can write by hand: one empty page, with the cross-reference table's
 * byte offsets computed (ISO 32000-1:2008, 7.5: header, body, xref, trailer).
 */
function minimalPdf(): Buffer {
  const objects = [
    '<< /Type /Catalog /Pages 2 0 R >>',
    '<< /Type /Pages /Kids [3 0 R] /Count 1 >>',
    '<< /Type /Page /Parent 2 0 R /MediaBox [0 0 200 200] >>',
  ];
  let body = '%PDF-1.4\n';
  const offsets: number[] = [];
  objects.forEach((o, i) => {
    offsets.push(Buffer.byteLength(body));
    body += `${i + 1} 0 obj\n${o}\nendobj\n`;
  });
  const xref = Buffer.byteLength(body);
  body += `xref\n0 ${objects.length + 1}\n0000000000 65535 f \n`;
  for (const off of offsets) body += `${String(off).padStart(10, '0')} 00000 n \n`;
  body += `trailer\n<< /Size ${objects.length + 1} /Root 1 0 R >>\nstartxref\n${xref}\n%%EOF\n`;
  return Buffer.from(body, 'latin1');
}


/**
 * The widest right edge of anything on the page, and whether anything was scrolled sideways: nothing
 * may stick out of a phone's 390 px (an overflowing child shows as either).
 */
const text = async (page: Page, id: string) => ((await byTestId(page, id).textContent()) ?? '').trim();

it('reports a sighting with a PDF, and a moderator accepts it onto an entry', async () => {
  const pdfPath = path.join(tmp, 'pitch-deck.pdf');
  const pdf = minimalPdf();
  fs.writeFileSync(pdfPath, pdf);

  // 1. The contributor reports the sighting, with a figure read in SI and the PDF.
  const page = await h.open(390, 844);
  await signInThroughForm(page, h.base, contributor, password);
  await byTestId(page, 'account-report-sighting').click();
  await byTestId(page, 'screen-report').waitFor();
  await byTestId(page, 'sighting-title').fill(title);
  await byTestId(page, 'sighting-url').fill('https://pitch.example.org/cavity-drive');
  await byTestId(page, 'sighting-citation').fill('Invented Investor Deck, slide 7 (2026)');
  await byTestId(page, 'sighting-summary').fill(summary);
  await byTestId(page, 'sighting-figure-add').click();
  await byTestId(page, 'sighting-figure-0-kind-thrust').click();
  await byTestId(page, 'sighting-figure-0-quantity').fill('0.2 lbf');
  await byTestId(page, 'sighting-figure-0-label').fill('claimed thrust');
  // 1 lbf = 4.448 221 615 260 5 N exactly (NIST SP 811, 2008, appendix B.8).
  const si = Number(await byTestId(page, 'sighting-figure-0-si').getAttribute('data-si'));
  expect(Math.abs(si - 0.2 * 4.4482216152605)).toBeLessThan(1e-12);
  const chooser = page.waitForEvent('filechooser');
  await byTestId(page, 'sighting-pick-files').click();
  await (await chooser).setFiles(pdfPath);
  await byTestId(page, 'sighting-file-0').waitFor();
  expect(await text(page, 'sighting-file-0')).toContain('pitch-deck.pdf');
  expect(await widest(page)).toBeLessThanOrEqual(390);
  await page.screenshot({ path: path.join(screenshotDir, 'sighting-form.png'), fullPage: true });
  await byTestId(page, 'sighting-submit').click();
  await byTestId(page, 'sighting-done').waitFor();
  const href = (await byTestId(page, 'sighting-done-link').getAttribute('href'))!;
  const id = Number(/^\/submissions\/(\d+)$/.exec(href)?.[1]);
  expect(id).toBeGreaterThan(0);
  await page.screenshot({ path: path.join(screenshotDir, 'sighting-sent.png'), fullPage: true });

  // 2. It is on the account, waiting for a moderator.
  await byTestId(page, 'sighting-done-account').click();
  await byTestId(page, `my-submission-${id}`).waitFor();
  expect(await byTestId(page, `my-submission-${id}-status`).getAttribute('data-status')).toBe('open');
  expect(await text(page, `my-submission-${id}-status`)).toBe('Waiting for a moderator');
  expect(await text(page, `my-submission-${id}-link`)).toBe(title);

  // 3. The moderator, in a fresh context: the Queue from the bottom bar, the item, its attachment.
  const mod = await h.open(390, 844);
  await signInThroughForm(mod, h.base, moderator, password);
  await byTestId(mod, 'nav-queue').click();
  await byTestId(mod, 'screen-queue').waitFor();
  await byTestId(mod, `queue-item-${id}`).waitFor();
  expect(Number(await byTestId(mod, 'queue-count').getAttribute('data-total'))).toBeGreaterThanOrEqual(1);
  const row = await text(mod, `queue-item-${id}`);
  expect(row).toContain(title);
  expect(row).toContain('1 attachment');
  expect(row).toContain('Esther Mbeki');
  await mod.screenshot({ path: path.join(screenshotDir, 'queue.png'), fullPage: true });
  await byTestId(mod, `queue-item-${id}-link`).click();
  await byTestId(mod, 'screen-queue-item').waitFor();
  expect(await byTestId(mod, 'item-status').getAttribute('data-status')).toBe('open');
  expect(await text(mod, 'submission-summary')).toBe(summary);
  const download = byTestId(mod, 'submission-attachments').locator('a[download]');
  expect(await download.count()).toBe(1);
  const file = await mod.request.get(`${h.base}${await download.getAttribute('href')}`);
  expect(file.status()).toBe(200);
  expect(file.headers()['content-type']).toMatch(/^application\/pdf/);
  expect(file.headers()['content-disposition']).toMatch(/^attachment/);
  expect(Buffer.from(await file.body()).equals(pdf)).toBe(true);

  // 4. Pick it up and accept it onto the resonant-cavity entry, found by searching the library.
  await byTestId(mod, 'item-claim').click();
  await until('the item is held', async () => (await byTestId(mod, 'item-status').getAttribute('data-status')) === 'claimed');
  await byTestId(mod, 'item-decide-accept').click();
  await byTestId(mod, 'item-entries-search').fill('resonant cavity');
  await byTestId(mod, 'item-entry-resonant-cavity-thruster').click();
  expect(await byTestId(mod, 'item-entry-resonant-cavity-thruster').getAttribute('aria-checked')).toBe('true');
  expect(await widest(mod)).toBeLessThanOrEqual(390);
  await mod.screenshot({ path: path.join(screenshotDir, 'queue-item-accept.png'), fullPage: true });
  await byTestId(mod, 'item-confirm').click();
  await until('the item is accepted', async () => (await byTestId(mod, 'item-status').getAttribute('data-status')) === 'accepted');
  await byTestId(mod, 'submission-linked-resonant-cavity-thruster').waitFor();

  // 5. The entry page lists it under "Seen in the wild", for any reader.
  const reader = await h.open(390, 844);
  await reader.goto(`${h.base}/entries/resonant-cavity-thruster`);
  await byTestId(reader, 'screen-entry').waitFor();
  await byTestId(reader, `entry-sighting-${id}`).waitFor();
  expect(await text(reader, `entry-sighting-${id}`)).toContain(title);
  expect(await byTestId(reader, `entry-sighting-${id}-url`).getAttribute('href')).toBe('https://pitch.example.org/cavity-drive');
  await byTestId(reader, `entry-sighting-${id}`).scrollIntoViewIfNeeded();
  expect(await widest(reader)).toBeLessThanOrEqual(390);
  await reader.screenshot({ path: path.join(screenshotDir, 'entry-seen-in-the-wild.png') });

  // 6. The contributor got the decision by e-mail, and their page says so.
  const mail = await h.mail.next(contributor, { subject: /^Accepted: / });
  expect(mail.subject).toContain(title);
  expect(mail.text).toContain(`/submissions/${id}`);
  await page.goto(`${h.base}/submissions/${id}`);
  await until('the submitter sees the decision', async () => (await byTestId(page, 'submission-status').getAttribute('data-status')) === 'accepted');
  await byTestId(page, 'submission-linked-resonant-cavity-thruster').waitFor();
  await page.screenshot({ path: path.join(screenshotDir, 'submission-accepted.png'), fullPage: true });

  expect(page.problems).toEqual([]);
  expect(mod.problems).toEqual([]);
  expect(reader.problems).toEqual([]);
  for (const p of [page, mod, reader]) await p.context().close();
});
