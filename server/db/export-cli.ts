/**
 * `npm run content:export [dir]`: writes the live library (each entry's latest published version)
 * to `dir` (default content/entries) in the starter-file format, one `<slug>.md` per entry.
 * With the managed MariaDB, a running one (npm start) is used as it is; otherwise one is started for
 * the command and stopped after it.
 */
import path from 'node:path';
import { loadConfig, ROOT } from '../config';
import { initModels } from '../models';
import { ensureMariaDbInstalled, MariaDbServer } from './mariadb';
import { writeExport } from './seed-entries';
import { createSequelize } from './sequelize';

async function main() {
  const dir = path.resolve(process.argv[2] ?? path.join(ROOT, 'content', 'entries'));
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
    const files = await writeExport(dir);
    console.log(files.length ? `Wrote ${files.length} entries to ${path.relative(process.cwd(), dir) || dir}.` : 'The library has no published entries; nothing written.');
  } finally {
    await sequelize.close();
    await owned?.stop();
  }
}

main().catch((err) => {
  console.error(err instanceof Error ? err.message : err);
  process.exit(1);
});
