/**
 * `npm start` end to end, as a user runs it: the launcher brings up its own MariaDB in a fresh
 * datadir, migrates, loads the starter data, serves the web app and the API; Ctrl-C (SIGINT to the
 * whole process group) stops it and leaves no mariadbd behind; a second start keeps every record;
 * SIGTERM sent to the launcher alone stops it cleanly too.
 */
import { spawn, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import mariadb from 'mariadb';
import { ROOT } from '../../server/config';
import { freePort } from '../../server/db/mariadb';

jest.setTimeout(240_000);

const dataDir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-start-'));
let port: number;
let dbPort: number;

beforeAll(async () => {
  port = await freePort();
  dbPort = await freePort();
});
const launched: ChildProcess[] = [];
afterAll(async () => {
  // A failed assertion must not leave the launcher (and its mariadbd) running.
  for (const child of launched) {
    if (child.exitCode === null && child.signalCode === null) {
      process.kill(-child.pid!, 'SIGTERM');
      await new Promise((r) => child.once('exit', r));
    }
  }
  fs.rmSync(dataDir, { recursive: true, force: true });
});

interface Running {
  child: ChildProcess;
  output: () => string;
  exited: Promise<number | null>;
}

function start(): Promise<Running> {
  const child = spawn(process.execPath, [path.join(ROOT, 'server/start.mjs')], {
    cwd: ROOT,
    // Its own process group, like a shell job: a Ctrl-C is SIGINT to the whole group.
    detached: true,
    stdio: ['ignore', 'pipe', 'pipe'],
    env: {
      ...process.env,
      NODE_ENV: 'development',
      DATA_DIR: dataDir,
      PORT: String(port),
      DB_PORT: String(dbPort),
      LOG_LEVEL: 'warn',
      // The test run has just built dist/; a stale build would be rebuilt here, as for a user.
    },
  });
  launched.push(child);
  let out = '';
  child.stdout!.on('data', (d) => (out += d));
  child.stderr!.on('data', (d) => (out += d));
  const exited = new Promise<number | null>((resolve) => child.on('exit', (code) => resolve(code)));
  return new Promise((resolve, reject) => {
    const timer = setInterval(() => {
      if (out.includes('Counterweight is running at')) {
        clearInterval(timer);
        resolve({ child, output: () => out, exited });
      }
    }, 100);
    void exited.then((code) => {
      clearInterval(timer);
      reject(new Error(`npm start exited early with ${code}:\n${out}`));
    });
  });
}

/** Every live mariadbd whose command line names our datadir. */
function mariadbdOnOurDatadir(): number[] {
  const pids: number[] = [];
  for (const name of fs.readdirSync('/proc')) {
    if (!/^\d+$/.test(name)) continue;
    try {
      const cmd = fs.readFileSync(`/proc/${name}/cmdline`, 'utf8');
      if (cmd.includes('mariadbd') && cmd.includes(dataDir)) pids.push(Number(name));
    } catch {
      /* gone */
    }
  }
  return pids;
}

const appConnection = () =>
  mariadb.createConnection({
    host: '127.0.0.1',
    port: dbPort,
    user: 'counterweight',
    password: fs.readFileSync(path.join(dataDir, 'db-password'), 'utf8').trim(),
    database: 'counterweight',
  });

/**
 * Through the running server, like the web app: a session and its CSRF token, a sign-up whose
 * confirmation mail reaches the outbox through the mail catcher, and the demo admin reading it.
 */
async function signUpAndFindTheMail() {
  const base = `http://127.0.0.1:${port}`;
  const session = async (cookie?: string) => {
    const res = await fetch(`${base}/api/session`, { headers: cookie ? { Cookie: cookie } : {} });
    const setCookie = res.headers.get('set-cookie');
    return { body: (await res.json()) as { csrfToken: string; user: { email: string } | null }, cookie: setCookie ? setCookie.split(';')[0] : cookie! };
  };
  const post = (path: string, cookie: string, csrf: string, body: object) =>
    fetch(`${base}${path}`, { method: 'POST', headers: { 'Content-Type': 'application/json', Cookie: cookie, 'X-CSRF-Token': csrf }, body: JSON.stringify(body) });

  const anon = await session();
  const up = await post('/api/auth/sign-up', anon.cookie, anon.body.csrfToken, { email: 'first.user@example.org', displayName: 'First User', password: 'violet-gravel-oboe-1874' });
  expect(up.status).toBe(201);

  const adminSession = await session();
  const signIn = await post('/api/auth/sign-in', adminSession.cookie, adminSession.body.csrfToken, { email: 'admin@example.org', password: 'counterweight-demo-2026' });
  expect(signIn.status).toBe(200);
  const cookie = signIn.headers.get('set-cookie')!.split(';')[0];
  const outbox = await fetch(`${base}/api/admin/outbox`, { headers: { Cookie: cookie } });
  expect(outbox.status).toBe(200);
  const { messages } = (await outbox.json()) as { messages: { to: string; text: string }[] };
  expect(messages[0].to).toBe('first.user@example.org');
  // The link is built from PUBLIC_URL's default, http://127.0.0.1:<PORT>.
  expect(messages[0].text).toContain(`http://127.0.0.1:${port}/verify?token=`);
}

it('serves the app, stops on Ctrl-C without leftovers, and keeps the data across restarts', async () => {
  const first = await start();
  expect(first.output()).toContain('Loaded the starter library');
  // Development: the demo accounts are seeded, and mail goes to the local mail catcher.
  expect(first.output()).toContain('Seeded the demo accounts (password for all: counterweight-demo-2026)');
  expect(first.output()).toMatch(/local mail catcher on 127\.0\.0\.1:\d+/);
  await signUpAndFindTheMail();
  const health = await fetch(`http://127.0.0.1:${port}/api/health`);
  expect(health.status).toBe(200);
  expect(await health.json()).toMatchObject({ status: 'ok', db: 'up' });
  const page = await fetch(`http://127.0.0.1:${port}/library/anything`, { headers: { Accept: 'text/html' } });
  expect(page.status).toBe(200);
  expect(await page.text()).toContain('<div id="root">');
  expect(mariadbdOnOurDatadir()).toHaveLength(1);

  // The app never connects as root: it has its own user, limited to its own database.
  const conn = await appConnection();
  await conn.query(
    "INSERT INTO conservation_laws (slug, name, quantity, summary, position, created_at, updated_at) VALUES ('kept-across-restarts', 'marker', 'marker', 'marker', 99, NOW(), NOW())",
  );
  const [{ n: lawsBefore }] = await conn.query('SELECT COUNT(*) AS n FROM conservation_laws');
  await expect(conn.query('SELECT COUNT(*) FROM mysql.user')).rejects.toThrow();
  await conn.end();

  process.kill(-first.child.pid!, 'SIGINT');
  // The exit code with the launcher's output, so that a failure shows what it printed.
  expect({ code: await first.exited, output: first.output() }).toEqual({ code: 0, output: expect.stringContaining('Stopped.') });
  expect(mariadbdOnOurDatadir()).toEqual([]);

  const second = await start();
  expect(second.output()).not.toContain('Loaded the starter library');
  expect(second.output()).not.toContain('Seeded the demo accounts');
  expect(second.output()).not.toContain('Created a new MariaDB datadir');
  const again = await appConnection();
  const rows = await again.query("SELECT slug FROM conservation_laws WHERE slug = 'kept-across-restarts'");
  const [{ n: lawsAfter }] = await again.query('SELECT COUNT(*) AS n FROM conservation_laws');
  await again.end();
  expect(rows).toHaveLength(1);
  expect(lawsAfter).toEqual(lawsBefore);

  process.kill(second.child.pid!, 'SIGTERM');
  expect({ code: await second.exited, output: second.output() }).toEqual({ code: 0, output: expect.stringContaining('Stopped.') });
  expect(mariadbdOnOurDatadir()).toEqual([]);
});
