/**
 * The throwaway database of the benches: a MariaDB in a temp datadir on a free port (never .data/),
 * provisioned, migrated, with the taxonomy, the synonyms and the demo accounts (the authors and
 * reviewers of entry versions). `started` is called as soon as mariadbd runs, so that a bench can stop
 * it on error or Ctrl-C even if what follows fails.
 */
import crypto from 'node:crypto';
import fs from 'node:fs';
import os from 'node:os';
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { ROOT } from '../server/config';
import { ensureMariaDbInstalled, freePort, MariaDbServer } from '../server/db/mariadb';
import { migrateUp } from '../server/db/migrate';
import { seedIfEmpty } from '../server/db/seed';
import { seedDemoAccounts } from '../server/db/seed-accounts';
import { createSequelize } from '../server/db/sequelize';
import { initModels } from '../server/models';

export const CONTENT = path.join(ROOT, 'content');

export interface BenchDatabaseConfig {
  host: string;
  port: number;
  name: string;
  user: string;
  password: string;
}

export async function startBenchDatabase(
  name: string,
  say: (line: string) => void,
  started: (db: MariaDbServer) => void,
): Promise<{ db: MariaDbServer; sequelize: Sequelize; cfg: BenchDatabaseConfig }> {
  const bins = ensureMariaDbInstalled(say);
  const db = new MariaDbServer({ baseDir: fs.mkdtempSync(path.join(os.tmpdir(), `cw-bench-${name}-`)), port: await freePort() });
  db.initialise(bins.installDb);
  await db.start(bins.mariadbd);
  started(db);
  const cfg = { host: '127.0.0.1', port: db.port, name: `cw_${name}`, user: `cw_${name}`, password: crypto.randomBytes(12).toString('hex') };
  await db.provision({ database: cfg.name, user: cfg.user, password: cfg.password });
  const sequelize = createSequelize(cfg);
  initModels(sequelize);
  await migrateUp(sequelize);
  await seedIfEmpty(sequelize, CONTENT);
  await seedDemoAccounts(sequelize, CONTENT, 'development');
  return { db, sequelize, cfg };
}
