/**
 * The trade's synonyms (issue 11): groups of words and phrases that mean one thing for matching,
 * edited by editors, loaded from content/synonyms.yml into an empty table. A phrase belongs to one
 * group only (`match_key`: its words as the matcher compares them, unique). `version` counts the
 * edits of a group: optimistic locking for editors, and with the row count and the highest id the
 * search index's change watermark.
 */
import { DataTypes } from 'sequelize';
import type { Migration } from './types';

export const up: Migration = async ({ context: qi }) => {
  await qi.createTable('synonym_groups', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    note: { type: DataTypes.STRING(500), allowNull: true },
    version: { type: DataTypes.INTEGER.UNSIGNED, allowNull: false, defaultValue: 1 },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
    created_at: { type: DataTypes.DATE, allowNull: false },
    updated_at: { type: DataTypes.DATE, allowNull: false },
  });
  await qi.addIndex('synonym_groups', ['position', 'id']);
  await qi.createTable('synonym_phrases', {
    id: { type: DataTypes.INTEGER.UNSIGNED, autoIncrement: true, primaryKey: true },
    group_id: {
      type: DataTypes.INTEGER.UNSIGNED,
      allowNull: false,
      references: { model: 'synonym_groups', key: 'id' },
      onDelete: 'CASCADE',
    },
    phrase: { type: DataTypes.STRING(80), allowNull: false },
    match_key: { type: DataTypes.STRING(190), allowNull: false, unique: true },
    position: { type: DataTypes.INTEGER, allowNull: false, defaultValue: 0 },
  });
  await qi.addIndex('synonym_phrases', ['group_id', 'position']);
};

export const down: Migration = async ({ context: qi }) => {
  await qi.dropTable('synonym_phrases');
  await qi.dropTable('synonym_groups');
};
