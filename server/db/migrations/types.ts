import type { QueryInterface } from 'sequelize';
import type { MigrationFn } from 'umzug';

/** One schema change: `up` and `down` against Sequelize's query interface (run by server/db/migrate.ts). */
export type Migration = MigrationFn<QueryInterface>;
