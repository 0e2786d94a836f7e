/** Restoring a backup (`npm run restore <file>`): see backup.ts for the archive and the order of the steps. */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Config } from '../config';
import { assertKey, type ObjectStore } from '../storage';
import { BACKUP_FORMAT, BACKUP_FORMAT_VERSION, RestoreRefusedError, type BackupManifest } from './backup-format';
import { clientOptionFile, run, CLIENT_HINT, TAR_HINT, sha256File } from './backup-tools';


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
