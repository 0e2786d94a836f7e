/** Migrations with umzug, recorded in the `schema_migrations` table. */
import type { QueryInterface, Sequelize } from 'sequelize';
import { SequelizeStorage, Umzug } from 'umzug';
import { migrations } from './migrations';

export type { Migration } from './migrations/types';

export function migrator(sequelize: Sequelize, log: (msg: string) => void = () => {}) {
  return new Umzug<QueryInterface>({
    migrations,
    context: sequelize.getQueryInterface(),
    storage: new SequelizeStorage({ sequelize, tableName: 'schema_migrations' }),
    logger: {
      info: (m) => log(`migration ${String((m as { event?: string }).event ?? '')} ${String((m as { name?: string }).name ?? '')}`.trim()),
      warn: (m) => log(JSON.stringify(m)),
      error: (m) => log(JSON.stringify(m)),
      debug: () => {},
    },
  });
}

export async function migrateUp(sequelize: Sequelize, log?: (msg: string) => void): Promise<string[]> {
  const done = await migrator(sequelize, log).up();
  return done.map((m) => m.name);
}

/** Reverts the last migration, or every migration down to and including `to` (0: all of them). */
export async function migrateDown(sequelize: Sequelize, to?: string | 0, log?: (msg: string) => void): Promise<string[]> {
  const done = await migrator(sequelize, log).down(to === undefined ? {} : { to });
  return done.map((m) => m.name);
}
