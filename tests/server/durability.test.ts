/**
 * Durability under SIGKILL (issue 13): the app runs as its own process (`node --import tsx
 * server/main.ts`) on a MariaDB of this file's own, with attachments in a temporary directory. Clients
 * make acknowledged writes of each kind — draft saves, publishes (submit, then approval by the other
 * editor), sightings with files, saved claim checks — while, at a moment drawn from a seeded random
 * generator, the app and mariadbd are both killed with SIGKILL (in a drawn order, a drawn gap apart; in
 * the first trial, counted from the moment each kind has been acknowledged once).
 * After each restart every acknowledged write must be there and whole, read through the API (the
 * attachment bytes hash to the SHA-256 of their row), and nothing half-written may be visible: no
 * attachment row without its file (or with other bytes), no sighting without all of its attachments,
 * no published entry without its version, no submission without its first event. Unacknowledged
 * writes may be there or not, but only whole. Three trials; the seed is printed when a check fails.
 * All texts and files are invented test data.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { parse } from 'yaml';
import { ROOT } from '../../server/config';
import { freePort, MariaDbServer } from '../../server/db/mariadb';
import { minimalPdf, minimalPng } from '../fixtures/files/samples';
import { Client, demo } from '../support/app';
import { until } from '../support/poll';

jest.setTimeout(180_000);

const SEED = Number(process.env.CW_DURABILITY_SEED ?? 20260713);
const TRIALS = 3;

/** mulberry32, a small seeded generator (public domain, Tommy Ettinger): the kill moments repeat for a seed. */
function mulberry32(seed: number) {
  let a = seed >>> 0;
  return () => {
    a = (a + 0x6d2b79f5) >>> 0;
    let t = a;
    t = Math.imul(t ^ (t >>> 15), t | 1);
    t ^= t + Math.imul(t ^ (t >>> 7), t | 61);
    return ((t ^ (t >>> 14)) >>> 0) / 4294967296;
  };
}
/** For the files and their sizes. */
const rng = mulberry32(SEED);
/** For the kills alone, so that a change to the writes does not move them. */
const killRng = mulberry32(SEED ^ 0x5bd1e995);

const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');
const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

const EDITOR_ONE = 'editor.one@example.org';
const EDITOR_TWO = 'editor.two@example.org';
const worksheet = parse(fs.readFileSync(path.join(ROOT, 'content/worksheets/photon-rocket-bound.yml'), 'utf8'));
/** A small but complete entry (our own fixture). */
const content = (title: string) => ({
  title,
  aliases: [],
  mechanismClass: 'enclosed-radiation',
  laws: ['linear-momentum'],
  inBrief: 'Light trapped in a sealed box pushes on every wall equally, so the box as a whole goes nowhere.',
  howItIsPitched: 'A cavity of a special shape is said to push harder on one end than the other.',
  whyItFails: 'The momentum of the light and the box together is conserved: $F \\le P/c$ for anything that emits.',
  worksheets: [worksheet],
  whatFakesTheEffect: 'Thermal drift of the balance and the Lorentz force on the supply leads.',
  repliesAndAnswers: [{ reply: 'The group velocity differs at each end.', answer: 'Momentum is still conserved for the closed system.' }],
  questionsToAsk: ['Was the device run upside down, with the thrust reversing?'],
  cautions: 'Microwave sources can burn; follow local RF exposure rules.',
  related: [],
  sources: [
    {
      csl: { id: 'feynman1964', type: 'book', title: 'The Feynman lectures on physics, vol. II', author: [{ family: 'Feynman', given: 'Richard P.' }], issued: { 'date-parts': [[1964]] }, publisher: 'Addison-Wesley' },
      note: 'Momentum of the electromagnetic field.',
    },
  ],
});

// ---------------------------------------------------------------------------------------------
// The database, the app process and their directories

const base = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-durable-'));
const dirs = { data: path.join(base, 'app-data'), uploads: path.join(base, 'uploads'), incoming: path.join(base, 'incoming'), static: path.join(base, 'static') };
const db = { name: 'durable', user: 'durable_app', password: crypto.randomBytes(12).toString('hex') };
let server: MariaDbServer;
let port: number;
let app: { child: ChildProcess; output: () => string; exited: Promise<void> } | null = null;
const log: string[] = [];
const note = (m: string) => log.push(`[${new Date().toISOString().slice(11, 23)}] ${m}`);

async function startApp(): Promise<void> {
  const child = spawn(process.execPath, ['--import', 'tsx', path.join(ROOT, 'server/main.ts')], {
    cwd: ROOT,
    // Its own process group, so that nothing it starts outlives a SIGKILL to the group.
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      NODE_ENV: 'development',
      HOST: '127.0.0.1',
      PORT: String(port),
      DB_MANAGED: '0',
      DB_HOST: '127.0.0.1',
      DB_PORT: String(server.port),
      DB_NAME: db.name,
      DB_USER: db.user,
      DB_PASSWORD: db.password,
      DATA_DIR: dirs.data,
      STORAGE: 'local',
      UPLOAD_DIR: dirs.uploads,
      UPLOAD_TMP_DIR: dirs.incoming,
      STATIC_DIR: dirs.static,
      SKIP_WEB_BUILD: '1',
      // The claim check's time limit, generous: on two busy cores (npm test runs two jest workers) the first
      // check of a freshly restarted app, its worker thread still loading the reader, can pass the 2 s a
      // server allows. This test is about writes surviving kills, not about compute time.
      COMPUTE_TIMEOUT_MS: '60000',
      SMTP_URL: '',
      LOG_LEVEL: 'error',
    },
  });
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const exited = new Promise<void>((resolve) => child.once('exit', () => resolve()));
  app = { child, output: () => out, exited };
  let gone = false;
  void exited.then(() => (gone = true));
  await until('the app is running', async () => {
    if (gone) throw new Error(`the app exited while starting:\n${out}`);
    return out.includes('Counterweight is running at');
  }, 90_000);
  note(`app up (pid ${child.pid})`);
}

function killApp(): Promise<void> {
  const a = app!;
  try {
    process.kill(-a.child.pid!, 'SIGKILL');
  } catch {
    /* already gone */
  }
  note('app killed');
  return a.exited;
}

function killDb(): void {
  const pid = server.pid;
  if (pid) process.kill(pid, 'SIGKILL');
  note('mariadbd killed');
}

/** Starts mariadbd again once the killed one has been reaped (MariaDbServer forgets its child on that exit). */
async function restartDb(): Promise<void> {
  await until('the killed mariadbd is reaped', async () => server.pid === null, 30_000);
  await server.start(process.env.CW_MARIADBD);
  note('mariadbd up again');
}

beforeAll(async () => {
  for (const d of Object.values(dirs)) fs.mkdirSync(d, { recursive: true });
  port = await freePort();
  server = new MariaDbServer({ baseDir: path.join(base, 'mariadb'), port: await freePort() });
  server.initialise(process.env.CW_INSTALL_DB ?? 'mariadb-install-db');
  await server.start(process.env.CW_MARIADBD);
  await server.provision({ database: db.name, user: db.user, password: db.password });
  note('mariadbd up');
});

afterAll(async () => {
  if (app && app.child.exitCode === null && app.child.signalCode === null) await killApp();
  await server?.stop().catch(() => {});
  // Never leave a mariadbd behind, even one this file lost track of.
  const left = server?.runningPid();
  if (left) process.kill(left, 'SIGKILL');
  fs.rmSync(base, { recursive: true, force: true });
});

// ---------------------------------------------------------------------------------------------
// The writes and what was acknowledged

interface Acked {
  /** Draft saves: per draft, the titles tried in order and the index of the last acknowledged one. */
  drafts: Map<number, { titles: string[]; acked: number; lockVersion: number }>;
  /** Published entries: slug → title. */
  published: Map<string, string>;
  /** Sightings: id → their title and the SHA-256 of each file, in order. */
  sightings: Map<number, { title: string; files: string[] }>;
  /** Every sighting tried (acknowledged or not), by title: how many files it carried. */
  sightingsTried: Map<string, number>;
  /** Saved claim checks: token → text. */
  checks: Map<string, string>;
}
const acked: Acked = { drafts: new Map(), published: new Map(), sightings: new Map(), sightingsTried: new Map(), checks: new Map() };
const counts = { tried: 0, acked: 0 };

const baseUrl = () => `http://127.0.0.1:${port}`;
const LIMIT = { response: 15_000, deadline: 20_000 };

async function signedIn(email: string): Promise<Client> {
  const c = await Client.start(baseUrl());
  const res = await c.post('/api/auth/sign-in', { email, password: demo.password }).timeout(LIMIT);
  if (res.status !== 200) throw new Error(`sign-in as ${email}: ${res.status} ${JSON.stringify(res.body)}`);
  return c;
}

/** Runs one write; true when it was acknowledged (a 2xx answer). A refused connection or a 503 is simply not acknowledged. */
async function attempt<T>(what: string, send: () => PromiseLike<{ status: number; body: T }>, expected: number): Promise<T | null> {
  counts.tried += 1;
  try {
    const res = await send();
    if (res.status === expected) {
      counts.acked += 1;
      return res.body;
    }
    // During a kill: 503 (database unreachable) or 500 (a query cut off mid-way); 4xx would be a bug in this test.
    if (res.status < 500) throw new Error(`unexpected ${res.status} to ${what}: ${JSON.stringify(res.body).slice(0, 300)}`);
    note(`${what}: not acknowledged (${res.status} ${(res.body as { error?: { code?: string } })?.error?.code ?? ''})`);
    return null;
  } catch (err) {
    if (/^unexpected \d{3}/.test((err as Error).message)) throw err;
    note(`${what}: not acknowledged (${(err as Error).message})`);
    return null; // connection refused or reset: the app was killed
  }
}

interface Writers {
  stop: () => void;
  done: Promise<void>;
}

function startWriters(trial: number, clients: { one: Client; two: Client; contributor: Client }): Writers {
  let stopped = false;
  const running = () => !stopped;
  const loops: Promise<void>[] = [];

  // Draft saves: one draft per trial, saved over and over with a new title each time.
  loops.push(
    (async () => {
      const slug = `durability-draft-${trial}`;
      const first = `Durability draft ${trial}.0`;
      const created = await attempt('a new draft', () => clients.one.post('/api/drafts', { slug, content: content(first) }).timeout(LIMIT), 201);
      if (!created) return;
      const draft = (created as { draft: { id: number; lockVersion: number } }).draft;
      const rec = { titles: [first], acked: 0, lockVersion: draft.lockVersion };
      acked.drafts.set(draft.id, rec);
      for (let n = 1; running(); n++) {
        const title = `Durability draft ${trial}.${n}`;
        rec.titles.push(title);
        const saved = await attempt('a draft save', () => clients.one.put(`/api/drafts/${draft.id}`, { content: content(title), lockVersion: rec.lockVersion }).timeout(LIMIT), 200);
        if (!saved) return; // a save that may or may not have landed: the lock version is no longer known
        rec.acked = rec.titles.length - 1;
        rec.lockVersion = (saved as { draft: { lockVersion: number } }).draft.lockVersion;
      }
    })(),
  );

  // Publishes: a new entry written by editor one, submitted, approved by editor two.
  loops.push(
    (async () => {
      for (let n = 0; running() && n < 8; n++) {
        const slug = `durability-entry-${trial}-${n}`;
        const title = `Durability entry ${trial}-${n}`;
        const created = await attempt('a new entry', () => clients.one.post('/api/drafts', { slug, content: content(title) }).timeout(LIMIT), 201);
        if (!created) return;
        const draft = (created as { draft: { id: number; lockVersion: number } }).draft;
        const submitted = await attempt('a submit', () => clients.one.post(`/api/drafts/${draft.id}/submit`, { lockVersion: draft.lockVersion }).timeout(LIMIT), 200);
        if (!submitted) return;
        const approved = await attempt('an approval', () => clients.two.post(`/api/drafts/${draft.id}/approve`, { changeNote: 'First version.' }).timeout(LIMIT), 200);
        if (!approved) return;
        acked.published.set(slug, title);
      }
    })(),
  );

  // Sightings with one to three files (at most five a trial: the submission rate limits count across trials).
  loops.push(
    (async () => {
      for (let n = 0; running() && n < 5; n++) {
        const title = `Durability sighting ${trial}-${n}`;
        const files = Array.from({ length: 1 + Math.floor(rng() * 3) }, (_, i) => {
          const head = i % 2 === 0 ? minimalPdf() : minimalPng();
          // Bytes after the signature make each file distinct and some of them large (up to ~600 kB).
          return Buffer.concat([head, crypto.randomBytes(Math.floor(rng() * 600_000))]);
        });
        acked.sightingsTried.set(title, files.length);
        const body = await attempt('a sighting', () => {
          let req = clients.contributor.agent
            .post('/api/sightings')
            .set('X-CSRF-Token', clients.contributor.csrf)
            .field('title', title)
            .field('seenAtUrl', `https://news.example.org/durability/${trial}-${n}`)
            .field('summary', 'A sealed box was said to push itself along a table with no exhaust.');
          files.forEach((f, i) => (req = req.attach('files', f, { filename: `file-${i}.${i % 2 === 0 ? 'pdf' : 'png'}`, contentType: 'application/octet-stream' })));
          return req.timeout(LIMIT);
        }, 201);
        if (!body) return;
        const s = (body as { submission: { id: number } }).submission;
        acked.sightings.set(s.id, { title, files: files.map(sha256) });
      }
    })(),
  );

  // Saved claim checks (at most five a trial: see the rate limit above).
  loops.push(
    (async () => {
      for (let n = 0; running() && n < 5; n++) {
        const text = `A sealed copper cavity fed with ${700 + trial * 10 + n} W of microwaves is said to give 1.2 mN of thrust with no exhaust (durability ${trial}-${n}).`;
        const body = await attempt('a saved claim check', () => clients.contributor.post('/api/claim-checks/saved', { text }).timeout(LIMIT), 201);
        if (!body) return;
        acked.checks.set((body as { saved: { token: string } }).saved.token, text);
      }
    })(),
  );

  return { stop: () => (stopped = true), done: Promise.all(loops).then(() => undefined) };
}

// ---------------------------------------------------------------------------------------------
// The checks after a restart

function storeFile(key: string): string {
  return path.join(dirs.uploads, key);
}

async function checkThroughApi(): Promise<void> {
  const one = await signedIn(EDITOR_ONE);
  const contributor = await signedIn(demo.contributor.email);

  for (const [id, rec] of acked.drafts) {
    const res = await one.get(`/api/drafts/${id}`).timeout(LIMIT);
    expect(res.status).toBe(200);
    // The last acknowledged save, or a later one that landed without its answer.
    const at = rec.titles.indexOf(res.body.draft.content.title);
    expect(at).toBeGreaterThanOrEqual(rec.acked);
    expect(res.body.draft.lockVersion).toBeGreaterThanOrEqual(rec.lockVersion);
    const { inBrief, whyItFails, cautions } = content('');
    expect(res.body.draft.content).toMatchObject({ inBrief, whyItFails, cautions });
  }
  for (const [slug, title] of acked.published) {
    const res = await contributor.get(`/api/entries/${slug}`).timeout(LIMIT);
    expect(res.status).toBe(200);
    expect(res.body.entry).toMatchObject({ slug, status: 'published', title });
    expect(res.body.version.number).toBe(1);
  }
  for (const [id, rec] of acked.sightings) {
    const res = await contributor.get(`/api/submissions/${id}`).timeout(LIMIT);
    expect(res.status).toBe(200);
    expect(res.body.submission.title).toBe(rec.title);
    const atts = res.body.submission.attachments as { id: number; sha256: string; url: string }[];
    expect(atts.map((a) => a.sha256)).toEqual(rec.files);
    for (const a of atts) {
      const got = await contributor.get(a.url).timeout(LIMIT).buffer(true).parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (x: Buffer) => chunks.push(x));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
      expect(got.status).toBe(200);
      expect(sha256(got.body as Buffer)).toBe(a.sha256);
    }
  }
  for (const [token, text] of acked.checks) {
    const res = await contributor.get(`/api/claim-checks/saved/${token}`).timeout(LIMIT);
    expect(res.status).toBe(200);
    expect(res.body.saved.text).toBe(text);
  }
}

/** Straight from the database and the attachment directory: nothing half-written anywhere. */
async function checkNothingHalfWritten(): Promise<{ orphans: number }> {
  const conn = await mariadb.createConnection({ socketPath: server.socket, user: 'root', database: db.name });
  try {
    const attachments = (await conn.query('SELECT id, submission_id, storage_key, size, sha256 FROM attachments')) as {
      id: number;
      submission_id: number;
      storage_key: string;
      size: number;
      sha256: string;
    }[];
    for (const a of attachments) {
      const file = storeFile(a.storage_key);
      expect({ row: a.id, exists: fs.existsSync(file) }).toEqual({ row: a.id, exists: true });
      const bytes = fs.readFileSync(file);
      expect({ row: a.id, size: bytes.length, sha256: sha256(bytes) }).toEqual({ row: a.id, size: Number(a.size), sha256: a.sha256 });
      expect(JSON.parse(fs.readFileSync(file + '.meta.json', 'utf8')).sha256).toBe(a.sha256);
    }
    // Every sighting of this test that exists has every file it was sent with, and its first event.
    const sightings = (await conn.query(
      `SELECT s.id, s.title, (SELECT COUNT(*) FROM attachments a WHERE a.submission_id = s.id) AS files,
              (SELECT COUNT(*) FROM submission_events e WHERE e.submission_id = s.id AND e.what = 'submitted') AS events
         FROM submissions s WHERE s.kind = 'sighting' AND s.title LIKE 'Durability sighting %'`,
    )) as { id: number; title: string; files: bigint | number; events: bigint | number }[];
    for (const s of sightings) {
      expect({ title: s.title, files: Number(s.files), events: Number(s.events) }).toEqual({ title: s.title, files: acked.sightingsTried.get(s.title), events: 1 });
    }
    // Every published entry points at a published version of its own.
    const broken = (await conn.query(
      `SELECT e.slug FROM entries e LEFT JOIN entry_versions v ON v.id = e.current_version_id
        WHERE e.status = 'published' AND (v.id IS NULL OR v.entry_id <> e.id OR v.state <> 'published')`,
    )) as { slug: string }[];
    expect(Array.from(broken)).toEqual([]);
    // Files in the store that no row names (a kill between storing and committing): invisible, counted.
    const named = new Set(attachments.map((a) => a.storage_key));
    const stored: string[] = [];
    const walk = (d: string) => {
      for (const e of fs.readdirSync(d, { withFileTypes: true })) {
        const p = path.join(d, e.name);
        if (e.isDirectory()) walk(p);
        else if (!e.name.startsWith('.') && !e.name.endsWith('.meta.json')) stored.push(path.relative(dirs.uploads, p));
      }
    };
    walk(dirs.uploads);
    return { orphans: stored.filter((k) => !named.has(k)).length };
  } finally {
    await conn.end();
  }
}

// ---------------------------------------------------------------------------------------------

it(`keeps every acknowledged write whole through ${TRIALS} kills of the app and MariaDB with SIGKILL (seed ${SEED})`, async () => {
  let orphans = 0;
  try {
    await startApp();
    const startWith = killRng() < 0.5 ? 0 : 1;
    for (let trial = 1; trial <= TRIALS; trial++) {
      const clients = { one: await signedIn(EDITOR_ONE), two: await signedIn(EDITOR_TWO), contributor: await signedIn(demo.contributor.email) };
      // The claim check's worker threads start with the app; wait until they answer (not a write; it
      // counts against the claim-check rate limit of 20 a minute, as the saves do: 6 a trial).
      const warm = await clients.contributor.post('/api/claim-checks', { text: 'A sealed cavity fed with 800 W of microwaves gives 1 mN of thrust.' }).timeout({ response: 60_000, deadline: 60_000 });
      expect(warm.status).toBe(200);
      const writers = startWriters(trial, clients);
      const delay = 600 + Math.floor(killRng() * 2400);
      // Which goes first alternates from a drawn start, so that both orders are tried.
      const dbFirst = (trial + startWith) % 2 === 0;
      const gap = Math.floor(killRng() * 400);
      // (In the first trial, the kill waits until each kind of write has been acknowledged once: on a loaded
      // machine a saved claim check can take longer than the drawn delay, and a test that never saw one
      // acknowledged would prove nothing of it. The later trials kill at the drawn moment alone.)
      if (trial === 1) {
        await until(
          'one write of each kind acknowledged',
          async () => acked.drafts.size > 0 && acked.published.size > 0 && acked.sightings.size > 0 && acked.checks.size > 0,
          60_000,
        );
        note(`trial ${trial}: one write of each kind acknowledged`);
      }
      note(`trial ${trial}: kill after ${delay} ms, ${dbFirst ? 'mariadbd' : 'the app'} first, ${gap} ms apart`);
      await sleep(delay);
      // The app must not have died on its own before the kill.
      expect(app!.child.exitCode).toBeNull();
      if (dbFirst) {
        killDb();
        await sleep(gap);
        expect(app!.child.exitCode).toBeNull(); // the database going away does not take the app down
        await killApp();
      } else {
        const exited = killApp();
        await sleep(gap);
        killDb();
        await exited;
      }
      writers.stop();
      await writers.done;
      note(`trial ${trial}: ${counts.acked} of ${counts.tried} writes acknowledged so far`);

      await restartDb();
      await startApp();
      await checkThroughApi();
      note(`trial ${trial}: every acknowledged write read back through the API`);
      orphans = (await checkNothingHalfWritten()).orphans;
      // The killed app's temporary upload files are swept by the new one.
      await until('the temporary upload directory is empty', async () => fs.readdirSync(dirs.incoming).length === 0, 10_000);
    }
    // Each kind was acknowledged at least once over the trials, or the test proved little.
    expect(acked.drafts.size).toBeGreaterThan(0);
    expect([...acked.drafts.values()].some((d) => d.acked > 0)).toBe(true);
    expect(acked.published.size).toBeGreaterThan(0);
    expect(acked.sightings.size).toBeGreaterThan(0);
    expect(acked.checks.size).toBeGreaterThan(0);
    note(`done: ${counts.acked} of ${counts.tried} writes acknowledged, all present; ${orphans} stored file(s) without a row (never visible)`);
  } catch (err) {
    (err as Error).message += `\n\nseed ${SEED}; what happened:\n${log.join('\n')}\n\napp output (last 3000 characters):\n${app?.output().slice(-3000) ?? ''}`;
    throw err;
  }
});
