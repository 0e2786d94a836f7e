/**
 * Test databases on the throwaway MariaDB that tests/support/run-all.ts starts: each test file gets
 * its own database and user, migrated, and dropped at the end.
 */
import crypto from 'node:crypto';
import type { Sequelize } from 'sequelize';
import type { Config } from '../../server/config';
import { dropDatabase, provisionDatabase } from '../../server/db/mariadb';
import { migrateUp } from '../../server/db/migrate';
import { createSequelize } from '../../server/db/sequelize';
import { initModels } from '../../server/models';

export function testDbEnv(): { socket: string; port: number } {
  const socket = process.env.CW_TEST_DB_SOCKET;
  const port = Number(process.env.CW_TEST_DB_PORT);
  if (!socket || !port) {
    throw new Error('No test database: run the tests with `npm test`, which starts a throwaway MariaDB first.');
  }
  return { socket, port };
}

export interface TestDatabase {
  sequelize: Sequelize;
  db: Config['db'];
  drop: () => Promise<void>;
}

export async function createTestDatabase(opts: { migrate?: boolean } = {}): Promise<TestDatabase> {
  const { socket, port } = testDbEnv();
  const id = crypto.randomBytes(5).toString('hex');
  const db = { host: '127.0.0.1', port, name: `cw_t_${id}`, user: `cw_t_${id}`, password: crypto.randomBytes(12).toString('hex') };
  await provisionDatabase(socket, { database: db.name, user: db.user, password: db.password });
  const sequelize = createSequelize(db);
  initModels(sequelize);
  if (opts.migrate !== false) await migrateUp(sequelize);
  return {
    sequelize,
    db,
    drop: async () => {
      await sequelize.close();
      await dropDatabase(socket, { database: db.name, user: db.user });
    },
  };
}
