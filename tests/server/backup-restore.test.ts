/**
 * `npm run backup` and `npm run restore <file>` as a round trip (real MariaDB, the real commands run
 * with tsx, attachments on local disk): data of every kind (starter entries published, a revision
 * published through the two-editor workflow, a draft, a sighting with two attachment files, a saved
 * claim check) is backed up, restored into a second, empty database and an empty attachment
 * directory, and every table (its definition and every row), every trigger and every attachment
 * (SHA-256) compared. A restore into a database that has tables is refused with a non-zero exit, and
 * a backup whose bytes do not match its manifest is refused before anything is written.
 * All texts are invented test data.
 */
import { spawn } from 'node:child_process';
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import { QueryTypes, type Sequelize } from 'sequelize';
import type { AppLocals } from '../../server/app';
import { ROOT } from '../../server/config';
import { restoreBackup, RestoreRefusedError, tablesOf, type BackupManifest } from '../../server/db/backup';
import { LocalStore } from '../../server/storage';
import { minimalPdf, minimalPng } from '../fixtures/files/samples';
import { demo, startTestApp, type TestApp } from '../support/app';
import { createTestDatabase, type TestDatabase } from '../support/db';

jest.setTimeout(120_000);

const tmp = (prefix: string) => fs.mkdtempSync(path.join(os.tmpdir(), prefix));
const sha256 = (b: Buffer) => crypto.createHash('sha256').update(b).digest('hex');

let h: TestApp;
let target: TestDatabase;
let damaged: TestDatabase;
const dirs: string[] = [];

beforeAll(async () => {
  // The empty databases first: createTestDatabase binds the (module-wide) models to its connection,
  // and the app's models must stay on the source database.
  target = await createTestDatabase({ migrate: false });
  damaged = await createTestDatabase({ migrate: false });
  // The digest timer is set long so that no job changes the source after the backup.
  h = await startTestApp({ starterEntries: true, searchRefreshMs: 0, submissionDigestMs: 3_600_000 });
});
afterAll(async () => {
  await h?.close();
  await target?.drop();
  await damaged?.drop();
  for (const d of dirs) fs.rmSync(d, { recursive: true, force: true });
});

/** Runs server/db/backup-cli.ts as `npm run backup|restore` does, against the given database and store. */
function cli(args: string[], env: { db: TestDatabase['db']; uploads: string; backups: string; data: string }) {
  return new Promise<{ code: number | null; stdout: string; stderr: string }>((resolve, reject) => {
    const child = spawn(process.execPath, [path.join(ROOT, 'node_modules/tsx/dist/cli.mjs'), path.join(ROOT, 'server/db/backup-cli.ts'), ...args], {
      cwd: ROOT,
      env: {
        PATH: process.env.PATH,
        HOME: process.env.HOME,
        NODE_ENV: 'test',
        INIT_CWD: ROOT,
        DATA_DIR: env.data,
        DB_MANAGED: '0',
        DB_HOST: env.db.host,
        DB_PORT: String(env.db.port),
        DB_NAME: env.db.name,
        DB_USER: env.db.user,
        DB_PASSWORD: env.db.password,
        STORAGE: 'local',
        UPLOAD_DIR: env.uploads,
        BACKUP_DIR: env.backups,
      },
      stdio: ['ignore', 'pipe', 'pipe'],
    });
    let stdout = '';
    let stderr = '';
    child.stdout.on('data', (d) => (stdout += d));
    child.stderr.on('data', (d) => (stderr += d));
    child.once('error', reject);
    child.once('close', (code) => resolve({ code, stdout, stderr }));
  });
}

interface Snapshot {
  tables: Record<string, { create: string; rows: string[] }>;
  triggers: unknown[];
}

/** Every table's definition and every row (as JSON, sorted), and every trigger of the database. */
async function snapshot(seq: Sequelize): Promise<Snapshot> {
  const tables: Snapshot['tables'] = {};
  for (const t of await tablesOf(seq)) {
    const [def] = await seq.query<Record<string, string>>(`SHOW CREATE TABLE \`${t}\``, { type: QueryTypes.SELECT });
    const rows = await seq.query<Record<string, unknown>>(`SELECT * FROM \`${t}\``, { type: QueryTypes.SELECT });
    tables[t] = { create: def['Create Table'], rows: rows.map((r) => JSON.stringify(r)).sort() };
  }
  const triggers = await seq.query(
    `SELECT TRIGGER_NAME, EVENT_MANIPULATION, EVENT_OBJECT_TABLE, ACTION_TIMING, ACTION_STATEMENT, SQL_MODE
       FROM information_schema.TRIGGERS WHERE TRIGGER_SCHEMA = DATABASE() ORDER BY TRIGGER_NAME`,
    { type: QueryTypes.SELECT },
  );
  return { tables, triggers };
}

/** SHA-256 of every attachment file under a local store's directory (metadata files included), by relative path. */
function filesOf(dir: string): Record<string, string> {
  const out: Record<string, string> = {};
  const walk = (d: string) => {
    for (const e of fs.readdirSync(d, { withFileTypes: true })) {
      const p = path.join(d, e.name);
      if (e.isDirectory()) walk(p);
      else out[path.relative(dir, p)] = sha256(fs.readFileSync(p));
    }
  };
  if (fs.existsSync(dir)) walk(dir);
  return out;
}

const count = async (seq: Sequelize, sql: string) => Number((await seq.query<{ n: number }>(sql, { type: QueryTypes.SELECT }))[0].n);

describe('backup and restore', () => {
  const pdf = minimalPdf();
  const png = minimalPng();
  /**
   * What the tests need is made on first use and kept for the file: the data of every kind, then one
   * backup of it. Each test asks for what it needs, so that any one of them also passes run alone.
   */
  let seeded: Promise<void> | undefined;
  const dataOfEveryKind = () => (seeded ??= seedEveryKind());
  let made: Promise<Backup> | undefined;
  const backupOfIt = () => (made ??= dataOfEveryKind().then(makeBackup));

  interface Backup {
    source: Snapshot;
    archive: string;
    backups: string;
    sourceUploads: string;
    /** The backup command's exit code and output, and the time it started. */
    r: Awaited<ReturnType<typeof cli>>;
    before: number;
  }

  async function makeBackup(): Promise<Backup> {
    const source = await snapshot(h.t.sequelize);
    const backups = tmp('cw-backups-');
    dirs.push(backups);
    const sourceUploads = (h.store as LocalStore).dir;
    const data = tmp('cw-backup-data-');
    dirs.push(data);
    const before = Date.now();
    const r = await cli(['backup'], { db: h.t.db, uploads: sourceUploads, backups, data });
    const files = fs.readdirSync(backups);
    return { source, archive: path.join(backups, files[0] ?? 'no-archive-written'), backups, sourceUploads, r, before };
  }

  async function seedEveryKind(): Promise<void> {
    const one = await h.signedIn(demo.editor.email);
    const two = await h.signedIn(demo.editor2.email);
    // A revision of a starter entry, published by the second editor: version 2.
    const rev = await one.post('/api/entries/overbalanced-wheel/drafts');
    expect(rev.status).toBe(201);
    expect((await one.post(`/api/drafts/${rev.body.draft.id}/submit`, { lockVersion: rev.body.draft.lockVersion })).status).toBe(200);
    expect((await two.post(`/api/drafts/${rev.body.draft.id}/approve`, { changeNote: 'Wording of the summary checked.' })).status).toBe(200);
    // A draft left as a draft.
    const draft = await one.post('/api/entries/buoyancy-wheel/drafts');
    expect(draft.status).toBe(201);

    // A sighting with two files.
    const contributor = await h.signedIn(demo.contributor.email);
    const sighting = await contributor.agent
      .post('/api/sightings')
      .set('X-CSRF-Token', contributor.csrf)
      .field('title', 'Weighted wheel said to turn by itself at a county show')
      .field('seenAtUrl', 'https://show.example.org/2026/weighted-wheel')
      .field('summary', 'A stand by the invented Harrowgate Mechanics Circle showed a wheel with hinged weights that was said to keep turning for a week — 7 days in a hall at 18 °C, “unaided”.')
      .attach('files', pdf, { filename: 'leaflet.pdf', contentType: 'application/pdf' })
      .attach('files', png, { filename: 'stand.png', contentType: 'image/png' });
    expect(sighting.status).toBe(201);

    // A saved claim check.
    const saved = await contributor.post('/api/claim-checks/saved', {
      text: 'The Harrowgate wheel lifts a 20 kg load by 2 m every minute with no input of any kind, running for a week on end.',
    });
    expect(saved.status).toBe(201);

    await (h.app.locals as unknown as AppLocals).settle();
  }

  it('has data of every kind to back up', async () => {
    await dataOfEveryKind();
    // Each kind is really there, so that the comparison below compares something.
    const seq = h.t.sequelize;
    expect(await count(seq, "SELECT COUNT(*) n FROM entry_versions WHERE state = 'published'")).toBeGreaterThanOrEqual(2);
    expect(await count(seq, "SELECT COUNT(*) n FROM entry_versions WHERE state = 'published' AND number = 2")).toBe(1);
    expect(await count(seq, "SELECT COUNT(*) n FROM entry_versions WHERE state = 'draft'")).toBe(1);
    expect(await count(seq, 'SELECT COUNT(*) n FROM attachments')).toBe(2);
    expect(await count(seq, 'SELECT COUNT(*) n FROM saved_claim_checks')).toBe(1);
    expect(await count(seq, 'SELECT COUNT(*) n FROM sessions')).toBeGreaterThanOrEqual(3);
  });

  it('backs up into one archive in BACKUP_DIR, named with the UTC time, with the SHA-256 of the dump and of every attachment', async () => {
    const { source, backups, r, before } = await backupOfIt();
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    const files = fs.readdirSync(backups);
    expect(files).toHaveLength(1); // no staging or temporary file left behind
    expect(files[0]).toMatch(/^counterweight-\d{8}T\d{6}Z\.tar\.gz$/);
    const [, y, mo, d, hh, mi, ss] = /^counterweight-(\d{4})(\d{2})(\d{2})T(\d{2})(\d{2})(\d{2})Z/.exec(files[0])!;
    const stamp = Date.UTC(+y, +mo - 1, +d, +hh, +mi, +ss);
    expect(stamp).toBeGreaterThanOrEqual(Math.floor(before / 1000) * 1000);
    expect(stamp).toBeLessThanOrEqual(Date.now());
    const archive = path.join(backups, files[0]);
    expect(fs.statSync(archive).mode & 0o777).toBe(0o600); // password hashes and sessions inside
    expect(r.stdout).toContain(files[0]);

    // The source did not change while it was backed up: the comparison below is against what was saved.
    expect(await snapshot(h.t.sequelize)).toEqual(source);

    // The manifest, read with the system's tar, lists both files with their checksums.
    const list = await new Promise<string>((resolve, reject) => {
      const c = spawn('tar', ['-xzOf', archive, 'manifest.json']);
      let out = '';
      c.stdout.on('data', (x) => (out += x));
      c.once('error', reject);
      c.once('close', () => resolve(out));
    });
    const manifest = JSON.parse(list) as BackupManifest;
    expect(manifest.database.sha256).toMatch(/^[0-9a-f]{64}$/);
    expect(manifest.database.tool).toMatch(/mariadb-dump/i);
    expect(manifest.problems).toEqual([]);
    expect(manifest.attachments.map((a) => a.sha256).sort()).toEqual([sha256(pdf), sha256(png)].sort());
  });

  it('restores into an empty database and an empty attachment directory: every table, row, trigger and file identical', async () => {
    const { source, archive, backups, sourceUploads } = await backupOfIt();
    const uploads = tmp('cw-restored-uploads-');
    dirs.push(uploads);
    const data = tmp('cw-restore-data-');
    dirs.push(data);
    expect(await tablesOf(target.sequelize)).toEqual([]);
    const r = await cli(['restore', archive], { db: target.db, uploads, backups, data });
    expect(r.stderr).toBe('');
    expect(r.code).toBe(0);
    expect(r.stdout).toMatch(/Restored database/);

    const restored = await snapshot(target.sequelize);
    expect(Object.keys(restored.tables).sort()).toEqual(Object.keys(source.tables).sort());
    for (const t of Object.keys(source.tables)) expect({ t, ...restored.tables[t] }).toEqual({ t, ...source.tables[t] });
    expect(restored.triggers).toEqual(source.triggers);
    // The published-version guards of migration 0003 and the audit log's of 0008.
    expect(source.triggers.length).toBe(4);

    // Every attachment file (and its metadata file) has the same bytes.
    const was = filesOf(sourceUploads);
    expect(Object.keys(was)).toHaveLength(4); // two files, each with <key>.meta.json
    expect(filesOf(uploads)).toEqual(was);

    // And the restored database still guards its published versions.
    await expect(target.sequelize.query("DELETE FROM entry_versions WHERE state = 'published'")).rejects.toThrow();
  });

  it('refuses to restore into a database that has tables, with a clear message and a non-zero exit, writing nothing', async () => {
    const { source, archive, backups } = await backupOfIt();
    const uploads = tmp('cw-refused-uploads-');
    dirs.push(uploads);
    const data = tmp('cw-refused-data-');
    dirs.push(data);
    const r = await cli(['restore', archive], { db: h.t.db, uploads, backups, data });
    expect(r.code).not.toBe(0);
    expect(r.stderr).toMatch(/Refusing to restore: database "cw_t_\w+" is not empty/);
    expect(filesOf(uploads)).toEqual({});
    expect(await snapshot(h.t.sequelize)).toEqual(source);
  });

  it('refuses a backup whose bytes differ from its manifest before writing anything', async () => {
    const { archive } = await backupOfIt();
    // Unpack, change one byte of one attachment, pack again with the same manifest.
    const work = tmp('cw-tamper-');
    dirs.push(work);
    const run = (args: string[]) =>
      new Promise<number | null>((resolve, reject) => {
        const c = spawn('tar', args, { stdio: 'ignore' });
        c.once('error', reject);
        c.once('close', resolve);
      });
    expect(await run(['-xzf', archive, '-C', work])).toBe(0);
    const manifest = JSON.parse(fs.readFileSync(path.join(work, 'manifest.json'), 'utf8')) as BackupManifest;
    const victim = path.join(work, manifest.attachments[0].file);
    const bytes = fs.readFileSync(victim);
    bytes[bytes.length >> 1] ^= 0x01;
    fs.writeFileSync(victim, bytes);
    const bad = path.join(work, 'damaged.tar.gz');
    expect(await run(['-czf', bad, '-C', work, 'manifest.json', 'SHA256SUMS', 'database.sql', 'objects'])).toBe(0);

    const uploads = tmp('cw-damaged-uploads-');
    dirs.push(uploads);
    await expect(restoreBackup({ file: bad, db: damaged.db, sequelize: damaged.sequelize, store: new LocalStore(uploads) })).rejects.toThrow(
      RestoreRefusedError,
    );
    await expect(restoreBackup({ file: bad, db: damaged.db, sequelize: damaged.sequelize, store: new LocalStore(uploads) })).rejects.toThrow(
      /SHA-256 or size differs from the manifest/,
    );
    expect(await tablesOf(damaged.sequelize)).toEqual([]);
    expect(filesOf(uploads)).toEqual({});
  });
});
