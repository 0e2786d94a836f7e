/**
 * Backup and restore (`npm run backup`, `npm run restore <file>`).
 *
 * A backup is one file, `counterweight-<UTC timestamp>.tar.gz`, holding
 *   manifest.json   what is inside: the dump and every attachment, each with its size and SHA-256
 *   SHA256SUMS      the same checksums in the format `sha256sum -c` reads
 *   database.sql    `mariadb-dump --single-transaction` of the configured database (a consistent
 *                   snapshot taken without locking the tables; triggers included, DEFINER clauses
 *                   left out so that another user may load it)
 *   objects/<key>   the bytes of every attachment the database lists, read through the configured
 *                   store (local directory or S3)
 * The dump is taken first and the attachment list read after it, so every attachment the dump
 * refers to is in the archive (attachments are never deleted once their row is committed).
 *
 * A restore extracts the archive to a temporary directory, checks every checksum, refuses a
 * database that has any table, puts the attachments into the store (refusing a key that already
 * holds different bytes), then loads the dump with the `mariadb` client.
 *
 * The archive is written and read by GNU tar and gzip (Debian's `tar` package, present wherever the
 * MariaDB client tools are); the dump and the load use Debian's MariaDB 10.11 client tools.
 */
import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { Transform, type TransformCallback } from 'node:stream';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Config } from '../config';
import { ROOT } from '../config';
import { assertKey, ObjectNotFoundError, type ObjectStore } from '../storage';

export const BACKUP_FORMAT = 'counterweight-backup';
export const BACKUP_FORMAT_VERSION = 1;

export interface ManifestObject {
  key: string;
  /** Path inside the archive: objects/<key>. */
  file: string;
  size: number;
  sha256: string;
  contentType: string;
}

export interface BackupManifest {
  format: typeof BACKUP_FORMAT;
  formatVersion: number;
  createdAt: string;
  appVersion: string | null;
  database: { name: string; file: string; size: number; sha256: string; tool: string };
  attachments: ManifestObject[];
  /** Attachments the database lists but the store could not give, or whose bytes differ from the row's SHA-256. */
  problems: string[];
}

/** A restore that was refused before anything was written (non-empty database, bad checksum, …). */
export class RestoreRefusedError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'RestoreRefusedError';
  }
}

type Env = Record<string, string | undefined>;

/** BACKUP_DIR (relative to the project root), default <DATA_DIR>/backups, i.e. .data/backups. */
export function backupDirFromEnv(env: Env = process.env, rootDir: string = ROOT): string {
  const raw = env.BACKUP_DIR?.trim();
  return path.resolve(rootDir, raw ? raw : path.join(env.DATA_DIR?.trim() || '.data', 'backups'));
}

/** 2026-03-04T05:06:07.890Z → 20260304T050607Z */
export function backupTimestamp(now: Date): string {
  return now.toISOString().replace(/\.\d{3}Z$/, 'Z').replace(/[-:]/g, '');
}

// ---------------------------------------------------------------------------------------------
// The MariaDB client tools and tar

/** A client option file (mode 600) so that the password never appears on a command line. */
function clientOptionFile(db: Config['db']): { file: string; remove: () => void } {
  const dir = fs.mkdtempSync(path.join(os.tmpdir(), 'cw-client-'));
  const file = path.join(dir, 'client.cnf');
  const quote = (s: string) => `"${s.replace(/\\/g, '\\\\').replace(/"/g, '\\"')}"`;
  fs.writeFileSync(
    file,
    ['[client]', `host=${db.host}`, `port=${db.port}`, `user=${quote(db.user)}`, `password=${quote(db.password)}`, 'protocol=tcp', ''].join('\n'),
    { mode: 0o600 },
  );
  return { file, remove: () => fs.rmSync(dir, { recursive: true, force: true }) };
}

interface Ran {
  code: number | null;
  stderr: string;
}

/** Runs a program with stdin/stdout wired by the caller; a missing program gets a message saying what to install. */
function run(
  cmd: string,
  args: string[],
  io: { stdin?: NodeJS.ReadableStream; stdout?: (out: NodeJS.ReadableStream) => Promise<void> } = {},
  installHint = '',
): Promise<Ran> {
  return new Promise((resolve, reject) => {
    const child = spawn(cmd, args, { stdio: [io.stdin ? 'pipe' : 'ignore', io.stdout ? 'pipe' : 'ignore', 'pipe'] });
    let stderr = '';
    child.stderr!.setEncoding('utf8');
    child.stderr!.on('data', (d: string) => {
      if (stderr.length < 20_000) stderr += d;
    });
    const piping: Promise<unknown>[] = [];
    if (io.stdin) piping.push(pipeline(io.stdin, child.stdin!));
    if (io.stdout) piping.push(io.stdout(child.stdout!));
    let failed: Error | null = null;
    child.once('error', (err: NodeJS.ErrnoException) => {
      failed = err.code === 'ENOENT' ? new Error(`${cmd} was not found on PATH.${installHint ? ' ' + installHint : ''}`) : err;
    });
    child.once('close', (code) => {
      Promise.allSettled(piping).then((results) => {
        if (failed) return reject(failed);
        const broken = results.find((r): r is PromiseRejectedResult => r.status === 'rejected');
        // A client that exits early breaks our pipe: its own message (stderr) says why.
        if (broken && code === 0) return reject(broken.reason);
        resolve({ code, stderr: stderr.trim() });
      });
    });
  });
}

const CLIENT_HINT = 'Install the MariaDB client tools (on Debian: `sudo apt-get install -y mariadb-client`).';
const TAR_HINT = 'Install GNU tar and gzip (on Debian: `sudo apt-get install -y tar gzip`).';

async function toolVersion(cmd: string): Promise<string> {
  let out = '';
  const r = await run(cmd, ['--version'], {
    stdout: async (s) => {
      for await (const chunk of s) out += chunk.toString();
    },
  }, CLIENT_HINT);
  if (r.code !== 0) throw new Error(`${cmd} --version failed: ${r.stderr}`);
  return out.trim();
}

/**
 * Leaves out the DEFINER of triggers (and views, routines, events) in mariadb-dump's output: loading
 * a definer other than oneself needs the SUPER or SET USER privilege, which the app user has not.
 * Only the dump's own definition lines (`/*!50003 CREATE*\/ …`, `/*!50001 CREATE …`) are touched,
 * never a row of data.
 */
class StripDefiners extends Transform {
  /** Bytes after the last newline so far (a newline byte never occurs inside a UTF-8 sequence). */
  private rest: Buffer = Buffer.alloc(0);
  _transform(chunk: Buffer, _enc: BufferEncoding, done: TransformCallback): void {
    const bytes = this.rest.length ? Buffer.concat([this.rest, chunk]) : chunk;
    const cut = bytes.lastIndexOf(0x0a);
    if (cut < 0) {
      this.rest = bytes;
      return done();
    }
    this.rest = bytes.subarray(cut + 1);
    done(null, StripDefiners.lines(bytes.subarray(0, cut + 1)));
  }
  _flush(done: TransformCallback): void {
    done(null, StripDefiners.lines(this.rest));
  }
  private static readonly DEFINITION = Buffer.from('/*!5000');
  /** Lines of bytes; only definition lines are decoded and changed, every other byte passes as it is. */
  static lines(bytes: Buffer): Buffer {
    const out: Buffer[] = [];
    let start = 0;
    while (start < bytes.length) {
      const nl = bytes.indexOf(0x0a, start);
      const end = nl < 0 ? bytes.length : nl + 1;
      const line = bytes.subarray(start, end);
      out.push(line.subarray(0, StripDefiners.DEFINITION.length).equals(StripDefiners.DEFINITION) ? Buffer.from(StripDefiners.strip(line.toString('utf8')), 'utf8') : line);
      start = end;
    }
    return Buffer.concat(out);
  }
  static strip(line: string): string {
    if (!/^\/\*!5000[0-9] (CREATE|ALTER)\b/.test(line)) return line;
    return line
      .replace(/\/\*!50017 DEFINER=`(?:[^`]|``)*`@`(?:[^`]|``)*`\s*\*\/\s?/g, '')
      .replace(/\/\*!50013 DEFINER=`(?:[^`]|``)*`@`(?:[^`]|``)*` SQL SECURITY (DEFINER|INVOKER) \*\/\s?/g, '');
  }
}

async function sha256File(file: string): Promise<{ sha256: string; size: number }> {
  const hash = crypto.createHash('sha256');
  let size = 0;
  for await (const chunk of fs.createReadStream(file)) {
    hash.update(chunk as Buffer);
    size += (chunk as Buffer).length;
  }
  return { sha256: hash.digest('hex'), size };
}

async function tail(file: string, bytes: number): Promise<string> {
  const h = await fs.promises.open(file, 'r');
  try {
    const { size } = await h.stat();
    const buf = Buffer.alloc(Math.min(bytes, size));
    await h.read(buf, 0, buf.length, size - buf.length);
    return buf.toString('utf8');
  } finally {
    await h.close();
  }
}

async function fsyncPath(p: string): Promise<void> {
  const h = await fs.promises.open(p, 'r');
  try {
    await h.sync();
  } finally {
    await h.close();
  }
}

// ---------------------------------------------------------------------------------------------
// Backup

export interface BackupOptions {
  db: Config['db'];
  /** A connection to the same database (to list the attachments after the dump). */
  sequelize: Sequelize;
  store: ObjectStore;
  backupDir: string;
  appVersion?: string | null;
  now?: Date;
  log?: (msg: string) => void;
}

export interface BackupResult {
  file: string;
  manifest: BackupManifest;
}

export async function createBackup(opts: BackupOptions): Promise<BackupResult> {
  const log = opts.log ?? (() => {});
  const now = opts.now ?? new Date();
  await fs.promises.mkdir(opts.backupDir, { recursive: true });
  const staging = await fs.promises.mkdtemp(path.join(opts.backupDir, '.staging-'));
  const client = clientOptionFile(opts.db);
  let tmpArchive: string | null = null;
  try {
    // 1. The database, as one consistent snapshot.
    const tool = (await toolVersion('mariadb-dump')).split('\n')[0];
    const dumpFile = path.join(staging, 'database.sql');
    log(`Dumping database "${opts.db.name}" with mariadb-dump --single-transaction…`);
    const dumped = await run(
      'mariadb-dump',
      [
        `--defaults-extra-file=${client.file}`,
        '--single-transaction',
        '--skip-lock-tables',
        '--quick',
        '--hex-blob',
        '--triggers',
        '--no-tablespaces',
        '--default-character-set=utf8mb4',
        opts.db.name,
      ],
      { stdout: (out) => pipeline(out, new StripDefiners(), fs.createWriteStream(dumpFile)) },
      CLIENT_HINT,
    );
    if (dumped.code !== 0) throw new Error(`mariadb-dump failed (exit ${dumped.code}): ${dumped.stderr}`);
    if (!/-- Dump completed/.test(await tail(dumpFile, 200))) throw new Error('mariadb-dump ended without "-- Dump completed": the dump is incomplete.');
    const dumpSum = await sha256File(dumpFile);

    // 2. The attachments the database lists (read after the dump: a superset of those it refers to).
    const rows = await opts.sequelize.query<{ storage_key: string; sha256: string; media_type: string }>(
      'SELECT storage_key, sha256, media_type FROM attachments ORDER BY id',
      { type: QueryTypes.SELECT },
    );
    log(`Copying ${rows.length} attachment${rows.length === 1 ? '' : 's'} from the ${opts.store.kind} store…`);
    const attachments: ManifestObject[] = [];
    const problems: string[] = [];
    for (const row of rows) {
      assertKey(row.storage_key);
      const file = `objects/${row.storage_key}`;
      const target = path.join(staging, file);
      let obj;
      try {
        obj = await opts.store.get(row.storage_key);
      } catch (err) {
        if (err instanceof ObjectNotFoundError) {
          problems.push(`attachment ${row.storage_key} is listed in the database but missing from the store`);
          continue;
        }
        throw err;
      }
      await fs.promises.mkdir(path.dirname(target), { recursive: true });
      const hash = crypto.createHash('sha256');
      let size = 0;
      await pipeline(
        obj.body as NodeJS.ReadableStream,
        new Transform({
          transform(chunk: Buffer, _e, done) {
            hash.update(chunk);
            size += chunk.length;
            done(null, chunk);
          },
        }),
        fs.createWriteStream(target),
      );
      const sha256 = hash.digest('hex');
      if (sha256 !== row.sha256) problems.push(`attachment ${row.storage_key}: the stored bytes' SHA-256 ${sha256} differs from the database's ${row.sha256}`);
      attachments.push({ key: row.storage_key, file, size, sha256, contentType: obj.contentType || row.media_type });
    }

    // 3. The manifest, the checksum list, and one archive.
    const manifest: BackupManifest = {
      format: BACKUP_FORMAT,
      formatVersion: BACKUP_FORMAT_VERSION,
      createdAt: now.toISOString(),
      appVersion: opts.appVersion ?? null,
      database: { name: opts.db.name, file: 'database.sql', size: dumpSum.size, sha256: dumpSum.sha256, tool },
      attachments,
      problems,
    };
    await fs.promises.writeFile(path.join(staging, 'manifest.json'), JSON.stringify(manifest, null, 2) + '\n');
    const sums = [`${dumpSum.sha256}  database.sql`, ...attachments.map((a) => `${a.sha256}  ${a.file}`)].join('\n') + '\n';
    await fs.promises.writeFile(path.join(staging, 'SHA256SUMS'), sums);

    const base = `counterweight-${backupTimestamp(now)}`;
    let name = `${base}.tar.gz`;
    for (let n = 2; fs.existsSync(path.join(opts.backupDir, name)); n++) name = `${base}-${n}.tar.gz`;
    const file = path.join(opts.backupDir, name);
    tmpArchive = path.join(opts.backupDir, `.${name}.${crypto.randomBytes(4).toString('hex')}.tmp`);
    const members = ['manifest.json', 'SHA256SUMS', 'database.sql', ...(attachments.length ? ['objects'] : [])];
    const tarred = await run('tar', ['--create', '--gzip', '--file', tmpArchive, '--directory', staging, '--owner=0', '--group=0', '--numeric-owner', '--', ...members], {}, TAR_HINT);
    if (tarred.code !== 0) throw new Error(`tar failed (exit ${tarred.code}): ${tarred.stderr}`);
    // It holds password hashes and sessions: readable by its owner only, like the datadir.
    await fs.promises.chmod(tmpArchive, 0o600);
    await fsyncPath(tmpArchive);
    await fs.promises.rename(tmpArchive, file);
    tmpArchive = null;
    await fsyncPath(opts.backupDir);
    return { file, manifest };
  } finally {
    client.remove();
    if (tmpArchive) await fs.promises.rm(tmpArchive, { force: true });
    await fs.promises.rm(staging, { recursive: true, force: true });
  }
}

// ---------------------------------------------------------------------------------------------
// Restore

export interface RestoreOptions {
  file: string;
  db: Config['db'];
  /** A connection to the target database (to check that it is empty). */
  sequelize: Sequelize;
  store: ObjectStore;
  log?: (msg: string) => void;
}

const SHA = /^[0-9a-f]{64}$/;

function readManifest(dir: string): BackupManifest {
  let m: BackupManifest;
  try {
    m = JSON.parse(fs.readFileSync(path.join(dir, 'manifest.json'), 'utf8')) as BackupManifest;
  } catch {
    throw new RestoreRefusedError('The archive has no readable manifest.json: it is not a Counterweight backup, or it is damaged.');
  }
  if (m?.format !== BACKUP_FORMAT) throw new RestoreRefusedError('manifest.json does not describe a Counterweight backup.');
  if (m.formatVersion !== BACKUP_FORMAT_VERSION) {
    throw new RestoreRefusedError(`This backup has format version ${m.formatVersion}; this version of Counterweight reads version ${BACKUP_FORMAT_VERSION}.`);
  }
  if (m.database?.file !== 'database.sql' || !SHA.test(m.database.sha256 ?? '')) throw new RestoreRefusedError('manifest.json lacks the dump\'s checksum.');
  if (!Array.isArray(m.attachments)) throw new RestoreRefusedError('manifest.json lacks the attachment list.');
  for (const a of m.attachments) {
    try {
      assertKey(a.key);
    } catch (err) {
      throw new RestoreRefusedError(`manifest.json lists a bad attachment key: ${(err as Error).message}`);
    }
    if (a.file !== `objects/${a.key}` || !SHA.test(a.sha256 ?? '') || typeof a.contentType !== 'string' || !a.contentType) {
      throw new RestoreRefusedError(`manifest.json has a malformed record for attachment ${a.key}.`);
    }
  }
  return m;
}

/** A regular file inside dir (no symbolic link, nothing outside), or a refusal naming it. */
async function memberFile(dir: string, rel: string): Promise<string> {
  const file = path.join(dir, rel);
  const st = await fs.promises.lstat(file).catch(() => null);
  if (!st) throw new RestoreRefusedError(`The archive lacks ${rel}, which its manifest lists.`);
  if (!st.isFile()) throw new RestoreRefusedError(`${rel} in the archive is not a regular file.`);
  const real = await fs.promises.realpath(file);
  if (!real.startsWith((await fs.promises.realpath(dir)) + path.sep)) throw new RestoreRefusedError(`${rel} in the archive points outside it.`);
  return file;
}

/** The tables (and views) of the connection's database. */
export async function tablesOf(sequelize: Sequelize): Promise<string[]> {
  const rows = await sequelize.query<{ name: string }>(
    'SELECT TABLE_NAME AS name FROM information_schema.TABLES WHERE TABLE_SCHEMA = DATABASE() ORDER BY TABLE_NAME',
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
}

async function hashStream(body: NodeJS.ReadableStream): Promise<string> {
  const hash = crypto.createHash('sha256');
  for await (const chunk of body as AsyncIterable<Buffer>) hash.update(chunk);
  return hash.digest('hex');
}

export async function restoreBackup(opts: RestoreOptions): Promise<BackupManifest> {
  const log = opts.log ?? (() => {});
  const archive = path.resolve(opts.file);
  if (!fs.existsSync(archive) || !fs.statSync(archive).isFile()) throw new RestoreRefusedError(`No backup file at ${archive}.`);

  // The database first: refuse before unpacking anything.
  const existing = await tablesOf(opts.sequelize);
  if (existing.length) {
    throw new RestoreRefusedError(
      `Refusing to restore: database "${opts.db.name}" is not empty (${existing.length} table${existing.length === 1 ? '' : 's'}, ` +
        `e.g. ${existing.slice(0, 3).join(', ')}). A restore goes into an empty database only: ` +
        'point DB_NAME at a new database, or drop and re-create this one once you are sure it is not needed, then run the restore again.',
    );
  }

  const dir = await fs.promises.mkdtemp(path.join(os.tmpdir(), 'cw-restore-'));
  const client = clientOptionFile(opts.db);
  try {
    log(`Unpacking ${archive}…`);
    // GNU tar refuses member names with ".." and strips a leading "/"; ownership and modes are ours.
    const untar = await run('tar', ['--extract', '--gzip', '--file', archive, '--directory', dir, '--no-same-owner', '--no-same-permissions'], {}, TAR_HINT);
    if (untar.code !== 0) throw new RestoreRefusedError(`The archive could not be unpacked (tar exit ${untar.code}): ${untar.stderr}`);
    const manifest = readManifest(dir);

    // Every checksum before anything is written.
    log(`Checking the SHA-256 of the dump and of ${manifest.attachments.length} attachment${manifest.attachments.length === 1 ? '' : 's'}…`);
    const dumpFile = await memberFile(dir, manifest.database.file);
    if ((await sha256File(dumpFile)).sha256 !== manifest.database.sha256) {
      throw new RestoreRefusedError('The dump\'s SHA-256 differs from the manifest: the backup is damaged; nothing was restored.');
    }
    for (const a of manifest.attachments) {
      const sum = await sha256File(await memberFile(dir, a.file));
      if (sum.sha256 !== a.sha256 || sum.size !== a.size) {
        throw new RestoreRefusedError(`Attachment ${a.key}: its SHA-256 or size differs from the manifest; the backup is damaged; nothing was restored.`);
      }
    }

    // The store: a key already there must hold the same bytes (a restore run again after a failed load).
    const toPut: typeof manifest.attachments = [];
    for (const a of manifest.attachments) {
      if (!(await opts.store.exists(a.key))) {
        toPut.push(a);
        continue;
      }
      const there = await hashStream((await opts.store.get(a.key)).body);
      if (there !== a.sha256) {
        throw new RestoreRefusedError(`Refusing to restore: the ${opts.store.kind} store already holds other bytes under ${a.key}. Restore into an empty attachment store.`);
      }
    }
    if (await tablesOf(opts.sequelize).then((t) => t.length > 0)) {
      throw new RestoreRefusedError(`Refusing to restore: database "${opts.db.name}" received tables while the backup was being checked.`);
    }

    log(`Putting ${toPut.length} attachment${toPut.length === 1 ? '' : 's'} into the ${opts.store.kind} store…`);
    for (const a of toPut) {
      const body = await fs.promises.readFile(path.join(dir, a.file));
      if (crypto.createHash('sha256').update(body).digest('hex') !== a.sha256) throw new Error(`Attachment ${a.key} changed while restoring.`);
      await opts.store.put(a.key, body, { contentType: a.contentType, sha256: a.sha256 });
    }

    log(`Loading the dump into database "${opts.db.name}"…`);
    const loaded = await run(
      'mariadb',
      [`--defaults-extra-file=${client.file}`, '--default-character-set=utf8mb4', '--batch', `--database=${opts.db.name}`],
      { stdin: fs.createReadStream(dumpFile) },
      CLIENT_HINT,
    );
    if (loaded.code !== 0) {
      throw new Error(
        `Loading the dump failed (mariadb exit ${loaded.code}): ${loaded.stderr}\n` +
          `Database "${opts.db.name}" may now be partly loaded: drop and re-create it before trying again (the attachments put so far may stay).`,
      );
    }

    // After the load: every attachment the database lists is in the store.
    const listed = await opts.sequelize.query<{ storage_key: string }>('SELECT storage_key FROM attachments', { type: QueryTypes.SELECT });
    const missing: string[] = [];
    for (const r of listed) if (!(await opts.store.exists(r.storage_key))) missing.push(r.storage_key);
    if (missing.length) log(`Warning: ${missing.length} attachment(s) listed in the database are not in the store (see the backup's problems): ${missing.slice(0, 5).join(', ')}`);
    return manifest;
  } finally {
    client.remove();
    await fs.promises.rm(dir, { recursive: true, force: true });
  }
}
