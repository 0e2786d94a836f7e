/**
 * Entries: the entry (stable slug, status, the last published version), its versions (drafts are
 * mutable, a published version never changes), and entry ↔ conservation law for filtering.
 * Content is JSON (MariaDB stores it as LONGTEXT with a json_valid check).
 *
 * A trigger refuses any UPDATE or DELETE of a published version at the database itself, beside the
 * model hooks and the service, so that a permalink's text can never change under a citation.
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

const timestamps = {
  created_at: { type: DataTypes.DATE, allowNull: false },
  updated_at: { type: DataTypes.DATE, allowNull: false },
};

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('entries', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    slug: { type: DataTypes.STRING(80), allowNull: false, unique: true },
    /** Title of the last published version (or of the first draft until then). */
    title: { type: DataTypes.STRING(160), allowNull: false },
    status: { type: DataTypes.ENUM('draft', 'in_review', 'published', 'retired'), allowNull: false, defaultValue: 'draft' },
    mechanism_class_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'mechanism_classes', key: 'id' },
      onDelete: 'RESTRICT',
    },
    current_version_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    last_published_at: { type: DataTypes.DATE, allowNull: true },
    retired_reason: { type: DataTypes.TEXT, allowNull: true },
    successor_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'entries', key: 'id' },
      onDelete: 'RESTRICT',
    },
    ...timestamps,
  });
  // The library list: published entries, newest revision first, by class.
  await qi.addIndex('entries', ['status', 'last_published_at', 'id']);
  await qi.addIndex('entries', ['mechanism_class_id', 'status', 'last_published_at']);
  await qi.addIndex('entries', ['successor_id']);

  await qi.createTable('entry_versions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    entry_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'entries', key: 'id' },
      onDelete: 'RESTRICT',
    },
    /** 1, 2, 3 … once published; null while a draft. */
    number: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    state: { type: DataTypes.ENUM('draft', 'in_review', 'published', 'superseded'), allowNull: false, defaultValue: 'draft' },
    /** The published version this draft revises (null for a new entry's first draft). */
    based_on_id: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    content: { type: DataTypes.JSON, allowNull: false },
    change_note: { type: DataTypes.STRING(500), allowNull: true },
    /** The reason given when the draft was last sent back. */
    review_note: { type: DataTypes.TEXT, allowNull: true },
    author_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    reviewer_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: true,
      references: { model: 'users', key: 'id' },
      onDelete: 'RESTRICT',
    },
    lock_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 0 },
    submitted_at: { type: DataTypes.DATE, allowNull: true },
    published_at: { type: DataTypes.DATE, allowNull: true },
    ...timestamps,
  });
  // Version N of an entry (unique; drafts have no number, and NULLs do not collide).
  await qi.addIndex('entry_versions', ['entry_id', 'number'], { unique: true, name: 'entry_versions_entry_number' });
  await qi.addIndex('entry_versions', ['entry_id', 'state']);
  // The Desk: my drafts; drafts waiting for review; recently published.
  await qi.addIndex('entry_versions', ['author_id', 'state', 'updated_at']);
  await qi.addIndex('entry_versions', ['state', 'updated_at']);
  await qi.addIndex('entry_versions', ['state', 'published_at']);
  await qi.addIndex('entry_versions', ['reviewer_id']);

  await qi.addConstraint('entries', {
    type: 'foreign key',
    fields: ['current_version_id'],
    name: 'entries_current_version_fk',
    references: { table: 'entry_versions', field: 'id' },
    onDelete: 'RESTRICT',
    onUpdate: 'RESTRICT',
  });
  await qi.addIndex('entries', ['current_version_id']);

  await qi.createTable('entry_laws', {
    entry_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      primaryKey: true,
      references: { model: 'entries', key: 'id' },
      onDelete: 'CASCADE',
    },
    law_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      primaryKey: true,
      references: { model: 'conservation_laws', key: 'id' },
      onDelete: 'RESTRICT',
    },
  });
  await qi.addIndex('entry_laws', ['law_id', 'entry_id']);

  const sequelize = qi.sequelize;
  await sequelize.query(`CREATE TRIGGER entry_versions_published_no_update BEFORE UPDATE ON entry_versions FOR EACH ROW
    BEGIN
      IF OLD.state = 'published' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a published entry version cannot be changed';
      END IF;
    END`);
  await sequelize.query(`CREATE TRIGGER entry_versions_published_no_delete BEFORE DELETE ON entry_versions FOR EACH ROW
    BEGIN
      IF OLD.state = 'published' THEN
        SIGNAL SQLSTATE '45000' SET MESSAGE_TEXT = 'a published entry version cannot be deleted';
      END IF;
    END`);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.sequelize.query('DROP TRIGGER IF EXISTS entry_versions_published_no_delete');
  await qi.sequelize.query('DROP TRIGGER IF EXISTS entry_versions_published_no_update');
  await qi.dropTable('entry_laws');
  await qi.removeConstraint('entries', 'entries_current_version_fk');
  await qi.dropTable('entry_versions');
  await qi.dropTable('entries');
};
