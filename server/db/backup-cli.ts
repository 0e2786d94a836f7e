/**
 * `npm run backup`: writes counterweight-<UTC timestamp>.tar.gz into BACKUP_DIR (default
 * .data/backups): a `mariadb-dump --single-transaction` of the configured database and every
 * attachment in the configured store, with their SHA-256 in manifest.json and SHA256SUMS.
 *
 * `npm run restore <file>`: checks every checksum, then restores into an EMPTY database (refused
 * otherwise, exit 1) and the configured attachment store. See server/db/backup.ts.
 *
 * With the managed MariaDB (DB_MANAGED=1, the default), a running one (npm start) is used as it is;
 * otherwise one is started for the command and stopped after it.
 */
import path from 'node:path';
import { loadConfig } from '../config';
import { storageFromEnv } from '../storage';
import { backupDirFromEnv, createBackup, restoreBackup } from './backup';
import { runCommand, withDatabase } from './command';

const USAGE = 'usage: npm run backup | npm run restore <backup-file.tar.gz>';

runCommand(async () => {
  const [command, file, ...extra] = process.argv.slice(2);
  const log = (m: string) => console.log(m);
  if (command === 'backup' && file === undefined) {
    const config = loadConfig();
    const store = storageFromEnv();
    const backupDir = backupDirFromEnv();
    const { file: written, manifest } = await withDatabase((sequelize) =>
      createBackup({ db: config.db, sequelize, store, backupDir, appVersion: config.version, log }),
    );
    for (const p of manifest.problems) console.warn(`Warning: ${p}`);
    console.log(
      `Wrote ${path.relative(process.cwd(), written) || written}: database "${manifest.database.name}" ` +
        `(${manifest.database.size} bytes of SQL) and ${manifest.attachments.length} attachment(s), with their SHA-256.`,
    );
    return;
  }
  if (command === 'restore' && file && !extra.length) {
    // npm runs scripts in the project root; a relative path means the caller's directory.
    const archive = path.resolve(process.env.INIT_CWD ?? process.cwd(), file);
    const config = loadConfig();
    const store = storageFromEnv();
    const manifest = await withDatabase((sequelize) => restoreBackup({ file: archive, db: config.db, sequelize, store, log }));
    console.log(
      `Restored database "${config.db.name}" from the backup of ${manifest.createdAt} ` +
        `and ${manifest.attachments.length} attachment(s) into the ${store.kind} store.`,
    );
    return;
  }
  console.error(USAGE);
  process.exit(2);
});
