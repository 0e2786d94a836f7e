/**
 * The compute pool (issue 13, item 1) under jest: computations run in worker threads that load our
 * TypeScript with tsx; a job over the wall-clock limit is ended (422) and the pool goes on, its warm
 * spare thread taking the next job before the ended thread's replacement has loaded; a full
 * queue answers 503 with Retry-After; a pool that cannot start answers 503 and computes nothing on
 * the main thread; and health checks and searches keep answering while four clients hammer the
 * slowest legal worksheet. No timed assertions: how fast they answer is `npm run bench`'s figure.
 */
import fs from 'node:fs';
import type http from 'node:http';
import os from 'node:os';
import path from 'node:path';
import request from 'supertest';
import type { AppLocals } from '../../server/app';
import type { ComputePool, ComputePoolState } from '../../server/compute/pool';
import { startTestApp, type TestApp } from '../support/app';

jest.setTimeout(240_000);

// Every pool here keeps its warm spare thread (`spare: true`), as a server's pool does; test apps
// elsewhere go without it unless they ask (server/app.ts).

/**
 * The slowest legal worksheet we found: 60 steps (the schema's most), each the product of 100
 * copies of the step before (under the 500-character limit). mathjs keeps the units of a product
 * as a list, so the lists grow a hundredfold at each step: the first two steps take milliseconds,
 * well inside the evaluator's own budget (checked only between steps), and the third runs inside
 * mathjs for about 30 s (measured on the development machine, uncapped).
 */
function slowWorksheet() {
  const steps = [{ name: 's0', label: 's0', expression: 'x' }];
  for (let i = 1; i < 60; i++) steps.push({ name: `s${i}`, label: `s${i}`, expression: Array(100).fill(`s${i - 1}`).join('*') });
  return { name: 'slow-chain', title: 'A slow chain', inputs: [{ name: 'x', label: 'x', unit: 'm', default: '1.0001 m' }], steps };
}

// F = P / c for 1 kW: 3.3356 µN (c exact, BIPM SI Brochure, 9th ed., 2019, Table 1).
const quick = {
  worksheet: {
    name: 'quick',
    title: 'Quick',
    inputs: [{ name: 'P', label: 'P', unit: 'W', default: '1 kW' }],
    steps: [{ name: 'F', label: 'F', expression: 'P / c', unit: 'uN' }],
  },
};
// P/c for 1 kW, c = 299 792 458 m/s exact (BIPM, SI Brochure, 9th ed., 2019): 3.3356 µN.
const F_1kW = 1000 / 299_792_458;

const evaluate = (target: Parameters<typeof request>[0], body: object) => request(target).post('/api/worksheets/evaluate').send(body);
const pool = (h: TestApp) => (h.app.locals as unknown as AppLocals).compute;

// Taken as this file has loaded the app and its test harness, before any app starts: mathjs (about a
// second to load under jest) is loaded on the main thread at its first use only, never with the app.
const mathjsAtImport = Object.keys(require.cache).some((file) => file.includes(`${path.sep}node_modules${path.sep}mathjs${path.sep}`));

it('imports the app without loading mathjs on the main thread', () => {
  expect(mathjsAtImport).toBe(false);
});

/** Resolves once `n` of the pool's threads have loaded and warmed up (the pool's own 'warm' events). */
const warmed = (p: ComputePool, n: number) =>
  new Promise<void>((resolve) => {
    const check = () => {
      if (p.state().warm.length < n) return;
      p.events.off('warm', check);
      resolve();
    };
    p.events.on('warm', check);
    check();
  });

describe('a pool with a 1 s limit per job', () => {
  let h: TestApp;
  let server: http.Server;
  beforeAll(async () => {
    h = await startTestApp({ starterEntries: true, searchRefreshMs: 0, compute: { timeoutMs: 1000, threads: 1, queueMax: 16, spare: true } });
    server = h.app.listen(0, '127.0.0.1');
    await pool(h).ready();
  });
  afterAll(async () => {
    await new Promise((r) => server?.close(r));
    await h?.close();
  });

  it('computes in a worker thread, not on the main thread', async () => {
    expect(pool(h).opts.inline).toBe(false);
    expect(pool(h).startError).toBeNull();
    const res = await evaluate(server, quick).expect(200);
    expect(res.body.steps[0].value.si).toBeCloseTo(F_1kW, 18);
  });

  it('keeps a warm spare thread, which takes the next job at once when a thread is ended at the limit', async () => {
    const p = pool(h);
    // threads: 1, and the spare; both loaded and warmed before the slow job.
    expect(p.state().threads).toHaveLength(2);
    await warmed(p, 2);
    const log: string[] = [];
    let atEnd: ComputePoolState | null = null;
    const onWarm = (id: number) => log.push(`warm ${id}`);
    const onBegin = (id: number) => log.push(`begin ${id}`);
    const onEnded = (id: number, why: string) => {
      log.push(`ended ${id} ${why}`);
      atEnd = p.state();
    };
    p.events.on('warm', onWarm).on('begin', onBegin).on('ended', onEnded);
    try {
      expect((await evaluate(server, { worksheet: slowWorksheet() })).status).toBe(422);
      const next = await evaluate(server, quick).expect(200);
      expect(next.body.steps[0].value.si).toBeCloseTo(F_1kW, 18);
    } finally {
      p.events.off('warm', onWarm).off('begin', onBegin).off('ended', onEnded);
    }
    const [slow, spare] = log.filter((l) => l.startsWith('begin ')).map((l) => Number(l.slice(6)));
    // In this order, with no thread warming up in between: the next job did not wait for a thread to load.
    expect(log.slice(0, 3)).toEqual([`begin ${slow}`, `ended ${slow} time`, `begin ${spare}`]);
    expect(spare).not.toBe(slow);
    // The moment the slow job's thread was ended: the spare had warmed up and stood idle, and the
    // pool still held two threads (the ended one gone, its replacement loading), never three.
    const s = atEnd as ComputePoolState | null;
    expect(s?.warm).toContain(spare);
    expect(s?.busy).not.toContain(spare);
    expect(s?.threads).toHaveLength(2);
    expect(s?.threads).not.toContain(slow);
  });

  it('ends a job over the limit with 422 in our error shape, and computes the next one', async () => {
    const res = await evaluate(server, { worksheet: slowWorksheet() });
    expect(res.status).toBe(422);
    expect(res.body).toEqual({ error: { code: 'computation_too_long', message: expect.stringMatching(/^The computation took longer than 1 s and was stopped\. Use fewer steps/) } });
    // The worker was ended; a new one takes the next job.
    const next = await evaluate(server, quick).expect(200);
    expect(next.body.steps[0].value.si).toBeCloseTo(F_1kW, 18);
  });

  it('answers health checks and searches while four clients hammer the slowest legal worksheet', async () => {
    let hammering = true;
    // Each job ended at the limit costs its thread, and a new one loads for seconds: one job per client keeps the test short.
    // (A job that reaches the evaluator's own 1 s budget before the pool's timer, started when the worker's
    // "begin" message reaches a busy main thread, ends itself: 200 with its remaining steps "not computed"
    // for time. Either way it stopped at the limit; it is counted as "ended", never as having run on.)
    const hammer = async () => {
      const res = await evaluate(server, { worksheet: slowWorksheet() });
      const endedItself = res.status === 200 && JSON.stringify(res.body.steps ?? []).includes('took longer than');
      return endedItself ? 'ended' : res.status;
    };
    const clients = Promise.all([hammer(), hammer(), hammer(), hammer()]).finally(() => {
      hammering = false;
    });
    const health: number[] = [];
    const search: number[] = [];
    let mostThreads = 0;
    let mostBusy = 0;
    const reads = (async () => {
      while (hammering) {
        health.push((await request(server).get('/api/health')).status);
        search.push((await request(server).get('/api/search').query({ q: 'propellant-free thrust' })).status);
        const now = pool(h).state();
        mostThreads = Math.max(mostThreads, now.threads.length);
        mostBusy = Math.max(mostBusy, now.busy.length);
      }
    })();
    const hammered = await clients;
    await reads;
    // Every slow job was ended at the limit (422, or ended by its own budget) or, with the queue full,
    // refused (503); none ran on.
    expect(hammered).toHaveLength(4);
    for (const s of hammered) expect([422, 503, 'ended']).toContain(s);
    expect(hammered).toContain(422);
    // Four jobs of at least 1 s each on one thread: the reads went on meanwhile, every one answered.
    expect(health.length).toBeGreaterThanOrEqual(4);
    expect(new Set(health)).toEqual(new Set([200]));
    expect(new Set(search)).toEqual(new Set([200]));
    // One thread computing and the spare, while threads were ended and replaced; never two jobs at once.
    expect(mostThreads).toBe(2);
    expect(mostBusy).toBe(1);
  });
});

describe('a full queue', () => {
  let h: TestApp;
  let server: http.Server;
  beforeAll(async () => {
    h = await startTestApp({ demoAccounts: false, compute: { timeoutMs: 1000, threads: 1, queueMax: 1, spare: true } });
    server = h.app.listen(0, '127.0.0.1');
    await pool(h).ready();
  });
  afterAll(async () => {
    await new Promise((r) => server?.close(r));
    await h?.close();
  });

  it('answers 503 with Retry-After and a message in our shape when one job runs and one waits', async () => {
    const all = await Promise.all([0, 1, 2, 3].map(() => evaluate(server, { worksheet: slowWorksheet() })));
    const busy = all.filter((r) => r.status === 503);
    // At most one job waits: of four sent at once, at least two are refused.
    expect(busy.length).toBeGreaterThanOrEqual(2);
    for (const r of busy) {
      expect(r.body).toEqual({ error: { code: 'compute_busy', message: expect.stringMatching(/^The server is busy with other computations .* Try again in \d+ seconds?\.$/) } });
      expect(Number(r.headers['retry-after'])).toBeGreaterThanOrEqual(1);
    }
    for (const r of all.filter((x) => x.status !== 503)) expect(r.status).toBe(422);
  });
});

describe('a pool that cannot start', () => {
  let h: TestApp;
  let dir: string;
  beforeAll(async () => {
    dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-broken-worker-'));
    const filename = path.join(dir, 'worker.mjs');
    fs.writeFileSync(filename, "throw new Error('this worker cannot load');\n");
    h = await startTestApp({ demoAccounts: false, compute: { filename, threads: 1, spare: true } });
    await pool(h).ready();
  });
  afterAll(async () => {
    await h?.close();
    fs.rmSync(dir, { recursive: true, force: true });
  });

  it('answers 503 and does not compute on the main thread instead', async () => {
    expect(pool(h).startError?.message).toMatch(/this worker cannot load/);
    const res = await evaluate(h.app, quick);
    expect(res.status).toBe(503);
    expect(res.body).toEqual({ error: { code: 'compute_unavailable', message: expect.stringMatching(/worker threads could not start/) } });
    const check = await request(h.app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 uN', P: '1 kW' } });
    expect(check.status).toBe(503);
  });
});

describe('the claim check and the check kit', () => {
  let h: TestApp;
  beforeAll(async () => {
    h = await startTestApp({ demoAccounts: false, compute: { threads: 1, timeoutMs: 5000, spare: true } });
  });
  afterAll(() => h?.close());

  it('read figures and run checks in the pool, with 4xx for bad input as before', async () => {
    // Invented claim text. 0.2 lbf = 0.889644 N (NIST SP 811, 2008, Appendix B.8).
    const res = await request(h.app).post('/api/claim-checks').send({ text: 'An invented sealed cavity gives 0.2 lbf of thrust from 1.5 kW with no propellant.' }).expect(200);
    expect(res.body.figures.find((f: { kind: string }) => f.kind === 'thrust').si).toBeCloseTo(0.45359237 * 9.80665 * 0.2, 9);
    expect(res.body.checks.map((c: { check: string }) => c.check)).toContain('photon-bound');
    const bad = await request(h.app).post('/api/claim-checks').send({ text: 'x', figures: [{ kind: 'thrust', quantity: '2 kWh' }] }).expect(400);
    expect(Object.keys(bad.body.error.fields)).toEqual(['body.figures.0.quantity']);
    const wrong = await request(h.app).post('/api/checks/photon-bound').send({ inputs: { F_claimed: '3 kWh', P: '1 kW' } }).expect(400);
    expect(Object.keys(wrong.body.error.fields)).toEqual(['body.inputs.F_claimed']);
  });

  it('answers 503 once the app has closed its pool, and the pool ends its threads', async () => {
    const compute = pool(h);
    // threads: 1 and the spare, both counted and both ended.
    expect(compute.state().threads).toHaveLength(2);
    await compute.close();
    expect(compute.state().threads).toEqual([]);
    const res = await evaluate(h.app, quick);
    expect(res.status).toBe(503);
    expect(res.body.error.code).toBe('compute_unavailable');
  });
});
