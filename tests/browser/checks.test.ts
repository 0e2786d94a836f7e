/**
 * The check kit in Chromium at phone size: every check computes in the browser from its permalink
 * with the same numbers the API gives (to 1e-12 relative), updates as the reader types, and its
 * permalink reproduces the result. A starter worksheet evaluates in the browser exactly as on the
 * server. Screenshots go to test-output/screenshots/.
 */
import path from 'node:path';
import type { Page } from 'playwright-core';
import { checkList } from '../../shared/checks';
import { runCheck } from '../../shared/checks/run';
import { byTestId, goInApp, screenshotDir, startHarness, type Harness } from '../support/browser';
import { relClose, until } from '../support/poll';

jest.setTimeout(180_000);

let h: Harness;
beforeAll(async () => {
  h = await startHarness();
});
afterAll(() => h?.close());

// The harness's shared context: the checks need no account, and the app's script stays in the cache.
const phonePage = () => h.page(390, 844);

type Watched = Page & { problems: string[] };
/**
 * The page the last check ended on, which the next one goes on in. The first check opened loads both
 * its permalinks (the typed one afresh in a profile cleared of cookies and storage), as a reader
 * opening a shared link does; the others open theirs in the running app (`goInApp`: the router reads
 * the query as on a fresh load), the check's screen left first so that it starts anew from the
 * address alone. Two page loads for the file instead of two a check.
 */
let carried: Watched | undefined;
async function openPermalink(url: string, screen: string): Promise<{ page: Watched; loaded: boolean }> {
  const page = carried && !carried.isClosed() ? carried : await phonePage();
  carried = undefined;
  // The same path again would keep the screen (and its typed inputs) rather than read the new query.
  const loaded = !page.url().startsWith(h.base) || new URL(page.url()).pathname === new URL(url).pathname;
  if (loaded) await page.goto(url);
  else await goInApp(page, url);
  await byTestId(page, screen).waitFor();
  return { page, loaded };
}

/** Every element whose testID starts with `prefix`, as name → exact SI value (data-si). */
async function siValues(page: Page, prefix: string): Promise<Record<string, number>> {
  return page.evaluate((p) => {
    const out: Record<string, number> = {};
    document.querySelectorAll(`[data-testid^="${p}"][data-si]`).forEach((el) => {
      out[el.getAttribute('data-testid')!.slice(p.length)] = Number(el.getAttribute('data-si'));
    });
    return out;
  }, prefix);
}

async function apiCheck(name: string, inputs: Record<string, string>) {
  const res = await fetch(`${h.base}/api/checks/${name}`, {
    method: 'POST',
    headers: { 'Content-Type': 'application/json' },
    body: JSON.stringify({ inputs }),
  });
  expect(res.status).toBe(200);
  return (await res.json()) as { outputs: { name: string; si: number }[]; verdict: { holds: boolean } };
}

function expectSameNumbers(browser: Record<string, number>, api: { name: string; si: number }[]) {
  expect(Object.keys(browser).sort()).toEqual(api.map((o) => o.name).sort());
  for (const o of api) {
    if (!relClose(browser[o.name], o.si)) throw new Error(`output ${o.name}: browser ${browser[o.name]} vs server ${o.si}`);
  }
}

/** The first input whose default, doubled, is still accepted: the value the reader "types". */
function changedInput(def: (typeof checkList)[number]): { name: string; text: string } {
  for (const spec of def.inputs) {
    const m = /^([-+]?\d*\.?\d+(?:e[-+]?\d+)?)(.*)$/i.exec(spec.default.trim());
    if (!m) continue;
    const text = `${Number(m[1]) * 2}${m[2]}`;
    try {
      runCheck(def.name, { [spec.name]: text });
      return { name: spec.name, text };
    } catch {
      /* out of bounds: try the next input */
    }
  }
  throw new Error(`no input of ${def.name} can be doubled`);
}

describe.each(checkList.map((c) => [c.name, c] as const))('check %s at phone size', (name, def) => {
  it('computes from its permalink as the server does, updates as the reader types, and the new permalink reproduces it', async () => {
    const defaults = Object.fromEntries(def.inputs.map((i) => [i.name, i.default]));
    const query = new URLSearchParams(defaults).toString();
    const { page, loaded } = await openPermalink(`${h.base}/checks/${name}?${query}`, `screen-check-${name}`);
    await byTestId(page, 'verdict').waitFor();
    const api = await apiCheck(name, defaults);
    await until('every output is shown', async () => Object.keys(await siValues(page, 'output-')).length === api.outputs.length);
    expectSameNumbers(await siValues(page, 'output-'), api.outputs);
    expect(await byTestId(page, 'verdict').getAttribute('data-holds')).toBe(String(api.verdict.holds));
    await page.screenshot({ path: path.join(screenshotDir, `check-${name}.png`), fullPage: true });

    const change = changedInput(def);
    await byTestId(page, `input-${change.name}`).fill(change.text);
    const changed = await apiCheck(name, { ...defaults, [change.name]: change.text });
    await until('the outputs follow the typed value', async () => {
      const v = await siValues(page, 'output-');
      return changed.outputs.every((o) => relClose(v[o.name], o.si));
    });

    await until('the permalink carries the typed value', async () => new URL(page.url()).searchParams.get(change.name) === change.text);
    const permalink = page.url();
    expect(page.problems).toEqual([]);
    let again: Watched;
    if (loaded) {
      // Closed first: the permalink opens in a profile cleared of cookies and storage, as before in a second one.
      await page.close();
      again = await phonePage();
      await again.goto(permalink);
    } else {
      // Away to the kit's list (the check's screen unmounts with its typed inputs), then to the permalink.
      await goInApp(page, `${h.base}/checks`);
      await byTestId(page, 'screen-checks').waitFor();
      await goInApp(page, permalink);
      again = page;
    }
    await byTestId(again, `screen-check-${name}`).waitFor();
    await byTestId(again, 'verdict').waitFor();
    await until('the permalink shows every output', async () => Object.keys(await siValues(again, 'output-')).length === changed.outputs.length);
    expectSameNumbers(await siValues(again, 'output-'), changed.outputs);
    expect(again.problems).toEqual([]);
    carried = again;
  });
});

it('evaluates a starter worksheet in the browser with the same numbers as the server', async () => {
  const list = (await (await fetch(`${h.base}/api/worksheets`)).json()) as { worksheets: { name: string }[] };
  expect(list.worksheets.length).toBeGreaterThan(0);
  for (const { name } of list.worksheets) {
    const { worksheet } = await (await fetch(`${h.base}/api/worksheets/${name}`)).json();
    const res = await fetch(`${h.base}/api/worksheets/evaluate`, {
      method: 'POST',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ worksheet, values: {} }),
    });
    const server = (await res.json()) as { steps: { name: string; value?: { si: number } }[] };
    const { page } = await openPermalink(`${h.base}/worksheets/${name}`, 'screen-worksheet');
    // Every worksheet's screen has the same testID: its title (set once its worksheet is loaded) tells them apart.
    await until(`worksheet ${name} is the one shown`, async () => (await page.title()).startsWith(`${worksheet.title} — `));
    const expected = server.steps.filter((s) => s.value);
    expect(expected.length).toBeGreaterThan(0);
    await until(`worksheet ${name} shows every step`, async () => Object.keys(await siValues(page, 'step-')).length === expected.length);
    const browser = await siValues(page, 'step-');
    for (const s of expected) {
      if (!relClose(browser[s.name], s.value!.si)) throw new Error(`${name}.${s.name}: browser ${browser[s.name]} vs server ${s.value!.si}`);
    }
    await page.screenshot({ path: path.join(screenshotDir, `worksheet-${name}.png`), fullPage: true });
    expect(page.problems).toEqual([]);
    carried = page;
  }
  await carried?.close();
  carried = undefined;
});
