/**
 * `npm run bench:search`: speed and typo tolerance of the full-text index (server/search/index.ts)
 * at 10,000 entries, printed beside MariaDB's own FULLTEXT index on the same text (figures only,
 * never asserted).
 *
 * In one run:
 *  1. a throwaway MariaDB (temp datadir, free port; never .data/), migrated, with the taxonomy and
 *     the demo accounts (authors and reviewers of the versions);
 *  2. a SYNTHETIC library of 10,000 published entries (bench/search/synthetic.ts: seeded PRNG,
 *     physics vocabulary; titles "Synthetic entry NNNNN: …", slugs "synthetic-NNNNN-…"), inserted
 *     in bulk into entries / entry_versions / entry_laws, and the same text into a bench table
 *     `bench_fulltext` with a FULLTEXT(title, body) index;
 *  3. the SearchIndex build: reading the entries from MariaDB, building the index from the rows
 *     read (time, heap), and the first build as the app runs it (pages read and indexed in slices);
 *  4. 1,000 queries of 2–5 distinctive words of a target entry, 30 % with typing errors, in process
 *     through SearchIndex.search (what GET /api/search computes: the ranked page of 20, the total
 *     and the facets; also timed: SearchIndex.query, every hit ranked, and the page with its
 *     excerpts and reader words) and through MATCH … AGAINST (natural language mode, top 20) on
 *     one connection: latency percentiles, their ratio, and how often the target comes first;
 *  5. claim-check latency at 10,000 entries (bench/claim-latency.ts);
 *  6. the real app (createApp, in a child process): how soon its first /api/search answers (and
 *     when its answer is complete), then autocannon, 32 connections × 10 s, on /api/search with
 *     those queries and on /api/health;
 *  7. the aims, each "met" or "not met".
 * mariadbd is stopped and the temp dir removed at the end, on error and on Ctrl-C.
 */
import { fork, spawn, type ChildProcess } from 'node:child_process';
import os from 'node:os';
import path from 'node:path';
import autocannon from 'autocannon';
import type { Sequelize } from 'sequelize';
import type { MariaDbServer } from '../server/db/mariadb';
import { ConservationLaw, Entry, EntryLaw, EntryVersion, MechanismClass, User } from '../server/models';
import { searchResult } from '../server/presenters/search';
import { SearchIndex } from '../server/search';
import { loadEntries, loadSynonyms } from '../server/search/load';
import { normaliseTerm, plainText } from '../server/search/normalise';
import { entryContentSchema } from '../shared/entries/schema';
import { AIM_CLAIM_P95_MS, benchClaimLatency } from './claim-latency';
import { startBenchDatabase } from './db';
import { generateLibrary, makeQueries, type BenchQuery } from './search/synthetic';

const ENTRIES = 10_000;
const QUERIES = 1_000;
const WARMUP = 200;
const TYPO_SHARE = 0.3;
const CONNECTIONS = 32;
const DURATION_S = 10;
const AIM_P95_MS = 2;
const AIM_P99_MS = 5;
const AIM_RATIO = 5;
const AIM_TYPO_FIRST = 0.95;
const AIM_BUILD_MS = 2000;
const AIM_HTTP_RATIO = 0.7;
/** The page GET /api/search answers by default. */
const PAGE = 20;

const say = (m: string) => console.log(`search: ${m}`);
const ms = (t: number) => (t < 10 ? t.toFixed(3) : t.toFixed(1));
const mb = (b: number) => `${(b / 1024 / 1024).toFixed(1)} MB`;
const pct = (x: number) => `${(x * 100).toFixed(1)} %`;
const gc = () => (globalThis as { gc?: () => void }).gc?.();

function percentiles(times: number[]) {
  const s = [...times].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil(p * s.length) - 1))];
  return { p50: at(0.5), p95: at(0.95), p99: at(0.99), mean: s.reduce((a, b) => a + b, 0) / s.length };
}

const chunks = <T>(xs: T[], n: number): T[][] => Array.from({ length: Math.ceil(xs.length / n) }, (_, i) => xs.slice(i * n, i * n + n));

// Everything to undo, whatever happens.
let db: MariaDbServer | null = null;
let sequelize: Sequelize | null = null;
/**
 * The connector without its bundled typings: they carry an old @types/node of their own, which
 * turns tsc's view of the project's timers into the DOM's.
 */
interface RawConnection {
  query(sql: string, values?: unknown[]): Promise<unknown>;
  end(): Promise<void>;
}
const mariadb = require('mariadb') as { createConnection(opts: object): Promise<RawConnection> };
let conn: RawConnection | null = null;
let child: ChildProcess | null = null;
let cannon: autocannon.Instance | null = null;
let cleaning: Promise<void> | null = null;
const cleanup = () =>
  (cleaning ??= (async () => {
    cannon?.stop();
    if (child && child.exitCode === null) {
      const c = child;
      const gone = new Promise((r) => c.once('exit', r));
      c.kill('SIGTERM');
      await Promise.race([gone, new Promise((r) => setTimeout(r, 3000))]);
      if (c.exitCode === null) c.kill('SIGKILL');
    }
    await conn?.end().catch(() => {});
    await sequelize?.close().catch(() => {});
    if (db) {
      await db.stop().catch(() => {});
      db.remove();
    }
  })());
let interrupted = false;
const onSignal = (code: number) => () => {
  interrupted = true;
  console.log('\nsearch: interrupted; stopping the app server and MariaDB, removing the temp dir…');
  void cleanup().then(() => process.exit(code));
};
process.on('SIGINT', onSignal(130));
process.on('SIGTERM', onSignal(143));

/**
 * A small detached watchdog that stops mariadbd and removes the temp dir if this process dies
 * without cleaning up: tsx SIGKILLs a child whose event loop is busy when Ctrl-C comes (the index
 * build is one long synchronous stretch), and mariadbd runs in its own process group, so nothing
 * else would stop it. It quits by itself once the temp dir is gone (the normal cleanup).
 */
function startWatchdog(mariadbdPid: number, baseDir: string): void {
  const code = `
    const fs = require('node:fs');
    const [parent, pid, dir] = [Number(process.argv[1]), Number(process.argv[2]), process.argv[3]];
    const alive = (p) => { try { process.kill(p, 0); return true; } catch { return false; } };
    const ours = () => { try { return fs.readFileSync('/proc/' + pid + '/cmdline', 'utf8').includes(dir); } catch { return alive(pid); } };
    const timer = setInterval(() => {
      if (!fs.existsSync(dir)) return process.exit(0);
      if (alive(parent)) return;
      clearInterval(timer);
      if (alive(pid) && ours()) process.kill(pid, 'SIGTERM');
      const t0 = Date.now();
      const wait = setInterval(() => {
        if (alive(pid) && Date.now() - t0 < 30000) return;
        if (alive(pid) && ours()) process.kill(pid, 'SIGKILL');
        clearInterval(wait);
        fs.rmSync(dir, { recursive: true, force: true });
        process.exit(0);
      }, 200);
    }, 500);`;
  spawn(process.execPath, ['-e', code, String(process.pid), String(mariadbdPid), baseDir], { detached: true, stdio: 'ignore' }).unref();
}

async function insertLibrary(seq: Sequelize, lib: ReturnType<typeof generateLibrary>) {
  const classes = new Map((await MechanismClass.findAll()).map((c) => [c.slug, c]));
  const laws = new Map((await ConservationLaw.findAll()).map((l) => [l.slug, l]));
  const users = new Map((await User.findAll()).map((u) => [u.email, u.id]));
  const author = users.get('editor.one@example.org')!;
  const reviewer = users.get('editor.two@example.org')!;
  const base = Date.UTC(2026, 0, 1);
  await seq.transaction(async (transaction) => {
    // Explicit ids (the tables are empty): entry n and its version 1 both have id n.
    for (const part of chunks(lib, 1000)) {
      await Entry.bulkCreate(
        part.map((e) => ({
          id: e.n, slug: e.slug, title: e.title, status: 'published' as const, mechanismClassId: classes.get(e.content.mechanismClass)!.id,
          currentVersionId: null, lastPublishedAt: new Date(base + e.n * 60_000), retiredReason: null, successorId: null,
        })),
        { transaction },
      );
    }
    for (const part of chunks(lib, 500)) {
      await EntryVersion.bulkCreate(
        part.map((e) => ({
          id: e.n, entryId: e.n, number: 1, state: 'published' as const, basedOnId: null, content: e.content, changeNote: 'Synthetic entry for the search benchmark.',
          reviewNote: null, authorId: author, reviewerId: reviewer, submittedAt: new Date(base + e.n * 60_000), publishedAt: new Date(base + e.n * 60_000),
        })),
        { transaction },
      );
    }
    // entries is not the immutable table: pointing each entry at its version is an ordinary update.
    await seq.query("UPDATE entries SET current_version_id = id WHERE slug LIKE 'synthetic-%'", { transaction });
    for (const part of chunks(lib.flatMap((e) => e.content.laws.map((s) => ({ entryId: e.n, lawId: laws.get(s)!.id }))), 2000)) {
      await EntryLaw.bulkCreate(part, { transaction });
    }
  });
  return { classes, laws };
}

async function main() {
  const t0 = performance.now();
  const cpus = os.cpus();
  console.log(
    `Counterweight search benchmark — node ${process.version}, ${cpus.length} × ${cpus[0]?.model ?? 'unknown CPU'}, ` +
      `${mb(os.totalmem())} RAM, ${os.platform()} ${os.release()}`,
  );
  if (!(globalThis as { gc?: unknown }).gc) console.log('(no --expose-gc: heap figures include garbage)');

  // 1. The database.
  const started = await startBenchDatabase('bench', say, (server) => {
    db = server;
    startWatchdog(server.pid!, server.baseDir);
  });
  const seq = (sequelize = started.sequelize);
  const cfg = started.cfg;
  say(`throwaway MariaDB on 127.0.0.1:${started.db.port} in ${started.db.baseDir}, migrated, taxonomy and demo accounts seeded (${((performance.now() - t0) / 1000).toFixed(1)} s)`);

  // 2. The synthetic library.
  let t = performance.now();
  const lib = generateLibrary(ENTRIES);
  for (const e of lib) entryContentSchema.parse(e.content);
  const words = lib.reduce((n, e) => n + (Object.values(e.content).join(' ').match(/\S+/g) ?? []).length, 0);
  say(`generated ${lib.length.toLocaleString('en-US')} SYNTHETIC entries (seeded, valid against entryContentSchema; ${Math.round(words / lib.length)} words each on average) in ${(performance.now() - t).toFixed(0)} ms`);
  t = performance.now();
  const { classes, laws } = await insertLibrary(seq, lib);
  say(`inserted them as published entries + versions + law links in one transaction in ${((performance.now() - t) / 1000).toFixed(1)} s`);

  // The same text in a bench table with MariaDB's FULLTEXT index.
  t = performance.now();
  await seq.query(
    'CREATE TABLE bench_fulltext (id INT UNSIGNED PRIMARY KEY, slug VARCHAR(80) NOT NULL, title VARCHAR(160) NOT NULL, body MEDIUMTEXT NOT NULL) ENGINE=InnoDB DEFAULT CHARSET=utf8mb4 COLLATE=utf8mb4_unicode_ci',
  );
  const lawName = new Map([...laws.values()].map((l) => [l.slug, l.name]));
  for (const part of chunks(lib, 500)) {
    const rows = part.map((e) => {
      const c = e.content;
      // The fields SearchIndex indexes besides the title (server/search/index.ts, SearchDoc).
      const body = [
        c.aliases.join(' · '), plainText(c.inBrief), plainText(c.howItIsPitched), plainText(c.whyItFails), plainText(c.whatFakesTheEffect),
        classes.get(c.mechanismClass)!.name, c.laws.map((s) => lawName.get(s) ?? s).join(' · '),
      ].join('\n');
      return [e.n, e.slug, e.title, body];
    });
    await seq.query(`INSERT INTO bench_fulltext (id, slug, title, body) VALUES ${rows.map(() => '(?, ?, ?, ?)').join(', ')}`, { replacements: rows.flat() });
  }
  const tFill = performance.now() - t;
  t = performance.now();
  await seq.query('ALTER TABLE bench_fulltext ADD FULLTEXT INDEX bench_fulltext_ft (title, body)');
  say(`bench_fulltext filled in ${(tFill / 1000).toFixed(1)} s; FULLTEXT(title, body) index built in ${((performance.now() - t) / 1000).toFixed(1)} s`);

  // 3. The SearchIndex build: the read from MariaDB and the build from the rows read, apart.
  gc();
  t = performance.now();
  const syn = await loadSynonyms();
  const read = await loadEntries();
  const tRead = performance.now() - t;
  const heap0 = process.memoryUsage().heapUsed;
  const index = new SearchIndex({ refreshMs: 0 });
  t = performance.now();
  index.install(read.items, syn, read);
  const tBuild = performance.now() - t;
  gc();
  const heap1 = process.memoryUsage().heapUsed;
  t = performance.now();
  index.install(read.items, syn, read);
  const tBuild2 = performance.now() - t;
  gc();
  say(
    `SearchIndex: ${index.size.toLocaleString('en-US')} entries read from MariaDB in ${tRead.toFixed(0)} ms; index built from the rows in ${tBuild.toFixed(0)} ms ` +
      `(again: ${tBuild2.toFixed(0)} ms); heap used ${mb(heap1)} after, ${mb(heap1 - heap0)} for the index and the rows`,
  );
  // The first build as the app runs it: pages of entries read and indexed in slices that yield.
  const fresh = new SearchIndex({ refreshMs: 0 });
  t = performance.now();
  await fresh.ready();
  const tFirst = performance.now() - t;
  say(`the app's first build (pages of 1,000 read, indexed in slices of 250 that yield to the event loop): ${tFirst.toFixed(0)} ms in all, reads included`);
  await fresh.stop();

  // 4. The queries.
  // 200 more for the warm-ups, never timed: the index keeps a cache of single words' hits, and a
  // warm-up on the timed queries themselves would fill it with exactly the words they ask for.
  const generated = makeQueries(lib, normaliseTerm, QUERIES + WARMUP, TYPO_SHARE);
  const queries = generated.slice(0, QUERIES);
  const warmup = generated.slice(QUERIES);
  const typos = queries.filter((q) => q.typo);
  const words2 = queries.reduce((n, q) => n + q.q.split(' ').length, 0) / queries.length;
  say(`${queries.length} queries, ${words2.toFixed(1)} words on average, ${typos.length} (${pct(typos.length / queries.length)}) with a typing error; e.g. ${queries.slice(0, 4).map((q) => `“${q.q}”`).join(', ')}`);

  const first = (ids: (number | undefined)[], qs: BenchQuery[]) => {
    const hit = (pred: (q: BenchQuery) => boolean) => {
      const sel = qs.map((q, i) => [q, ids[i]] as const).filter(([q]) => pred(q));
      return sel.filter(([q, id]) => id === q.target).length / sel.length;
    };
    return { typo: hit((q) => q.typo), clean: hit((q) => !q.typo), all: hit(() => true) };
  };

  // What GET /api/search computes (SearchIndex.search: the page of 20 ranked, the total, the facets).
  const page = (q: string) => index.search({ q, offset: 0, limit: PAGE });
  for (const q of warmup) page(q.q); // warm-up (other queries than those timed)
  gc(); // each timed loop starts from a collected heap (the build's garbage is not the queries' cost)
  const msTimes: number[] = [];
  const msFirst: (number | undefined)[] = [];
  const msCounts: number[] = [];
  for (const q of queries) {
    const s = performance.now();
    const res = page(q.q);
    msTimes.push(performance.now() - s);
    msFirst.push(res.hits[0]?.entry.id);
    msCounts.push(res.total);
  }
  const msP = percentiles(msTimes);
  const msTop = first(msFirst, queries);
  say(
    `index in process (SearchIndex.search, as GET /api/search: page of ${PAGE} ranked, total, facets): p50 ${ms(msP.p50)} ms, p95 ${ms(msP.p95)} ms, p99 ${ms(msP.p99)} ms, ` +
      `mean ${ms(msP.mean)} ms; median ${percentiles(msCounts).p50} hits per query`,
  );
  // The same queries with every hit ranked (SearchIndex.query), and with the page presented as the route presents it.
  gc();
  const allTimes: number[] = [];
  const presentedTimes: number[] = [];
  for (const q of queries) {
    let s = performance.now();
    index.query(q.q);
    allTimes.push(performance.now() - s);
    s = performance.now();
    for (const h of page(q.q).hits) searchResult(h, index.readerWords(h, q.q));
    presentedTimes.push(performance.now() - s);
  }
  const allP = percentiles(allTimes);
  const presP = percentiles(presentedTimes);
  say(`  every hit ranked (SearchIndex.query): p50 ${ms(allP.p50)} ms, p95 ${ms(allP.p95)} ms, p99 ${ms(allP.p99)} ms`);
  say(`  the page with its excerpts and reader words (what the route sends): p50 ${ms(presP.p50)} ms, p95 ${ms(presP.p95)} ms, p99 ${ms(presP.p99)} ms`);

  conn = await mariadb.createConnection({ host: cfg.host, port: cfg.port, user: cfg.user, password: cfg.password, database: cfg.name });
  const sql =
    'SELECT id, MATCH(title, body) AGAINST (? IN NATURAL LANGUAGE MODE) AS score FROM bench_fulltext ' +
    'WHERE MATCH(title, body) AGAINST (? IN NATURAL LANGUAGE MODE) ORDER BY score DESC LIMIT 20';
  for (const q of warmup) await conn.query(sql, [q.q, q.q]); // warm-up (other queries than those timed)
  gc();
  const ftTimes: number[] = [];
  const ftFirst: (number | undefined)[] = [];
  for (const q of queries) {
    const s = performance.now();
    const rows = (await conn.query(sql, [q.q, q.q])) as { id: number }[];
    ftTimes.push(performance.now() - s);
    ftFirst.push(rows[0] ? Number(rows[0].id) : undefined);
  }
  const ftP = percentiles(ftTimes);
  const ftTop = first(ftFirst, queries);
  say(`MariaDB FULLTEXT (MATCH … AGAINST natural language, top 20, one connection over TCP): p50 ${ms(ftP.p50)} ms, p95 ${ms(ftP.p95)} ms, p99 ${ms(ftP.p99)} ms, mean ${ms(ftP.mean)} ms`);
  const ratio = { p50: ftP.p50 / msP.p50, p95: ftP.p95 / msP.p95, p99: ftP.p99 / msP.p99 };
  say(`FULLTEXT / index: p50 ${ratio.p50.toFixed(1)}×, p95 ${ratio.p95.toFixed(1)}×, p99 ${ratio.p99.toFixed(1)}×`);
  say(`target entry first — index:    typo queries ${pct(msTop.typo)}, clean ${pct(msTop.clean)}, all ${pct(msTop.all)}`);
  say(`target entry first — FULLTEXT:   typo queries ${pct(ftTop.typo)}, clean ${pct(ftTop.clean)}, all ${pct(ftTop.all)}`);
  const missed = queries.filter((q, i) => q.typo && msFirst[i] !== q.target).slice(0, 5);
  if (missed.length) say(`typo queries the index did not put first, e.g.: ${missed.map((q) => `“${q.q}” (wanted ${lib[q.target - 1].slug})`).join('; ')}`);
  await conn.end();
  conn = null;

  // 5. Claim checks at 10,000 entries.
  const claims = await benchClaimLatency(index, seq, say);

  // 6. HTTP: the real app in a child process, autocannon here.
  // CW_BENCH_PROFILE_APP=<dir>: the app process writes a CPU profile there as it exits (for tuning the route).
  const profile = process.env.CW_BENCH_PROFILE_APP;
  child = fork(path.join(__dirname, 'search', 'http-server.ts'), [], {
    env: { ...process.env, CW_BENCH_DB: JSON.stringify(cfg) },
    stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
    ...(profile ? { execArgv: [...process.execArgv, '--cpu-prof', `--cpu-prof-dir=${profile}`] } : {}),
  });
  const port = await new Promise<number>((resolve, reject) => {
    child!.once('message', (m) => resolve((m as { port: number }).port));
    child!.once('exit', (code) => reject(new Error(`the bench app server exited with code ${code} before listening`)));
  });
  const base = `http://127.0.0.1:${port}`;
  // The child sent its port as soon as it listened: its index is building now.
  t = performance.now();
  const ask = async () => {
    const res = await fetch(`${base}/api/search?q=${encodeURIComponent(queries[0].q)}`);
    if (res.status !== 200) throw new Error(`GET /api/search answered ${res.status}: ${await res.text()}`);
    return (await res.json()) as { total: number; partial?: boolean };
  };
  const firstBody = await ask();
  const tFirstAnswer = performance.now() - t;
  let complete = firstBody;
  while (complete.partial) {
    await new Promise((r) => setTimeout(r, 50));
    complete = await ask();
  }
  const tComplete = performance.now() - t;
  say(
    `app (createApp, env production, own process) on ${base}: first /api/search answered after ${tFirstAnswer.toFixed(0)} ms ` +
      `(${firstBody.partial ? `partial while the index builds: ${firstBody.total} hits so far` : `complete, total ${firstBody.total}`}); complete answers from ${tComplete.toFixed(0)} ms, total ${complete.total}`,
  );
  const run = (opts: autocannon.Options) =>
    new Promise<autocannon.Result>((resolve, reject) => {
      cannon = autocannon(opts, (err, result) => (err ? reject(err) : resolve(result)));
    });
  let k = 0;
  const search = await run({
    url: base,
    connections: CONNECTIONS,
    duration: DURATION_S,
    requests: [{ method: 'GET', setupRequest: (req) => ({ ...req, path: `/api/search?q=${encodeURIComponent(queries[k++ % queries.length].q)}` }) }],
  });
  const health = await run({ url: `${base}/api/health`, connections: CONNECTIONS, duration: DURATION_S });
  cannon = null;
  const line = (what: string, r: autocannon.Result) =>
    `${what}: ${Math.round(r.requests.average).toLocaleString('en-US')} requests/s, latency p50 ${r.latency.p50} ms, p99 ${r.latency.p99} ms ` +
    `(${r.requests.total.toLocaleString('en-US')} requests, ${r.non2xx} non-2xx, ${r.errors} errors, ${r.timeouts} timeouts; ${mb(r.throughput.average)}/s)`;
  say(`autocannon ${CONNECTIONS} connections × ${DURATION_S} s, no compression asked (the 1,000 queries repeat, so after the first pass the app's cache of single words' hits is warm):`);
  say(line(`  /api/search?q=<the 1,000 queries in turn>`, search));
  say(line(`  /api/health (one SELECT 1)              `, health));
  const httpRatio = search.requests.average / health.requests.average;
  say(`  search / health: ${httpRatio.toFixed(2)}× the requests/s, ${(search.latency.p50 / Math.max(health.latency.p50, 0.001)).toFixed(1)}× the p50 latency`);

  // 7. The aims.
  const verdict = (ok: boolean) => (ok ? 'met' : 'not met');
  const ratioOk = [ratio.p50, ratio.p95, ratio.p99].map((r) => r >= AIM_RATIO);
  console.log('');
  say('aims:');
  say(`  p95 ≤ ${AIM_P95_MS} ms in process at ${ENTRIES.toLocaleString('en-US')} entries: p95 ${ms(msP.p95)} ms — ${verdict(msP.p95 <= AIM_P95_MS)}`);
  say(`  p99 ≤ ${AIM_P99_MS} ms in process at ${ENTRIES.toLocaleString('en-US')} entries: p99 ${ms(msP.p99)} ms — ${verdict(msP.p99 <= AIM_P99_MS)}`);
  say(
    `  ≥ ${AIM_RATIO}× faster than FULLTEXT in the same run: ${ratio.p50.toFixed(1)}× / ${ratio.p95.toFixed(1)}× / ${ratio.p99.toFixed(1)}× at p50 / p95 / p99 — ` +
      (ratioOk.every(Boolean) ? 'met' : ratioOk.some(Boolean) ? `met at ${['p50', 'p95', 'p99'].filter((_, i) => ratioOk[i]).join(', ')} only` : 'not met'),
  );
  say(`  ≥ ${pct(AIM_TYPO_FIRST)} of typo queries find their entry first: ${pct(msTop.typo)} — ${verdict(msTop.typo >= AIM_TYPO_FIRST)} (typo-free: ${pct(msTop.clean)}; FULLTEXT: ${pct(ftTop.typo)} / ${pct(ftTop.clean)})`);
  say(`  index build ≤ ${AIM_BUILD_MS} ms for ${ENTRIES.toLocaleString('en-US')} entries (from the rows read): ${tBuild.toFixed(0)} ms — ${verdict(tBuild <= AIM_BUILD_MS)} (reading them: ${tRead.toFixed(0)} ms more)`);
  say(`  searches answered while the index builds: first /api/search after ${tFirstAnswer.toFixed(0)} ms${firstBody.partial ? ', flagged partial' : ''} — ${verdict(tFirstAnswer <= AIM_BUILD_MS)}`);
  say(`  /api/search ≥ ${AIM_HTTP_RATIO}× the requests/s of /api/health in the same run: ${httpRatio.toFixed(2)}× — ${verdict(httpRatio >= AIM_HTTP_RATIO)}`);
  say(`  claim check p95 ≤ ${AIM_CLAIM_P95_MS} ms in process at ${ENTRIES.toLocaleString('en-US')} entries: whole check ${claims.check.p95.toFixed(1)} ms — ${verdict(claims.check.p95 <= AIM_CLAIM_P95_MS)} (matcher alone ${claims.matcher.p95.toFixed(1)} ms; on long texts ${claims.long.p95.toFixed(1)} ms)`);
  console.log('');
  say(`run time ${((performance.now() - t0) / 1000).toFixed(1)} s; the library above is SYNTHETIC (bench/search/synthetic.ts), in a throwaway database removed as this run ends`);
}

/** The whole bench (also part of `npm run bench`, bench/run.ts); cleans up whatever happens. */
export function runSearchBench(): Promise<void> {
  return main()
    .catch((e) => {
      if (interrupted) return; // the work under way failed because cleanup closed what it used
      console.error(e);
      process.exitCode = 1;
    })
    .finally(() => cleanup());
}

if (require.main === module) void runSearchBench();
