/**
 * `npm run db:migrate` and `npm run db:rollback [name]` (the last one, or down to and including
 * that name): migrations against the configured database.
 */
import { runCommand, withDatabase } from './command';
import { migrateDown, migrateUp } from './migrate';

runCommand(async () => {
  const [command, target] = process.argv.slice(2);
  if (command !== 'migrate' && command !== 'rollback') {
    console.error('usage: tsx server/db/cli.ts migrate | rollback [migration-name]');
    process.exit(2);
  }
  const log = (m: string) => console.log(m);
  const done = await withDatabase((sequelize) =>
    command === 'migrate' ? migrateUp(sequelize, log) : migrateDown(sequelize, target, log),
  );
  console.log(done.length ? `${command === 'migrate' ? 'Applied' : 'Rolled back'}: ${done.join(', ')}` : 'Nothing to do.');
});
