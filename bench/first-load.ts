/**
 * Part of `npm run bench` (also `npx tsx bench/first-load.ts` alone): what a reader's browser does on
 * a first visit. Builds the web app if dist/ is stale (server/build.ts), serves it with the real app
 * (createApp, env production, the precompressed files of the build) on a throwaway MariaDB with the
 * starter library, and opens the Library (`/`) and a starter entry's page in Debian's Chromium
 * (playwright-core), each in a fresh browser context (a cold cache), at phone size (390 × 844) and
 * wide (1366 × 900), on localhost and over a throttled "slow mobile" link.
 *
 * Per page: the JavaScript transferred (compressed, as sent) and decoded, the number of scripts,
 * first contentful paint (the 'paint' entry), and the time the page's first content is on screen: as the
 * server put it in the HTML (#cw-shell: the entry's `#section-inBrief`, the Library's `.cw-entries`;
 * the later of its arrival in the viewport and the first paint) and as the app renders it (the entry's
 * first section, `entry-section-inBrief`; the Library's list, `entry-list`).
 * Times are from the start of navigation, medians of RUNS loads on localhost.
 *
 * CW_BENCH_DIST=<dir> measures another build as it is (no build, no staleness check): to compare
 * with an earlier build of the app.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import http from 'node:http';
import path from 'node:path';
import { chromium, type Browser, type Page } from 'playwright-core';
import { createApp, type AppLocals } from '../server/app';
import { buildWeb, webBuildIsStale } from '../server/build';
import { ROOT } from '../server/config';
import type { MariaDbServer } from '../server/db/mariadb';
import { importEntriesIfEmpty } from '../server/db/seed-entries';
import { LIMIT_NAMES, type RateLimits } from '../server/http/rate-limit';
import { CONTENT, startBenchDatabase } from './db';

/** The aims (issue 16). */
const AIM_JS_KB = 300;
const AIM_FCP_MS = 1000;
const AIM_SECTION_MS = 1500;
/** "Slow mobile": common practice, no source (about a weak 4G or a good 3G link). */
const SLOW = { downloadKbps: 1600, uploadKbps: 750, rttMs: 150 };
/** Quiet after the first content that counts as "loaded" (Playwright's networkidle uses 500 ms). */
const QUIET_MS = 1000;
const RUNS = Number(process.env.CW_BENCH_RUNS ?? 3);
const ENTRY_SLUG = 'overbalanced-wheel';
const SIZES = [
  { name: 'phone', width: 390, height: 844 },
  { name: 'wide', width: 1366, height: 900 },
] as const;

const HIGH_LIMITS = Object.fromEntries(LIMIT_NAMES.map((n) => [n, { limit: 100_000, windowMs: 60_000 }])) as RateLimits;
const say = (m: string) => console.log(`first load: ${m}`);
const kb = (n: number) => `${(n / 1024).toFixed(0)} KB`;
const msText = (n: number | null) => (n === null ? '—' : `${Math.round(n)} ms`);

interface Load {
  /** JavaScript as sent (bodies, compressed) and decoded, in bytes; how many scripts. */
  jsSent: number;
  jsDecoded: number;
  scripts: number;
  /** The same, for the scripts that had arrived when the first content was in the document. */
  jsSentBeforeContent: number;
  scriptsBeforeContent: number;
  fcp: number | null;
  content: number | null;
  /** The same content as the server put it in the page (#cw-shell), painted: the later of its arrival on screen and the first paint. */
  shellContent: number | null;
  encodings: string[];
}

/**
 * Records, from the start of navigation, the first contentful paint and the moment an element with
 * the given testID is in the document (a MutationObserver: no polling delay).
 */
const WATCH = (testId: string, shellSelector: string) => `
  window.__cw = { fcp: null, content: null, shell: null };
  new PerformanceObserver((list) => {
    for (const e of list.getEntries()) if (e.name === 'first-contentful-paint') window.__cw.fcp = e.startTime;
  }).observe({ type: 'paint', buffered: true });
  const seen = () => {
    if (window.__cw.content === null && document.querySelector('[data-testid="${testId}"]')) window.__cw.content = performance.now();
  };
  new MutationObserver(seen).observe(document, { childList: true, subtree: true });
  // The same content in the server-rendered shell (#cw-shell): when it is in the document, laid out and on
  // screen (its top inside the viewport, not hidden); it is painted at the first paint after that.
  const shellSeen = () => {
    if (window.__cw.shell !== null) return;
    const el = document.querySelector('#cw-shell ${shellSelector}');
    if (!el) return;
    const r = el.getBoundingClientRect();
    if (r.height === 0 || r.top >= innerHeight || getComputedStyle(el).visibility === 'hidden') return;
    window.__cw.shell = performance.now();
  };
  new MutationObserver(shellSeen).observe(document, { childList: true, subtree: true });
  document.addEventListener('DOMContentLoaded', shellSeen);
`;

async function loadOnce(browser: Browser, url: string, testId: string, shellSelector: string, size: { width: number; height: number }, slow: boolean): Promise<Load> {
  const context = await browser.newContext({ viewport: { width: size.width, height: size.height }, deviceScaleFactor: 1 });
  try {
    const page: Page = await context.newPage();
    const cdp = await context.newCDPSession(page);
    await cdp.send('Network.enable');
    // A fresh context has an empty cache; say so to the browser as well.
    await cdp.send('Network.setCacheDisabled', { cacheDisabled: true });
    if (slow) {
      await cdp.send('Network.emulateNetworkConditions', {
        offline: false,
        latency: SLOW.rttMs,
        downloadThroughput: (SLOW.downloadKbps * 1000) / 8,
        uploadThroughput: (SLOW.uploadKbps * 1000) / 8,
      });
    }
    const encodings = new Set<string>();
    cdp.on('Network.responseReceived', (e: { type: string; response: { headers: Record<string, string> } }) => {
      if (e.type !== 'Script') return;
      const h = Object.fromEntries(Object.entries(e.response.headers).map(([k, v]) => [k.toLowerCase(), v]));
      encodings.add(h['content-encoding'] ?? 'identity');
    });
    // Requests in flight, to wait for quiet after the first content (Playwright's 'networkidle' is
    // sticky: once reached, during the first script's run, it would not wait for the deferred chunk).
    const inFlight = new Set<string>();
    let lastChange = performance.now();
    cdp.on('Network.requestWillBeSent', (e: { requestId: string }) => {
      inFlight.add(e.requestId);
      lastChange = performance.now();
    });
    const done = (e: { requestId: string }) => {
      inFlight.delete(e.requestId);
      lastChange = performance.now();
    };
    cdp.on('Network.loadingFinished', done);
    cdp.on('Network.loadingFailed', done);
    await page.addInitScript(WATCH(testId, shellSelector));
    await page.goto(url, { waitUntil: 'load', timeout: 120_000 });
    await page.locator(`[data-testid="${testId}"]`).first().waitFor({ timeout: 120_000 });
    // Let what the page fetches after its first content (the deferred chunk, fonts) arrive: nothing in
    // flight for QUIET_MS.
    const until = performance.now() + 120_000;
    while (inFlight.size > 0 || performance.now() - lastChange < QUIET_MS) {
      if (performance.now() > until) throw new Error(`${url}: still loading after 120 s`);
      await new Promise((r) => setTimeout(r, 50));
    }
    const r = await page.evaluate(() => {
      const w = window as unknown as { __cw: { fcp: number | null; content: number | null; shell: number | null } };
      const scripts = (performance.getEntriesByType('resource') as PerformanceResourceTiming[]).filter((e) => /\.js(\?|$)/.test(e.name));
      return {
        fcp: w.__cw.fcp,
        content: w.__cw.content,
        shell: w.__cw.shell,
        scripts: scripts.map((e) => ({ name: e.name, sent: e.encodedBodySize, decoded: e.decodedBodySize, end: e.responseEnd })),
      };
    });
    if (process.env.CW_BENCH_VERBOSE) for (const x of r.scripts) say(`    ${x.name.replace(/^https?:\/\/[^/]+/, '')} ${kb(x.sent)} at ${Math.round(x.end)} ms (content at ${msText(r.content)})`);
    const before = r.scripts.filter((s) => r.content !== null && s.end <= r.content);
    return {
      jsSent: r.scripts.reduce((a, s) => a + s.sent, 0),
      jsDecoded: r.scripts.reduce((a, s) => a + s.decoded, 0),
      scripts: r.scripts.length,
      jsSentBeforeContent: before.reduce((a, s) => a + s.sent, 0),
      scriptsBeforeContent: before.length,
      fcp: r.fcp,
      content: r.content,
      shellContent: r.shell !== null && r.fcp !== null ? Math.max(r.shell, r.fcp) : null,
      encodings: [...encodings],
    };
  } finally {
    await context.close();
  }
}

const median = (xs: (number | null)[]): number | null => {
  const v = xs.filter((x): x is number => x !== null).sort((a, b) => a - b);
  return v.length ? v[Math.floor((v.length - 1) / 2)] : null;
};

function summarise(loads: Load[]): Load {
  return {
    ...loads[0],
    fcp: median(loads.map((l) => l.fcp)),
    content: median(loads.map((l) => l.content)),
    shellContent: median(loads.map((l) => l.shellContent)),
  };
}

export async function benchFirstLoad(): Promise<void> {
  let db: MariaDbServer | null = null;
  let browser: Browser | null = null;
  let server: http.Server | null = null;
  let app: ReturnType<typeof createApp> | null = null;
  let sequelize: { close(): Promise<void> } | null = null;
  try {
    let dist = process.env.CW_BENCH_DIST ? path.resolve(process.env.CW_BENCH_DIST) : path.join(ROOT, 'dist');
    if (process.env.CW_BENCH_DIST) {
      say(`measuring the build in ${dist} as it is`);
    } else if (webBuildIsStale(ROOT, dist)) {
      buildWeb(ROOT, dist, say);
    } else {
      say('dist/ is up to date with its sources');
    }
    if (!fs.existsSync(path.join(dist, 'index.html'))) throw new Error(`no web build in ${dist}`);
    dist = fs.realpathSync(dist);

    const started = await startBenchDatabase('firstload', say, (d) => {
      db = d;
    });
    sequelize = started.sequelize;
    const imported = await importEntriesIfEmpty(started.sequelize, CONTENT);
    server = http.createServer();
    await new Promise<void>((resolve) => server!.listen(0, '127.0.0.1', resolve));
    const base = `http://127.0.0.1:${(server.address() as { port: number }).port}`;
    app = createApp({
      sequelize: started.sequelize,
      version: 'bench',
      env: 'production',
      sessionSecret: crypto.randomBytes(32).toString('base64url'),
      publicUrl: base,
      staticDir: dist,
      rateLimits: HIGH_LIMITS,
      sessionCleanupMs: 0,
    });
    server.on('request', app);
    // The first search and entry read warm the server (its index, its HTML cache), as a running site is.
    await (await fetch(`${base}/api/search?q=wheel`)).arrayBuffer();
    await (await fetch(`${base}/api/entries/${ENTRY_SLUG}`)).arrayBuffer();

    browser = await chromium.launch({
      executablePath: process.env.CHROMIUM_PATH ?? '/usr/bin/chromium',
      args: ['--no-sandbox', '--disable-gpu', '--disable-background-networking', '--disable-component-update', '--disable-sync', '--no-first-run', '--disable-quic'],
    });
    say(`app (createApp, env production) on ${base} serving ${path.relative(ROOT, dist) || dist}, ${imported} starter entries; Chromium ${browser.version()}, a fresh context (cold cache) per load`);
    say(`times from the start of navigation; localhost: median of ${RUNS} loads; slow mobile: one load at ${SLOW.downloadKbps / 1000} Mbps down, ${SLOW.uploadKbps} kbps up, ${SLOW.rttMs} ms RTT (common practice, no source)`);

    const pages = [
      { name: '/', url: `${base}/`, testId: 'entry-list', shell: '.cw-entries', contentName: 'list' },
      { name: `/entries/${ENTRY_SLUG}`, url: `${base}/entries/${ENTRY_SLUG}`, testId: 'entry-section-inBrief', shell: '#section-inBrief', contentName: 'first section' },
    ];
    const results = new Map<string, Load>();
    for (const p of pages) {
      for (const size of SIZES) {
        for (const slow of [false, true]) {
          const loads: Load[] = [];
          for (let i = 0; i < (slow ? 1 : RUNS); i++) loads.push(await loadOnce(browser, p.url, p.testId, p.shell, size, slow));
          const s = summarise(loads);
          results.set(`${p.name}|${size.name}|${slow ? 'slow' : 'local'}`, s);
          say(
            `${p.name.padEnd(28)} ${size.name.padEnd(5)} ${(slow ? 'slow mobile' : 'localhost').padEnd(11)}: ` +
              `JS ${kb(s.jsSent)} sent (${s.encodings.join('/') || 'none'}), ${kb(s.jsDecoded)} decoded, ${s.scripts} script${s.scripts === 1 ? '' : 's'} ` +
              `(${kb(s.jsSentBeforeContent)} in ${s.scriptsBeforeContent} before the ${p.contentName}); ` +
              `first contentful paint ${msText(s.fcp)}, ${p.contentName} from the HTML ${msText(s.shellContent)}, from the app ${msText(s.content)}`,
          );
        }
      }
    }

    const verdict = (ok: boolean) => (ok ? 'met' : 'not met');
    const library = results.get('/|phone|local')!;
    const entry = results.get(`/entries/${ENTRY_SLUG}|phone|local`)!;
    console.log('');
    say('aims:');
    say(`  JavaScript of a cold load of / ≤ ${AIM_JS_KB} KB compressed: ${kb(library.jsSent)} — ${verdict(library.jsSent <= AIM_JS_KB * 1024)}`);
    say(`  first contentful paint ≤ ${AIM_FCP_MS} ms cold on localhost at phone size: / ${msText(library.fcp)}, entry ${msText(entry.fcp)} — ${verdict(library.fcp !== null && entry.fcp !== null && Math.max(library.fcp, entry.fcp) <= AIM_FCP_MS)}`);
    // The reader sees the section from whichever comes first: the server's copy in the HTML or the app's.
    const seen = [entry.shellContent, entry.content].filter((x): x is number => x !== null);
    const first = seen.length ? Math.min(...seen) : null;
    say(
      `  the entry's first section ≤ ${AIM_SECTION_MS} ms cold on localhost at phone size: ${msText(first)} (from the HTML ${msText(entry.shellContent)}, the app's own ${msText(entry.content)}) — ${verdict(first !== null && first <= AIM_SECTION_MS)}`,
    );
  } finally {
    await browser?.close().catch(() => {});
    if (server) {
      server.closeAllConnections();
      await new Promise((r) => server!.close(r));
    }
    await (app?.locals as unknown as AppLocals | undefined)?.close().catch(() => {});
    await sequelize?.close().catch(() => {});
    await (db as MariaDbServer | null)?.stop().catch(() => {});
    (db as MariaDbServer | null)?.remove();
  }
}

if (require.main === module) {
  benchFirstLoad().catch((e) => {
    console.error(e);
    process.exitCode = 1;
  });
}
