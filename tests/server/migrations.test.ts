/** Migrations run up, down and up again on a real MariaDB. */
import { QueryTypes } from 'sequelize';
import { migrateDown, migrateUp } from '../../server/db/migrate';
import { migrations } from '../../server/db/migrations';
import { createTestDatabase, type TestDatabase } from '../support/db';

let t: TestDatabase;
beforeAll(async () => {
  t = await createTestDatabase({ migrate: false });
});
afterAll(() => t.drop());

const tables = async () => {
  const rows = await t.sequelize.query<{ name: string }>(
    'SELECT table_name AS name FROM information_schema.tables WHERE table_schema = DATABASE()',
    { type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name).filter((n) => n !== 'schema_migrations').sort();
};

it('applies every migration, rolls all back, and applies them again', async () => {
  expect(await migrateUp(t.sequelize)).toEqual(migrations.map((m) => m.name));
  expect(await tables()).toEqual(['conservation_laws', 'mechanism_classes']);
  expect(await migrateUp(t.sequelize)).toEqual([]);
  expect(await migrateDown(t.sequelize)).toEqual([migrations[migrations.length - 1].name]);
  await migrateDown(t.sequelize, 0);
  expect(await tables()).toEqual([]);
  expect(await migrateUp(t.sequelize)).toEqual(migrations.map((m) => m.name));
});
