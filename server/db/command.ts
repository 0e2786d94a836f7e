/**
 * For one-off commands (migrations, export): a Sequelize connection to the configured database.
 * With the managed MariaDB, a running one (npm start) is used as it is; otherwise one is started for
 * the command and stopped after it.
 */
import path from 'node:path';
import type { Sequelize } from 'sequelize';
import { loadConfig } from '../config';
import { initModels } from '../models';
import { ensureMariaDbInstalled, MariaDbServer } from './mariadb';
import { createSequelize } from './sequelize';

export async function withDatabase<T>(work: (sequelize: Sequelize) => Promise<T>): Promise<T> {
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
  initModels(sequelize);
  try {
    return await work(sequelize);
  } finally {
    await sequelize.close();
    await owned?.stop();
  }
}

/** Runs a command's main function, printing its error in one line and exiting 1 on failure. */
export function runCommand(main: () => Promise<void>): void {
  main().catch((err) => {
    console.error(err instanceof Error ? err.message : err);
    process.exit(1);
  });
}
