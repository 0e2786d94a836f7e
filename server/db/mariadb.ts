/**
 * Our own MariaDB lifecycle: install the server package when it is missing, create a project-local
 * datadir once, start `mariadbd` on 127.0.0.1 with its own socket and pid file, wait until it
 * answers, create the application database and user, and stop it cleanly.
 *
 * Used by `npm start` (datadir under .data/) and by the tests (a throwaway datadir on a free port).
 */
import { spawn, spawnSync, type ChildProcess } from 'node:child_process';
import fs from 'node:fs';
import net from 'node:net';
import path from 'node:path';
import mariadb from 'mariadb';

export interface MariaDbOptions {
  /** Folder that holds the datadir, socket, pid file and log. Created when missing. */
  baseDir: string;
  port: number;
  /** Where mariadbd's own error log goes; defaults to baseDir/mariadb.log. */
  logFile?: string;
}

export interface AppDatabase {
  database: string;
  user: string;
  password: string;
}

const which = (cmd: string): string | null => {
  for (const dir of (process.env.PATH ?? '').split(':').concat(['/usr/sbin', '/usr/bin', '/sbin'])) {
    const candidate = path.join(dir, cmd);
    try {
      fs.accessSync(candidate, fs.constants.X_OK);
      return candidate;
    } catch {
      /* not here */
    }
  }
  return null;
};

/** Finds mariadbd and mariadb-install-db, installing Debian's mariadb-server when we are root. */
export function ensureMariaDbInstalled(log: (msg: string) => void = console.log): {
  mariadbd: string;
  installDb: string;
} {
  let mariadbd = which('mariadbd');
  let installDb = which('mariadb-install-db');
  if (mariadbd && installDb) return { mariadbd, installDb };
  const isRoot = typeof process.getuid === 'function' && process.getuid() === 0;
  if (!isRoot || !which('apt-get')) {
    throw new Error(
      'MariaDB is not installed. Install the MariaDB server (on Debian: `sudo apt-get install -y mariadb-server`), ' +
        'or point DB_HOST/DB_PORT at a running server and set DB_MANAGED=0.',
    );
  }
  log('MariaDB is missing: installing mariadb-server with apt-get (one time, about a minute)…');
  const env = { ...process.env, DEBIAN_FRONTEND: 'noninteractive' };
  for (const args of [['update', '-qq'], ['install', '-y', '-qq', 'mariadb-server']]) {
    const r = spawnSync('apt-get', args, { stdio: 'inherit', env });
    if (r.status !== 0) throw new Error(`apt-get ${args.join(' ')} failed with exit code ${r.status}`);
  }
  // Debian's package starts its own system service; ours runs in a project-local datadir instead.
  mariadbd = which('mariadbd');
  installDb = which('mariadb-install-db');
  if (!mariadbd || !installDb) throw new Error('mariadb-server installed, but mariadbd was not found on PATH.');
  return { mariadbd, installDb };
}

const sleep = (ms: number) => new Promise((r) => setTimeout(r, ms));

const isAlive = (pid: number): boolean => {
  try {
    process.kill(pid, 0);
    return true;
  } catch {
    return false;
  }
};

/** True when nothing listens on host:port yet. */
export function portIsFree(port: number, host = '127.0.0.1'): Promise<boolean> {
  return new Promise((resolve) => {
    const srv = net.createServer();
    srv.once('error', () => resolve(false));
    srv.listen(port, host, () => srv.close(() => resolve(true)));
  });
}

/** Asks the OS for a free TCP port on 127.0.0.1. */
export function freePort(): Promise<number> {
  return new Promise((resolve, reject) => {
    const srv = net.createServer();
    srv.unref();
    srv.on('error', reject);
    srv.listen(0, '127.0.0.1', () => {
      const { port } = srv.address() as net.AddressInfo;
      srv.close(() => resolve(port));
    });
  });
}

/** Identifiers we put into SQL text must be plain; values always go through placeholders. */
const assertIdentifier = (s: string, what: string) => {
  if (!/^[A-Za-z0-9_]{1,64}$/.test(s)) throw new Error(`${what} "${s}" must be letters, digits and _ only`);
};

/**
 * Creates a database and a user that may use only it, connecting as root over the socket
 * (root never connects over TCP, and the app never as root). Idempotent; the password is set each time.
 */
export async function provisionDatabase(socketPath: string, app: AppDatabase): Promise<void> {
  assertIdentifier(app.database, 'database name');
  assertIdentifier(app.user, 'database user');
  const conn = await mariadb.createConnection({ socketPath, user: 'root' });
  try {
    await conn.query(
      `CREATE DATABASE IF NOT EXISTS \`${app.database}\` CHARACTER SET utf8mb4 COLLATE utf8mb4_unicode_ci`,
    );
    for (const host of ['127.0.0.1', 'localhost']) {
      await conn.query(`CREATE USER IF NOT EXISTS ?@? IDENTIFIED BY ?`, [app.user, host, app.password]);
      await conn.query(`ALTER USER ?@? IDENTIFIED BY ?`, [app.user, host, app.password]);
      await conn.query(`GRANT ALL PRIVILEGES ON \`${app.database}\`.* TO ?@?`, [app.user, host]);
    }
  } finally {
    await conn.end();
  }
}

/** Drops a database and its user (throwaway databases in tests). */
export async function dropDatabase(socketPath: string, app: Omit<AppDatabase, 'password'>): Promise<void> {
  assertIdentifier(app.database, 'database name');
  assertIdentifier(app.user, 'database user');
  const conn = await mariadb.createConnection({ socketPath, user: 'root' });
  try {
    await conn.query(`DROP DATABASE IF EXISTS \`${app.database}\``);
    for (const host of ['127.0.0.1', 'localhost']) await conn.query(`DROP USER IF EXISTS ?@?`, [app.user, host]);
  } finally {
    await conn.end();
  }
}

export class MariaDbServer {
  readonly baseDir: string;
  readonly dataDir: string;
  readonly socket: string;
  readonly pidFile: string;
  readonly logFile: string;
  readonly port: number;
  private child: ChildProcess | null = null;
  private exited: Promise<void> | null = null;

  constructor(opts: MariaDbOptions) {
    this.baseDir = path.resolve(opts.baseDir);
    this.dataDir = path.join(this.baseDir, 'data');
    // Unix socket paths are limited to ~107 bytes: keep it short, beside the datadir.
    this.socket = path.join(this.baseDir, 'mysqld.sock');
    this.pidFile = path.join(this.baseDir, 'mariadbd.pid');
    this.logFile = opts.logFile ?? path.join(this.baseDir, 'mariadb.log');
    this.port = opts.port;
  }

  get pid(): number | null {
    return this.child?.pid ?? null;
  }

  /** Creates the datadir once; a datadir that already holds the system tables is kept as it is. */
  initialise(installDb: string): boolean {
    fs.mkdirSync(this.baseDir, { recursive: true });
    if (fs.existsSync(path.join(this.dataDir, 'mysql'))) return false;
    fs.rmSync(this.dataDir, { recursive: true, force: true });
    const r = spawnSync(
      installDb,
      [
        '--no-defaults',
        `--datadir=${this.dataDir}`,
        '--user=root',
        '--auth-root-authentication-method=normal',
        '--skip-test-db',
      ],
      { encoding: 'utf8' },
    );
    if (r.status !== 0) {
      throw new Error(`mariadb-install-db failed (exit ${r.status}):\n${r.stderr || r.stdout}`);
    }
    return true;
  }

  /** The pid of a live mariadbd on this datadir (started by another process), or null. */
  runningPid(): number | null {
    let pid: number;
    try {
      pid = Number(fs.readFileSync(this.pidFile, 'utf8').trim());
    } catch {
      return null;
    }
    if (!pid || !isAlive(pid)) return null;
    try {
      if (!fs.readFileSync(`/proc/${pid}/cmdline`, 'utf8').includes(this.dataDir)) return null;
    } catch {
      /* not Linux: trust the pid file */
    }
    return pid;
  }

  /** Stops a mariadbd that an earlier run left behind on this datadir (after a crash or kill -9). */
  private async stopLeftover(): Promise<void> {
    const pid = this.runningPid();
    if (pid === null) return;
    process.kill(pid, 'SIGTERM');
    for (let i = 0; i < 300 && isAlive(pid); i++) await sleep(100);
  }

  /** Starts mariadbd and resolves once it accepts connections on the socket. */
  async start(mariadbdPath?: string): Promise<void> {
    const bin = mariadbdPath ?? ensureMariaDbInstalled().mariadbd;
    await this.stopLeftover();
    const log = fs.openSync(this.logFile, 'a');
    const child = spawn(
      bin,
      [
        '--no-defaults',
        `--datadir=${this.dataDir}`,
        '--user=root',
        '--bind-address=127.0.0.1',
        `--port=${this.port}`,
        `--socket=${this.socket}`,
        `--pid-file=${this.pidFile}`,
        '--skip-name-resolve',
        '--character-set-server=utf8mb4',
        '--collation-server=utf8mb4_unicode_ci',
        // Durability: every acknowledged commit is on disk (these are the defaults, stated on purpose).
        '--innodb-flush-log-at-trx-commit=1',
        '--innodb-buffer-pool-size=128M',
        '--max-connections=200',
      ],
      // Its own process group: a Ctrl-C in the terminal reaches us, and we stop it in order.
      { stdio: ['ignore', log, log], detached: true },
    );
    fs.closeSync(log);
    this.child = child;
    this.exited = new Promise((resolve) => child.once('exit', () => resolve()));
    let exitCode: number | null = null;
    child.once('exit', (code) => {
      exitCode = code ?? -1;
      // (Only if no newer child was started since: a late exit of the old one must not forget the new.)
      if (this.child === child) this.child = null;
    });
    const deadline = Date.now() + 60_000;
    while (Date.now() < deadline) {
      if (exitCode !== null) {
        throw new Error(`mariadbd exited with code ${exitCode} while starting; see ${this.logFile}:\n${this.tail()}`);
      }
      try {
        const conn = await mariadb.createConnection({ socketPath: this.socket, user: 'root', connectTimeout: 1000 });
        await conn.end();
        return;
      } catch {
        await sleep(150);
      }
    }
    throw new Error(`mariadbd did not answer within 60 s; see ${this.logFile}:\n${this.tail()}`);
  }

  private tail(): string {
    try {
      return fs.readFileSync(this.logFile, 'utf8').split('\n').slice(-15).join('\n');
    } catch {
      return '';
    }
  }

  /** Creates the application database and its user (idempotent; the password is set each time). */
  provision(app: AppDatabase): Promise<void> {
    return provisionDatabase(this.socket, app);
  }

  /** Stops mariadbd with SIGTERM (a clean InnoDB shutdown) and waits for it to exit. */
  async stop(timeoutMs = 60_000): Promise<void> {
    const child = this.child;
    if (!child || !this.exited) return;
    child.kill('SIGTERM');
    const timer = setTimeout(() => child.kill('SIGKILL'), timeoutMs);
    await this.exited;
    clearTimeout(timer);
    if (this.child === child) this.child = null;
  }

  /** Removes everything under baseDir (throwaway instances in tests). */
  remove(): void {
    fs.rmSync(this.baseDir, { recursive: true, force: true });
  }
}
