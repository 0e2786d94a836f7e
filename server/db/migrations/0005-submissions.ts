/**
 * Submissions from the public (issue 7): sightings (a claim seen in the wild, with attachments)
 * and corrections (an error reported against an entry version), one table for the moderators'
 * queue; their attachments (stored objects: key, media type checked by content, size, SHA-256);
 * the entries an accepted sighting is linked to; and each submission's history.
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

const fk = (table: string, allowNull: boolean, onDelete: 'RESTRICT' | 'CASCADE' | 'SET NULL' = 'RESTRICT') => ({
  type: DataTypes.INTEGER.UNSIGNED,
  allowNull,
  references: { model: table, key: 'id' },
  onDelete,
});

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('submissions', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    kind: { type: DataTypes.ENUM('sighting', 'correction'), allowNull: false },
    status: { type: DataTypes.ENUM('open', 'claimed', 'waiting', 'accepted', 'drafted', 'rejected'), allowNull: false, defaultValue: 'open' },
    title: { type: DataTypes.STRING(200), allowNull: false },
    submitter_id: fk('users', false),
    claimed_by_id: fk('users', true, 'SET NULL'),
    claimed_at: { type: DataTypes.DATE, allowNull: true },
    // Sightings
    seen_at_url: { type: DataTypes.STRING(2000), allowNull: true },
    seen_at_citation: { type: DataTypes.TEXT, allowNull: true },
    summary: { type: DataTypes.TEXT, allowNull: true },
    figures: { type: DataTypes.JSON, allowNull: true },
    // Corrections
    entry_id: fk('entries', true),
    entry_version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: true },
    section: { type: DataTypes.STRING(40), allowNull: true },
    what_is_wrong: { type: DataTypes.TEXT, allowNull: true },
    suggested_fix: { type: DataTypes.TEXT, allowNull: true },
    sources: { type: DataTypes.TEXT, allowNull: true },
    // Decisions
    decision: { type: DataTypes.ENUM('accept', 'draft', 'ask', 'reject'), allowNull: true },
    decision_note: { type: DataTypes.TEXT, allowNull: true },
    decided_by_id: fk('users', true, 'SET NULL'),
    decided_at: { type: DataTypes.DATE, allowNull: true },
    draft_entry_id: fk('entries', true),
    /** Set when the moderators' digest mail has listed it (null: not yet). */
    moderators_notified_at: { type: DataTypes.DATE, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('submissions', ['status', 'created_at', 'id']);
  await qi.addIndex('submissions', ['submitter_id', 'created_at']);
  await qi.addIndex('submissions', ['moderators_notified_at']);
  await qi.addIndex('submissions', ['entry_id', 'status']);

  await qi.createTable('attachments', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    submission_id: fk('submissions', false, 'CASCADE'),
    storage_key: { type: DataTypes.STRING(200), allowNull: false, unique: true },
    name: { type: DataTypes.STRING(200), allowNull: false },
    media_type: { type: DataTypes.STRING(40), allowNull: false },
    size: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false },
    sha256: { type: DataTypes.CHAR(64), allowNull: false },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('attachments', ['submission_id']);

  await qi.createTable('submission_entries', {
    submission_id: { ...fk('submissions', false, 'CASCADE'), primaryKey: true },
    entry_id: { ...fk('entries', false, 'CASCADE'), primaryKey: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('submission_entries', ['entry_id', 'created_at']);

  await qi.createTable('submission_events', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    submission_id: fk('submissions', false, 'CASCADE'),
    what: { type: DataTypes.STRING(20), allowNull: false },
    actor_id: fk('users', true, 'SET NULL'),
    note: { type: DataTypes.TEXT, allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('submission_events', ['submission_id', 'id']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('submission_events');
  await qi.dropTable('submission_entries');
  await qi.dropTable('attachments');
  await qi.dropTable('submissions');
};
