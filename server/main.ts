/**
 * `npm start`: build the web app if needed, bring up our MariaDB, migrate, load the starter data
 * into an empty database, and serve the app and the API on one port. SIGINT or SIGTERM stops
 * Express first, then the database pool, then mariadbd, and leaves no process behind.
 */
import type { Server } from 'node:http';
import path from 'node:path';
import pino from 'pino';
import type { Sequelize } from 'sequelize';
import { createApp } from './app';
import { buildWeb, webBuildIsStale } from './build';
import { loadConfig, ROOT } from './config';
import { ensureMariaDbInstalled, MariaDbServer, portIsFree } from './db/mariadb';
import { migrateUp } from './db/migrate';
import { seedIfEmpty } from './db/seed';
import { createSequelize } from './db/sequelize';
import { initModels } from './models';

const say = (m: string) => console.log(`[counterweight] ${m}`);

async function main() {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  let db: MariaDbServer | null = null;
  let sequelize: Sequelize | null = null;
  let server: Server | null = null;
  let stopping: Promise<void> | null = null;

  const shutdown = (reason: string, code = 0) => {
    stopping ??= (async () => {
      say(`Stopping (${reason})…`);
      if (server) {
        const s = server;
        await new Promise<void>((resolve) => {
          s.close(() => resolve());
          s.closeIdleConnections();
          setTimeout(() => {
            s.closeAllConnections();
            resolve();
          }, 5000).unref();
        });
      }
      await sequelize?.close().catch(() => {});
      if (db) {
        say('Stopping MariaDB…');
        await db.stop();
      }
      say('Stopped.');
      process.exit(code);
    })();
    return stopping;
  };
  process.on('SIGINT', () => void shutdown('SIGINT'));
  process.on('SIGTERM', () => void shutdown('SIGTERM'));

  try {
    // Before touching the database: a second launcher must not take over the first one's MariaDB.
    if (!(await portIsFree(config.port, config.host))) {
      throw new Error(`port ${config.port} is already in use (is Counterweight already running?). Stop it, or set PORT.`);
    }
    if (process.env.SKIP_WEB_BUILD !== '1' && webBuildIsStale(ROOT, config.staticDir)) {
      buildWeb(ROOT, config.staticDir, say);
    }
    if (config.dbManaged) {
      const { mariadbd, installDb } = ensureMariaDbInstalled(say);
      db = new MariaDbServer({ baseDir: path.join(config.dataDir, 'mariadb'), port: config.db.port });
      if (db.initialise(installDb)) say(`Created a new MariaDB datadir in ${db.dataDir}.`);
      await db.start(mariadbd);
      say(`MariaDB is up on 127.0.0.1:${config.db.port} (pid ${db.pid}).`);
      await db.provision({ database: config.db.name, user: config.db.user, password: config.db.password });
    }
    sequelize = createSequelize(config.db);
    initModels(sequelize);
    await sequelize.authenticate();
    const applied = await migrateUp(sequelize);
    if (applied.length) say(`Applied migrations: ${applied.join(', ')}.`);
    if (await seedIfEmpty(sequelize, path.join(ROOT, 'content'))) say('Loaded the starter library into the empty database.');

    const app = createApp({ sequelize, version: config.version, staticDir: config.staticDir, logger });
    const s = app.listen(config.port, config.host);
    server = s;
    await new Promise<void>((resolve, reject) => {
      s.once('listening', resolve);
      s.once('error', reject);
    });
    say(`Counterweight is running at http://${config.host}:${config.port}  (Ctrl-C stops it)`);
  } catch (err) {
    console.error(`[counterweight] Could not start: ${(err as Error).message}`);
    await shutdown('start-up failed', 1);
  }
}

void main();
