/**
 * The audit log append-only at the database itself (issue 13): triggers refuse every UPDATE and
 * DELETE of a row of audit_events, whoever sends it — beside the model's hooks, which only guard
 * what goes through Sequelize. As in 0003 for published entry versions, the refusal is a SIGNAL with
 * SQLSTATE 45000. REPLACE and INSERT … ON DUPLICATE KEY UPDATE fire the same triggers. TRUNCATE and
 * DROP fire no trigger (they are DDL); they need rights an operator can withhold from the app's user.
 *
 * mariadb-dump writes triggers by default, so a backup restored with `npm run restore` keeps them.
 */
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  const sequelize = qi.sequelize;
  await sequelize.query(`CREATE TRIGGER audit_events_no_update BEFORE UPDATE ON audit_events FOR EACH ROW
    BEGIN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit events are append-only: they cannot be changed';
    END`);
  await sequelize.query(`CREATE TRIGGER audit_events_no_delete BEFORE DELETE ON audit_events FOR EACH ROW
    BEGIN
      SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'audit events are append-only: they cannot be deleted';
    END`);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_delete');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS audit_events_no_update');
};
