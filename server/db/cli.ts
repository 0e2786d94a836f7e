/**
 * `npm run db:migrate` and `npm run db:rollback [name]` (the last one, or down to and including
 * that name): migrations against the configured database.
 * With the managed MariaDB, a running one (npm start) is used as it is; otherwise one is started for
 * the command and stopped after it.
 */
import path from 'node:path';
import { loadConfig } from '../config';
import { ensureMariaDbInstalled, MariaDbServer } from './mariadb';
import { migrateDown, migrateUp } from './migrate';
import { createSequelize } from './sequelize';

async function main() {
  const [command, target] = process.argv.slice(2);
  if (command !== 'migrate' && command !== 'rollback') {
    console.error('usage: tsx server/db/cli.ts migrate | rollback [migration-name]');
    process.exit(2);
  }
  const config = loadConfig();
  let owned: MariaDbServer | null = null;
  if (config.dbManaged) {
    const server = new MariaDbServer({ baseDir: path.join(config.dataDir, 'mariadb'), port: config.db.port });
    if (server.runningPid() === null) {
      const { mariadbd, installDb } = ensureMariaDbInstalled();
      server.initialise(installDb);
      await server.start(mariadbd);
      await server.provision({ database: config.db.name, user: config.db.user, password: config.db.password });
      owned = server;
    }
  }
  const sequelize = createSequelize(config.db);
  try {
    const log = (m: string) => console.log(m);
    const done = command === 'migrate' ? await migrateUp(sequelize, log) : await migrateDown(sequelize, target, log);
    console.log(done.length ? `${command === 'migrate' ? 'Applied' : 'Rolled back'}: ${done.join(', ')}` : 'Nothing to do.');
  } finally {
    await sequelize.close();
    await owned?.stop();
  }
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
