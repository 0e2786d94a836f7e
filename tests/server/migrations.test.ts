/** Migrations run up, down and up again on a real MariaDB. */
import { QueryTypes } from 'sequelize';
import { migrateDown, migrateUp } from '../../server/db/migrate';
import { migrations } from '../../server/db/migrations';
import { createTestDatabase, type TestDatabase } from '../support/db';

// Eight migrations up, down and up again, with triggers: seconds on a busy machine.
jest.setTimeout(60_000);

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

const columns = async (table: string) => {
  const rows = await t.sequelize.query<{ name: string }>(
    'SELECT column_name AS name FROM information_schema.columns WHERE table_schema = DATABASE() AND table_name = ? ORDER BY ordinal_position',
    { replacements: [table], type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name);
};

const indexed = async (table: string) => {
  const rows = await t.sequelize.query<{ name: string }>(
    'SELECT DISTINCT column_name AS name FROM information_schema.statistics WHERE table_schema = DATABASE() AND table_name = ? AND seq_in_index = 1',
    { replacements: [table], type: QueryTypes.SELECT },
  );
  return rows.map((r) => r.name).sort();
};

const taxonomy = ['conservation_laws', 'mechanism_classes'];
const accounts = ['audit_events', 'dev_outbox', 'email_tokens', 'sessions', 'users'];
const entries = ['entries', 'entry_laws', 'entry_versions'];
const claimChecks = ['saved_claim_checks'];
const submissions = ['attachments', 'submission_entries', 'submission_events', 'submissions'];
const synonyms = ['synonym_groups', 'synonym_phrases'];
const rateLimits = ['rate_limits'];

it('applies every migration, rolls all back, and applies them again', async () => {
  expect(await migrateUp(t.sequelize)).toEqual(migrations.map((m) => m.name));
  expect(await tables()).toEqual([...taxonomy, ...accounts, ...entries, ...claimChecks, ...submissions, ...synonyms, ...rateLimits].sort());
  expect(await migrateUp(t.sequelize)).toEqual([]);
  // The migrations after 0006 first, all at once, then the earlier ones one by one with their tables.
  const later = migrations.slice(migrations.findIndex((m) => m.name === '0006-synonyms') + 1).map((m) => m.name);
  if (later.length) expect(await migrateDown(t.sequelize, later[0])).toEqual([...later].reverse());
  expect(await migrateDown(t.sequelize)).toEqual(['0006-synonyms']);
  expect(await tables()).toEqual([...taxonomy, ...accounts, ...entries, ...claimChecks, ...submissions].sort());
  expect(await migrateDown(t.sequelize)).toEqual(['0005-submissions']);
  expect(await tables()).toEqual([...taxonomy, ...accounts, ...entries, ...claimChecks].sort());
  expect(await migrateDown(t.sequelize)).toEqual(['0004-claim-checks']);
  expect(await tables()).toEqual([...taxonomy, ...accounts, ...entries].sort());
  expect(await migrateDown(t.sequelize)).toEqual(['0003-entries']);
  expect(await tables()).toEqual([...taxonomy, ...accounts].sort());
  expect(await migrateDown(t.sequelize)).toEqual(['0002-accounts']);
  expect(await tables()).toEqual(taxonomy);
  await migrateDown(t.sequelize, 0);
  expect(await tables()).toEqual([]);
  expect(await migrateUp(t.sequelize)).toEqual(migrations.map((m) => m.name));
});

it('creates the accounts tables with the columns and indexes their users need', async () => {
  // connect-session-sequelize reads and writes sid, expires and data; user_id lets a reset end a user's sessions.
  expect(await columns('sessions')).toEqual(['sid', 'expires', 'data', 'user_id', 'created_at', 'updated_at']);
  expect(await indexed('sessions')).toEqual(['expires', 'sid', 'user_id']);
  expect(await columns('users')).toEqual(['id', 'email', 'display_name', 'password_hash', 'role', 'email_verified_at', 'created_at', 'updated_at']);
  expect(await columns('email_tokens')).toEqual(['id', 'user_id', 'purpose', 'token_hash', 'expires_at', 'used_at', 'created_at']);
  expect(await columns('audit_events')).toEqual(['id', 'actor_id', 'action', 'subject_type', 'subject_id', 'before', 'after', 'created_at']);
  expect(await indexed('audit_events')).toEqual(expect.arrayContaining(['created_at', 'subject_type']));
  expect(await columns('dev_outbox')).toEqual(['id', 'to', 'from', 'subject', 'text', 'html', 'received_at']);
  // The role column: the four roles, contributor by default.
  const [role] = await t.sequelize.query<{ type: string; def: string }>(
    "SELECT column_type AS type, column_default AS def FROM information_schema.columns WHERE table_schema = DATABASE() AND table_name = 'users' AND column_name = 'role'",
    { type: QueryTypes.SELECT },
  );
  expect(role.type).toBe("enum('contributor','editor','moderator','admin')");
  expect(role.def).toMatch(/contributor/);
  // One account per address.
  await t.sequelize.query("INSERT INTO users (email, display_name, password_hash, created_at, updated_at) VALUES ('a@example.org', 'A', 'x', NOW(), NOW())");
  await expect(
    t.sequelize.query("INSERT INTO users (email, display_name, password_hash, created_at, updated_at) VALUES ('a@example.org', 'B', 'y', NOW(), NOW())"),
  ).rejects.toMatchObject({ name: 'SequelizeUniqueConstraintError' });
});
