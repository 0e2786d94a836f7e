/**
 * The claim check in Chromium at phone size, against the real server and the starter library: a
 * pasted (invented) claim finds the resonant-cavity entry first, its figures are read with their SI
 * values, a fixed figure re-runs the checks with the numbers runCheck gives in this process, the
 * referee paragraph is copied with the entry's permanent URL and numbered references; a contributor
 * saves the check, a signed-out reader opens the share link, and once the owner deletes it the link
 * answers not found. Screenshots go to test-output/screenshots/.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { runCheck } from '../../shared/checks/run';
import type { ClaimCheckResult } from '../../shared/claims/types';
import { byTestId, screenshotDir, signInThroughForm, startHarness, type Harness } from '../support/browser';
import { relClose, until } from '../support/poll';

jest.setTimeout(240_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// Invented test data: no real device, company or person.
const claim =
  'Invented test data. Press release: our sealed resonant microwave cavity drive, fed 1.5 kW of RF power from a magnetron, ' +
  'produced a steady thrust of 0.2 lbf on a torsion balance with no propellant and no exhaust of any kind.';
// The demo contributor seeded in development (README, "Roles and demo accounts").
const contributor = { email: 'contributor@example.org', password: 'counterweight-demo-2026' };
// 1 lbf = 0.453 592 37 kg × 9.806 65 m/s² exactly (NIST SP 811, 2008, appendix B.8).
const LBF = 0.45359237 * 9.80665;
/** The thrust as the reader retypes it: a tenth of the claimed one. */
const fixedThrust = '0.02 lbf';

const si = async (page: Page, id: string) => Number(await byTestId(page, id).getAttribute('data-si'));

/** The claim check as the API answers it for this text, to know the figures' ids and kinds. */
async function apiRun(text: string): Promise<ClaimCheckResult> {
  const res = await fetch(`${h.base}/api/claim-checks`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json', Origin: h.base },
    body: JSON.stringify({ text, style: 'apa' }),
  });
  expect(res.status).toBe(200);
  return (await res.json()) as ClaimCheckResult;
}


/** The match testIDs in the order shown. */
const matchOrder = (page: Page) =>
  page.evaluate(() =>
    Array.from(document.querySelectorAll('[data-testid^="claim-match-"]'))
      .map((el) => el.getAttribute('data-testid')!)
      .filter((id) => !/-(link|words)$/.test(id)),
  );

/** Pastes the claim and runs it; returns the thrust and power figures the API reads in it. */
async function pasteAndRun(page: Page) {
  await page.goto(`${h.base}/check`);
  await byTestId(page, 'screen-check').waitFor();
  await byTestId(page, 'claim-text').fill(claim);
  await byTestId(page, 'claim-run').click();
  await byTestId(page, 'claim-result').waitFor();
  const api = await apiRun(claim);
  const thrust = api.figures.find((f) => f.kind === 'thrust');
  const power = api.figures.find((f) => f.kind === 'power');
  if (!thrust || !power) throw new Error(`the API read no thrust or no power in the claim: ${JSON.stringify(api.figures)}`);
  return { api, thrust, power };
}

/** Retypes the thrust and re-runs; resolves once the photon-bound ratio is the one runCheck gives for it. */
async function fixThrustAndRerun(page: Page, thrustId: string, powerQuantity: string) {
  await byTestId(page, `claim-figure-${thrustId}-quantity`).fill(fixedThrust);
  await byTestId(page, 'claim-figures-edited').waitFor();
  await byTestId(page, 'claim-rerun').click();
  const expected = runCheck('photon-bound', { F_claimed: fixedThrust, P: powerQuantity });
  const ratio = expected.outputs.find((o) => o.name === 'ratio')!.si;
  await until('the photon-bound ratio follows the fixed thrust', async () =>
    relClose(await si(page, 'claim-check-photon-bound-output-ratio'), ratio),
  );
  await byTestId(page, 'claim-figures-edited').waitFor({ state: 'detached' });
  return expected;
}

it('checks a pasted claim, re-runs it with a fixed figure, copies the paragraph, and saves, shares and deletes it', async () => {
  const page = await h.open(390, 844);
  await page.context().grantPermissions(['clipboard-read', 'clipboard-write'], { origin: h.base });

  // 1. Paste and run: the resonant-cavity entry comes first, at its permanent version.
  const { api, thrust, power } = await pasteAndRun(page);
  expect((await matchOrder(page))[0]).toBe('claim-match-resonant-cavity-thruster');
  expect(await byTestId(page, 'claim-match-resonant-cavity-thruster-link').getAttribute('href')).toBe('/entries/resonant-cavity-thruster/v/1');
  expect(await byTestId(page, 'claim-match-resonant-cavity-thruster-words').textContent()).toMatch(/cavity/i);

  // 2. The figures: thrust and power, each with its SI value (checked against NIST SP 811 and the SI).
  expect(relClose(thrust.si, 0.2 * LBF)).toBe(true);
  expect(relClose(power.si, 1500)).toBe(true);
  for (const f of [thrust, power]) {
    await byTestId(page, `claim-figure-${f.id}`).waitFor();
    expect(await byTestId(page, `claim-figure-${f.id}-quantity`).inputValue()).toBe(f.quantity);
    expect(relClose(await si(page, `claim-figure-${f.id}-si`), f.si)).toBe(true);
    expect(await byTestId(page, `claim-figure-${f.id}-si`).textContent()).toBe(f.display);
    expect(await byTestId(page, `claim-figure-${f.id}-kind-${f.kind}`).getAttribute('aria-checked')).toBe('true');
  }
  // The checks as first run: the claimed thrust against P/c, as runCheck gives it here.
  const first = runCheck('photon-bound', { F_claimed: thrust.quantity, P: power.quantity });
  expect(relClose(await si(page, 'claim-check-photon-bound-output-ratio'), first.outputs.find((o) => o.name === 'ratio')!.si)).toBe(true);
  expect(await byTestId(page, 'claim-check-photon-bound-verdict').getAttribute('data-holds')).toBe(String(first.verdict.holds));
  expect(api.checks.map((c) => c.check)).toContain('photon-bound');
  await byTestId(page, 'claim-where-toggle').click();
  await byTestId(page, `claim-where-${thrust.id}`).waitFor();
  await page.screenshot({ path: path.join(screenshotDir, 'claim-check-result.png'), fullPage: true });

  // 3. Fix the thrust and re-run: the photon-bound outputs follow, exactly as runCheck computes them.
  const fixed = await fixThrustAndRerun(page, thrust.id, power.quantity);
  const bound = fixed.outputs.find((o) => o.name === 'F_bound')!;
  expect(relClose(await si(page, 'claim-check-photon-bound-output-F_bound'), bound.si)).toBe(true);
  // Independently: P/c with c = 299 792 458 m/s exactly (BIPM SI Brochure, 9th ed.).
  expect(relClose(bound.si, 1500 / 299_792_458)).toBe(true);

  // 4. Copy the paragraph: it names the entry at its permanent URL and has numbered references.
  await byTestId(page, 'claim-copy').click();
  await until('the copy is confirmed', async () => (await byTestId(page, 'claim-copy-status').textContent()) === 'Copied.');
  const copied = await page.evaluate(() => navigator.clipboard.readText());
  expect(copied).toContain('/entries/resonant-cavity-thruster/v/1');
  expect(copied).toMatch(/\[1\]/);
  expect(copied).toMatch(/\n\nReferences\n1\. .+/);
  expect(await byTestId(page, 'claim-sign-in-to-save').isVisible()).toBe(true);
  expect(await byTestId(page, 'claim-save').count()).toBe(0);

  // 5. Signed in as a contributor: run and fix again, save, and get the share link.
  await signInThroughForm(page, h.base, contributor.email, contributor.password);
  const again = await pasteAndRun(page);
  await fixThrustAndRerun(page, again.thrust.id, again.power.quantity);
  await byTestId(page, 'claim-save').click();
  const shareUrl = (await byTestId(page, 'claim-share-url').textContent())!.trim();
  expect(shareUrl).toMatch(new RegExp(`^${h.base}/check/[A-Za-z0-9_-]{16,}$`));
  const token = shareUrl.split('/').pop()!;
  await byTestId(page, `claim-saved-${token}`).waitFor();
  await page.screenshot({ path: path.join(screenshotDir, 'claim-check-saved.png'), fullPage: true });

  // 6. A signed-out reader in a fresh context opens the link and sees the saved result, read only.
  const reader = await h.open(390, 844);
  await reader.goto(shareUrl);
  await byTestId(reader, 'screen-claim-saved').waitFor();
  await byTestId(reader, 'claim-match-resonant-cavity-thruster').waitFor();
  expect(relClose(await si(reader, 'claim-check-photon-bound-output-ratio'), fixed.outputs.find((o) => o.name === 'ratio')!.si)).toBe(true);
  expect(await byTestId(reader, 'claim-paragraph').textContent()).toContain('/entries/resonant-cavity-thruster/v/1');
  expect(await byTestId(reader, 'claim-saved-delete').count()).toBe(0);
  await reader.screenshot({ path: path.join(screenshotDir, 'claim-check-shared.png'), fullPage: true });

  // 7. The owner deletes it from the share page; the link then answers not found, for the reader too.
  await page.goto(shareUrl);
  await byTestId(page, 'claim-saved-delete').waitFor();
  page.once('dialog', (d) => void d.accept());
  await byTestId(page, 'claim-saved-delete').click();
  await byTestId(page, 'claim-saved-not-found').waitFor();
  await reader.reload();
  await byTestId(reader, 'claim-saved-not-found').waitFor();
  const res = await fetch(`${h.base}/api/claim-checks/saved/${token}`);
  expect(res.status).toBe(404);

  expect(page.problems).toEqual([]);
  expect(reader.problems).toEqual([]);
  await page.context().close();
  await reader.context().close();
});
