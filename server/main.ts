/**
 * `npm start`: build the web app if needed, bring up our MariaDB, migrate, load the starter data
 * into an empty database (and the demo accounts, in development), start the local fake SMTP server
 * (development, unless SMTP_URL is set), and serve the app and the API on one port. SIGINT or
 * SIGTERM stops Express first, then the mail catcher, the database pool, then mariadbd, and leaves
 * no process behind.
 */
import type { Server } from 'node:http';
import path from 'node:path';
import pino from 'pino';
import type { Sequelize } from 'sequelize';
import { createApp, type AppLocals } from './app';
import { buildWeb, webBuildIsStale } from './build';
import { loadConfig, ROOT } from './config';
import { ensureMariaDbInstalled, MariaDbServer, portIsFree } from './db/mariadb';
import { migrateUp } from './db/migrate';
import { seedIfEmpty } from './db/seed';
import { seedDemoAccounts } from './db/seed-accounts';
import { importEntriesIfEmpty } from './db/seed-entries';
import { keepConnectionsLonger } from './http/keep-alive';
import { FakeSmtpServer } from './mail/fake-smtp';
import { createMailer, type Mailer } from './mail/mailer';
import { createSequelize } from './db/sequelize';
import { initModels } from './models';

const say = (m: string) => console.log(`[counterweight] ${m}`);

async function main() {
  const config = loadConfig();
  const logger = pino({ level: config.logLevel });
  let db: MariaDbServer | null = null;
  let sequelize: Sequelize | null = null;
  let server: Server | null = null;
  let locals: AppLocals | null = null;
  let smtp: FakeSmtpServer | null = null;
  let mailer: Mailer | null = null;
  let stopping: Promise<void> | null = null;

  const shutdown = (reason: string, code = 0) => {
    stopping ??= (async () => {
      say(`Stopping (${reason})…`);
      if (server) {
        const s = server;
        await new Promise<void>((resolve) => {
          s.close(() => resolve());
          s.closeIdleConnections();
          // Cast: tsc may read the DOM's setTimeout (returning a number) before Node's.
          (setTimeout(() => {
            s.closeAllConnections();
            resolve();
          }, 5000) as unknown as NodeJS.Timeout).unref();
        });
      }
      await locals?.close().catch(() => {});
      mailer?.close();
      if (smtp) await smtp.stop().catch(() => {});
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
  // An error nothing caught: before a stop, the launcher stops in order (MariaDB included) and exits 1;
  // during a stop (a late answer of a connection or a worker being closed), it is reported and the
  // stop goes on: it must not end the process with MariaDB still running.
  const uncaught = (err: unknown) => {
    const text = err instanceof Error ? (err.stack ?? err.message) : String(err);
    if (stopping) {
      say(`While stopping, an error nothing caught (the stop goes on): ${text}`);
      return;
    }
    say(`An error nothing caught; stopping: ${text}`);
    void shutdown('an error nothing caught', 1);
  };
  process.on('uncaughtException', uncaught);
  process.on('unhandledRejection', uncaught);

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
    if (config.env === 'development') {
      const demo = await seedDemoAccounts(sequelize, path.join(ROOT, 'content'), config.env);
      if (demo) {
        say(`Seeded the demo accounts (password for all: ${demo.password}):`);
        for (const a of demo.accounts) say(`  ${a.email} (${a.role}, ${a.displayName})`);
      }
    } else if (config.env === 'production') {
      say('NODE_ENV=production: the demo accounts are not seeded (their password is published).');
    }
    if (config.env !== 'production') {
      // After the accounts: the starter entries name the demo editors as author and reviewer.
      const imported = await importEntriesIfEmpty(sequelize, path.join(ROOT, 'content'));
      if (imported) say(`Imported ${imported} starter entries from content/entries.`);
    } else {
      say('NODE_ENV=production: the starter entries are not imported (they are attributed to the demo editors).');
    }

    let smtpUrl = config.smtpUrl;
    if (!smtpUrl) {
      // Development without SMTP_URL: our own mail catcher on loopback, read in the admin Outbox.
      smtp = await new FakeSmtpServer({ port: config.smtpPort }).start();
      smtpUrl = smtp.url;
      say(`Mail goes to the local mail catcher on 127.0.0.1:${smtp.port}; read it in Admin → Outbox.`);
    }
    mailer = createMailer({ url: smtpUrl, from: config.mailFrom });

    const app = createApp({
      sequelize,
      version: config.version,
      staticDir: config.staticDir,
      logger,
      env: config.env,
      sessionSecret: config.sessionSecret,
      publicUrl: config.publicUrl,
      mailer,
      trustProxy: config.trustProxy,
    });
    locals = app.locals as unknown as AppLocals;
    const s = keepConnectionsLonger(app.listen(config.port, config.host));
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
