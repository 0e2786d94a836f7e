/**
 * The application's one Sequelize instance. The pool recreates connections on demand, so when
 * MariaDB goes away and comes back the server carries on by itself; short timeouts make a down
 * database answer quickly (health says 503) instead of hanging requests.
 */
import { Sequelize } from 'sequelize';
import type { Config } from '../config';

export function createSequelize(db: Config['db'], opts: { logging?: (sql: string) => void } = {}): Sequelize {
  return new Sequelize(db.name, db.user, db.password, {
    host: db.host,
    port: db.port,
    dialect: 'mariadb',
    logging: opts.logging ?? false,
    define: { underscored: true, charset: 'utf8mb4', collate: 'utf8mb4_unicode_ci' },
    dialectOptions: { connectTimeout: 3000 },
    timezone: '+00:00',
    pool: { max: 10, min: 0, acquire: 5000, idle: 10_000, evict: 5000 },
    retry: { max: 0 },
  });
}

/** True when a trivial query answers within the timeout. Never throws. */
export async function databaseIsUp(sequelize: Sequelize, timeoutMs = 2000): Promise<boolean> {
  let timer: ReturnType<typeof setTimeout> | undefined;
  try {
    await Promise.race([
      sequelize.query('SELECT 1'),
      new Promise((_, reject) => {
        timer = setTimeout(() => reject(new Error('timeout')), timeoutMs);
      }),
    ]);
    return true;
  } catch {
    return false;
  } finally {
    clearTimeout(timer);
  }
}
