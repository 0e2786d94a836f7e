/**
 * Saved claim checks (issue 6): a signed-in reader's claim check, kept with its result and shared
 * by an unguessable token. Only the SHA-256 of the token would not do here: the owner's list must
 * show the link again, so the token itself is kept (it grants reading only, never writing).
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('saved_claim_checks', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    token: { type: DataTypes.STRING(43), allowNull: false, unique: true },
    owner_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'users', key: 'id' },
      onDelete: 'CASCADE',
    },
    text: { type: DataTypes.TEXT('medium'), allowNull: false },
    style: { type: DataTypes.STRING(16), allowNull: false },
    /** The figures as the reader sent them back (null: extracted from the text). */
    figures: { type: DataTypes.JSON, allowNull: true },
    result: { type: DataTypes.JSON, allowNull: false },
    top_match: { type: DataTypes.STRING(160), allowNull: true },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('saved_claim_checks', ['owner_id', 'created_at']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('saved_claim_checks');
};
