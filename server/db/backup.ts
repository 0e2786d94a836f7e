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
import crypto from 'node:crypto';
import fs from 'node:fs';
import path from 'node:path';
import { pipeline } from 'node:stream/promises';
import { Transform } from 'node:stream';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { Config } from '../config';
import { assertKey, ObjectNotFoundError, type ObjectStore } from '../storage';
import { BACKUP_FORMAT, BACKUP_FORMAT_VERSION, backupTimestamp, type BackupManifest, type ManifestObject } from './backup-format';
import { clientOptionFile, run, CLIENT_HINT, TAR_HINT, toolVersion, StripDefiners, sha256File, tail, fsyncPath } from './backup-tools';

export {
  BACKUP_FORMAT,
  BACKUP_FORMAT_VERSION,
  RestoreRefusedError,
  backupDirFromEnv,
  backupTimestamp,
  type BackupManifest,
  type ManifestObject,
} from './backup-format';
export { restoreBackup, tablesOf, type RestoreOptions } from './restore';


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
