/**
 * Part of `npm run bench`: do health checks and searches stay fast while the compute pool is
 * saturated (issue 13, item 1)? The real app (bench/search/http-server.ts, env production, the
 * compute pool at its defaults: COMPUTE_THREADS, COMPUTE_TIMEOUT_MS …) runs in its own process on a
 * throwaway MariaDB with the starter library. Health and search latency are measured first idle,
 * then while four clients post the slowest legal worksheet again and again (each job ended at the
 * time limit), and printed as p50/p99 with the ratio saturated / idle.
 * Aim: a search answers within 100 ms (p99) under saturation.
 */
import { fork, type ChildProcess } from 'node:child_process';
import path from 'node:path';
import type { MariaDbServer } from '../server/db/mariadb';
import { importEntriesIfEmpty } from '../server/db/seed-entries';
import { CONTENT, startBenchDatabase } from './db';

const AIM_SEARCH_P99_MS = 100;
const HAMMERS = 4;
const DURATION_MS = 15_000;
const QUERIES = ['propellant-free thrust', 'over-unity magnet motor', 'heat engine beats Carnot', 'perpetual motion wheel', 'reactionless drive'];

const say = (m: string) => console.log(`compute pool: ${m}`);

/** The slowest legal worksheet we found (see tests/server/compute-pool.test.ts): 60 steps, each the product of 100 copies of the one before. */
function slowWorksheet() {
  const steps = [{ name: 's0', label: 's0', expression: 'x' }];
  for (let i = 1; i < 60; i++) steps.push({ name: `s${i}`, label: `s${i}`, expression: Array(100).fill(`s${i - 1}`).join('*') });
  return { name: 'slow-chain', title: 'A slow chain', inputs: [{ name: 'x', label: 'x', unit: 'm', default: '1.0001 m' }], steps };
}

function percentiles(times: number[]) {
  const s = [...times].sort((a, b) => a - b);
  const at = (p: number) => s[Math.min(s.length - 1, Math.max(0, Math.ceil(p * s.length) - 1))];
  return { p50: at(0.5), p99: at(0.99), n: s.length };
}

/** Health and search, one after the other, for `ms`: the latency of each, and any status other than 200. */
async function measureReads(base: string, ms: number) {
  const health: number[] = [];
  const search: number[] = [];
  const bad: string[] = [];
  const end = performance.now() + ms;
  let k = 0;
  while (performance.now() < end) {
    let t = performance.now();
    const h = await fetch(`${base}/api/health`);
    await h.arrayBuffer();
    health.push(performance.now() - t);
    if (h.status !== 200) bad.push(`health ${h.status}`);
    t = performance.now();
    const s = await fetch(`${base}/api/search?q=${encodeURIComponent(QUERIES[k++ % QUERIES.length])}`);
    await s.arrayBuffer();
    search.push(performance.now() - t);
    if (s.status !== 200) bad.push(`search ${s.status}`);
    // A reader's pace, not a load test: the figure is the wait one reader sees.
    await new Promise((r) => setTimeout(r, 20));
  }
  return { health: percentiles(health), search: percentiles(search), bad };
}

export async function benchComputePool(): Promise<void> {
  let db: MariaDbServer | null = null;
  let child: ChildProcess | null = null;
  try {
    const started = await startBenchDatabase('compute', say, (d) => {
      db = d;
    });
    const imported = await importEntriesIfEmpty(started.sequelize, CONTENT);
    await started.sequelize.close();
    child = fork(path.join(__dirname, 'search', 'http-server.ts'), [], {
      env: { ...process.env, CW_BENCH_DB: JSON.stringify(started.cfg) },
      stdio: ['ignore', 'inherit', 'inherit', 'ipc'],
    });
    const port = await new Promise<number>((resolve, reject) => {
      child!.once('message', (m) => resolve((m as { port: number }).port));
      child!.once('exit', (code) => reject(new Error(`the bench app server exited with code ${code} before listening`)));
    });
    const base = `http://127.0.0.1:${port}`;
    // The first search waits for the index; the first computation for the workers.
    await (await fetch(`${base}/api/search?q=thrust`)).arrayBuffer();
    const first = await fetch(`${base}/api/checks/photon-bound`, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify({ inputs: { F_claimed: '3 uN', P: '1 kW' } }) });
    if (first.status !== 200) throw new Error(`POST /api/checks/photon-bound answered ${first.status}: ${await first.text()}`);
    say(`app on ${base}, ${imported} starter entries; ${HAMMERS} clients, ${DURATION_MS / 1000} s each phase`);

    const idle = await measureReads(base, DURATION_MS);

    let hammering = true;
    const outcomes = new Map<number, number>();
    const hammer = async () => {
      const body = JSON.stringify({ worksheet: slowWorksheet() });
      while (hammering) {
        const res = await fetch(`${base}/api/worksheets/evaluate`, { method: 'POST', headers: { 'content-type': 'application/json' }, body });
        await res.arrayBuffer();
        outcomes.set(res.status, (outcomes.get(res.status) ?? 0) + 1);
        // A refused request (503 busy) retries after a short pause rather than spinning.
        if (res.status === 503) await new Promise((r) => setTimeout(r, 200));
      }
    };
    const hammers = Array.from({ length: HAMMERS }, hammer);
    // Let the pool fill before measuring.
    await new Promise((r) => setTimeout(r, 1000));
    const busy = await measureReads(base, DURATION_MS);
    hammering = false;
    await Promise.all(hammers);

    const row = (what: string, a: { p50: number; p99: number; n: number }, b: { p50: number; p99: number; n: number }) =>
      `${what}: idle p50 ${a.p50.toFixed(1)} ms, p99 ${a.p99.toFixed(1)} ms (${a.n}); saturated p50 ${b.p50.toFixed(1)} ms, p99 ${b.p99.toFixed(1)} ms (${b.n}); ratio p50 ${(b.p50 / a.p50).toFixed(1)}×, p99 ${(b.p99 / a.p99).toFixed(1)}×`;
    say(row('health', idle.health, busy.health));
    say(row('search', idle.search, busy.search));
    say(`slow worksheets posted: ${[...outcomes].map(([s, n]) => `${n} × ${s}`).join(', ')} (422: ended at the time limit; 503: queue full)`);
    if (idle.bad.length || busy.bad.length) say(`non-200 reads: ${[...idle.bad, ...busy.bad].join(', ')}`);
    const met = busy.search.p99 <= AIM_SEARCH_P99_MS && busy.bad.length === 0;
    say(`aim: search within ${AIM_SEARCH_P99_MS} ms (p99) while saturated, every health check 200 — ${met ? 'met' : 'NOT met'}`);
  } finally {
    if (child && child.exitCode === null) {
      const exited = new Promise((r) => child!.once('exit', r));
      child.kill('SIGTERM');
      await exited;
    }
    await (db as MariaDbServer | null)?.stop().catch(() => {});
    (db as MariaDbServer | null)?.remove();
  }
}

if (require.main === module) {
  benchComputePool().catch((e) => {
    console.error(e);
    process.exitCode = 1;
  });
}
