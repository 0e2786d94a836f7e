/**
 * The browser-test harness: the built web app (dist/) served by the real Express app on a fresh
 * test database (with the starter library and the demo accounts), its own fake SMTP server whose
 * messages land in the outbox, and Debian's Chromium driven through playwright-core.
 */
import fs from 'node:fs';
import http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import { chromium, type Browser, type BrowserContext, type Page } from 'playwright-core';
import { createApp, type AppLocals } from '../../server/app';
import { ROOT } from '../../server/config';
import { seedIfEmpty } from '../../server/db/seed';
import { seedDemoAccounts } from '../../server/db/seed-accounts';
import { importEntriesIfEmpty } from '../../server/db/seed-entries';
import { keepConnectionsLonger } from '../../server/http/keep-alive';
import { LocalStore } from '../../server/storage';
import { HIGH_LIMITS } from './app';
import { createTestDatabase, type TestDatabase } from './db';
import { startTestMail, type TestMail } from './mail';

export const screenshotDir = path.join(ROOT, 'test-output', 'screenshots');

export interface Harness {
  base: string;
  browser: Browser;
  /** The fake SMTP server's catch (the same messages the admin Outbox shows). */
  mail: TestMail;
  /**
   * A new page at this viewport and colour scheme, alone in its browser profile while it is open:
   * signed out, with no storage or permissions, but with the browser's HTTP and code caches, as a
   * returning reader's browser has them (the app's script is not fetched and compiled anew for every
   * page). Page errors are collected in `problems`. Close the page (or its context) when done, so the
   * profile serves the next page (a page a test leaves open is closed when the next test asks for
   * one); `close()` ends them all. `{ held: true }`: a page several tests share (opened in a
   * `beforeAll`), kept until it is closed (jest names no test in a `beforeAll`, or still the last one
   * run, so the harness cannot tell such a page from one a finished test left open).
   */
  page(width: number, height: number, colorScheme?: 'light' | 'dark', opts?: { held?: boolean }): Promise<Page & { problems: string[] }>;
  /**
   * A new page in a fresh context of its own (cold caches, its own cookie jar) at this viewport; page
   * errors are collected in `problems`. Close its context when done. (Measured, file by file: `page`
   * is faster where a file opens one page at a time and each loads the app once or more (the entry
   * page, shell and search tests: 1–4 s a file); where typing and saving take the time (desk, claim
   * check) or pages are open side by side, each needing a Chromium of its own, no difference showed.)
   */
  open(width: number, height: number): Promise<Page & { problems: string[] }>;
  close(): Promise<void>;
}

const browserArgs = [
  '--no-sandbox',
  '--disable-gpu',
  '--disable-background-networking',
  '--disable-component-update',
  '--disable-sync',
  '--no-first-run',
  '--disable-quic',
];

export async function startHarness(): Promise<Harness> {
  const dist = path.join(ROOT, 'dist');
  if (!fs.existsSync(path.join(dist, 'index.html'))) {
    throw new Error('dist/ is missing: run the browser tests through `npm test`, which builds the web app first.');
  }
  fs.mkdirSync(screenshotDir, { recursive: true });
  const t: TestDatabase = await createTestDatabase();
  await seedIfEmpty(t.sequelize, path.join(ROOT, 'content'));
  await seedDemoAccounts(t.sequelize, path.join(ROOT, 'content'), 'development');
  await importEntriesIfEmpty(t.sequelize, path.join(ROOT, 'content'));
  const mail = await startTestMail();
  const uploads = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-uploads-'));
  // Listen first, so that the e-mailed links can name the server's real address.
  // Idle sockets outlast the Playwright driver's (Node's agent, 5 s), as in server/main.ts: else a
  // request sent on a socket the server was closing in the same moment fails with ECONNRESET.
  const server = keepConnectionsLonger(http.createServer());
  await new Promise<void>((resolve) => server.listen(0, '127.0.0.1', resolve));
  const base = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
  const app = createApp({
    sequelize: t.sequelize,
    version: 'test',
    env: 'test',
    staticDir: dist,
    publicUrl: base,
    mailer: mail.mailer,
    rateLimits: HIGH_LIMITS,
    sessionCleanupMs: 0,
    store: new LocalStore(uploads),
    submissionDigestMs: 300,
  });
  server.on('request', app);
  const browser = await chromium.launch({ executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium', args: browserArgs });
  // Pages come from a pool of persistent browser profiles (each its own Chromium, launched when no
  // free one is left): a page has its own profile while it is open, so cookies, storage and
  // permissions never cross between pages open at once, and a profile is handed on, cleared, once its
  // pages are closed. A persistent profile keeps the HTTP cache and V8's code cache across pages, so
  // the app's script is compiled once per profile instead of for every page: a page load takes about
  // half the time it takes in a fresh incognito context.
  const profiles: { context: BrowserContext; dir: string; keeper: Page; busy: boolean; owner: string | undefined }[] = [];
  const testName = (): string | undefined => (typeof expect === 'undefined' ? undefined : expect.getState().currentTestName);
  const acquire = async (width: number, height: number, colorScheme: 'light' | 'dark', keep: boolean) => {
    // A page a finished test left open: its profile goes back to the pool (held pages, and pages opened
    // in a file's first beforeAll, belong to no test and stay until they are closed).
    const now = testName();
    for (const p of profiles) {
      if (p.busy && p.owner !== undefined && p.owner !== now) {
        for (const old of p.context.pages()) if (old !== p.keeper) await old.close();
        p.busy = false;
      }
    }
    let profile = profiles.find((p) => !p.busy);
    if (!profile) {
      const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-profile-'));
      const context = await chromium.launchPersistentContext(dir, {
        executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
        args: browserArgs,
        viewport: { width, height },
      });
      // The blank first page stays open: with no page left, Chromium no longer serves compiled code
      // from its cache (measured: every load as slow as a fresh profile's).
      profile = { context, dir, keeper: context.pages()[0] ?? (await context.newPage()), busy: false, owner: undefined };
      profiles.push(profile);
    }
    const held = profile;
    held.busy = true;
    held.owner = keep ? undefined : now;
    const { context, keeper } = held;
    for (const old of context.pages()) if (old !== keeper) await old.close();
    await context.clearCookies();
    await context.clearPermissions();
    const page = await context.newPage();
    // Storage is per origin; the HTTP and code caches stay (a returning reader's browser).
    const cdp = await context.newCDPSession(page);
    await cdp.send('Storage.clearDataForOrigin', { origin: base, storageTypes: 'local_storage,indexeddb' });
    await cdp.detach();
    await page.setViewportSize({ width, height });
    await page.emulateMedia({ colorScheme });
    page.on('close', () => {
      if (context.pages().every((p) => p === keeper || p.isClosed())) held.busy = false;
    });
    // `page.context().close()` hands the profile back instead of ending its Chromium.
    const facade = new Proxy(context, {
      get(target, key) {
        if (key === 'close')
          return async () => {
            for (const p of target.pages()) if (p !== keeper) await p.close();
            held.busy = false;
          };
        const v = Reflect.get(target, key, target) as unknown;
        return typeof v === 'function' ? (v as (...a: unknown[]) => unknown).bind(target) : v;
      },
    });
    page.context = () => facade;
    return watched(page);
  };
  const watched = (page: Page) => {
    const p = page as Page & { problems: string[] };
    p.problems = [];
    p.on('pageerror', (e) => p.problems.push(e.message));
    trackRequests(p);
    return p;
  };
  return {
    base,
    browser,
    mail,
    page: (width, height, colorScheme = 'light', opts = {}) => acquire(width, height, colorScheme, opts.held === true),
    async open(width, height) {
      const context = await browser.newContext({ viewport: { width, height }, deviceScaleFactor: 1 });
      return watched(await context.newPage());
    },
    async close() {
      for (const p of profiles) {
        await p.context.close().catch(() => {});
        fs.rmSync(p.dir, { recursive: true, force: true });
      }
      await browser.close();
      server.closeAllConnections();
      await new Promise((r) => server.close(r));
      await (app.locals as unknown as AppLocals).close();
      await mail.stop();
      await t.drop();
      fs.rmSync(uploads, { recursive: true, force: true });
    },
  };
}

export const byTestId = (page: Page, id: string) => page.locator(`[data-testid="${id}"]`);

/**
 * Takes a page that already shows the app to another of its addresses (path and query) the way the
 * app's router follows the browser's own address changes: the address is set, then the popstate event
 * that going back or forward sends. The router reads the path and query as it does on a fresh load,
 * but the app is not loaded and started again (about a tenth of a page load). For tests that visit many
 * addresses; what a fresh load shows (the first paint, a permalink opened anew) still needs `goto`.
 * Wait for the new screen afterwards, as after a `goto`.
 */
export async function goInApp(page: Page, url: string): Promise<void> {
  if (!/^https?:/.test(page.url())) throw new Error(`goInApp needs a page that shows the app, not ${page.url()}`);
  await page.evaluate((to) => {
    history.pushState(null, '', to);
    dispatchEvent(new PopStateEvent('popstate', { state: null }));
  }, url);
}

/** Signs in through the sign-in screen (the demo password unless given) and waits for the account screen. */
export async function signInThroughForm(page: Page, base: string, email: string, password = 'counterweight-demo-2026'): Promise<void> {
  await page.goto(`${base}/sign-in`);
  await submitSignInForm(page, email, password);
}

/** `signInThroughForm` on a page that already shows the sign-in screen (no page load): fills the form in, sends it, waits for the account screen. */
export async function submitSignInForm(page: Page, email: string, password = 'counterweight-demo-2026'): Promise<void> {
  await byTestId(page, 'screen-sign-in').waitFor();
  await byTestId(page, 'field-email').fill(email);
  await byTestId(page, 'field-password').fill(password);
  await byTestId(page, 'submit').click();
  await byTestId(page, 'screen-account').waitFor();
}

/**
 * Signs the page's context in through the API (GET /api/session for the CSRF token, then POST
 * /api/auth/sign-in; the browser context's cookie jar keeps the session), without loading a screen:
 * for tests about something else than the sign-in form, which `signInThroughForm` and
 * tests/browser/accounts.test.ts cover. The next `goto` opens the app signed in.
 */
export async function signInQuickly(page: Page, base: string, email: string, password = 'counterweight-demo-2026'): Promise<void> {
  const session = await page.request.get(`${base}/api/session`);
  if (!session.ok()) throw new Error(`GET /api/session answered ${session.status()}`);
  const { csrfToken } = (await session.json()) as { csrfToken: string };
  const res = await page.request.post(`${base}/api/auth/sign-in`, { data: { email, password }, headers: { 'X-CSRF-Token': csrfToken } });
  if (res.status() !== 200) throw new Error(`signing in as ${email} answered ${res.status()}: ${await res.text()}`);
}

/**
 * Waits until the page has done what it was going to do, instead of a fixed pause: no request in
 * flight (network idle), the fonts loaded, two animation frames rendered (React has committed and the
 * browser painted) and the task queue run through once (event handlers such as `onerror` or
 * `ontoggle`, which the browser queues as tasks after rendering, have fired). Use it before checking
 * that something did NOT happen.
 */
export async function settled(page: Page): Promise<void> {
  await page.waitForLoadState('networkidle');
  // As a string: babel would turn an async function into helpers the page does not have.
  await page.evaluate(`(async () => {
    await document.fonts.ready;
    await new Promise((resolve) => requestAnimationFrame(() => requestAnimationFrame(() => resolve())));
    await new Promise((resolve) => setTimeout(resolve, 0));
  })()`);
  // Anything the first round of tasks started (a fetch from a handler) has also finished.
  await page.waitForLoadState('networkidle');
}

/** Per page of the harness: requests in flight, and when the last one started or ended (for `networkQuiet`). */
const traffic = new WeakMap<Page, { inFlight: number; since: number }>();
function trackRequests(page: Page): void {
  const t = { inFlight: 0, since: Date.now() };
  traffic.set(page, t);
  page.on('request', () => {
    t.inFlight += 1;
    t.since = Date.now();
  });
  const ended = () => {
    t.inFlight = Math.max(0, t.inFlight - 1);
    t.since = Date.now();
  };
  page.on('requestfinished', ended);
  page.on('requestfailed', ended);
}

/**
 * Waits until no request of the page has been in flight for 500 ms: what `waitForLoadState('networkidle')`
 * waits for after a load, but also after a screen change within the page (Playwright reports network
 * idle once per document, so `settled` alone does not wait for the requests of a screen reached by
 * `goInApp` or a click). For pages of the harness (`page`, `open`).
 */
export async function networkQuiet(page: Page, timeoutMs = 15_000): Promise<void> {
  const t = traffic.get(page);
  if (!t) throw new Error('networkQuiet needs a page of the harness');
  // Quiet for 500 ms from the call on at least: a request the screen is about to start is seen.
  const start = Date.now();
  const deadline = start + timeoutMs;
  while (t.inFlight > 0 || Date.now() - Math.max(t.since, start) < 500) {
    if (Date.now() > deadline) throw new Error(`the page still had ${t.inFlight} request(s) in flight after ${timeoutMs} ms`);
    await new Promise((r) => setTimeout(r, 50));
  }
}

/**
 * The right edge of the widest element on the page (a page that fits a phone keeps it within the
 * viewport); Infinity when anything is scrolled sideways. A display equation wider than the column
 * scrolls inside its own box (`.katex-display` has `overflow-x: auto`, checked here), so its content
 * counts by that box, not by the equation's full width.
 */
export const widest = (page: Page): Promise<number> =>
  page.evaluate(() => {
    const all = Array.from(document.querySelectorAll('body *'));
    if (all.some((el) => el.scrollLeft > 0) || window.scrollX > 0) return Infinity;
    const scrollsItself = (el: Element) => el.classList.contains('katex-display') && ['auto', 'scroll'].includes(getComputedStyle(el).overflowX);
    const measured = all.filter((el) => {
      const box = el.parentElement?.closest('.katex-display');
      return !(box && scrollsItself(box));
    });
    return Math.max(...measured.map((el) => el.getBoundingClientRect().right));
  });
